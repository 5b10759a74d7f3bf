import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type CataloguePump, selectPumps } from '../../src/select/index';
import { q } from '../../src/units/index';
import { catalogueOf, parabolicDesign, parabolicPump } from './fixtures';

/** A random parabolic pump: shut-off head, BEP flow, droop, price, maybe a drive. */
const pumpArb = fc
  .record({
    a: fc.double({ min: 15, max: 90, noNaN: true }),
    qBest: fc.double({ min: 30, max: 220, noNaN: true }),
    droop: fc.double({ min: 0.1, max: 0.3, noNaN: true }),
    price: fc.integer({ min: 500, max: 20000 }),
    drive: fc.boolean(),
  })
  .map(
    ({ a, qBest, droop, price, drive }): Omit<CataloguePump, 'name'> =>
      parabolicPump('x', a, (a * droop) / (qBest * qBest), qBest, {
        price,
        ...(drive
          ? { drive: { minSpeed: q(500, 'rpm'), maxSpeed: q(1750, 'rpm'), efficiency: 0.96 } }
          : {}),
      }),
  );

const named = (pumps: readonly Omit<CataloguePump, 'name'>[]): CataloguePump[] =>
  pumps.map((p, i) => ({ ...p, name: `pump ${i + 1}` }));

const design = parabolicDesign(12, 0.0015, 90, [3]);
const costs = { years: 15, discountRate: 0.06, maintenancePerYear: 150 };
const price = { perKWh: 0.15, currency: 'EUR' };

function bestPassing(pumps: CataloguePump[]): number {
  const sel = selectPumps(design, catalogueOf(...pumps), { costs, energyPrice: price });
  const first = sel.ranked[0];
  return first?.passed === true && first.lifeCycleCost !== undefined
    ? first.lifeCycleCost.total
    : Number.POSITIVE_INFINITY;
}

describe('selectPumps properties (fast-check)', () => {
  it('never ranks a failing entry above a passing one', () => {
    fc.assert(
      fc.property(fc.array(pumpArb, { minLength: 1, maxLength: 5 }), (pumps) => {
        for (const options of [{ costs, energyPrice: price }, {}]) {
          const sel = selectPumps(design, catalogueOf(...named(pumps)), options);
          let seenFailing = false;
          sel.ranked.forEach((e, i) => {
            expect(e.rank).toBe(i + 1);
            if (!e.passed) seenFailing = true;
            else
              expect(seenFailing, `${e.label} passes but ranks below a failing entry`).toBe(false);
            // A failing entry has an error check; a passing one has none.
            expect(e.checks.some((c) => c.severity === 'error')).toBe(!e.passed);
          });
        }
      }),
      { numRuns: 25 },
    );
  });

  it('adding a pump never makes the best life-cycle cost worse', () => {
    fc.assert(
      fc.property(fc.array(pumpArb, { minLength: 1, maxLength: 4 }), pumpArb, (pumps, extra) => {
        const before = bestPassing(named(pumps));
        const after = bestPassing(named([...pumps, extra]));
        expect(after).toBeLessThanOrEqual(before);
      }),
      { numRuns: 25 },
    );
  });

  it('ranks passing entries by life-cycle cost when costs are given, else by energy', () => {
    fc.assert(
      fc.property(fc.array(pumpArb, { minLength: 2, maxLength: 4 }), (pumps) => {
        const byCost = selectPumps(design, catalogueOf(...named(pumps)), {
          costs,
          energyPrice: price,
        });
        expect(byCost.rankedBy).toBe('life-cycle cost');
        const passing = byCost.ranked.filter((e) => e.passed);
        for (let i = 1; i < passing.length; i++) {
          expect(passing[i]?.lifeCycleCost?.total ?? 0).toBeGreaterThanOrEqual(
            passing[i - 1]?.lifeCycleCost?.total ?? 0,
          );
        }
        const unpriced = named(pumps).map(({ price: _p, ...rest }) => rest);
        const byEnergy = selectPumps(design, catalogueOf(...unpriced));
        expect(byEnergy.rankedBy).toBe('energy');
        const pe = byEnergy.ranked.filter((e) => e.passed);
        for (let i = 1; i < pe.length; i++) {
          expect(pe[i]?.energy?.kWh ?? 0).toBeGreaterThanOrEqual(pe[i - 1]?.energy?.kWh ?? 0);
        }
      }),
      { numRuns: 15 },
    );
  });
});

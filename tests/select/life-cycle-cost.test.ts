import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lifeCycleCost, presentValueFactor } from '../../src/select/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('lifeCycleCost', () => {
  it('special values: no input is zero cost over 20 years', () => {
    expect(lifeCycleCost().total).toBe(0);
    expect(lifeCycleCost(null).total).toBe(0);
    expect(lifeCycleCost({ energyPerYear: 100 }).energy).toBe(2000); // 20 years, no discount
  });

  it('refuses impossible input', () => {
    expectHeadflowError(() => lifeCycleCost({ initial: -1 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => lifeCycleCost({ energyPerYear: Number.NaN }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => lifeCycleCost({ years: 0 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => lifeCycleCost({ years: 2.5 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => lifeCycleCost({ discountRate: -0.1 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => lifeCycleCost({ escalation: -1 }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => lifeCycleCost('cheap' as unknown as Parameters<typeof lifeCycleCost>[0]),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => presentValueFactor(101, 0.05, 0), 'INVALID_ARGUMENT');
  });

  it('matches a present value worked by hand (3 years, i = 10 %, energy +5 %/yr)', () => {
    // Worked by hand, end-of-year payments at today's prices escalated, then discounted:
    //   energy 1000/yr: x = 1.05 / 1.10 = 0.954545; x + x^2 + x^3
    //     = 0.954545 + 0.911157 + 0.869741 = 2.735443  ->  2735.443
    //   maintenance 200/yr, escalation 2 %: y = 1.02 / 1.10 = 0.927273;
    //     y + y^2 + y^3 = 0.927273 + 0.859835 + 0.797301 = 2.584409  ->  516.882
    //   decommissioning 500 at the end of year 3 (escalated 2 %): 500 y^3 = 500 x 0.7973013 = 398.6506
    //   initial 3000 and installation 800 at year 0.
    const lcc = lifeCycleCost({
      years: 3,
      discountRate: 0.1,
      energyEscalation: 0.05,
      escalation: 0.02,
      initial: 3000,
      installation: 800,
      energyPerYear: 1000,
      maintenancePerYear: 200,
      decommissioning: 500,
    });
    // 6 significant figures of the hand working: tolerance 1e-6 relative.
    expectRelative(lcc.energy, 2735.443, 1e-6, 'energy');
    expectRelative(lcc.maintenance, 516.882, 1e-6, 'maintenance');
    expectRelative(lcc.decommissioning, 398.6506, 1e-6, 'decommissioning');
    expectRelative(lcc.total, 3000 + 800 + 2735.443 + 516.882 + 398.6506, 1e-6, 'total');
    expect(lcc.operation).toBe(0);
  });

  it('matches the uniform-series present-worth factor (P/A, 8 %, 10 years) = 6.7101', () => {
    // Compound-interest tables of engineering economics texts (P/A, i = 8 %, n = 10):
    // 6.7101 (from memory; = (1 - 1.08^-10) / 0.08).
    expectRelative(presentValueFactor(10, 0.08, 0), 6.7101, 1e-5);
    expectRelative(
      lifeCycleCost({ years: 10, discountRate: 0.08, initial: 12000, energyPerYear: 5000 }).total,
      45550.4,
      1e-6,
    );
  });

  it('grows with every cost and falls with the discount rate (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }),
        fc.double({ min: 0, max: 0.2, noNaN: true }),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        (years, i, e, energy) => {
          const base = lifeCycleCost({
            years,
            discountRate: i,
            energyEscalation: e,
            energyPerYear: energy,
          });
          const more = lifeCycleCost({
            years,
            discountRate: i,
            energyEscalation: e,
            energyPerYear: energy * 1.1 + 1,
          });
          const dearer = lifeCycleCost({
            years,
            discountRate: i + 0.01,
            energyEscalation: e,
            energyPerYear: energy,
          });
          expect(more.total).toBeGreaterThan(base.total);
          expect(dearer.total).toBeLessThanOrEqual(base.total * (1 + 1e-12));
          // Equal discount and escalation: each year counts in full.
          expectRelative(presentValueFactor(years, e, e), years, 1e-9);
        },
      ),
    );
  });
});

/**
 * NPSH available with the velocity head: from the suction source (a tank surface or a point
 * in the suction line) and from a suction gauge reading at the pump; the whole-job route and
 * the system curve count the same velocity head. Check values: the energy balance itself
 * (ISO 9906 / ANSI/HI 14.6 definition of NPSH, from memory) evaluated by hand; the published
 * gauge example is in tests/reference/npsha-gauge-example.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { design } from '../../docs/examples/irrigation-lift';
import { evaluateDesign } from '../../src/design';
import { npshAvailable } from '../../src/pumps';
import { systemCurve } from '../../src/system';
import {
  type Flow,
  type Length,
  type Pressure,
  q,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  type Velocity,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const rho = q(998.2, 'kg/m3');
const pv = q(2.339, 'kPa');
const surface = {
  surfacePressure: q(101.325, 'kPa'),
  vaporPressure: pv,
  density: rho,
  staticHeadAboveImpeller: q(-3, 'm'),
  suctionLoss: q(1.2, 'm'),
};
const gauge = {
  gaugePressure: q(30, 'kPa'),
  gaugeHeightAboveImpeller: q(0.3, 'm'),
  suctionVelocity: q(2, 'm/s'),
  vaporPressure: pv,
  density: rho,
};

describe('npshAvailable: bad input', () => {
  it('refuses what is not an input object, and missing or impossible fields', () => {
    expectHeadflowError(() => npshAvailable(null as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => npshAvailable(7 as never), 'INVALID_ARGUMENT');
    const bad: [string, Record<string, unknown>][] = [
      ['surfacePressure', { ...surface, surfacePressure: 0 }],
      ['surfacePressure', { ...surface, surfacePressure: undefined }],
      ['vaporPressure', { ...surface, vaporPressure: -1 }],
      ['density', { ...surface, density: Number.NaN }],
      [
        'staticHeadAboveImpeller',
        { ...surface, staticHeadAboveImpeller: Number.POSITIVE_INFINITY },
      ],
      ['suctionLoss', { ...surface, suctionLoss: -0.1 }],
      ['suctionVelocity', { ...surface, suctionVelocity: -1 }],
      ['g', { ...surface, g: 0 }],
      ['gaugePressure', { ...gauge, gaugePressure: -101325 }],
      ['gaugePressure', { ...gauge, gaugePressure: 'high' }],
      ['atmosphericPressure', { ...gauge, atmosphericPressure: 0 }],
      ['gaugeHeightAboveImpeller', { ...gauge, gaugeHeightAboveImpeller: undefined }],
      ['suctionVelocity', { ...gauge, suctionVelocity: undefined }],
      ['surfacePressure', { ...gauge, surfacePressure: STANDARD_ATMOSPHERE }],
    ];
    for (const [parameter, input] of bad) {
      const err = expectHeadflowError(() => npshAvailable(input as never), 'INVALID_ARGUMENT');
      expect(err.parameter, JSON.stringify(input)).toBe(parameter);
    }
  });
});

describe('npshAvailable: the velocity head', () => {
  it('a still surface has none; a point in a pipe adds V^2 / 2g', () => {
    const still = npshAvailable(surface);
    const moving = npshAvailable({ ...surface, suctionVelocity: q(3, 'm/s') });
    expectRelative(moving - still, 9 / (2 * STANDARD_GRAVITY), 1e-12);
    // by hand: (p_s - p_v) / (rho g) + z - h_L
    expectRelative(still, (101325 - 2339) / (998.2 * STANDARD_GRAVITY) - 3 - 1.2, 1e-14);
  });

  it('from a gauge: (p_g + p_atm - p_v) / (rho g) + z_g + V^2 / 2g', () => {
    const byHand =
      (30000 + 101325 - 2339) / (998.2 * STANDARD_GRAVITY) + 0.3 + 4 / (2 * STANDARD_GRAVITY);
    expectRelative(npshAvailable(gauge), byHand, 1e-14);
    const high = npshAvailable({ ...gauge, atmosphericPressure: q(89.88, 'kPa') });
    expectRelative(
      npshAvailable(gauge) - high,
      (101325 - 89880) / (998.2 * STANDARD_GRAVITY),
      1e-9,
    );
  });

  it('the gauge form and the source form agree for the same point (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -90e3, max: 2e6, noNaN: true }),
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 6, noNaN: true }),
        (pg, z, v) => {
          const a = npshAvailable({
            ...gauge,
            gaugePressure: pg as Pressure,
            gaugeHeightAboveImpeller: z as Length,
            suctionVelocity: v as Velocity,
          });
          const b = npshAvailable({
            surfacePressure: (pg + STANDARD_ATMOSPHERE) as Pressure,
            vaporPressure: pv,
            density: rho,
            staticHeadAboveImpeller: z as Length,
            suctionLoss: q(0, 'm'),
            suctionVelocity: v as Velocity,
          });
          expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(a)));
        },
      ),
    );
  });
});

describe('the whole job and the system curve count the same suction velocity head', () => {
  const bore = q(202.7, 'mm'); // 8 in schedule 40, ASME B36.10M
  const inPipe = {
    ...design,
    cases: [],
    system: { ...design.system, suction: { ...design.system.suction, velocityDiameter: bore } },
  };
  const still = evaluateDesign({ ...design, cases: [] }, { curves: true });
  const moving = evaluateDesign(inPipe, { curves: true });

  it('at the duty: NPSH available rises by exactly what the system head falls', () => {
    const v = design.dutyFlow / ((Math.PI * bore * bore) / 4);
    const velocityHead = (v * v) / (2 * STANDARD_GRAVITY);
    const dNpsh = (moving.duty[0]?.npshAvailable ?? 0) - (still.duty[0]?.npshAvailable ?? 0);
    const dHead = (still.duty[0]?.head ?? 0) - (moving.duty[0]?.head ?? 0);
    expectRelative(dNpsh, velocityHead, 1e-9);
    expectRelative(dHead, velocityHead, 1e-9);
  });

  it('at any flow (property), from the sampled NPSH curve and the system curve', () => {
    const a = systemCurve(design.system);
    const b = systemCurve(inPipe.system);
    const curveA = still.curves?.npshAvailable[0];
    const curveB = moving.curves?.npshAvailable[0];
    expect(curveA?.flows).toEqual(curveB?.flows);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: (curveA?.flows.length ?? 1) - 1 }), (i) => {
        const flow = (curveA?.flows[i] ?? 0) as Flow;
        const dNpsh = (curveB?.values[i] ?? 0) - (curveA?.values[i] ?? 0);
        const dHead = a.head(flow) - b.head(flow);
        expect(Math.abs(dNpsh - dHead)).toBeLessThanOrEqual(1e-9 * Math.max(1, dHead));
        expect(dNpsh).toBeGreaterThan(0);
      }),
    );
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { material } from '../../src/pipes/index';
import {
  closureSurgeHead,
  joukowskyHead,
  PIPE_ANCHORINGS,
  restraintFactor,
  waveSpeed,
} from '../../src/system/index';
import { type Length, type Pressure, q, to, type Velocity } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const WATER = { bulkModulus: q(2196.6, 'MPa'), density: q(998.2, 'kg/m3') };

describe('restraintFactor', () => {
  it('refuses unknown anchoring, Poisson ratio outside [0, 0.5], thick wall without pipe data', () => {
    expectHeadflowError(
      () => restraintFactor({ anchoring: 'welded' as never, poissonRatio: 0.3 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => restraintFactor({ anchoring: 'anchored-upstream', poissonRatio: 0.6 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => restraintFactor({ anchoring: 'anchored-upstream', poissonRatio: Number.NaN }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => restraintFactor({ anchoring: 'anchored-upstream', poissonRatio: 0.3, wall: 'thick' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => restraintFactor(null as never), 'INVALID_ARGUMENT');
  });
  it('thin wall: 1 - mu/2, 1 - mu^2, 1 (Wylie and Streeter 1993, from memory)', () => {
    expect(restraintFactor({ anchoring: 'anchored-upstream', poissonRatio: 0.3 })).toBeCloseTo(
      0.85,
      15,
    );
    expect(restraintFactor({ anchoring: 'anchored-throughout', poissonRatio: 0.3 })).toBeCloseTo(
      0.91,
      15,
    );
    expect(restraintFactor({ anchoring: 'expansion-joints', poissonRatio: 0.3 })).toBe(1);
  });
  it('doc example: thick wall, expansion joints, D = 100 mm, e = 10 mm, mu = 0.3 -> 0.26 + 100/110', () => {
    const c1 = restraintFactor({
      anchoring: 'expansion-joints',
      poissonRatio: 0.3,
      wall: 'thick',
      insideDiameter: q(100, 'mm'),
      wallThickness: q(10, 'mm'),
    });
    expectRelative(c1, 0.26 + 100 / 110, 1e-14);
  });
  it('the thick-wall factor tends to the thin-wall one as e/D -> 0 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...PIPE_ANCHORINGS),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        (anchoring, mu) => {
          const thin = restraintFactor({ anchoring, poissonRatio: mu });
          const thick = restraintFactor({
            anchoring,
            poissonRatio: mu,
            wall: 'thick',
            insideDiameter: q(1, 'm'),
            wallThickness: q(1e-7, 'm'),
          });
          // the thick form differs from the thin by O(e/D) = 1e-7
          return Math.abs(thick - thin) < 1e-6;
        },
      ),
    );
  });
});

describe('waveSpeed: special values and domain', () => {
  it('refuses non-positive or non-finite K, rho, D, e, E and c1', () => {
    expectHeadflowError(() => waveSpeed({ ...WATER, bulkModulus: q(0, 'Pa') }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => waveSpeed({ ...WATER, density: Number.NaN as never }),
      'INVALID_ARGUMENT',
    );
    const pipe = {
      insideDiameter: q(0.2, 'm'),
      wallThickness: q(5, 'mm'),
      elasticModulus: q(207000, 'MPa'),
    };
    expectHeadflowError(
      () => waveSpeed({ ...WATER, ...pipe, wallThickness: q(-1, 'mm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => waveSpeed({ ...WATER, ...pipe, restraintFactor: 0 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => waveSpeed(undefined as never), 'INVALID_ARGUMENT');
  });
  it('refuses part of the pipe data, and restraint options without the pipe', () => {
    expectHeadflowError(
      () => waveSpeed({ ...WATER, insideDiameter: q(0.2, 'm') }),
      'INVALID_ARGUMENT',
    );
    const one = expectHeadflowError(
      () => waveSpeed({ ...WATER, insideDiameter: q(0.2, 'm'), wallThickness: q(5, 'mm') }),
      'INVALID_ARGUMENT',
    );
    expect(one.message).toContain('input.elasticModulus is missing');
    expectHeadflowError(() => waveSpeed({ ...WATER, restraintFactor: 0.9 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => waveSpeed({ ...WATER, wall: 'thick' }), 'INVALID_ARGUMENT');
  });
  it("needs Poisson's ratio where the anchoring or the thick wall uses it", () => {
    const pipe = {
      insideDiameter: q(0.2, 'm'),
      wallThickness: q(5, 'mm'),
      elasticModulus: q(207000, 'MPa'),
    };
    expectHeadflowError(
      () => waveSpeed({ ...WATER, ...pipe, anchoring: 'anchored-throughout' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => waveSpeed({ ...WATER, ...pipe, wall: 'thick' }), 'INVALID_ARGUMENT');
    // expansion joints, thin wall: c1 = 1 needs no Poisson ratio
    expect(waveSpeed({ ...WATER, ...pipe })).toBeGreaterThan(0);
  });
});

describe('waveSpeed: limits and laws', () => {
  it('rigid pipe: a = sqrt(K/rho) (doc example 1483.4 m/s)', () => {
    expect(waveSpeed(WATER)).toBe(Math.sqrt(2196.6e6 / 998.2));
    expectRelative(waveSpeed(WATER), 1483.43, 1e-5);
  });
  it('a very stiff wall tends to the rigid limit; the elastic pipe is always slower (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 3, noNaN: true }), // D (m)
        fc.double({ min: 0.001, max: 0.2, noNaN: true }), // e/D
        fc.double({ min: 0.5e9, max: 250e9, noNaN: true }), // E (Pa)
        fc.constantFrom(...PIPE_ANCHORINGS),
        fc.constantFrom('thin' as const, 'thick' as const),
        (d, ratio, e, anchoring, wall) => {
          const input = {
            ...WATER,
            insideDiameter: d as Length,
            wallThickness: (d * ratio) as Length,
            elasticModulus: e as Pressure,
            anchoring,
            poissonRatio: 0.3,
            wall,
          };
          const a = waveSpeed(input);
          const stiffer = waveSpeed({ ...input, elasticModulus: (e * 2) as Pressure });
          const thicker = waveSpeed({ ...input, wallThickness: (d * ratio * 1.5) as Length });
          return a < waveSpeed(WATER) && stiffer > a && thicker > a;
        },
      ),
    );
    const huge = waveSpeed({
      ...WATER,
      insideDiameter: q(0.2, 'm'),
      wallThickness: q(10, 'mm'),
      elasticModulus: 1e22 as number as Pressure,
    });
    expectRelative(huge, waveSpeed(WATER), 1e-10);
  });
  it('Korteweg by hand: steel, D = 154.05 mm, e = 7.112 mm, anchored throughout (doc example)', () => {
    const c1 = 1 - 0.3 * 0.3;
    const expected = Math.sqrt(
      2196.6e6 / 998.2 / (1 + (c1 * 2196.6e6 * 0.15405) / (207e9 * 0.007112)),
    );
    const a = waveSpeed({
      ...WATER,
      insideDiameter: q(154.05, 'mm'),
      wallThickness: q(7.112, 'mm'),
      elasticModulus: q(207000, 'MPa'),
      anchoring: 'anchored-throughout',
      poissonRatio: 0.3,
    });
    expectRelative(a, expected, 1e-14);
    expectRelative(to(a, 'm/s'), 1349.0, 1e-4);
  });
  it('takes E and Poisson ratio from the materials table', () => {
    const steel = material('commercial-steel');
    const a = waveSpeed({
      ...WATER,
      insideDiameter: q(154.05, 'mm'),
      wallThickness: q(7.112, 'mm'),
      elasticModulus: steel.elasticModulus,
      anchoring: 'anchored-throughout',
      poissonRatio: steel.poissonRatio,
    });
    const pvc = material('pvc');
    const b = waveSpeed({
      ...WATER,
      insideDiameter: q(154.05, 'mm'),
      wallThickness: q(7.112, 'mm'),
      elasticModulus: pvc.elasticModulus,
      anchoring: 'anchored-throughout',
      poissonRatio: pvc.poissonRatio,
    });
    // a plastic wall gives a far slower wave than steel (common practice)
    expect(b).toBeLessThan(a / 2);
  });
  it('an explicit restraint factor is used as given', () => {
    const base = {
      ...WATER,
      insideDiameter: q(0.3, 'm'),
      wallThickness: q(6, 'mm'),
      elasticModulus: q(207000, 'MPa'),
    };
    expect(waveSpeed({ ...base, restraintFactor: 0.91 })).toBe(
      waveSpeed({ ...base, anchoring: 'anchored-throughout', poissonRatio: 0.3 }),
    );
  });
});

describe('joukowskyHead', () => {
  it('refuses a non-positive wave speed or g and a non-finite velocity change', () => {
    expectHeadflowError(() => joukowskyHead(q(0, 'm/s'), q(1, 'm/s')), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => joukowskyHead(q(1000, 'm/s'), Number.NaN as Velocity),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => joukowskyHead(q(1000, 'm/s'), q(1, 'm/s'), q(0, 'm/s2')),
      'INVALID_ARGUMENT',
    );
  });
  it('is a dV / g with the sign of dV; zero change, zero head (doc example 244.73 m)', () => {
    expect(joukowskyHead(q(1000, 'm/s'), q(0, 'm/s'))).toBe(0);
    expectRelative(joukowskyHead(q(1200, 'm/s'), q(2, 'm/s')), 2400 / 9.80665, 1e-15);
    expect(joukowskyHead(q(1200, 'm/s'), q(-2, 'm/s'))).toBe(
      -joukowskyHead(q(1200, 'm/s'), q(2, 'm/s')),
    );
  });
  it('rho g dH = rho a dV: the pressure form (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 1600, noNaN: true }),
        fc.double({ min: -10, max: 10, noNaN: true }),
        (a, dv) => {
          const dh = joukowskyHead(a as Velocity, dv as Velocity);
          return (
            Math.abs(1000 * 9.80665 * dh - 1000 * a * dv) <= 1e-9 * Math.abs(1000 * a * dv) + 1e-9
          );
        },
      ),
    );
  });
});

describe('closureSurgeHead', () => {
  it('refuses bad input', () => {
    const ok = {
      waveSpeed: q(1000, 'm/s'),
      length: q(2000, 'm'),
      velocityChange: q(1.5, 'm/s'),
      closureTime: q(10, 's'),
    };
    expectHeadflowError(() => closureSurgeHead({ ...ok, length: q(0, 'm') }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => closureSurgeHead({ ...ok, velocityChange: q(-1, 'm/s') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => closureSurgeHead({ ...ok, closureTime: q(-1, 's') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => closureSurgeHead({ ...ok, g: q(0, 'm/s2') }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => closureSurgeHead(null as never), 'INVALID_ARGUMENT');
  });
  it('doc example: 2000 m at 1000 m/s, 1.5 m/s stopped in 10 s: T_r = 4 s, Michaud 61.18 m', () => {
    const s = closureSurgeHead({
      waveSpeed: q(1000, 'm/s'),
      length: q(2000, 'm'),
      velocityChange: q(1.5, 'm/s'),
      closureTime: q(10, 's'),
    });
    expect(s.roundTripTime).toBe(4);
    expect(s.method).toBe('michaud');
    expectRelative(s.head, (2 * 2000 * 1.5) / (9.80665 * 10), 1e-15);
  });
  it('sudden closure (t_c <= 2L/a) gives the full Joukowsky head', () => {
    const s = closureSurgeHead({
      waveSpeed: q(1000, 'm/s'),
      length: q(2000, 'm'),
      velocityChange: q(1.5, 'm/s'),
      closureTime: q(0, 's'),
    });
    expect(s.method).toBe('joukowsky');
    expect(s.head).toBe(joukowskyHead(q(1000, 'm/s'), q(1.5, 'm/s')));
  });
  it('continuous at t_c = 2L/a, never above Joukowsky, falling as 1/t_c beyond (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 1500, noNaN: true }),
        fc.double({ min: 10, max: 20000, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 200, noNaN: true }),
        (a, length, dv, tc) => {
          const input = {
            waveSpeed: a as Velocity,
            length: length as Length,
            velocityChange: dv as Velocity,
          };
          const joukowsky = joukowskyHead(a as Velocity, dv as Velocity);
          const tr = (2 * length) / a;
          const atTr = closureSurgeHead({ ...input, closureTime: tr as never }).head;
          const just = closureSurgeHead({ ...input, closureTime: (tr * (1 + 1e-12)) as never });
          const s = closureSurgeHead({ ...input, closureTime: tc as never });
          const later = closureSurgeHead({
            ...input,
            closureTime: (2 * Math.max(tc, tr)) as never,
          });
          return (
            Math.abs(atTr - joukowsky) <= 1e-12 * joukowsky &&
            Math.abs(just.head - joukowsky) <= 1e-9 * joukowsky &&
            s.head <= joukowsky * (1 + 1e-12) &&
            later.head <= s.head * (1 + 1e-12)
          );
        },
      ),
    );
  });
});

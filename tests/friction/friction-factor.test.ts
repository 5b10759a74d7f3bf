import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  blasius,
  chen,
  churchill,
  colebrook,
  colebrookInto,
  colebrookSolve,
  frictionFactor,
  frictionFactorInto,
  goudarSonnad,
  haaland,
  LAMINAR_LIMIT,
  laminar,
  serghides,
  swameeJain,
  TURBULENT_LIMIT,
  TURBULENT_METHODS,
  type TurbulentMethod,
  zigrangSylvester,
} from '../../src/friction/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const ROUGH_FUNCTIONS = {
  colebrook,
  swameeJain,
  haaland,
  churchill,
  serghides,
  zigrangSylvester,
  goudarSonnad,
  chen,
  frictionFactor,
} as const;

const reArb = fc.double({ min: 0, max: 9, noNaN: true }).map((u) => 10 ** u);
const turbReArb = fc.double({ min: Math.log10(4000), max: 8, noNaN: true }).map((u) => 10 ** u);
const kArb = fc.oneof(
  fc.constant(0),
  fc.double({ min: -8, max: -1, noNaN: true }).map((u) => 10 ** u),
);

describe('special values and bad input', () => {
  it.each(Object.entries(ROUGH_FUNCTIONS))('%s rejects Re <= 0, NaN and Infinity', (_, fn) => {
    for (const re of [0, -1, -0, Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      const err = expectHeadflowError(() => fn(re, 1e-4), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe('re');
    }
  });

  it.each(Object.entries(ROUGH_FUNCTIONS))('%s rejects bad relative roughness', (_, fn) => {
    for (const k of [-1e-9, -1, Number.NaN, Number.POSITIVE_INFINITY]) {
      const err = expectHeadflowError(() => fn(1e5, k), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe('relativeRoughness');
    }
    // Above 0.1: possible but outside every fitted range, refused unless asked for.
    const err = expectHeadflowError(() => fn(1e5, 0.2), 'OUT_OF_RANGE');
    expect(err.message).toContain('allowLargeRoughness');
    expect(err.allowed).toBe('0 to 0.1');
    expect(fn(1e5, 0.2, { allowLargeRoughness: true })).toBeGreaterThan(0);
    expect(fn(1e5, 0.1)).toBeGreaterThan(0);
    // Above 0.5 describes no pipe, even with the option.
    expectHeadflowError(() => fn(1e5, 0.6, { allowLargeRoughness: true }), 'INVALID_ARGUMENT');
  });

  it('refuses non-numbers from untyped callers', () => {
    expectHeadflowError(() => colebrook('5000' as unknown as number, 0), 'INVALID_ARGUMENT');
    expectHeadflowError(() => colebrook(5000, '0' as unknown as number), 'INVALID_ARGUMENT');
  });

  it('laminar and blasius reject bad Re', () => {
    for (const re of [0, -5, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectHeadflowError(() => laminar(re), 'INVALID_ARGUMENT');
      expectHeadflowError(() => blasius(re), 'INVALID_ARGUMENT');
    }
  });

  it('rejects unknown method and transition names with UNKNOWN_NAME', () => {
    expectHeadflowError(
      () => frictionFactor(1e5, 0, { method: 'moody' as TurbulentMethod }),
      'UNKNOWN_NAME',
    );
    expectHeadflowError(
      () => frictionFactor(3000, 0, { transition: 'max' as 'conservative' }),
      'UNKNOWN_NAME',
    );
  });

  it('accepts smooth pipe (eps/D = 0) and tiny Re', () => {
    expect(colebrook(1e5, 0)).toBeGreaterThan(0);
    expect(frictionFactor(1e-300, 0)).toBe(64 / 1e-300);
  });
});

describe('laminar', () => {
  it('is exactly 64/Re', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e6, noNaN: true }), (re) => {
        expect(laminar(re)).toBe(64 / re);
      }),
    );
    expect(laminar(1600)).toBe(0.04); // doc example
  });
});

describe('frictionFactor regime policy', () => {
  it('is laminar up to 2300 and the turbulent method from 4000', () => {
    expect(LAMINAR_LIMIT).toBe(2300);
    expect(TURBULENT_LIMIT).toBe(4000);
    expect(frictionFactor(2300, 0.01)).toBe(64 / 2300);
    expect(frictionFactor(1000, 1e-4)).toBe(0.064);
    expect(frictionFactor(4000, 0.01)).toBe(colebrook(4000, 0.01));
    for (const m of TURBULENT_METHODS) {
      expect(frictionFactor(1e5, 1e-3, { method: m })).toBe(ROUGH_FUNCTIONS[m](1e5, 1e-3));
    }
  });

  it('takes the larger value in the band by default (conservative)', () => {
    for (const re of [2301, 2800, 3000, 3999]) {
      const f = frictionFactor(re, 1e-4);
      expect(f).toBe(Math.max(64 / re, colebrook(re, 1e-4)));
      expect(frictionFactor(re, 1e-4, { transition: 'conservative' })).toBe(f);
    }
    expectRelative(frictionFactor(3000, 1e-4), 0.04360908759075776, 1e-15, 'doc example');
  });

  it('interpolates linearly in Re when asked, continuous at both ends', () => {
    const o = { transition: 'interpolate' } as const;
    const ft = colebrook(4000, 1e-4);
    expectRelative(frictionFactor(2300 + 1e-9, 1e-4, o), 64 / 2300, 1e-12, 'Re 2300+');
    expectRelative(frictionFactor(4000 - 1e-9, 1e-4, o), ft, 1e-12, 'Re 4000-');
    expectRelative(frictionFactor(3150, 1e-4, o), (64 / 2300 + ft) / 2, 1e-15, 'midpoint');
    expectRelative(frictionFactor(3000, 1e-4, o), 0.03284234636471211, 1e-15, 'doc example');
  });

  it('never returns NaN or a non-positive value for valid input', () => {
    const method = fc.constantFrom(...TURBULENT_METHODS);
    const transition = fc.constantFrom('conservative' as const, 'interpolate' as const);
    fc.assert(
      fc.property(reArb, kArb, method, transition, (re, k, m, t) => {
        const f = frictionFactor(re, k, { method: m, transition: t });
        expect(Number.isFinite(f) && f > 0, `Re ${re}, eps/D ${k}, ${m}, ${t}: ${f}`).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('laws of turbulent friction', () => {
  it('f decreases with Re at fixed roughness and increases with roughness at fixed Re', () => {
    fc.assert(
      fc.property(turbReArb, kArb, fc.double({ min: 1.001, max: 10, noNaN: true }), (re, k, r) => {
        // Strictly lower for a 10 % rise in Re; never higher for a smaller rise (in fully
        // rough flow a 0.1 % rise can change f by less than one rounding unit).
        expect(colebrook(re * r, k)).toBeLessThanOrEqual(colebrook(re, k));
        expect(colebrook(re * Math.max(r, 1.1), k)).toBeLessThan(colebrook(re, k));
        // kArb stays <= 0.1; a rise of at least 1 % in eps/D (capped at 0.1) moves f by far
        // more than the solver's rounding.
        const k2 = k === 0 ? 1e-6 : Math.min(k * Math.max(r, 1.01), 0.1);
        if (k2 >= k * 1.01 || k === 0) {
          expect(colebrook(re, k2)).toBeGreaterThan(colebrook(re, k));
        }
      }),
      { numRuns: 1000 },
    );
  });

  it('Churchill is continuous across 2300-4000 and tends to 64/Re in laminar flow', () => {
    for (const k of [0, 1e-4, 1e-2, 0.05]) {
      let prev = churchill(2300, k);
      for (let re = 2300.5; re <= 4000; re += 0.5) {
        const f = churchill(re, k);
        // A step of 0.5 in Re changes f by far less than 0.1 % on a smooth curve.
        expect(Math.abs(f - prev) / prev, `Re ${re}, eps/D ${k}`).toBeLessThan(1e-3);
        prev = f;
      }
    }
    expectRelative(churchill(1000, 0), 0.064, 1e-13, 'Re 1000');
    expectRelative(churchill(100, 0.01), 0.64, 1e-13, 'Re 100');
  });

  it('Colebrook tends to the fully rough law at very high Re', () => {
    // Fully rough limit of Colebrook itself: 1/sqrt(f) = -2 log10(K/3.7) (Colebrook 1939).
    const k = 0.01;
    const rough = 1 / (2 * Math.log10(k / 3.7)) ** 2;
    expectRelative(colebrook(1e12, k), rough, 1e-5, 'Re 1e12');
  });
});

describe('colebrookSolve', () => {
  it('reports the result, two steps and the residual', () => {
    const s = colebrookSolve(1e5, 1e-4);
    expect(s.f).toBe(colebrook(1e5, 1e-4));
    expect(s.iterations).toBe(2);
    expect(Math.abs(s.residual)).toBeLessThan(1e-14);
  });
});

describe('array forms', () => {
  const re = Float64Array.of(1000, 3000, 1e4, 1e5, 1e6, 1e8);
  const k = Float64Array.of(0, 1e-4, 1e-3, 1e-4, 0.01, 0.05);

  it('colebrookInto matches colebrook, with one or many roughness values', () => {
    const out = colebrookInto(re, 1e-4, new Float64Array(re.length));
    const out2 = colebrookInto(re, k, new Float64Array(re.length));
    re.forEach((r, i) => {
      expect(out[i]).toBe(colebrook(r, 1e-4));
      expect(out2[i]).toBe(colebrook(r, k[i] ?? 0));
    });
  });

  it('frictionFactorInto matches frictionFactor for every method and rule', () => {
    for (const method of TURBULENT_METHODS) {
      for (const transition of ['conservative', 'interpolate'] as const) {
        const o = { method, transition };
        const out = frictionFactorInto(re, k, new Float64Array(re.length), o);
        const out1 = frictionFactorInto(re, 1e-3, new Float64Array(re.length), o);
        re.forEach((r, i) => {
          expect(out[i]).toBe(frictionFactor(r, k[i] ?? 0, o));
          expect(out1[i]).toBe(frictionFactor(r, 1e-3, o));
        });
      }
    }
    const d = frictionFactorInto(re, 1e-4, new Float64Array(re.length));
    expect(d[0]).toBe(0.064);
  });

  it('may write in place', () => {
    const a = Float64Array.of(1e4, 1e5);
    colebrookInto(a, 0, a);
    expect(a[1]).toBe(colebrook(1e5, 0));
  });

  it('checks lengths and every element', () => {
    const e1 = expectHeadflowError(
      () => colebrookInto(re, 0, new Float64Array(2)),
      'INVALID_ARGUMENT',
    );
    expect(e1.parameter).toBe('out.length');
    const e2 = expectHeadflowError(
      () => frictionFactorInto(re, new Float64Array(2), new Float64Array(re.length)),
      'INVALID_ARGUMENT',
    );
    expect(e2.parameter).toBe('relativeRoughness.length');
    const bad = Float64Array.of(1e4, Number.NaN);
    const e3 = expectHeadflowError(
      () => colebrookInto(bad, 0, new Float64Array(2)),
      'INVALID_ARGUMENT',
    );
    expect(e3.parameter).toBe('re[1]');
    expectHeadflowError(
      () => colebrookInto(Float64Array.of(0), Float64Array.of(0), new Float64Array(1)),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => frictionFactorInto(bad, 0, new Float64Array(2)), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => colebrookInto(re, Float64Array.of(0, 0, 0, 0, 0, 0.3), new Float64Array(6)),
      'OUT_OF_RANGE',
    );
    expectHeadflowError(
      () => frictionFactorInto(re, Float64Array.of(0, 0, 0, 0, 0, -1), new Float64Array(6)),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => frictionFactorInto(re, 0.2, new Float64Array(6)), 'OUT_OF_RANGE');
  });
});

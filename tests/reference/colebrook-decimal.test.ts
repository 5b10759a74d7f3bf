/**
 * Colebrook against an independent arbitrary-precision solution: decimal.js (npm `decimal.js`,
 * a general-purpose decimal library) solves
 *   G(s) = s + 2 log10(K/3.7 + 2.51 s / Re) = 0,   s = 1/sqrt(f),
 * by Newton's method at 45 significant digits, starting from s = 1 (left of the root; G is
 * increasing and concave, so the iterates rise monotonically to it), until the step is below
 * 1e-40 s. Each double input is converted to its exact binary value, so the reference is the
 * Colebrook solution of exactly the numbers colebrook() receives.
 *
 * Equation: C. F. Colebrook, 1939, J. Inst. Civil Eng. 11:133-156.
 * Tolerance 1e-14 relative (the project's requirement): the solver's own rounding is a few
 * units in the last place, about 1e-15.
 */
import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { colebrook, colebrookResidual, colebrookSolve } from '../../src/friction/index';
import { expectRelative } from '../helpers/expect';

const D45 = Decimal.clone({ precision: 45 });
const LN10 = D45.ln(10);
const TWO_OVER_LN10 = new D45(2).div(LN10);
const C37 = new D45('3.7');
const C251 = new D45('2.51');

/** The exact decimal value of a double (every double is a dyadic rational). */
function exact(x: number): Decimal {
  if (x === 0) return new D45(0);
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const expBits = Number((bits >> 52n) & 0x7ffn);
  const frac = bits & 0xfffffffffffffn;
  const mant = expBits === 0 ? frac : frac | (1n << 52n);
  const e2 = (expBits === 0 ? 1 : expBits) - 1075;
  return new D45(mant.toString()).times(new D45(2).pow(e2));
}

/**
 * Colebrook f at 45 digits, Newton from s = 1, or from s = Re/2.51 x 1e-3 below Re 10 (still
 * left of the root, which lies below Re/2.51 there, so the iterates still rise to it).
 */
function colebrookDecimal(re: number, k: number): Decimal {
  const R = exact(re);
  const K = exact(k).div(C37);
  const a = C251.div(R);
  let s = re < 10 ? R.div(C251).times('1e-3') : new D45(1);
  for (let i = 0; i < 2000; i++) {
    const arg = K.plus(a.times(s));
    const g = s.plus(D45.log10(arg).times(2));
    const dg = new D45(1).plus(TWO_OVER_LN10.times(a).div(arg));
    const step = g.div(dg);
    s = s.minus(step);
    if (step.abs().lte(s.times('1e-40'))) return new D45(1).div(s.times(s));
  }
  throw new Error(`decimal Newton did not converge at Re ${re}, K ${k}`);
}

function relErr(re: number, k: number): number {
  const ref = colebrookDecimal(re, k);
  return exact(colebrook(re, k)).minus(ref).div(ref).abs().toNumber();
}

const TOL = 1e-14;

describe('colebrook against a 45-digit decimal.js solution', () => {
  it('matches at the corners and along the edges of the required range', () => {
    // Corners: Re 2000 and 1e9, eps/D 0 and 0.05, and the regime boundaries between.
    let worst = 0;
    for (const re of [2000, 2300, 4000, 1e4, 1e5, 1e6, 1e7, 1e8, 5e8, 1e9]) {
      for (const k of [0, 1e-12, 1e-8, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 0.03, 0.05]) {
        const e = relErr(re, k);
        worst = Math.max(worst, e);
        expect(e, `Re ${re}, eps/D ${k}: relative error ${e}`).toBeLessThan(TOL);
      }
    }
    // Observed: about 1.3e-15 (two correction steps suffice at every corner).
    expect(worst).toBeLessThan(TOL);
  }, 60_000);

  it('matches over 3000 random points across Re 2e3..1e9 and eps/D 0..0.05', () => {
    const reArb = fc.double({ min: Math.log10(2000), max: 9, noNaN: true }).map((u) => 10 ** u);
    const kArb = fc.oneof(
      fc.constant(0),
      fc.constant(0.05),
      fc.double({ min: -12, max: Math.log10(0.05), noNaN: true }).map((u) => 10 ** u),
      fc.double({ min: 0, max: 0.05, noNaN: true }),
    );
    fc.assert(
      fc.property(reArb, kArb, (re, k) => {
        const e = relErr(re, k);
        if (!(e < TOL)) throw new Error(`Re ${re}, eps/D ${k}: relative error ${e} >= ${TOL}`);
      }),
      { numRuns: 3000 },
    );
    // 3000 decimal solves take a few seconds, longer under coverage.
  }, 120_000);

  it('stays exact at low Re, where the start of the solver changes (no NaN below Re 2.8)', () => {
    // Before the low-Re start, colebrook(2, 0) and everything below Re 2.8 came out NaN.
    let worst = 0;
    for (const re of [1e-6, 1e-3, 0.1, 1, 2, 2.8, 3, 10, 30, 44, 45, 46, 100, 1000, 1999]) {
      for (const k of [0, 1e-6, 1e-4, 1e-2, 0.05, 0.1]) {
        const e = relErr(re, k);
        worst = Math.max(worst, e);
        expect(e, `Re ${re}, eps/D ${k}: relative error ${e}`).toBeLessThan(TOL);
      }
    }
    expect(worst).toBeLessThan(TOL);
  }, 60_000);

  it('keeps the value shown in the doc comment', () => {
    // Re 1e5, eps/D 1e-4: the 45-digit solve above gives 0.0185138660774716427.
    expectRelative(colebrook(1e5, 1e-4), 0.018513866077471644, 1e-15, 'Re 1e5, eps/D 1e-4');
  });
});

describe('colebrook residual and iteration count', () => {
  it('leaves a residual of order 1e-15 and reports two steps', () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log10(2000), max: 9, noNaN: true }).map((u) => 10 ** u),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (re, k) => {
          const s = colebrookSolve(re, k);
          expect(s.iterations).toBe(2);
          expect(s.f).toBe(colebrook(re, k));
          // 1/sqrt(f) lies between about 2.6 and 15 here; 8 ulp of 16 is 2.8e-14.
          expect(Math.abs(s.residual)).toBeLessThan(3e-14);
          expect(s.residual).toBe(colebrookResidual(re, k, s.f));
        },
      ),
      { numRuns: 2000 },
    );
  }, 60_000);
});

import { colebrookKernel } from './colebrook';
import {
  checkTransition,
  type FrictionFactorOptions,
  LAMINAR_LIMIT,
  TURBULENT_LIMIT,
  turbulentKernel,
} from './friction-factor';

/**
 * A friction-factor policy resolved once (method kernel and transition rule), for loops that
 * need the factor and its derivative in Re many times.
 * @internal
 */
export interface FrictionPolicy {
  readonly turbulent: (re: number, relativeRoughness: number) => number;
  /** True when the turbulent method is the exact Colebrook solution (analytic slope). */
  readonly exactColebrook: boolean;
  /** True for the `'interpolate'` transition rule. */
  readonly interpolate: boolean;
  /** Whether the options allow eps/D above 0.1 (carried for the run's own check). */
  readonly allowLargeRoughness: boolean;
}

/** A friction factor and its derivative in Re, filled by {@link frictionWithSlope}. */
export interface FrictionSlope {
  f: number;
  /** df/dRe. */
  dfdRe: number;
}

/**
 * Resolves friction-factor options into a {@link FrictionPolicy}; `transition` overrides the
 * options' rule when the options leave it out.
 * @throws HeadflowError `UNKNOWN_NAME` for an unknown method or transition rule.
 * @internal
 */
export function frictionPolicy(
  options: FrictionFactorOptions | undefined,
  defaultTransition: 'conservative' | 'interpolate' = 'conservative',
): FrictionPolicy {
  const method = options?.method;
  return {
    turbulent: turbulentKernel(method),
    exactColebrook: method === undefined || method === 'colebrook',
    interpolate: checkTransition(options?.transition ?? defaultTransition),
    allowLargeRoughness: options?.allowLargeRoughness === true,
  };
}

/** Relative step of the central difference used for methods without an analytic slope. */
const STEP = 1e-6;

/**
 * Derivative of the exact Colebrook factor in Re, by implicit differentiation of
 * `F(s, Re) = s + 2 log10(eps/(3.7 D) + 2.51 s / Re) = 0` with `s = 1/sqrt(f)`:
 * `ds/dRe = -F_Re / F_s`, `df/dRe = -2 f^(3/2) ds/dRe`.
 */
function colebrookSlope(re: number, rr: number, f: number): number {
  const s = 1 / Math.sqrt(f);
  const u = rr / 3.7 + (2.51 * s) / re;
  const c = 2 / Math.LN10 / u;
  const fs = 1 + (c * 2.51) / re;
  const fre = (-c * 2.51 * s) / (re * re);
  return 2 * f * Math.sqrt(f) * (fre / fs);
}

function turbulentWithSlope(p: FrictionPolicy, re: number, rr: number, out: FrictionSlope): void {
  if (p.exactColebrook) {
    const f = colebrookKernel(re, rr);
    out.f = f;
    out.dfdRe = colebrookSlope(re, rr, f);
    return;
  }
  out.f = p.turbulent(re, rr);
  out.dfdRe =
    (p.turbulent(re * (1 + STEP), rr) - p.turbulent(re * (1 - STEP), rr)) / (2 * re * STEP);
}

/**
 * Darcy friction factor under a policy and its derivative in Re, for Re > 0: laminar 64/Re
 * up to Re 2300, the policy's turbulent method from Re 4000, and the transition rule between
 * (the same values as `frictionFactor`). The slope is analytic for Colebrook and the laminar
 * and interpolated forms, a central difference (relative step 1e-6) for the explicit methods.
 * At the band edges the slope is one-sided (the law is continuous there with `'interpolate'`,
 * not differentiable). Allocates nothing.
 * @internal
 */
export function frictionWithSlope(
  p: FrictionPolicy,
  re: number,
  rr: number,
  out: FrictionSlope,
): void {
  if (re >= TURBULENT_LIMIT) {
    turbulentWithSlope(p, re, rr, out);
    return;
  }
  if (re <= LAMINAR_LIMIT) {
    out.f = 64 / re;
    out.dfdRe = -64 / (re * re);
    return;
  }
  if (p.interpolate) {
    const fl = 64 / LAMINAR_LIMIT;
    const ft = p.turbulent(TURBULENT_LIMIT, rr);
    const slope = (ft - fl) / (TURBULENT_LIMIT - LAMINAR_LIMIT);
    out.f = fl + slope * (re - LAMINAR_LIMIT);
    out.dfdRe = slope;
    return;
  }
  turbulentWithSlope(p, re, rr, out);
  const fl = 64 / re;
  if (fl > out.f) {
    out.f = fl;
    out.dfdRe = -64 / (re * re);
  }
}

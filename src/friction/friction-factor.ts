import { argumentError } from '../errors';
import { guardOptions, guardResult } from '../guards';
import { chenKernel } from './chen';
import { churchillKernel } from './churchill';
import { colebrookKernel } from './colebrook';
import { goudarSonnadKernel } from './goudar-sonnad';
import { haalandKernel } from './haaland';
import { serghidesKernel } from './serghides';
import { swameeJainKernel } from './swamee-jain';
import {
  checkRelativeRoughness,
  checkReynolds,
  type RoughnessOptions,
  roughnessOptions,
} from './validate';
import { zigrangSylvesterKernel } from './zigrang-sylvester';

/** Upper Reynolds number of the laminar regime in {@link frictionFactor} (common practice). */
export const LAMINAR_LIMIT = 2300;
/** Lower Reynolds number of the turbulent regime in {@link frictionFactor} (common practice). */
export const TURBULENT_LIMIT = 4000;

/** Turbulent friction-factor methods that {@link frictionFactor} can apply. */
export type TurbulentMethod =
  | 'colebrook'
  | 'swameeJain'
  | 'haaland'
  | 'churchill'
  | 'serghides'
  | 'zigrangSylvester'
  | 'goudarSonnad'
  | 'chen';

/** Names of every {@link TurbulentMethod}, in a fixed order. */
export const TURBULENT_METHODS: readonly TurbulentMethod[] = [
  'colebrook',
  'swameeJain',
  'haaland',
  'churchill',
  'serghides',
  'zigrangSylvester',
  'goudarSonnad',
  'chen',
];

/**
 * How {@link frictionFactor} fills the transition band 2300 < Re < 4000, where flow is
 * intermittent and no correlation is reliable:
 * - `'conservative'` (default): the larger of laminar 64/Re and the turbulent method at the
 *   same Re. For pump sizing the larger friction (more head) is the safe side.
 * - `'interpolate'`: linear in Re between laminar at Re 2300 (64/2300) and the turbulent
 *   method at Re 4000; continuous at both ends of the band.
 */
export type TransitionRule = 'conservative' | 'interpolate';

/** Options of {@link frictionFactor}. */
export interface FrictionFactorOptions extends RoughnessOptions {
  /** Turbulent method (default `'colebrook'`, exact). */
  readonly method?: TurbulentMethod;
  /** Rule for 2300 < Re < 4000 (default `'conservative'`). */
  readonly transition?: TransitionRule;
}

/** @internal Resolves a method name to its unchecked kernel. */
export function turbulentKernel(
  method: TurbulentMethod | undefined,
): (re: number, relativeRoughness: number) => number {
  switch (method) {
    case undefined:
    case 'colebrook':
      return colebrookKernel;
    case 'swameeJain':
      return swameeJainKernel;
    case 'haaland':
      return haalandKernel;
    case 'churchill':
      return churchillKernel;
    case 'serghides':
      return serghidesKernel;
    case 'zigrangSylvester':
      return zigrangSylvesterKernel;
    case 'goudarSonnad':
      return goudarSonnadKernel;
    case 'chen':
      return chenKernel;
    default:
      throw argumentError(
        'UNKNOWN_NAME',
        'method',
        method,
        undefined,
        TURBULENT_METHODS.join(', '),
      );
  }
}

/**
 * Reads the options of {@link frictionFactor} and {@link frictionFactorInto}: `undefined` and
 * `null` mean none; the method and transition names are checked where they are used.
 * @internal
 */
export function frictionOptions(
  options: FrictionFactorOptions | null | undefined,
): FrictionFactorOptions {
  if (options === undefined || options === null) return {};
  const o = guardOptions<FrictionFactorOptions>('options', options);
  return {
    ...roughnessOptions(options),
    ...(o.method === undefined ? {} : { method: o.method as TurbulentMethod }),
    ...(o.transition === undefined ? {} : { transition: o.transition as TransitionRule }),
  };
}

/** @internal Checks a transition rule name. */
export function checkTransition(transition: TransitionRule | undefined): boolean {
  if (transition === undefined || transition === 'conservative') return false;
  if (transition === 'interpolate') return true;
  throw argumentError(
    'UNKNOWN_NAME',
    'transition',
    transition,
    undefined,
    'conservative, interpolate',
  );
}

/**
 * @internal Unchecked regime policy on plain numbers.
 * @param interpolate - true for the `'interpolate'` transition rule
 */
export function frictionFactorKernel(
  re: number,
  relativeRoughness: number,
  turbulent: (re: number, relativeRoughness: number) => number,
  interpolate: boolean,
): number {
  if (re >= TURBULENT_LIMIT) return turbulent(re, relativeRoughness);
  if (re <= LAMINAR_LIMIT) return 64 / re;
  if (interpolate) {
    const fl = 64 / LAMINAR_LIMIT;
    const ft = turbulent(TURBULENT_LIMIT, relativeRoughness);
    return fl + ((ft - fl) * (re - LAMINAR_LIMIT)) / (TURBULENT_LIMIT - LAMINAR_LIMIT);
  }
  const fl = 64 / re;
  const ft = turbulent(re, relativeRoughness);
  return Math.max(ft, fl);
}

/**
 * Darcy friction factor for any Reynolds number, with a stated regime policy:
 * - Re <= 2300: laminar, `f = 64/Re` (roughness plays no part);
 * - Re >= 4000: the turbulent `method` (default {@link colebrook}, exact);
 * - 2300 < Re < 4000: the `transition` rule (default `'conservative'`, the larger of the
 *   laminar and turbulent values; or `'interpolate'`, linear in Re across the band).
 *
 * The band limits 2300 and 4000 are common practice (for example F. M. White, "Fluid
 * Mechanics", section 6.1). The transition band has no reliable correlation: results there
 * are for design margins, not for prediction. Each turbulent method keeps its own validated
 * range (see its doc comment); a Re or roughness outside it is evaluated, not clamped.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @param relativeRoughness - eps/D (dimensionless), 0 to 0.1 (0.5 with `allowLargeRoughness`)
 * @param options - `method`, `transition`, `allowLargeRoughness`
 * @returns the Darcy friction factor (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN, Infinity, negative eps/D or
 *   eps/D > 0.5; `OUT_OF_RANGE` for 0.1 < eps/D <= 0.5 without `allowLargeRoughness`;
 *   `UNKNOWN_NAME` for an unknown method or transition rule.
 * @example
 * ```ts
 * frictionFactor(1000, 1e-4); // 0.064 (laminar)
 * frictionFactor(3000, 1e-4); // 0.043609... (conservative: Colebrook at Re 3000)
 * frictionFactor(3000, 1e-4, { transition: 'interpolate' }); // 0.032842...
 * frictionFactor(1e5, 1e-4); // 0.018513866077471648 (Colebrook)
 * ```
 */
export function frictionFactor(
  re: number,
  relativeRoughness: number,
  options?: FrictionFactorOptions | null,
): number {
  checkReynolds(re);
  if (options === undefined || options === null) {
    checkRelativeRoughness(relativeRoughness, undefined);
    return guardResult(
      'frictionFactor',
      frictionFactorKernel(re, relativeRoughness, colebrookKernel, false),
      'OUT_OF_RANGE',
    );
  }
  const o = frictionOptions(options);
  checkRelativeRoughness(relativeRoughness, o);
  return guardResult(
    'frictionFactor',
    frictionFactorKernel(
      re,
      relativeRoughness,
      turbulentKernel(o.method),
      checkTransition(o.transition),
    ),
    'OUT_OF_RANGE',
  );
}

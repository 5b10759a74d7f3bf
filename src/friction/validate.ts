import { argumentError } from '../errors';
import { guardBoolean, guardOptions } from '../guards';

/**
 * Options shared by every friction-factor function.
 */
export interface RoughnessOptions {
  /**
   * Accept a relative roughness above {@link MAX_RELATIVE_ROUGHNESS} (0.1), up to
   * {@link LIMIT_RELATIVE_ROUGHNESS} (0.5). No correlation here was fitted to such rough
   * pipes; set this only when you mean it. Default `false`.
   */
  readonly allowLargeRoughness?: boolean;
}

/** Largest relative roughness accepted without `allowLargeRoughness` (0.1). */
export const MAX_RELATIVE_ROUGHNESS = 0.1;

/**
 * Largest relative roughness accepted at all (0.5): a roughness height of half the diameter
 * fills the bore, so larger values describe no pipe.
 */
export const LIMIT_RELATIVE_ROUGHNESS = 0.5;

/**
 * Throws `INVALID_ARGUMENT` unless `re` is a finite number > 0. One comparison pair on the
 * fast path (NaN fails both).
 * @internal
 */
export function checkReynolds(re: number): void {
  if (typeof re !== 'number' || !(re > 0 && re < Number.POSITIVE_INFINITY)) {
    throw argumentError('INVALID_ARGUMENT', 're', re, undefined, 'a finite number > 0');
  }
}

/**
 * Reads the options of a friction-factor function: `undefined` and `null` mean none; anything
 * else must be an object whose `allowLargeRoughness`, when present, is a boolean.
 * @internal
 */
export function roughnessOptions(options: RoughnessOptions | null | undefined): RoughnessOptions {
  const o = guardOptions<RoughnessOptions>('options', options);
  if (o.allowLargeRoughness === undefined) return {};
  return {
    allowLargeRoughness: guardBoolean('options.allowLargeRoughness', o.allowLargeRoughness),
  };
}

/**
 * Smallest Reynolds number the explicit turbulent approximations (Swamee-Jain, Haaland,
 * Serghides, Zigrang-Sylvester, Goudar-Sonnad, Chen) accept: 100. None of them was fitted
 * below Re 4000 (turbulent flow); below about Re 13 some give no number at all (the argument
 * of a logarithm turns negative: Goudar-Sonnad below about 2.2, Chen 7.1, Serghides 12.0,
 * Zigrang-Sylvester 13.0 over eps/D 0..0.5) and Swamee-Jain and Haaland pass through a pole
 * near Re 7. The bound is this project's choice, well clear of those and well below the
 * laminar limit 2300 of {@link frictionFactor}, which never calls them lower.
 */
export const MIN_APPROXIMATION_REYNOLDS = 100;

/**
 * Throws `INVALID_ARGUMENT` for a Re that is not a finite number > 0 and `OUT_OF_RANGE` below
 * {@link MIN_APPROXIMATION_REYNOLDS}.
 * @internal
 */
export function checkApproximationReynolds(re: number): void {
  checkReynolds(re);
  if (re < MIN_APPROXIMATION_REYNOLDS) {
    throw argumentError(
      'OUT_OF_RANGE',
      're',
      re,
      undefined,
      `>= ${MIN_APPROXIMATION_REYNOLDS}`,
      'The explicit approximations of Colebrook are turbulent-flow formulas; use colebrook(), ' +
        'churchill() or frictionFactor() at low Re.',
    );
  }
}

/**
 * Checks a relative roughness: finite, >= 0, and <= 0.1 unless `allowLargeRoughness`
 * (then <= 0.5). One comparison pair on the fast path; the slow path names the rule broken.
 * @internal
 */
export function checkRelativeRoughness(
  relativeRoughness: number,
  options: RoughnessOptions | undefined,
): void {
  if (
    typeof relativeRoughness === 'number' &&
    relativeRoughness >= 0 &&
    relativeRoughness <= MAX_RELATIVE_ROUGHNESS
  ) {
    return;
  }
  roughnessSlowPath(relativeRoughness, options);
}

function roughnessSlowPath(value: number, options: RoughnessOptions | undefined): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'relativeRoughness',
      value,
      undefined,
      'a finite number >= 0',
    );
  }
  if (value > LIMIT_RELATIVE_ROUGHNESS) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'relativeRoughness',
      value,
      undefined,
      `0 to ${LIMIT_RELATIVE_ROUGHNESS}`,
      'A roughness height above half the diameter describes no pipe.',
    );
  }
  if (options?.allowLargeRoughness !== true) {
    throw argumentError(
      'OUT_OF_RANGE',
      'relativeRoughness',
      value,
      undefined,
      `0 to ${MAX_RELATIVE_ROUGHNESS}`,
      'Pass { allowLargeRoughness: true } to accept up to 0.5; no correlation was fitted there.',
    );
  }
}

import { argumentError } from '../errors';
import { guardBuffer, guardResult } from '../guards';
import { COLEBROOK_MIN_REYNOLDS, checkColebrookReynolds, colebrookKernel } from './colebrook';
import {
  checkTransition,
  type FrictionFactorOptions,
  frictionFactorKernel,
  frictionOptions,
  turbulentKernel,
} from './friction-factor';
import { checkRelativeRoughness, type RoughnessOptions, roughnessOptions } from './validate';

function checkLengths(
  re: Float64Array,
  relativeRoughness: number | Float64Array,
  out: Float64Array,
): number {
  if (!(re instanceof Float64Array)) guardBuffer('re', re, 0);
  const n = re.length;
  guardBuffer('out', out, 0);
  if (typeof relativeRoughness !== 'number') guardBuffer('relativeRoughness', relativeRoughness, 0);
  if (out.length !== n) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'out.length',
      out.length,
      undefined,
      `${n} (re.length)`,
    );
  }
  if (typeof relativeRoughness !== 'number' && relativeRoughness.length !== n) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'relativeRoughness.length',
      relativeRoughness.length,
      undefined,
      `${n} (re.length)`,
    );
  }
  return n;
}

function badRe(i: number, value: number): never {
  if (value > 0) checkColebrookReynolds(value, `re[${i}]`);
  throw argumentError('INVALID_ARGUMENT', `re[${i}]`, value, undefined, 'a finite number > 0');
}

/**
 * Array form of {@link colebrook}: fills `out[i]` with the Colebrook friction factor of
 * `re[i]` and `relativeRoughness` (one value for all, or `relativeRoughness[i]`). Checks
 * lengths once and every element on the way; allocates nothing.
 *
 * @param re - Reynolds numbers, each > 0
 * @param relativeRoughness - eps/D, one value or one per element (0 to 0.1; 0.5 with
 *   `allowLargeRoughness`)
 * @param out - receives the friction factors; same length as `re` (may be `re` itself)
 * @param options - `allowLargeRoughness`
 * @returns `out`
 * @throws HeadflowError `INVALID_ARGUMENT` for mismatched lengths or a bad element (named
 *   `re[i]` or `relativeRoughness`); `OUT_OF_RANGE` as {@link colebrook}. Elements before the
 *   bad one are already written.
 * @example
 * ```ts
 * const out = colebrookInto(Float64Array.of(1e4, 1e5, 1e6), 1e-4, new Float64Array(3));
 * // [0.031037..., 0.018513866077471648, 0.013441...]
 * ```
 */
export function colebrookInto(
  re: Float64Array,
  relativeRoughness: number | Float64Array,
  out: Float64Array,
  options?: RoughnessOptions | null,
): Float64Array {
  const n = checkLengths(re, relativeRoughness, out);
  const o = roughnessOptions(options);
  if (typeof relativeRoughness === 'number') {
    checkRelativeRoughness(relativeRoughness, o);
    for (let i = 0; i < n; i++) {
      const r = re[i] as number;
      if (!(r >= COLEBROOK_MIN_REYNOLDS && r < Number.POSITIVE_INFINITY)) badRe(i, r);
      const f = colebrookKernel(r, relativeRoughness);
      if (!(f < Number.POSITIVE_INFINITY)) guardResult(`out[${i}]`, f, 'OUT_OF_RANGE');
      out[i] = f;
    }
    return out;
  }
  for (let i = 0; i < n; i++) {
    const r = re[i] as number;
    const k = relativeRoughness[i] as number;
    if (!(r >= COLEBROOK_MIN_REYNOLDS && r < Number.POSITIVE_INFINITY)) badRe(i, r);
    checkRelativeRoughness(k, o);
    const f = colebrookKernel(r, k);
    if (!(f < Number.POSITIVE_INFINITY)) guardResult(`out[${i}]`, f, 'OUT_OF_RANGE');
    out[i] = f;
  }
  return out;
}

/**
 * Array form of {@link frictionFactor}: the same regime policy and options, element by
 * element. The method and transition rule are resolved once; allocates nothing.
 *
 * @param re - Reynolds numbers, each > 0
 * @param relativeRoughness - eps/D, one value or one per element
 * @param out - receives the friction factors; same length as `re` (may be `re` itself)
 * @param options - `method`, `transition`, `allowLargeRoughness`
 * @returns `out`
 * @throws HeadflowError as {@link colebrookInto}, and `UNKNOWN_NAME` for an unknown method
 *   or transition rule.
 * @example
 * ```ts
 * frictionFactorInto(Float64Array.of(1000, 3000, 1e5), 1e-4, new Float64Array(3));
 * // [0.064, 0.043609..., 0.018513866077471648]
 * ```
 */
export function frictionFactorInto(
  re: Float64Array,
  relativeRoughness: number | Float64Array,
  out: Float64Array,
  options?: FrictionFactorOptions | null,
): Float64Array {
  const n = checkLengths(re, relativeRoughness, out);
  const o = frictionOptions(options);
  const turbulent = turbulentKernel(o.method);
  const interpolate = checkTransition(o.transition);
  const single = typeof relativeRoughness === 'number';
  if (single) checkRelativeRoughness(relativeRoughness, o);
  for (let i = 0; i < n; i++) {
    const r = re[i] as number;
    if (!(r > 0 && r < Number.POSITIVE_INFINITY)) badRe(i, r);
    let k: number;
    if (single) {
      k = relativeRoughness;
    } else {
      k = relativeRoughness[i] as number;
      checkRelativeRoughness(k, o);
    }
    const f = frictionFactorKernel(r, k, turbulent, interpolate);
    if (!(f < Number.POSITIVE_INFINITY)) guardResult(`out[${i}]`, f, 'OUT_OF_RANGE');
    out[i] = f;
  }
  return out;
}

/**
 * Private helpers of the pumps module: curve kernels on plain numbers, a bounded maximum
 * search, and the range check with its message. Not exported from the module.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';
import {
  guardBoolean,
  guardFunction,
  guardInteger,
  guardNumber,
  guardOneOf,
  guardRange,
  guardRecord,
} from '../guards';
import { monotoneCubic } from '../numeric/interpolate';
import { polynomialLeastSquares } from '../numeric/least-squares';
import type { Flow } from '../units/index';
import type { CurveFit, FitReport, Pump, SystemCurveLike } from './types';

/** A fitted curve on plain SI numbers. */
export interface Kernel {
  readonly xMin: number;
  readonly xMax: number;
  evaluate(x: number): number;
  derivative(x: number): number;
  readonly report: FitReport;
}

/**
 * How closely a fitted head or efficiency curve must pass by each catalogue point to count as
 * faithful to the catalogue: head within 0.5 % of the point's head (`headRelative`),
 * efficiency within 0.5 percentage point (`efficiency`, a difference of fractions).
 *
 * The bounds are of the order of the reading accuracy of a printed catalogue curve (common
 * practice) and well inside the acceptance tolerances of a pump test (ISO 9906:2012 grade 1B:
 * flow +-5 %, head +-3 %, efficiency -3 % of its value; from memory), so a fit within them
 * adds no error that matters to the selection.
 */
export const CATALOGUE_FIT_TOLERANCE = { headRelative: 0.005, efficiency: 0.005 } as const;

/** Highest polynomial degree the default efficiency rule tries before the monotone cubic. */
const MAX_DEFAULT_DEGREE = 8;

/** Which curve a kernel is for: head and efficiency are held to the catalogue tolerance. */
type CurveName = 'head' | 'efficiency' | 'npshRequired' | 'shaftPower';

/** Largest absolute and relative residual of `f` at the points. */
function residuals(
  xs: readonly number[],
  ys: readonly number[],
  f: (x: number) => number,
): { maxAbs: number; maxRel: number } {
  let maxAbs = 0;
  let maxRel = 0;
  for (let i = 0; i < xs.length; i++) {
    const y = ys[i] as number;
    const r = Math.abs(y - f(xs[i] as number));
    if (r > maxAbs) maxAbs = r;
    if (y !== 0 && r / Math.abs(y) > maxRel) maxRel = r / Math.abs(y);
  }
  return { maxAbs, maxRel };
}

/** Whether residuals meet the catalogue tolerance (head, efficiency), else undefined. */
function within(name: CurveName, maxAbs: number, maxRel: number): boolean | undefined {
  // The tolerances are compared with a hair of slack for round-off in the fit itself.
  if (name === 'head') return maxRel <= CATALOGUE_FIT_TOLERANCE.headRelative * (1 + 1e-9);
  if (name === 'efficiency') return maxAbs <= CATALOGUE_FIT_TOLERANCE.efficiency * (1 + 1e-9);
  return undefined;
}

/** Fits one catalogue curve. `name` is used in messages ("head", "efficiency" ...). */
export function fitKernel(
  name: CurveName,
  xs: readonly number[],
  ys: readonly number[],
  spec: CurveFit,
  throughOrigin: boolean,
  selection: FitReport['selection'] = 'given',
): Kernel {
  const first = xs[0] ?? 0;
  const last = xs[xs.length - 1] ?? 0;
  guardRecord(`fit.${name}`, spec);
  guardOneOf(`fit.${name}.method`, spec.method, ['polynomial', 'monotone'] as const);
  if (spec.method === 'monotone') {
    const px = throughOrigin && first > 0 ? [0, ...xs] : [...xs];
    const py = throughOrigin && first > 0 ? [0, ...ys] : [...ys];
    const f = monotoneCubic(px, py);
    return {
      xMin: f.xMin,
      xMax: f.xMax,
      evaluate: (x) => f.evaluate(x),
      derivative: (x) => f.derivative(x),
      report: {
        method: 'monotone',
        degree: undefined,
        selection,
        points: xs.length,
        rms: 0,
        maxResidual: 0,
        maxRelativeResidual: 0,
        withinTolerance: within(name, 0, 0),
        rSquared: 1,
      },
    };
  }
  if (spec.method !== 'polynomial') {
    throw argumentError(
      'INVALID_ARGUMENT',
      `fit.${name}.method`,
      String((spec as { method: unknown }).method),
      undefined,
      "'polynomial' or 'monotone'",
    );
  }
  const low = throughOrigin ? 1 : 0;
  guardInteger(`fit.${name}.degree`, spec.degree, low, 20);
  const needed = spec.degree - low + 1;
  if (Number.isInteger(spec.degree) && spec.degree >= low && xs.length < needed) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `fit.${name}.degree`,
      spec.degree,
      undefined,
      `at most ${xs.length - 1 + low} with ${xs.length} ${name} points`,
    );
  }
  const p = polynomialLeastSquares(xs, ys, spec.degree, { throughOrigin, scale: last });
  const r = residuals(xs, ys, p.evaluate);
  return {
    xMin: first,
    xMax: last,
    evaluate: p.evaluate,
    derivative: p.derivative,
    report: {
      method: 'polynomial',
      degree: spec.degree,
      selection,
      points: xs.length,
      rms: p.rms,
      maxResidual: p.maxResidual,
      maxRelativeResidual: r.maxRel,
      withinTolerance: within(name, r.maxAbs, r.maxRel),
      rSquared: p.rSquared,
    },
  };
}

/**
 * The default efficiency curve: faithful to the catalogue and smooth.
 *
 * Tries least-squares polynomials through the origin of degree min(3, n) up to min(n, 8)
 * (n = points above zero flow) and keeps the first that (a) passes within
 * {@link CATALOGUE_FIT_TOLERANCE} of every point, (b) stays inside (0, 1] on a grid of 513
 * flows over `[xMin, xMax]` and (c) has one hump: once it falls it never rises again by more
 * than round-off on that grid (a catalogue efficiency curve rises to its BEP and falls). When
 * none does, it takes the monotone cubic through (0, 0) and every point (Steffen 1990), which
 * passes through each point exactly, is continuous with a continuous slope, and overshoots
 * nowhere (its BEP is then the best catalogue point).
 */
export function defaultEfficiencyKernel(
  xs: readonly number[],
  ys: readonly number[],
  xMin: number,
  xMax: number,
): Kernel {
  const n = xs.filter((x) => x > 0).length;
  for (let degree = Math.min(3, n); degree <= Math.min(n, MAX_DEFAULT_DEGREE); degree++) {
    // Distinct flows and degree <= n: the least-squares problem always has full rank.
    const k = fitKernel('efficiency', xs, ys, { method: 'polynomial', degree }, true, 'default');
    if (k.report.withinTolerance === true && oneHumpInRange(k, xMin, xMax)) return k;
  }
  return fitKernel('efficiency', xs, ys, { method: 'monotone' }, true, 'default');
}

/** True when `k` stays in (0, 1] on (xMin, xMax] and rises then falls (no interior dip). */
function oneHumpInRange(k: Kernel, xMin: number, xMax: number): boolean {
  const steps = 512;
  let prev = k.evaluate(xMin);
  let falling = false;
  for (let i = 1; i <= steps; i++) {
    const x = i === steps ? xMax : xMin + ((xMax - xMin) * i) / steps;
    const v = k.evaluate(x);
    if (!(v > 0 && v <= 1)) return false;
    const slack = 1e-12 * Math.max(1, Math.abs(v));
    if (v < prev - slack) falling = true;
    else if (falling && v > prev + slack) return false;
    prev = v;
  }
  return true;
}

/** Relative slack for range checks: flows within this fraction of the range's end count as in. */
export const RANGE_SLACK = 1e-12;

/**
 * Returns x clamped into [lo, hi] when it lies inside within round-off, else throws
 * `OUT_OF_RANGE` naming the quantity and the range (in the caller's scale).
 */
export function inRange(
  what: string,
  x: number,
  lo: number,
  hi: number,
  scale: number,
  unit: string,
): number {
  const slack = RANGE_SLACK * Math.max(Math.abs(hi), Math.abs(lo));
  if (typeof x !== 'number' || Number.isNaN(x)) {
    throw argumentError('INVALID_ARGUMENT', 'flow', x, 'm3/s', 'a finite number >= 0');
  }
  if (x < 0) {
    throw argumentError('INVALID_ARGUMENT', 'flow', x * scale, 'm3/s', 'a finite number >= 0');
  }
  if (x < lo - slack || x > hi + slack) {
    const range = `${fmt(lo * scale)} to ${fmt(hi * scale)} ${unit}`;
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `flow = ${fmt(x * scale)} ${unit} is outside the ${what} data (${range}); ` +
        'pump curves never extrapolate past their catalogue points.',
      { parameter: 'flow', value: x * scale, unit, allowed: range },
    );
  }
  return Math.max(lo, Math.min(x, hi));
}

/** Formats a number for messages with 6 significant digits. */
export function fmt(v: number): string {
  return Number.parseFloat(v.toPrecision(6)).toString();
}

/** Result of {@link maximize}. */
export interface MaxResult {
  readonly x: number;
  readonly value: number;
  readonly evaluations: number;
}

/**
 * Largest value of f on [a, b]: a scan of `grid` equal steps and of the `seeds` (flows where a
 * hump is known to be, such as the catalogue points, so that a hump narrower than a grid step
 * is not missed), then golden-section search around the best of them (bounded: at most 200
 * steps). Finds the global maximum of curves with one hump per grid step or per seed.
 */
export function maximize(
  f: (x: number) => number,
  a: number,
  b: number,
  grid = 128,
  seeds: ArrayLike<number> = [],
): MaxResult {
  let bestX = a;
  let bestV = Number.NEGATIVE_INFINITY;
  let evaluations = 0;
  const h = (b - a) / grid;
  for (let i = 0; i <= grid; i++) {
    const x = i === grid ? b : a + i * h;
    const v = f(x);
    evaluations++;
    if (v > bestV) {
      bestV = v;
      bestX = x;
    }
  }
  for (let i = 0; i < seeds.length; i++) {
    const x = seeds[i] as number;
    if (!(x >= a && x <= b)) continue;
    const v = f(x);
    evaluations++;
    if (v > bestV) {
      bestV = v;
      bestX = x;
    }
  }
  // The neighbours of the best point: a grid step either side, or the nearest seeds if closer.
  let lo = Math.max(a, bestX - h);
  let hi = Math.min(b, bestX + h);
  for (let i = 0; i < seeds.length; i++) {
    const x = seeds[i] as number;
    if (x < bestX && x > lo) lo = x;
    if (x > bestX && x < hi) hi = x;
  }
  const r = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - r * (hi - lo);
  let x2 = lo + r * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  evaluations += 2;
  const tol = 1e-12 * Math.max(Math.abs(a), Math.abs(b));
  for (let k = 0; k < 200 && hi - lo > tol; k++) {
    if (f1 >= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - r * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + r * (hi - lo);
      f2 = f(x2);
    }
    evaluations++;
  }
  const xm = 0.5 * (lo + hi);
  const vm = f(xm);
  evaluations++;
  return vm >= bestV ? { x: xm, value: vm, evaluations } : { x: bestX, value: bestV, evaluations };
}

/**
 * Checks the shape of a pump handed to a public function (any object with the {@link Pump}
 * members, not only those headflow builds): an object, its curve methods functions, its flow
 * range finite with 0 <= min < max. Returns it typed.
 * @internal
 */
export function guardPump<P extends Pump>(parameter: string, pump: P): P {
  const p = guardRecord(parameter, pump);
  for (const m of ['head', 'efficiency', 'npshRequired', 'shaftPower', 'shares'] as const) {
    guardFunction(`${parameter}.${m}`, p[m]);
  }
  guardBoolean(`${parameter}.hasEfficiency`, p['hasEfficiency']);
  const range = guardRecord(`${parameter}.flowRange`, p['flowRange']);
  const min = guardRange(`${parameter}.flowRange.min`, range['min'], { min: 0, unit: 'm3/s' });
  guardRange(`${parameter}.flowRange.max`, range['max'], { min, minOpen: true, unit: 'm3/s' });
  if (p['npshRange'] !== undefined) guardRecord(`${parameter}.npshRange`, p['npshRange']);
  return pump;
}

/**
 * Checks a system handed to a public function (an object with `head(flow)` and a finite
 * `staticHead`) and returns its head function, which refuses a result that is not a finite
 * number (naming the flow) instead of carrying it into a solver.
 * @internal
 */
export function systemHeadOf(parameter: string, system: SystemCurveLike): (flow: Flow) => number {
  const s = guardRecord(parameter, system);
  const head = guardFunction<(flow: Flow) => unknown>(`${parameter}.head`, s['head']);
  guardNumber(`${parameter}.staticHead`, s['staticHead'], 'm');
  return (flow: Flow): number => {
    const h = head.call(system, flow);
    if (typeof h !== 'number' || !Number.isFinite(h)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${parameter}.head(${fmt(flow)} m3/s) returned ${typeof h === 'number' ? String(h) : typeof h}, not a finite head.`,
        { parameter: `${parameter}.head`, allowed: 'a finite head (m)' },
      );
    }
    return h;
  };
}

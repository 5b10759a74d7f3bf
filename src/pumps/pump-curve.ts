/**
 * Pump curves from catalogue points, their best efficiency point and operating regions, and
 * the affinity laws for speed change and impeller trim.
 *
 * @module
 */
import { argumentError, checkPositive, HeadflowError } from '../errors';
import { guardArray, guardNumber, guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Length,
  type Power,
  type RotationalSpeed,
  STANDARD_GRAVITY,
} from '../units/index';
import {
  CATALOGUE_FIT_TOLERANCE,
  defaultEfficiencyKernel,
  fitKernel,
  fmt,
  inRange,
  type Kernel,
  maximize,
} from './internal';

export { CATALOGUE_FIT_TOLERANCE };

import type {
  BestEfficiencyPoint,
  CataloguePoint,
  CurveFit,
  FlowRange,
  Pump,
  PumpCurve,
  PumpCurveFits,
  PumpShare,
} from './types';

/** Default preferred operating region, as fractions of BEP flow (ANSI/HI 9.6.3). */
export const DEFAULT_PREFERRED_REGION: readonly [number, number] = [0.7, 1.2];

/** Input of {@link pumpCurve}. */
export interface PumpCurveInput {
  /** Catalogue points at `speed` (and `impellerDiameter`), at least 3, flows increasing. */
  readonly points: readonly CataloguePoint[];
  /** Speed of the catalogue data, e.g. `q(1750, 'rpm')`. */
  readonly speed: RotationalSpeed;
  /** Impeller diameter of the catalogue data (needed only for `trimmedTo`). */
  readonly impellerDiameter?: Length;
  /** How each curve is fitted; defaults in {@link PumpCurveFits}. */
  readonly fit?: PumpCurveFits;
  /**
   * When the first point is above zero flow: extend the head (and efficiency) fit down to
   * zero flow to give a shut-off head. Needs a polynomial head fit. Default false: the flow
   * range then starts at the first point and `shutoffHead` is undefined.
   */
  readonly extrapolateShutoff?: boolean;
  /** Density of the liquid the catalogue shaft power refers to (needed with `shaftPower`). */
  readonly catalogueDensity?: Density;
  /**
   * Operating regions as fractions of BEP flow, `[low, high]`. Preferred default
   * [0.7, 1.2] (ANSI/HI 9.6.3); allowable default: the catalogue flow range.
   */
  readonly regions?: {
    readonly preferred?: readonly [number, number];
    readonly allowable?: readonly [number, number];
  };
}

/** The catalogue-speed data of a curve, shared by every affinity-scaled copy. */
interface Base {
  readonly xMin: number;
  readonly xMax: number;
  readonly head: Kernel;
  readonly efficiency: Kernel | undefined;
  readonly power: Kernel | undefined;
  readonly powerDensity: number;
  readonly npsh: Kernel | undefined;
  readonly bep: BestEfficiencyPoint | undefined;
  readonly preferred: readonly [number, number];
  readonly allowable: readonly [number, number] | undefined;
  readonly speed: number;
  readonly diameter: number | undefined;
  readonly fits: PumpCurve['fits'];
  readonly points: readonly CataloguePoint[];
}

const GRID = 512;

/** Smallest efficiency of a catalogue point above zero flow (0.1 %). */
const MIN_POINT_EFFICIENCY = 1e-3;
/** Largest flow (m3/s) and head (m) of a catalogue point: the physical ranges of a file. */
const MAX_POINT_FLOW = 1e3;
const MAX_POINT_HEAD = 1e6;

/** The k-th of GRID + 1 evenly spaced flows from a to b, landing exactly on b at k = GRID. */
function gridFlow(a: number, b: number, k: number): number {
  return k === GRID ? b : a + ((b - a) * k) / GRID;
}

/**
 * Builds a pump from catalogue points (flow, head and optionally efficiency, NPSH required
 * or shaft power) at a rated speed.
 *
 * Fits: head by a monotone piecewise cubic (Steffen 1990, through every point, default) or a
 * least-squares polynomial of a chosen degree; efficiency by a least-squares polynomial
 * through the origin of a chosen degree or the monotone cubic with the point (0, 0) added;
 * NPSH required and shaft power by either.
 *
 * Faithful by default: the default curves pass within {@link CATALOGUE_FIT_TOLERANCE} of every
 * catalogue point (head within 0.5 % of each point's head, efficiency within 0.5 percentage
 * point). The head default goes through every point. The efficiency default tries
 * least-squares polynomials through the origin from degree min(3, n) up to min(n, 8) (n
 * points above zero flow) and keeps the first within the tolerance that stays in (0, 1] and
 * has a single hump; otherwise it takes the monotone cubic through (0, 0) and every point
 * (exact at the points, continuous slope, no overshoot, so its BEP is then the best catalogue
 * point). A fit you name is used as given; `fits` reports for each curve the method, the
 * degree, whether it was the default or given, RMS and largest residual (absolute and
 * relative), R^2 and, for head and efficiency, `withinTolerance` (the design report warns when
 * a given fit misses the tolerance). Head must be non-increasing with flow, in the points and
 * in the fitted curve (checked on a grid of 513 flows); a rising curve is refused. The
 * efficiency fit must stay inside (0, 1] over the flow range.
 *
 * A single rated point (one flow, head and efficiency from a nameplate or data sheet) is not a
 * curve and is refused: give at least 3 points read from the manufacturer's curve.
 *
 * Best efficiency point: the maximum of the efficiency fit over the flow range (grid scan,
 * then golden-section search). Operating regions: preferred 70-120 % of BEP flow by default
 * (ANSI/HI 9.6.3-2012, "Rotodynamic Pumps - Guideline for Allowable Operating Region",
 * section 9.6.3.3, from memory of the standard's figure for the preferred operating region);
 * allowable defaults to the catalogue flow range (give the manufacturer's allowable region
 * when you have it).
 *
 * No silent extrapolation: `head`, `efficiency`, `shaftPower` throw `OUT_OF_RANGE` outside
 * `flowRange`, and `npshRequired` outside `npshRange`. When the first point is above zero
 * flow, `flowRange` starts there and `shutoffHead` is undefined unless `extrapolateShutoff`.
 *
 * Affinity laws (common practice; e.g. DOE-HDBK-1012/3-92, Fluid Flow module 3, eqs. 3-23 to
 * 3-25): `atSpeed(n)` scales flow by r = n/n0, head by r^2 and power by r^3, with efficiency
 * unchanged along each affinity parabola (`Q/r`); NPSH required is scaled by r^2 (an
 * approximation: measured exponents differ, more so far from BEP and for large changes).
 * `trimmedTo(D)` scales flow by D/D0 and head by (D/D0)^2 at constant speed (the usual
 * impeller-trim form of the laws). Known limits of trim scaling: it assumes the trimmed
 * impeller stays geometrically similar, which it does not (the outlet width and blade angles
 * stay as cast), so it is trustworthy only for small trims, about 5-10 % of diameter (common
 * practice); efficiency usually falls with trim, which is not modelled; NPSH required is kept
 * as the full-diameter value at the same flow (the impeller eye is unchanged).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for fewer than 3 points, a negative or
 *   non-increasing flow, a head that is not positive or rises with flow, an efficiency outside
 *   [0.001, 1] (0 only at zero flow), efficiency on some points only, both efficiency and
 *   shaft power, shaft power without `catalogueDensity`, a fit that cannot be made or leaves
 *   its bounds, or bad regions; `OUT_OF_RANGE` for a point's flow above 1000 m3/s or head
 *   above 1e6 m, and from the curve's methods outside the data.
 * @example
 * ```ts
 * const pump = pumpCurve({
 *   speed: q(1750, 'rpm'),
 *   points: [
 *     { flow: q(0, 'm3/h'), head: q(40, 'm'), efficiency: 0 },
 *     { flow: q(50, 'm3/h'), head: q(37.5, 'm'), efficiency: 0.6 },
 *     { flow: q(100, 'm3/h'), head: q(30, 'm'), efficiency: 0.75 },
 *     { flow: q(150, 'm3/h'), head: q(17.5, 'm'), efficiency: 0.6 },
 *   ],
 *   fit: { head: { method: 'polynomial', degree: 2 }, efficiency: { method: 'polynomial', degree: 2 } },
 * });
 * to(pump.head(q(120, 'm3/h')), 'm'); // 25.6 (H = 40 - 0.001 Q^2, Q in m3/h)
 * ```
 */
export function pumpCurve(input: PumpCurveInput): PumpCurve {
  const base = buildBase(input);
  return new ScaledCurve(base, 1, 1);
}

/**
 * A frozen copy of a checked catalogue point with only the fields a point has: the caller's
 * other keys (an extra field, an own `__proto__`) are not carried into the curve.
 */
function cataloguePointCopy(p: CataloguePoint): CataloguePoint {
  return Object.freeze({
    flow: p.flow,
    head: p.head,
    ...(p.efficiency === undefined ? {} : { efficiency: p.efficiency }),
    ...(p.npshRequired === undefined ? {} : { npshRequired: p.npshRequired }),
    ...(p.shaftPower === undefined ? {} : { shaftPower: p.shaftPower }),
  });
}

function buildBase(input: PumpCurveInput): Base {
  const { points } = guardRecord('input', input) as unknown as PumpCurveInput;
  checkPositive('speed', input.speed, 'rad/s');
  if (input.impellerDiameter !== undefined) {
    checkPositive('impellerDiameter', input.impellerDiameter, 'm');
  }
  if (!Array.isArray(points) || points.length < 3) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      Array.isArray(points) ? points.length : 0,
      'points',
      'at least 3 catalogue points',
      'A rated point alone (one flow, head and efficiency) is not a curve: the operating point, ' +
        'the BEP and the motor check need the shape of the curve. Read at least 3 points off the ' +
        "manufacturer's curve for this impeller and speed, from shut-off (or the lowest flow shown) " +
        'to the end of the curve, each with its head and efficiency.',
    );
  }
  guardArray('points', points, { max: 10_000 });
  const n = points.length;
  const q: number[] = [];
  const h: number[] = [];
  const effQ: number[] = [];
  const eff: number[] = [];
  const powQ: number[] = [];
  const pow: number[] = [];
  const npQ: number[] = [];
  const np: number[] = [];
  points.forEach((point, i) => {
    const p = guardRecord(`points[${i}]`, point) as unknown as CataloguePoint;
    const flow = p.flow as number;
    const head = p.head as number;
    if (typeof flow !== 'number' || !Number.isFinite(flow) || flow < 0) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].flow`,
        flow,
        'm3/s',
        'a finite flow >= 0',
      );
    }
    // Past the physical ranges (1000 m3/s, 1e6 m: those of the scenario reader) the power
    // rho g Q H of a point would overflow in the checks built on it.
    if (flow > MAX_POINT_FLOW) {
      throw argumentError(
        'OUT_OF_RANGE',
        `points[${i}].flow`,
        flow,
        'm3/s',
        `<= ${MAX_POINT_FLOW}`,
      );
    }
    if (typeof head === 'number' && head > MAX_POINT_HEAD) {
      throw argumentError('OUT_OF_RANGE', `points[${i}].head`, head, 'm', `<= ${MAX_POINT_HEAD}`);
    }
    if (i > 0 && !(flow > (q[i - 1] as number))) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].flow`,
        flow,
        'm3/s',
        `> ${fmt(q[i - 1] as number)} m3/s (flows strictly increasing)`,
      );
    }
    if (typeof head !== 'number' || !Number.isFinite(head) || head <= 0) {
      throw argumentError('INVALID_ARGUMENT', `points[${i}].head`, head, 'm', 'a finite head > 0');
    }
    if (i > 0 && head > (h[i - 1] as number)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].head`,
        head,
        'm',
        `<= ${fmt(h[i - 1] as number)} m (head non-increasing with flow)`,
        'The head rises with flow here; a rising (unstable) curve has no single operating point and is not supported.',
      );
    }
    q.push(flow);
    h.push(head);
    if (p.efficiency !== undefined) {
      const e = p.efficiency;
      const zeroFlowZero = flow === 0 && e === 0;
      // Below 0.1 % (the scenario reader's smallest fraction) the shaft power rho g Q H / eta
      // would run to Infinity for no pump there is.
      if (
        typeof e !== 'number' ||
        !Number.isFinite(e) ||
        ((e < MIN_POINT_EFFICIENCY || e > 1) && !zeroFlowZero)
      ) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `points[${i}].efficiency`,
          e,
          undefined,
          `${MIN_POINT_EFFICIENCY} <= efficiency <= 1 (a fraction; 0 only at zero flow)`,
        );
      }
      if (flow === 0 && e !== 0) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `points[${i}].efficiency`,
          e,
          undefined,
          '0 at zero flow (no hydraulic power at zero flow)',
        );
      }
      effQ.push(flow);
      eff.push(e);
    }
    if (p.shaftPower !== undefined) {
      const pw = p.shaftPower as number;
      if (typeof pw !== 'number' || !Number.isFinite(pw) || pw <= 0) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `points[${i}].shaftPower`,
          pw,
          'W',
          'a finite power > 0',
        );
      }
      powQ.push(flow);
      pow.push(pw);
    }
    if (p.npshRequired !== undefined) {
      const v = p.npshRequired as number;
      if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `points[${i}].npshRequired`,
          v,
          'm',
          'a finite head > 0',
        );
      }
      npQ.push(flow);
      np.push(v);
    }
  });
  if (effQ.length > 0 && effQ.length < n) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      effQ.length,
      'points with efficiency',
      `efficiency on all ${n} points or on none`,
    );
  }
  if (powQ.length > 0 && powQ.length < n) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      powQ.length,
      'points with shaftPower',
      `shaft power on all ${n} points or on none`,
    );
  }
  if (effQ.length > 0 && powQ.length > 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      'efficiency and shaftPower',
      undefined,
      'one of efficiency or shaftPower',
      'Give one; the other follows from P = rho g Q H / efficiency.',
    );
  }
  let powerDensity = 0;
  if (powQ.length > 0) {
    if (input.catalogueDensity === undefined) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'catalogueDensity',
        undefined,
        'kg/m3',
        'the density the catalogue shaft power refers to',
      );
    }
    checkPositive('catalogueDensity', input.catalogueDensity, 'kg/m3');
    powerDensity = input.catalogueDensity;
  }
  const fits = input.fit ?? {};
  const headSpec: CurveFit = fits.head ?? { method: 'monotone' };
  const head = fitKernel('head', q, h, headSpec, false, fits.head ? 'given' : 'default');
  const first = q[0] as number;
  const last = q[n - 1] as number;
  let xMin = first;
  if (input.extrapolateShutoff === true && first > 0) {
    if (headSpec.method !== 'polynomial') {
      throw argumentError(
        'INVALID_ARGUMENT',
        'extrapolateShutoff',
        'true',
        undefined,
        'a polynomial head fit',
        'The monotone cubic never extrapolates; fit the head with a polynomial to extend it to zero flow.',
      );
    }
    if (powQ.length > 0 && fits.shaftPower?.method !== 'polynomial') {
      throw argumentError(
        'INVALID_ARGUMENT',
        'extrapolateShutoff',
        'true',
        undefined,
        'a polynomial shaft-power fit when power is given',
      );
    }
    xMin = 0;
  }
  // Head must stay positive and non-increasing over the whole range (grid check).
  let prev = Number.POSITIVE_INFINITY;
  const tolH = 1e-9 * (h[0] as number);
  for (let k = 0; k <= GRID; k++) {
    const x = gridFlow(xMin, last, k);
    const v = head.evaluate(x);
    if (!(v > 0) || v > prev + tolH) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'fit.head',
        headSpec.method === 'polynomial' ? `polynomial of degree ${headSpec.degree}` : 'monotone',
        undefined,
        'a fitted head that stays positive and non-increasing over the flow range',
        `The fitted head is ${fmt(v)} m at ${fmt(x)} m3/s after ${fmt(prev)} m; try a lower degree or { method: 'monotone' }.`,
      );
    }
    prev = v;
  }
  let efficiency: Kernel | undefined;
  let power: Kernel | undefined;
  let effFn: ((x: number) => number) | undefined;
  if (effQ.length > 0) {
    efficiency =
      fits.efficiency === undefined
        ? defaultEfficiencyKernel(effQ, eff, xMin, last)
        : fitKernel('efficiency', effQ, eff, fits.efficiency, true);
    const k = efficiency;
    effFn = (x) => k.evaluate(x);
  } else if (powQ.length > 0) {
    const spec: CurveFit = fits.shaftPower ?? { method: 'monotone' };
    power = fitKernel('shaftPower', powQ, pow, spec, false, fits.shaftPower ? 'given' : 'default');
    const pk = power;
    effFn = (x) =>
      x === 0 ? 0 : (powerDensity * STANDARD_GRAVITY * x * head.evaluate(x)) / pk.evaluate(x);
    for (let i = 0; i <= GRID; i++) {
      const x = gridFlow(xMin, last, i);
      const v = pk.evaluate(x);
      if (!(v > 0)) {
        throw argumentError(
          'INVALID_ARGUMENT',
          'fit.shaftPower',
          spec.method,
          undefined,
          'a fitted shaft power > 0 over the flow range',
          `The fit gives ${fmt(v)} W at ${fmt(x)} m3/s.`,
        );
      }
    }
  }
  if (effFn !== undefined) {
    for (let i = 1; i <= GRID; i++) {
      const x = gridFlow(xMin, last, i);
      const v = effFn(x);
      if (!(v > 0 && v <= 1)) {
        throw argumentError(
          'INVALID_ARGUMENT',
          efficiency ? 'fit.efficiency' : 'points.shaftPower',
          fmt(v),
          undefined,
          'an efficiency in (0, 1] over the flow range',
          `The fitted efficiency is ${fmt(v)} at ${fmt(x)} m3/s; try another degree or { method: 'monotone' }.`,
        );
      }
    }
  }
  let npsh: Kernel | undefined;
  if (npQ.length > 0) {
    const spec: CurveFit = fits.npshRequired ?? { method: 'monotone' };
    if (npQ.length < 2) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'points',
        npQ.length,
        'points with npshRequired',
        'at least 2 points with NPSH required, or none',
      );
    }
    npsh = fitKernel('npshRequired', npQ, np, spec, false, fits.npshRequired ? 'given' : 'default');
    for (let i = 0; i <= GRID; i++) {
      const x = gridFlow(npsh.xMin, npsh.xMax, i);
      const v = npsh.evaluate(x);
      if (!(v > 0)) {
        throw argumentError(
          'INVALID_ARGUMENT',
          'fit.npshRequired',
          spec.method,
          undefined,
          'a fitted NPSH required > 0 over its flow range',
          `The fit gives ${fmt(v)} m at ${fmt(x)} m3/s.`,
        );
      }
    }
  }
  let bep: BestEfficiencyPoint | undefined;
  if (effFn !== undefined) {
    const f = effFn;
    // The catalogue flows seed the search: a hump narrower than a grid step is not missed.
    const m = maximize(f, xMin, last, 128, q);
    bep = { flow: m.x as Flow, head: head.evaluate(m.x) as Length, efficiency: m.value };
  }
  const preferred = checkRegion(
    'regions.preferred',
    input.regions?.preferred ?? DEFAULT_PREFERRED_REGION,
  );
  const allowable =
    bep === undefined
      ? undefined
      : input.regions?.allowable !== undefined
        ? checkRegion('regions.allowable', input.regions.allowable)
        : ([xMin / bep.flow, last / bep.flow] as const);
  return {
    xMin,
    xMax: last,
    head,
    efficiency,
    power,
    powerDensity,
    npsh,
    bep,
    preferred,
    allowable,
    speed: input.speed,
    diameter: input.impellerDiameter,
    points: Object.freeze(points.map(cataloguePointCopy)),
    fits: {
      head: head.report,
      efficiency: efficiency?.report,
      npshRequired: npsh?.report,
      shaftPower: power?.report,
    },
  };
}

function checkRegion(name: string, r: readonly [number, number]): readonly [number, number] {
  guardArray(name, r, { min: 2, max: 2 });
  const [lo, hi] = r;
  if (
    typeof lo !== 'number' ||
    typeof hi !== 'number' ||
    !Number.isFinite(lo) ||
    !Number.isFinite(hi) ||
    lo < 0 ||
    !(hi > lo)
  ) {
    throw argumentError(
      'INVALID_ARGUMENT',
      name,
      typeof lo === 'number' && typeof hi === 'number' ? `[${lo}, ${hi}]` : 'not two numbers',
      undefined,
      '[low, high] fractions of BEP flow with 0 <= low < high',
    );
  }
  return [lo, hi];
}

/**
 * A catalogue curve seen at a speed ratio `rs` and diameter ratio `rd` (affinity laws).
 * Flow scales by `rs rd`, head by `(rs rd)^2`, power by `(rs rd)^3`; NPSH required by rs^2.
 */
class ScaledCurve implements PumpCurve {
  readonly speed: RotationalSpeed;
  readonly impellerDiameter: Length | undefined;
  readonly ratedSpeed: RotationalSpeed;
  readonly ratedImpellerDiameter: Length | undefined;
  readonly flowRange: FlowRange;
  readonly shutoffHead: Length | undefined;
  readonly hasEfficiency: boolean;
  readonly npshRange: FlowRange | undefined;
  readonly bestEfficiencyPoint: BestEfficiencyPoint | undefined;
  readonly preferredRegion: FlowRange | undefined;
  readonly allowableRegion: FlowRange | undefined;
  readonly fits: PumpCurve['fits'];
  readonly catalogue: readonly CataloguePoint[];
  private readonly qs: number;
  private readonly hs: number;

  constructor(
    private readonly base: Base,
    private readonly rs: number,
    private readonly rd: number,
  ) {
    this.qs = rs * rd;
    this.hs = this.qs * this.qs;
    this.speed = (base.speed * rs) as RotationalSpeed;
    this.ratedSpeed = base.speed as RotationalSpeed;
    this.catalogue = base.points;
    this.ratedImpellerDiameter = base.diameter as Length | undefined;
    this.impellerDiameter =
      base.diameter === undefined ? undefined : ((base.diameter * rd) as Length);
    this.flowRange = { min: (base.xMin * this.qs) as Flow, max: (base.xMax * this.qs) as Flow };
    this.shutoffHead = base.xMin === 0 ? ((base.head.evaluate(0) * this.hs) as Length) : undefined;
    this.hasEfficiency = base.bep !== undefined;
    this.npshRange =
      base.npsh === undefined
        ? undefined
        : { min: (base.npsh.xMin * rs) as Flow, max: (base.npsh.xMax * rs) as Flow };
    const bep = base.bep;
    if (bep === undefined) {
      this.bestEfficiencyPoint = undefined;
      this.preferredRegion = undefined;
      this.allowableRegion = undefined;
    } else {
      const qb = bep.flow * this.qs;
      this.bestEfficiencyPoint = {
        flow: qb as Flow,
        head: (bep.head * this.hs) as Length,
        efficiency: bep.efficiency,
      };
      this.preferredRegion = {
        min: (base.preferred[0] * qb) as Flow,
        max: (base.preferred[1] * qb) as Flow,
      };
      const a = base.allowable ?? [0, 0];
      this.allowableRegion = { min: (a[0] * qb) as Flow, max: (a[1] * qb) as Flow };
    }
    this.fits = base.fits;
    // A speed or diameter so far from the catalogue's that the scaled curve leaves the range
    // of floating-point numbers (head r^2 overflowing, flows rounding to zero) is refused.
    const top = base.head.evaluate(base.xMin) * this.hs;
    if (!(this.hs > 0 && base.xMax * this.qs > 0)) {
      throw new HeadflowError(
        'OUT_OF_RANGE',
        `the speed or impeller ratio ${rs * rd} scales the catalogue curve to nothing.`,
        { parameter: 'speed', value: rs * rd, allowed: 'a ratio the curve can be scaled by' },
      );
    }
    guardResult('scaled head', top, 'OUT_OF_RANGE');
    guardResult('scaled flow', base.xMax * this.qs, 'OUT_OF_RANGE');
  }

  private x(flow: number): number {
    if (typeof flow !== 'number') guardNumber('flow', flow, 'm3/s');
    return inRange('catalogue', flow / this.qs, this.base.xMin, this.base.xMax, this.qs, 'm3/s');
  }

  head(flow: Flow): Length {
    return (this.base.head.evaluate(this.x(flow)) * this.hs) as Length;
  }

  efficiency(flow: Flow): number {
    const x = this.x(flow);
    return this.efficiencyAt(x);
  }

  private efficiencyAt(x: number): number {
    const { efficiency, power, powerDensity, head } = this.base;
    if (efficiency !== undefined) return efficiency.evaluate(x);
    if (power !== undefined) {
      return x === 0
        ? 0
        : (powerDensity * STANDARD_GRAVITY * x * head.evaluate(x)) / power.evaluate(x);
    }
    throw noData('efficiency');
  }

  npshRequired(flow: Flow): Length {
    const k = this.base.npsh;
    if (k === undefined) throw noData('NPSH required');
    if (typeof flow !== 'number') guardNumber('flow', flow, 'm3/s');
    const x = inRange('NPSH-required', flow / this.rs, k.xMin, k.xMax, this.rs, 'm3/s');
    return (k.evaluate(x) * this.rs * this.rs) as Length;
  }

  shaftPower(flow: Flow, density: Density, g: Acceleration = STANDARD_GRAVITY): Power {
    checkPositive('density', density, 'kg/m3');
    checkPositive('g', g, 'm/s2');
    const x = this.x(flow);
    const { efficiency, power, powerDensity, head, xMax } = this.base;
    const cube = this.qs * this.hs;
    if (power !== undefined) {
      return ((power.evaluate(x) * cube * density * g) /
        (powerDensity * STANDARD_GRAVITY)) as Power;
    }
    if (efficiency === undefined) throw noData('efficiency');
    let p0: number;
    if (x > 1e-9 * xMax) {
      p0 = (density * g * x * head.evaluate(x)) / efficiency.evaluate(x);
    } else {
      // Limit at zero flow: efficiency ~ eta'(0) x, so P -> rho g H(0) / eta'(0).
      p0 = (density * g * head.evaluate(x)) / efficiency.derivative(x);
    }
    return guardResult('shaftPower', p0 * cube, 'OUT_OF_RANGE') as Power;
  }

  shares(flow: Flow): readonly PumpShare[] {
    return [shareOf(this, flow)];
  }

  atSpeed(speed: RotationalSpeed): PumpCurve {
    checkPositive('speed', speed, 'rad/s');
    return new ScaledCurve(this.base, speed / this.base.speed, this.rd);
  }

  trimmedTo(impellerDiameter: Length): PumpCurve {
    checkPositive('impellerDiameter', impellerDiameter, 'm');
    const d0 = this.base.diameter;
    if (d0 === undefined) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'impellerDiameter',
        impellerDiameter,
        'm',
        'a curve built with its impellerDiameter',
        'Give pumpCurve({ impellerDiameter }) to trim.',
      );
    }
    if (impellerDiameter > d0 * (1 + 1e-12)) {
      throw argumentError(
        'OUT_OF_RANGE',
        'impellerDiameter',
        impellerDiameter,
        'm',
        `<= ${fmt(d0)} m (the catalogue impeller; trimming only removes material)`,
      );
    }
    return new ScaledCurve(this.base, this.rs, impellerDiameter / d0);
  }
}

function noData(what: string): HeadflowError {
  return new HeadflowError(
    'INVALID_ARGUMENT',
    `this pump has no ${what} data; give it in the catalogue points.`,
    { parameter: 'points' },
  );
}

/** The share of a single pump running alone at `flow`. @internal */
export function shareOf(pump: Pump, flow: Flow): PumpShare {
  const head = pump.head(flow);
  const bep = pump.bestEfficiencyPoint;
  if (bep === undefined) {
    return {
      flow,
      head,
      efficiency: undefined,
      percentOfBep: undefined,
      inPreferredRegion: undefined,
      inAllowableRegion: undefined,
    };
  }
  return {
    flow,
    head,
    efficiency: pump.efficiency(flow),
    percentOfBep: (100 * flow) / bep.flow,
    inPreferredRegion: within(flow, pump.preferredRegion),
    inAllowableRegion: within(flow, pump.allowableRegion),
  };
}

function within(flow: number, r: FlowRange | undefined): boolean | undefined {
  if (r === undefined) return undefined;
  const slack = 1e-12 * r.max;
  return flow >= r.min - slack && flow <= r.max + slack;
}

import { argumentError, checkFinite, checkPositive } from '../errors';
import { guardArray, guardBuffer, guardRecord, guardResult } from '../guards';
import { monotoneCubic } from '../numeric/index';
import type { Acceleration, Density, Flow, Length, Pressure } from '../units/index';
import { STANDARD_GRAVITY } from '../units/index';

/**
 * A piece of equipment whose loss is known by flow rather than by a K: a strainer, a heat
 * exchanger, a meter. Evaluating allocates nothing.
 *
 * Sign convention: the loss takes the sign of the flow, `dp(-Q) = -dp(Q)`, so that a reverse
 * flow meets a loss against it (a system solver can treat both directions alike). This
 * models a passive, symmetric resistance; a check valve that blocks reverse flow is not one.
 */
export interface FixedLoss {
  /** Pressure drop (Pa) at a volumetric flow (m^3/s), signed as the flow. */
  pressureDrop(flow: Flow): Pressure;
  /** Head loss (m of the fluid) at a flow: `dp / (rho g)`; g defaults to 9.80665 m/s^2. */
  headLoss(flow: Flow, density: Density, g?: Acceleration): Length;
  /** Fills `out[i]` with the pressure drop (Pa) at `flows[i]` (m^3/s); returns `out`. */
  pressureDropInto(flows: ArrayLike<number>, out: Float64Array): Float64Array;
}

/** A rated point: the pressure drop measured or specified at one flow. */
export interface RatedPoint {
  /** Pressure drop at the rated flow (Pa), finite and >= 0. */
  readonly pressureDrop: Pressure;
  /** The rated flow (m^3/s), finite and > 0. */
  readonly flow: Flow;
}

/** A {@link FixedLoss} scaled from one rated point. */
export interface RatedLoss extends FixedLoss {
  /** `dp_rated / Q_rated^2` (Pa s^2/m^6): `dp = coefficient Q |Q|`. */
  readonly coefficient: number;
}

function makeFixedLoss(drop: (flow: number) => number): FixedLoss {
  return {
    pressureDrop: (flow: Flow): Pressure => {
      checkFinite('flow', flow, 'm3/s');
      return guardResult('pressureDrop', drop(flow), 'OUT_OF_RANGE') as Pressure;
    },
    headLoss: (flow: Flow, density: Density, g: Acceleration = STANDARD_GRAVITY): Length => {
      checkFinite('flow', flow, 'm3/s');
      checkPositive('density', density, 'kg/m3');
      checkPositive('g', g, 'm/s2');
      return guardResult('headLoss', drop(flow) / (density * g), 'OUT_OF_RANGE') as Length;
    },
    pressureDropInto: (flows: ArrayLike<number>, out: Float64Array): Float64Array => {
      if (!(flows instanceof Float64Array)) guardArray('flows', flows);
      guardBuffer('out', out, 0);
      if (out.length !== flows.length) {
        throw argumentError('INVALID_ARGUMENT', 'out', out.length, 'elements', `${flows.length}`);
      }
      for (let i = 0; i < flows.length; i++) {
        const f = flows[i] as number;
        checkFinite(`flows[${i}]`, f, 'm3/s');
        out[i] = guardResult(`out[${i}]`, drop(f), 'OUT_OF_RANGE');
      }
      return out;
    },
  };
}

/**
 * Equipment given by its pressure drop at a rated flow, scaled with the square of the flow:
 * `dp(Q) = dp_r Q |Q| / Q_r^2`.
 *
 * The square law is the turbulent-flow law of every K-type loss; it does not hold where the
 * equipment's loss is laminar (for example fine filters at low flow). Use {@link curveLoss}
 * with the maker's curve where that matters. Reverse flow: see {@link FixedLoss}.
 *
 * Source: common practice (the turbulent loss law `dp ~ rho V^2`).
 *
 * @param rated - the rated pressure drop (Pa, >= 0) and flow (m^3/s, > 0)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite or out-of-range values.
 * @example
 * ```ts
 * const strainer = ratedLoss({ pressureDrop: q(0.2, 'bar'), flow: q(50, 'm3/h') });
 * to(strainer.pressureDrop(q(25, 'm3/h')), 'bar'); // 0.05
 * ```
 */
export function ratedLoss(rated: RatedPoint): RatedLoss {
  guardRecord('rated', rated);
  checkPositive('flow', rated.flow, 'm3/s');
  if (
    typeof rated.pressureDrop !== 'number' ||
    !(rated.pressureDrop >= 0 && Number.isFinite(rated.pressureDrop))
  ) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'pressureDrop',
      rated.pressureDrop,
      'Pa',
      'a finite number >= 0',
    );
  }
  const coefficient = guardResult(
    'coefficient',
    rated.pressureDrop / (rated.flow * rated.flow),
    'OUT_OF_RANGE',
  );
  return { ...makeFixedLoss((q) => coefficient * q * Math.abs(q)), coefficient };
}

/** A {@link FixedLoss} through the points of a user curve. */
export interface CurveLoss extends FixedLoss {
  /** Largest flow of the curve (m^3/s); beyond it the loss is extrapolated (see curveLoss). */
  readonly lastFlow: Flow;
  /** True when `|flow|` lies within the curve's points (no extrapolation); false for NaN. */
  covers(flow: Flow): boolean;
}

/**
 * Equipment given by a curve of (flow, pressure drop) points, interpolated with the monotone
 * piecewise cubic of Steffen (1990) (see `monotoneCubic` in src/numeric).
 *
 * Rules:
 * - flows are >= 0 and strictly increasing; pressure drops are >= 0 and do not decrease
 *   (a passive loss never falls as flow rises);
 * - the curve passes through (0, 0): when the first flow is 0 its drop must be 0, otherwise
 *   the point (0, 0) is added in front;
 * - beyond the last point the loss is extrapolated by the square law from the last point,
 *   `dp = dp_n (Q / Q_n)^2` (chosen over throwing so that a system solver can bracket flows
 *   past the curve); {@link CurveLoss.covers} tells the caller when that happened, so that
 *   it can report it;
 * - reverse flow: `dp(-Q) = -dp(Q)`, see {@link FixedLoss}.
 *
 * Source: M. Steffen, "A simple method for monotonic interpolation in one dimension",
 * Astronomy and Astrophysics 239 (1990) 443-450; square-law extrapolation: common practice.
 *
 * @param points - at least 2 points `{ flow, pressureDrop }` (m^3/s, Pa)
 * @throws HeadflowError `INVALID_ARGUMENT` for fewer than 2 points, NaN, negative values,
 *   flows that do not increase, drops that decrease, or a non-zero drop at zero flow.
 * @example
 * ```ts
 * const exchanger = curveLoss([
 *   { flow: q(10, 'm3/h'), pressureDrop: q(4, 'kPa') },
 *   { flow: q(20, 'm3/h'), pressureDrop: q(15, 'kPa') },
 *   { flow: q(30, 'm3/h'), pressureDrop: q(33, 'kPa') },
 * ]);
 * to(exchanger.pressureDrop(q(20, 'm3/h')), 'kPa'); // 15
 * to(exchanger.pressureDrop(q(60, 'm3/h')), 'kPa'); // 33 x 4 = 132 (extrapolated)
 * ```
 */
export function curveLoss(points: readonly RatedPoint[]): CurveLoss {
  if (!Array.isArray(points) || points.length < 2) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'points',
      Array.isArray(points) ? points.length : points,
      'points',
      'at least 2 points',
    );
  }
  guardArray('points', points, { max: 10_000 });
  const xs: number[] = [];
  const ys: number[] = [];
  points.forEach((point, i) => {
    const p = guardRecord(`points[${i}]`, point);
    const x = p['flow'];
    const y = p['pressureDrop'];
    if (typeof x !== 'number' || !(x >= 0 && Number.isFinite(x))) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].flow`,
        x,
        'm3/s',
        'a finite number >= 0',
      );
    }
    if (typeof y !== 'number' || !(y >= 0 && Number.isFinite(y))) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].pressureDrop`,
        y,
        'Pa',
        'a finite number >= 0',
      );
    }
    const px = xs[xs.length - 1];
    const py = ys[ys.length - 1];
    if (px !== undefined && !(x > px)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].flow`,
        x,
        'm3/s',
        `> ${String(px)} m3/s (flows strictly increasing)`,
      );
    }
    if (py !== undefined && y < py) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].pressureDrop`,
        y,
        'Pa',
        `>= ${String(py)} Pa (a loss does not fall as flow rises)`,
      );
    }
    if (x === 0 && y !== 0) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `points[${i}].pressureDrop`,
        y,
        'Pa',
        '0 at zero flow (a passive loss)',
      );
    }
    xs.push(x);
    ys.push(y);
  });
  if ((xs[0] as number) > 0) {
    xs.unshift(0);
    ys.unshift(0);
  }
  const cubic = monotoneCubic(xs, ys);
  const lastFlow = xs[xs.length - 1] as number;
  const lastDrop = ys[ys.length - 1] as number;
  const scale = guardResult(
    'pressureDrop / flow^2',
    lastDrop / (lastFlow * lastFlow),
    'OUT_OF_RANGE',
  );
  const drop = (flow: number): number => {
    const a = Math.abs(flow);
    const dp = a <= lastFlow ? cubic.evaluate(a) : scale * a * a;
    return flow < 0 ? -dp : dp;
  };
  return {
    ...makeFixedLoss(drop),
    lastFlow: lastFlow as Flow,
    covers: (flow: Flow): boolean => Math.abs(flow) <= lastFlow,
  };
}

/**
 * Shapes shared by the pumps module: the system curve it solves against, the common face of
 * single pumps and combinations, and the pieces of a catalogue curve.
 *
 * @module
 */
import type { Acceleration, Density, Flow, Length, Power, RotationalSpeed } from '../units/index';

/**
 * What the pumps module needs of a system curve. The system module's curves satisfy it; any
 * object with these two members will do (a closed form `H = Hs + k Q^2` in a test).
 */
export interface SystemCurveLike {
  /** Head the system needs at a flow (>= 0), m; non-decreasing in flow. */
  head(flow: Flow): Length;
  /** Head at zero flow (static head incl. pressure difference), m; may be negative. */
  readonly staticHead: Length;
}

/** A closed flow interval [min, max] (m3/s). */
export interface FlowRange {
  readonly min: Flow;
  readonly max: Flow;
}

/** The best efficiency point of a pump at its speed and impeller diameter. */
export interface BestEfficiencyPoint {
  readonly flow: Flow;
  readonly head: Length;
  /** Pump efficiency there, a fraction in (0, 1]. */
  readonly efficiency: number;
}

/** One pump's part of a combined duty (a single pump has one share). */
export interface PumpShare {
  readonly flow: Flow;
  readonly head: Length;
  /** Efficiency at this share, or undefined when the pump has no efficiency data. */
  readonly efficiency: number | undefined;
  /** Flow as a percentage of this pump's BEP flow, or undefined without efficiency data. */
  readonly percentOfBep: number | undefined;
  /** Inside the pump's preferred operating region (undefined without efficiency data). */
  readonly inPreferredRegion: boolean | undefined;
  /** Inside the pump's allowable operating region (undefined without efficiency data). */
  readonly inAllowableRegion: boolean | undefined;
}

/**
 * The face every pump offers to {@link operatingPoint}: a single catalogue curve, a curve
 * scaled by the affinity laws, or pumps combined in parallel or series.
 *
 * Every flow-dependent method throws `OUT_OF_RANGE` outside {@link Pump.flowRange} (no silent
 * extrapolation past the catalogue).
 */
export interface Pump {
  /** The flows the data cover. */
  readonly flowRange: FlowRange;
  /** Head at zero flow, or undefined when the data start above zero flow. */
  readonly shutoffHead: Length | undefined;
  /** True when efficiency (or shaft power) data exist. */
  readonly hasEfficiency: boolean;
  /** The flows the NPSH-required data cover, or undefined when there are none. */
  readonly npshRange: FlowRange | undefined;
  /** Best efficiency point, or undefined without efficiency data. */
  readonly bestEfficiencyPoint: BestEfficiencyPoint | undefined;
  /** Preferred operating region (flows), or undefined where it does not apply. */
  readonly preferredRegion: FlowRange | undefined;
  /** Allowable operating region (flows), or undefined where it does not apply. */
  readonly allowableRegion: FlowRange | undefined;
  /** Pump head at a flow (m). */
  head(flow: Flow): Length;
  /** Pump efficiency at a flow, a fraction in [0, 1]. */
  efficiency(flow: Flow): number;
  /** NPSH required at a flow (m). */
  npshRequired(flow: Flow): Length;
  /** Shaft (brake) power at a flow for a liquid of `density` (W). */
  shaftPower(flow: Flow, density: Density, g?: Acceleration): Power;
  /** Each pump's flow and head when the whole delivers `flow`. */
  shares(flow: Flow): readonly PumpShare[];
}

/** How a catalogue curve is fitted through its points. */
export type CurveFit =
  /** Least-squares polynomial of this degree (residuals reported). */
  | { readonly method: 'polynomial'; readonly degree: number }
  /** Monotone piecewise cubic through every point (Steffen 1990); no overshoot. */
  | { readonly method: 'monotone' };

/** Fit of each catalogue curve; any left out takes its default. */
export interface PumpCurveFits {
  /** Head-flow curve. Default `{ method: 'monotone' }` (through every point). */
  readonly head?: CurveFit;
  /**
   * Efficiency curve. A polynomial is fitted through the origin (efficiency is 0 at zero
   * flow). Default: the catalogue-faithful rule of `pumpCurve` (a least-squares polynomial
   * through the origin of degree 3 or more that passes within
   * the catalogue tolerance (`CATALOGUE_FIT_TOLERANCE`) of every point and keeps one hump, else the monotone
   * cubic through every point).
   */
  readonly efficiency?: CurveFit;
  /** NPSH-required curve. Default `{ method: 'monotone' }`. */
  readonly npshRequired?: CurveFit;
  /** Shaft-power curve (when power is given instead of efficiency). Default monotone. */
  readonly shaftPower?: CurveFit;
}

/** How well one fitted curve matches its catalogue points. */
export interface FitReport {
  readonly method: 'polynomial' | 'monotone';
  /** Polynomial degree, or undefined for the monotone cubic. */
  readonly degree: number | undefined;
  /** `'given'` when the caller named the fit, `'default'` when the default rule chose it. */
  readonly selection: 'default' | 'given';
  /** Number of points fitted. */
  readonly points: number;
  /** RMS of the residuals, in SI units of the curve (m, fraction, W). 0 for the monotone cubic. */
  readonly rms: number;
  /**
   * Largest |residual| (catalogue value minus fitted value), in SI units of the curve (m of
   * head, efficiency as a fraction, W). 0 for the monotone cubic.
   */
  readonly maxResidual: number;
  /** Largest |residual| / |catalogue value| over the points whose value is not 0 (a fraction). */
  readonly maxRelativeResidual: number;
  /**
   * For head and efficiency: true when the fit passes within the catalogue tolerance (`CATALOGUE_FIT_TOLERANCE`)
   * of every catalogue point (head within 0.5 % of each point's head, efficiency within 0.5
   * percentage point). Undefined for NPSH required and shaft power.
   */
  readonly withinTolerance: boolean | undefined;
  /** Coefficient of determination. 1 for the monotone cubic. */
  readonly rSquared: number;
}

/** One catalogue point. */
export interface CataloguePoint {
  /** Flow, >= 0, strictly increasing along the list. */
  readonly flow: Flow;
  /** Head, > 0, non-increasing along the list. */
  readonly head: Length;
  /** Pump efficiency, a fraction in (0, 1] (0 allowed only at zero flow). */
  readonly efficiency?: number;
  /** NPSH required (NPSH3), > 0. May be given on some points only. */
  readonly npshRequired?: Length;
  /** Shaft power, >= 0, for a liquid of `catalogueDensity` (give this or efficiency). */
  readonly shaftPower?: Power;
}

/** A pump curve from catalogue points, with the affinity laws. */
export interface PumpCurve extends Pump {
  /** Speed the curve holds at (rad/s). */
  readonly speed: RotationalSpeed;
  /** Impeller diameter the curve holds at, when given. */
  readonly impellerDiameter: Length | undefined;
  /** Speed of the catalogue data (rad/s). */
  readonly ratedSpeed: RotationalSpeed;
  /** Impeller diameter of the catalogue data, when given. */
  readonly ratedImpellerDiameter: Length | undefined;
  /** The catalogue points the curve was built from (at `ratedSpeed`), when it keeps them. */
  readonly catalogue?: readonly CataloguePoint[];
  /** How each curve fits the catalogue points (at the catalogue's speed and diameter). */
  readonly fits: {
    readonly head: FitReport;
    readonly efficiency: FitReport | undefined;
    readonly npshRequired: FitReport | undefined;
    readonly shaftPower: FitReport | undefined;
  };
  /** The same pump at another speed (affinity laws; see `pumpCurve`). */
  atSpeed(speed: RotationalSpeed): PumpCurve;
  /** The same pump with a trimmed impeller (affinity laws; see `pumpCurve`). */
  trimmedTo(impellerDiameter: Length): PumpCurve;
}

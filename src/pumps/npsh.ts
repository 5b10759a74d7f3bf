import { argumentError, checkFinite, checkNonNegative, checkPositive } from '../errors';
import { guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Density,
  type Length,
  type Pressure,
  STANDARD_GRAVITY,
} from '../units/index';

/** Input of {@link npshAvailable}. */
export interface NpshAvailableInput {
  /** Absolute pressure on the liquid surface of the suction source (Pa, absolute). */
  readonly surfacePressure: Pressure;
  /** Vapour pressure of the liquid at the pumping temperature (Pa, absolute). */
  readonly vaporPressure: Pressure;
  /** Liquid density (kg/m^3). */
  readonly density: Density;
  /**
   * Height of the liquid surface above the impeller eye datum (m); negative for a suction
   * lift (surface below the pump).
   */
  readonly staticHeadAboveImpeller: Length;
  /** Head lost in the suction line at the flow considered (m), >= 0. */
  readonly suctionLoss: Length;
  /** Gravity (m/s^2); default 9.80665. */
  readonly g?: Acceleration;
}

/**
 * Net positive suction head available at the pump:
 * `NPSHa = (p_s - p_v) / (rho g) + z_s - h_L,s`, with absolute pressures, the static height
 * `z_s` of the source's liquid surface above the impeller datum (negative for a suction lift)
 * and the suction-line loss `h_L,s`. The velocity head in the suction tank is taken as zero
 * (a large tank). The result may be negative, meaning the liquid flashes before the pump.
 *
 * Source: ANSI/HI 9.6.1-2012, "Rotodynamic Pumps - Guideline for NPSH Margin", definition of
 * NPSHA (from memory of the standard; the same balance appears in every pump text).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a surface pressure <= 0, a negative vapour
 *   pressure or suction loss, a non-finite static head, or a bad density or g.
 * @example
 * ```ts
 * // Open tank at sea level, water at 20 degC (p_v 2.339 kPa), 3 m suction lift, 1.2 m loss
 * to(npshAvailable({ surfacePressure: q(101.325, 'kPa'), vaporPressure: q(2.339, 'kPa'),
 *   density: q(998.2, 'kg/m3'), staticHeadAboveImpeller: q(-3, 'm'), suctionLoss: q(1.2, 'm') }), 'm');
 * // 5.912 m
 * ```
 */
export function npshAvailable(input: NpshAvailableInput): Length {
  guardRecord('input', input);
  const g = input.g ?? STANDARD_GRAVITY;
  checkPositive('surfacePressure', input.surfacePressure, 'Pa');
  checkNonNegative('vaporPressure', input.vaporPressure, 'Pa');
  checkPositive('density', input.density, 'kg/m3');
  checkFinite('staticHeadAboveImpeller', input.staticHeadAboveImpeller, 'm');
  checkNonNegative('suctionLoss', input.suctionLoss, 'm');
  checkPositive('g', g, 'm/s2');
  return guardResult(
    'npshAvailable',
    (input.surfacePressure - input.vaporPressure) / (input.density * g) +
      input.staticHeadAboveImpeller -
      input.suctionLoss,
    'OUT_OF_RANGE',
  ) as Length;
}

/** Input of {@link npshMargin}. */
export interface NpshMarginInput {
  readonly available: Length;
  /** NPSH required (NPSH3) at the same flow and speed, > 0. */
  readonly required: Length;
  /** Smallest acceptable NPSHa / NPSHr; default 1.1. See the guidance in {@link npshMargin}. */
  readonly marginRatio?: number;
  /** Smallest acceptable NPSHa - NPSHr (m); default 0. Both rules apply ("whichever is greater"). */
  readonly minimumMargin?: Length;
}

/** Result of {@link npshMargin}. */
export interface NpshMarginResult {
  /** NPSHa / NPSHr. */
  readonly ratio: number;
  /** NPSHa - NPSHr (m). */
  readonly margin: Length;
  /** The NPSHa the rules ask for: max(ratio x NPSHr, NPSHr + minimum margin) (m). */
  readonly requiredAvailable: Length;
  /** True when NPSHa meets `requiredAvailable`. */
  readonly ok: boolean;
}

/**
 * Checks NPSH available against NPSH required with a margin ratio (and optionally a minimum
 * margin in metres) that the caller sets for the application.
 *
 * NPSH required as published is NPSH3, the suction head at which the first-stage head has
 * already dropped 3 %: the pump is cavitating there. A margin above it is needed for
 * reliable service. ANSI/HI 9.6.1 ("Rotodynamic Pumps - Guideline for NPSH Margin") gives
 * margin ratios by application and suction energy. As summarized in a secondary source seen
 * while writing this (the standard itself was not in hand, so treat these as orientation):
 * petroleum process pumps 1.1 or 1 m, whichever is greater; chemical process pumps 1.1 or
 * 0.6 m inside the allowable region (1.2 or 1 m outside the preferred region at high suction
 * specific speed); power plant, water/wastewater and pulp-and-paper pumps 1.1 or 0.6 m below
 * S = 7 500 (US units), 1.2 or 1 m above; building services pumps above 1.0 throughout the
 * allowable region below S = 7 500, 1.1 or 0.6 m above. The 1998 edition's table gave ranges
 * of about 1.1-1.3 for most services and 1.5-2.5 for high-suction-energy power plant pumps
 * (from memory). Use the edition your project names, and the manufacturer's advice.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for non-finite input, a required NPSH <= 0, a
 *   ratio below 1 or a negative minimum margin.
 * @example
 * ```ts
 * npshMargin({ available: q(5.9, 'm'), required: q(4.5, 'm'), marginRatio: 1.2, minimumMargin: q(1, 'm') });
 * // { ratio: 1.311, margin: 1.4, requiredAvailable: 5.5, ok: true }
 * ```
 */
export function npshMargin(input: NpshMarginInput): NpshMarginResult {
  guardRecord('input', input);
  checkFinite('available', input.available, 'm');
  checkPositive('required', input.required, 'm');
  const ratioRule = input.marginRatio ?? 1.1;
  if (typeof ratioRule !== 'number' || !Number.isFinite(ratioRule) || ratioRule < 1) {
    throw argumentError('INVALID_ARGUMENT', 'marginRatio', ratioRule, undefined, 'a ratio >= 1');
  }
  const minimum = input.minimumMargin ?? (0 as Length);
  checkNonNegative('minimumMargin', minimum, 'm');
  const requiredAvailable = Math.max(ratioRule * input.required, input.required + minimum);
  return {
    ratio: guardResult('ratio', input.available / input.required, 'OUT_OF_RANGE'),
    margin: (input.available - input.required) as Length,
    requiredAvailable: guardResult(
      'requiredAvailable',
      requiredAvailable,
      'OUT_OF_RANGE',
    ) as Length,
    ok: input.available >= requiredAvailable,
  };
}

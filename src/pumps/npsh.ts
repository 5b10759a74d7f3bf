import { argumentError, checkFinite, checkNonNegative, checkPositive } from '../errors';
import { guardNumber, guardRange, guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Density,
  type Length,
  type Pressure,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';

/** NPSH available from the suction source: a liquid surface, or a point in the suction line. */
export interface NpshAvailableInput {
  /**
   * Absolute pressure at the suction end (Pa, absolute): on the liquid surface of the source
   * tank, or the static pressure at a point in the suction line.
   */
  readonly surfacePressure: Pressure;
  /** Vapour pressure of the liquid at the pumping temperature (Pa, absolute). */
  readonly vaporPressure: Pressure;
  /** Liquid density (kg/m^3). */
  readonly density: Density;
  /**
   * Height of the liquid surface (or of the point) above the impeller eye datum (m); negative
   * for a suction lift (surface below the pump).
   */
  readonly staticHeadAboveImpeller: Length;
  /** Head lost between the suction end and the pump at the flow considered (m), >= 0. */
  readonly suctionLoss: Length;
  /**
   * Mean velocity at the suction end (m/s), >= 0. Default 0: the still surface of a large
   * tank. When the suction end is a point in a pipe, its velocity head `V^2 / (2 g)` is part
   * of the energy that reaches the pump.
   */
  readonly suctionVelocity?: Velocity;
  /** Gravity (m/s^2); default 9.80665. */
  readonly g?: Acceleration;
}

/**
 * NPSH available from a suction gauge reading near the pump's suction flange: the way field
 * tests measure it.
 */
export interface NpshFromGaugeInput {
  /** The gauge's reading (Pa, gauge: relative to the atmosphere; negative for a vacuum). */
  readonly gaugePressure: Pressure;
  /** Atmospheric pressure at the site (Pa, absolute); default 101 325 Pa. */
  readonly atmosphericPressure?: Pressure;
  /**
   * Height of the gauge above the impeller eye datum (m): the shaft centre line of a
   * horizontal pump; negative when the gauge is below it.
   */
  readonly gaugeHeightAboveImpeller: Length;
  /** Mean velocity in the pipe at the gauge (m/s), >= 0: flow / bore area there. */
  readonly suctionVelocity: Velocity;
  /** Vapour pressure of the liquid at the pumping temperature (Pa, absolute). */
  readonly vaporPressure: Pressure;
  /** Liquid density (kg/m^3). */
  readonly density: Density;
  /** Gravity (m/s^2); default 9.80665. */
  readonly g?: Acceleration;
}

/**
 * Net positive suction head available at the pump: the absolute energy head of the liquid at
 * the impeller eye datum above its vapour pressure head.
 *
 * From the suction source (a tank surface or a point in the suction line):
 * `NPSHa = (p_s - p_v) / (rho g) + V_s^2 / (2 g) + z_s - h_L,s`, with the absolute pressure
 * `p_s` at the suction end, its velocity `V_s` (0 for a large tank's surface), its height
 * `z_s` above the datum (negative for a suction lift) and the loss `h_L,s` between it and the
 * pump.
 *
 * From a suction gauge reading `p_g` (gauge) at height `z_g` above the datum, where the pipe
 * velocity is `V`, with atmospheric pressure `p_atm`:
 * `NPSHa = (p_g + p_atm - p_v) / (rho g) + z_g + V^2 / (2 g)`.
 *
 * Both are the definition of NPSH as the total inlet head plus the atmospheric head less the
 * vapour-pressure head, referred to the datum (ISO 9906:2012, section 3, and ANSI/HI 14.6,
 * definition of NPSHA; from memory of the standards). The gauge form is the one field tests
 * use: it is printed, with its gauge-elevation correction and velocity head, in a worked
 * example ("Best practice no. 25", Example 4) checked in
 * tests/reference/npsha-gauge-example.test.ts. The result may be negative, meaning the
 * liquid flashes before the pump.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a missing or non-finite field, a surface
 *   pressure <= 0, a gauge reading at or below a perfect vacuum, a negative vapour pressure,
 *   suction loss or velocity, a density or g <= 0, or both a surface pressure and a gauge
 *   reading.
 * @example
 * ```ts
 * // Open tank at sea level, water at 20 degC (p_v 2.339 kPa), 3 m suction lift, 1.2 m loss
 * to(npshAvailable({ surfacePressure: q(101.325, 'kPa'), vaporPressure: q(2.339, 'kPa'),
 *   density: q(998.2, 'kg/m3'), staticHeadAboveImpeller: q(-3, 'm'), suctionLoss: q(1.2, 'm') }), 'm');
 * // 5.912 m
 * // A suction gauge 1 ft above the shaft reads 2.4 psi, 10 ft/s in the pipe, 68 degF water
 * to(npshAvailable({ gaugePressure: q(2.4, 'psi'), gaugeHeightAboveImpeller: q(1, 'ft'),
 *   suctionVelocity: q(10, 'ft/s'), vaporPressure: q(0.339, 'psi'), density: q(998.2, 'kg/m3') }), 'ft');
 * // 41.28 ft (the worked example prints 41.27 with 1 psi = 2.31 ft and 14.7 psi)
 * ```
 */
export function npshAvailable(input: NpshAvailableInput | NpshFromGaugeInput): Length {
  const r = guardRecord('input', input);
  const g =
    r['g'] === undefined
      ? STANDARD_GRAVITY
      : guardRange('g', r['g'], { min: 0, minOpen: true, unit: 'm/s2' });
  const vaporPressure = guardRange('vaporPressure', r['vaporPressure'], { min: 0, unit: 'Pa' });
  const density = guardRange('density', r['density'], { min: 0, minOpen: true, unit: 'kg/m3' });
  const rhoG = density * g;
  if (r['gaugePressure'] !== undefined) {
    if (r['surfacePressure'] !== undefined) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'surfacePressure',
        r['surfacePressure'],
        'Pa',
        'one of surfacePressure (at the suction source) or gaugePressure (at the pump), not both',
      );
    }
    const atmosphere =
      r['atmosphericPressure'] === undefined
        ? STANDARD_ATMOSPHERE
        : guardRange('atmosphericPressure', r['atmosphericPressure'], {
            min: 0,
            minOpen: true,
            unit: 'Pa',
          });
    const gauge = guardRange('gaugePressure', r['gaugePressure'], {
      min: -atmosphere,
      minOpen: true,
      unit: 'Pa',
    });
    const z = guardNumber('gaugeHeightAboveImpeller', r['gaugeHeightAboveImpeller'], 'm');
    const v = guardRange('suctionVelocity', r['suctionVelocity'], { min: 0, unit: 'm/s' });
    return guardResult(
      'NPSH available',
      (gauge + atmosphere - vaporPressure) / rhoG + z + (v * v) / (2 * g),
      'OUT_OF_RANGE',
    ) as Length;
  }
  const surface = guardRange('surfacePressure', r['surfacePressure'], {
    min: 0,
    minOpen: true,
    unit: 'Pa',
  });
  const z = guardNumber('staticHeadAboveImpeller', r['staticHeadAboveImpeller'], 'm');
  const loss = guardRange('suctionLoss', r['suctionLoss'], { min: 0, unit: 'm' });
  const v =
    r['suctionVelocity'] === undefined
      ? 0
      : guardRange('suctionVelocity', r['suctionVelocity'], { min: 0, unit: 'm/s' });
  return guardResult(
    'NPSH available',
    (surface - vaporPressure) / rhoG + (v * v) / (2 * g) + z - loss,
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

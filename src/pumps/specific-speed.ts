import { checkPositive } from '../errors';
import { guardOneOf, guardResult } from '../guards';
import { type Flow, type Length, type RotationalSpeed, UNITS } from '../units/index';

/** Unit system of a specific speed: SI (rpm, m3/s, m) or US customary (rpm, gal/min, ft). */
export type SpecificSpeedUnits = 'si' | 'us';

const RPM = (2 * Math.PI) / 60; // rad/s per rpm
const GPM = UNITS['gal/min'].factor; // m3/s per US gal/min, exact (NIST SP 811)
const FOOT = UNITS.ft.factor; // m, exact

/**
 * Ratio of the US customary to the SI form of specific speed (and of suction specific
 * speed): `N_s,US / N_s,SI = (1 / 6.309 019 64e-5)^0.5 x 0.3048^0.75 = 51.645` (both forms
 * in rpm; US gallon = 231 in^3 and foot = 0.3048 m exactly).
 */
export const SPECIFIC_SPEED_US_PER_SI: number = (1 / GPM) ** 0.5 * FOOT ** 0.75;

function check(units: SpecificSpeedUnits): void {
  guardOneOf('units', units, ['si', 'us'] as const);
}

/**
 * Specific speed `N_s = N Q^0.5 / H^0.75` at the best efficiency point, with N in rpm, Q the
 * flow of the whole pump and H the head per stage; in SI form (Q in m3/s,
 * H in m) or US customary form (Q in gal/min, H in ft). The US value is
 * {@link SPECIFIC_SPEED_US_PER_SI} (51.645) times the SI value.
 *
 * Usual ranges (US units, common practice): radial-flow impellers about 500-4 000, mixed flow
 * about 4 000-9 000, axial flow above about 9 000; efficiency peaks around 2 000-3 000.
 *
 * Source: the definition is standard (ANSI/HI 1.1-1.2, "Rotodynamic Centrifugal Pumps for
 * Nomenclature and Definitions", specific speed; from memory of the standard).
 *
 * @param speed - rotational speed (rad/s; make it with `q(1750, 'rpm')`), > 0
 * @param flow - flow at BEP (use the total flow even for a double-suction impeller), > 0
 * @param headPerStage - head per stage at BEP, > 0
 * @param units - 'si' or 'us' (default 'us')
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive input or unknown units.
 * @example
 * ```ts
 * specificSpeed(q(1750, 'rpm'), q(1000, 'gal/min'), q(100, 'ft')); // 1750 x 31.623 / 31.623 = 1750
 * ```
 */
export function specificSpeed(
  speed: RotationalSpeed,
  flow: Flow,
  headPerStage: Length,
  units: SpecificSpeedUnits = 'us',
): number {
  checkPositive('speed', speed, 'rad/s');
  checkPositive('flow', flow, 'm3/s');
  checkPositive('headPerStage', headPerStage, 'm');
  check(units);
  return speedNumber(speed, flow, headPerStage, units);
}

/**
 * Suction specific speed `S = N Q^0.5 / NPSHr^0.75` at the best efficiency point, with Q the
 * flow per impeller eye (half the pump flow for a double-suction impeller) and NPSHr the NPSH
 * required (NPSH3) of the first stage at BEP; SI (rpm, m3/s, m) or US (rpm, gal/min, ft)
 * form, related by {@link SPECIFIC_SPEED_US_PER_SI}.
 *
 * Usual limits: S below about 8 500 (US units; about 165 SI) is common practice for a wide
 * stable operating range; values above about 11 000 (US) narrow the range in which the pump
 * runs free of suction recirculation. ANSI/HI 9.6.1 uses 7 500 and 11 000 (US) as the
 * thresholds of its suction-energy classes (as summarized in a secondary source; the standard
 * was not in hand).
 *
 * @param speed - rotational speed (rad/s), > 0
 * @param flowPerEye - flow per impeller eye at BEP, > 0
 * @param npshRequired - NPSH required at BEP, > 0
 * @param units - 'si' or 'us' (default 'us')
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive input or unknown units.
 * @example
 * ```ts
 * suctionSpecificSpeed(q(3560, 'rpm'), q(500, 'gal/min'), q(20, 'ft')); // 8417.1
 * ```
 */
export function suctionSpecificSpeed(
  speed: RotationalSpeed,
  flowPerEye: Flow,
  npshRequired: Length,
  units: SpecificSpeedUnits = 'us',
): number {
  checkPositive('speed', speed, 'rad/s');
  checkPositive('flowPerEye', flowPerEye, 'm3/s');
  checkPositive('npshRequired', npshRequired, 'm');
  check(units);
  return speedNumber(speed, flowPerEye, npshRequired, units);
}

/** `N Q^0.5 / H^0.75` with N in rpm and Q, H in SI (m3/s, m) or US (gal/min, ft) units. */
function speedNumber(speed: number, flow: number, head: number, units: SpecificSpeedUnits): number {
  const n = speed / RPM;
  const value =
    units === 'si'
      ? (n * Math.sqrt(flow)) / head ** 0.75
      : (n * Math.sqrt(flow / GPM)) / (head / FOOT) ** 0.75;
  return guardResult('specific speed', value, 'OUT_OF_RANGE');
}

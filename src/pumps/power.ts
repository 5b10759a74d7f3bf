import { checkFraction, checkNonNegative, checkPositive } from '../errors';
import { guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Length,
  type Power,
  STANDARD_GRAVITY,
} from '../units/index';

/**
 * Hydraulic (water) power given to the liquid: `P_h = rho g Q H`.
 *
 * In US customary practice the same is written `WHP = Q H SG / 3960` with Q in gal/min, H in
 * ft and SG the specific gravity (3960 = 33 000 ft lbf/min per hp / 8.33 lb/gal, rounded;
 * common practice). This function uses the exact SI form. With SG referred to 1000 kg/m3 the
 * exact constant is 3954.27, 0.14 % below 3960; the 3960 rule is exact for SG referred to
 * water of 998.55 kg/m3.
 *
 * @param flow - volumetric flow (m3/s), >= 0
 * @param head - pump head (m of the liquid), >= 0
 * @param density - liquid density (kg/m3), > 0
 * @param g - gravity (m/s^2), default 9.80665
 * @throws HeadflowError `INVALID_ARGUMENT` for negative or non-finite input.
 * @example
 * ```ts
 * to(hydraulicPower(q(100, 'm3/h'), q(30, 'm'), q(1000, 'kg/m3')), 'kW'); // 8.17221
 * ```
 */
export function hydraulicPower(
  flow: Flow,
  head: Length,
  density: Density,
  g: Acceleration = STANDARD_GRAVITY,
): Power {
  checkNonNegative('flow', flow, 'm3/s');
  checkNonNegative('head', head, 'm');
  checkPositive('density', density, 'kg/m3');
  checkPositive('g', g, 'm/s2');
  return guardResult('hydraulicPower', density * g * flow * head, 'OUT_OF_RANGE') as Power;
}

/** Input of {@link powerChain}. */
export interface PowerChainInput {
  readonly flow: Flow;
  readonly head: Length;
  readonly density: Density;
  /** Pump efficiency, a fraction in (0, 1]. */
  readonly pumpEfficiency: number;
  /** Motor efficiency at this load, (0, 1]; default 1 (no motor loss counted). */
  readonly motorEfficiency?: number;
  /** Drive (VFD) efficiency at this load, (0, 1]; default 1 (no drive). */
  readonly driveEfficiency?: number;
  readonly g?: Acceleration;
}

/** The power at each step from the wire to the water. */
export interface PowerChain {
  /** rho g Q H (W). */
  readonly hydraulic: Power;
  /** Pump shaft (brake) power = hydraulic / pump efficiency (W). */
  readonly shaft: Power;
  /** Motor electrical input = shaft / motor efficiency (W). */
  readonly motorInput: Power;
  /** Drive input from the supply = motor input / drive efficiency (W). */
  readonly driveInput: Power;
  /** Wire-to-water efficiency = hydraulic / drive input = product of the three. */
  readonly wireToWater: number;
}

/**
 * Power from the supply to the liquid: hydraulic power, shaft power from the pump efficiency,
 * motor input from the motor efficiency, drive input from the drive efficiency, and the
 * wire-to-water efficiency (their product). Definitions: common practice (e.g. ANSI/HI 40.6
 * and the US DOE pumping-system guides use the same chain; from memory).
 *
 * Efficiencies are taken at the load considered; published part-load derating of motors and
 * drives is not modelled here.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for negative input or an efficiency outside (0, 1].
 * @example
 * ```ts
 * const c = powerChain({ flow: q(100, 'm3/h'), head: q(30, 'm'), density: q(1000, 'kg/m3'),
 *   pumpEfficiency: 0.75, motorEfficiency: 0.92, driveEfficiency: 0.97 });
 * to(c.shaft, 'kW'); // 10.8963
 * c.wireToWater; // 0.6693
 * ```
 */
export function powerChain(input: PowerChainInput): PowerChain {
  guardRecord('input', input);
  const hydraulic = hydraulicPower(input.flow, input.head, input.density, input.g);
  checkFraction('pumpEfficiency', input.pumpEfficiency);
  const motor = input.motorEfficiency ?? 1;
  const drive = input.driveEfficiency ?? 1;
  checkFraction('motorEfficiency', motor);
  checkFraction('driveEfficiency', drive);
  const shaft = hydraulic / input.pumpEfficiency;
  const motorInput = shaft / motor;
  // An efficiency of 1e-300 is in (0, 1] but leaves the floating-point range here.
  const driveInput = guardResult('driveInput', motorInput / drive, 'OUT_OF_RANGE');
  return {
    hydraulic,
    shaft: shaft as Power,
    motorInput: motorInput as Power,
    driveInput: driveInput as Power,
    wireToWater: input.pumpEfficiency * motor * drive,
  };
}

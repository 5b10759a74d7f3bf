import { checkFinite, checkNonNegative, checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Acceleration, Density, Length, Pressure, Velocity } from '../units/index';
import { STANDARD_GRAVITY } from '../units/index';

/**
 * Head loss of a straight pipe by Darcy-Weisbach: `h = f (L/D) V^2 / (2 g)`.
 *
 * Exact for any regime once f is known (take f from the `frictionFactor` function). The head is a
 * height of the flowing fluid's column.
 *
 * Source: the Darcy-Weisbach equation (H. Darcy 1857, J. Weisbach 1845), as given in any
 * fluid-mechanics text (for example F. M. White, "Fluid Mechanics", eq. 6.10).
 *
 * @param frictionFactor - Darcy friction factor f (dimensionless), finite and > 0
 * @param length - pipe length L (m), finite and >= 0
 * @param diameter - inside diameter D (m), finite and > 0
 * @param velocity - mean velocity V (m/s), finite (its sign does not matter: V^2)
 * @param g - gravitational acceleration (m/s^2), finite and > 0; default 9.80665
 * @returns the head loss h (m of fluid)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value outside those ranges or NaN.
 * @example
 * ```ts
 * darcyHeadLoss(0.02, q(100, 'm'), q(100, 'mm'), q(2, 'm/s')); // 4.0789... m
 * ```
 */
export function darcyHeadLoss(
  frictionFactor: number,
  length: Length,
  diameter: Length,
  velocity: Velocity,
  g: Acceleration = STANDARD_GRAVITY,
): Length {
  checkPositive('frictionFactor', frictionFactor);
  checkNonNegative('length', length, 'm');
  checkPositive('diameter', diameter, 'm');
  checkFinite('velocity', velocity, 'm/s');
  checkPositive('g', g, 'm/s2');
  return guardResult(
    'darcyHeadLoss',
    (frictionFactor * length * velocity * velocity) / (2 * g * diameter),
    'OUT_OF_RANGE',
  ) as Length;
}

/**
 * Pressure drop of a straight pipe by Darcy-Weisbach: `dp = f (L/D) rho V^2 / 2`
 * (= rho g h with h from {@link darcyHeadLoss}; g cancels). A difference of pressure, not an
 * absolute pressure.
 *
 * Source: as {@link darcyHeadLoss}.
 *
 * @param frictionFactor - Darcy friction factor f (dimensionless), finite and > 0
 * @param length - pipe length L (m), finite and >= 0
 * @param diameter - inside diameter D (m), finite and > 0
 * @param velocity - mean velocity V (m/s), finite
 * @param density - fluid density rho (kg/m^3), finite and > 0
 * @returns the pressure drop (Pa)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value outside those ranges or NaN.
 * @example
 * ```ts
 * pressureDrop(0.02, q(100, 'm'), q(100, 'mm'), q(2, 'm/s'), q(1000, 'kg/m3')); // 40000 Pa
 * ```
 */
export function pressureDrop(
  frictionFactor: number,
  length: Length,
  diameter: Length,
  velocity: Velocity,
  density: Density,
): Pressure {
  checkPositive('frictionFactor', frictionFactor);
  checkNonNegative('length', length, 'm');
  checkPositive('diameter', diameter, 'm');
  checkFinite('velocity', velocity, 'm/s');
  checkPositive('density', density, 'kg/m3');
  return guardResult(
    'pressureDrop',
    (frictionFactor * length * density * velocity * velocity) / (2 * diameter),
    'OUT_OF_RANGE',
  ) as Pressure;
}

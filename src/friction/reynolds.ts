import { checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Flow, KinematicViscosity, Length, Velocity } from '../units/index';

/**
 * Reynolds number of pipe flow from the mean velocity: `Re = V D / nu`.
 *
 * @param velocity - mean velocity V (m/s), finite and > 0
 * @param diameter - inside diameter D (m), finite and > 0
 * @param kinematicViscosity - nu (m^2/s), finite and > 0
 * @returns Re (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value that is not finite and > 0.
 * @example
 * ```ts
 * reynolds(q(2, 'm/s'), q(100, 'mm'), q(1, 'cSt')); // 200000 (to rounding)
 * ```
 */
export function reynolds(
  velocity: Velocity,
  diameter: Length,
  kinematicViscosity: KinematicViscosity,
): number {
  checkPositive('velocity', velocity, 'm/s');
  checkPositive('diameter', diameter, 'm');
  checkPositive('kinematicViscosity', kinematicViscosity, 'm2/s');
  return guardResult('reynolds', (velocity * diameter) / kinematicViscosity, 'OUT_OF_RANGE');
}

/**
 * Reynolds number of full-bore flow in a round pipe from the volumetric flow:
 * `Re = 4 Q / (pi D nu)` (the same as `V D / nu` with `V = 4Q / (pi D^2)`).
 *
 * @param flow - volumetric flow Q (m^3/s), finite and > 0
 * @param diameter - inside diameter D (m), finite and > 0
 * @param kinematicViscosity - nu (m^2/s), finite and > 0
 * @returns Re (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value that is not finite and > 0.
 * @example
 * ```ts
 * reynoldsFromFlow(q(0.01, 'm3/s'), q(100, 'mm'), q(1, 'cSt')); // 127323.95... (= 4e5/pi)
 * ```
 */
export function reynoldsFromFlow(
  flow: Flow,
  diameter: Length,
  kinematicViscosity: KinematicViscosity,
): number {
  checkPositive('flow', flow, 'm3/s');
  checkPositive('diameter', diameter, 'm');
  checkPositive('kinematicViscosity', kinematicViscosity, 'm2/s');
  return guardResult(
    'reynoldsFromFlow',
    (4 * flow) / (Math.PI * diameter * kinematicViscosity),
    'OUT_OF_RANGE',
  );
}

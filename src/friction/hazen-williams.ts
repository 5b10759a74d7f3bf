import { checkNonNegative, checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Flow, Length } from '../units/index';

/** SI coefficient of the Hazen-Williams head-loss form (Q in m^3/s, D and h in m). */
export const HAZEN_WILLIAMS_SI = 10.67;
/** Exponent of flow and of C: 1/0.54, printed as 1.852. */
const Q_EXP = 1.852;
/** Exponent of diameter: 2.63/0.54, printed as 4.8704. */
const D_EXP = 4.8704;

/**
 * Head loss of water in a straight pipe by the Hazen-Williams formula, SI form:
 * `h = 10.67 L Q^1.852 / (C^1.852 D^4.8704)` (h, L, D in m; Q in m^3/s).
 *
 * It rearranges Williams and Hazen's velocity form `V = k C R^0.63 S^0.54` (k = 0.849 in SI,
 * 1.318 in US units with ft and s). The US head forms, `h = 4.727 L Q^1.852 /
 * (C^1.852 D^4.8704)` (ft, ft3/s) and `h = 10.44 L Q^1.852 / (C^1.852 d^4.8704)` (ft, gal/min,
 * d in inches), give the same loss to the rounding of their printed constants (the tests
 * observe agreement within 0.1 %). Since the function takes quantities, use it for either
 * system: `to(h, 'ft')`.
 *
 * Validity: water near room temperature (about 5 to 25 degC; the formula has no viscosity
 * term) in turbulent flow, roughly 0.05 to 1.8 m diameters and velocities up to about
 * 3 m/s (common practice). Outside that, use Darcy-Weisbach ({@link darcyHeadLoss}) with
 * {@link frictionFactor}. C is a property of pipe material and age (for example about 140
 * to 150 for new plastic or copper, 100 or less for old cast iron; common practice).
 *
 * Source: G. S. Williams, A. Hazen, 1905 (2nd ed. 1909), "Hydraulic Tables", Wiley; SI form
 * as given in water-supply texts (10.67, 1.852, 4.8704; from memory).
 *
 * @param flow - volumetric flow Q (m^3/s), finite and >= 0
 * @param length - pipe length L (m), finite and >= 0
 * @param diameter - inside diameter D (m), finite and > 0
 * @param c - Hazen-Williams coefficient C (dimensionless), finite and > 0
 * @returns the head loss h (m of water)
 * @throws HeadflowError `INVALID_ARGUMENT` for a value outside those ranges or NaN.
 * @example
 * ```ts
 * hazenWilliamsHeadLoss(q(0.01, 'm3/s'), q(100, 'm'), q(100, 'mm'), 130); // 1.90344... m
 * ```
 */
export function hazenWilliamsHeadLoss(
  flow: Flow,
  length: Length,
  diameter: Length,
  c: number,
): Length {
  checkNonNegative('flow', flow, 'm3/s');
  checkNonNegative('length', length, 'm');
  checkPositive('diameter', diameter, 'm');
  checkPositive('c', c);
  return guardResult(
    'hazenWilliamsHeadLoss',
    (HAZEN_WILLIAMS_SI * length * flow ** Q_EXP) / (c ** Q_EXP * diameter ** D_EXP),
    'OUT_OF_RANGE',
  ) as Length;
}

/**
 * The temperature rise of the liquid through a pump, from an energy balance.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { guardRange, guardResult } from '../guards';
import type { Density, Flow, Power, SpecificHeat } from '../units/index';

/**
 * Temperature rise of the liquid between the pump's suction and discharge: the shaft power
 * that does not become hydraulic power (the losses) is taken up as heat by the liquid passing
 * through.
 *
 * `dT = (P_shaft - P_hyd) / (rho c_p Q)`
 *
 * (equivalently `dT = g H (1/eta - 1) / c_p`). Near shut-off the flow that carries the heat
 * away shrinks while the losses do not, so the rise grows fast: check it at the lowest flow the
 * pump can see against the liquid's margin to boiling at the suction (common practice).
 *
 * Validity: steady running, all losses into the pumped liquid (none to the casing, bearings or
 * surroundings: the conservative case), constant c_p over the rise. At zero flow there is no
 * through-flow and the liquid in the casing heats without limit: the function refuses Q = 0.
 *
 * Source: a steady-flow energy balance on the pump (common practice; e.g. the minimum-flow
 * discussions of pump handbooks).
 *
 * @param shaftPower - pump shaft power (W), >= 0
 * @param hydraulicPower - hydraulic power rho g Q H (W), 0 <= P_hyd <= P_shaft
 * @param density - liquid density (kg/m^3), > 0
 * @param specificHeat - isobaric specific heat capacity (J/(kg K)), > 0
 * @param flow - flow through the pump (m^3/s), > 0
 * @returns the temperature rise in kelvins (a difference, so the same number in degC; not an
 *   absolute temperature: do not pass it to `to(..., 'degC')`)
 * @throws HeadflowError `INVALID_ARGUMENT` for negative or non-finite power, a hydraulic power
 *   above the shaft power (an efficiency above 1), a non-positive density, specific heat or
 *   flow; `OUT_OF_RANGE` where rho c_p Q underflows (the rise would be Infinity).
 * @example
 * ```ts
 * temperatureRise(q(10, 'kW'), q(2, 'kW'), q(998.2, 'kg/m3'), q(4184, 'J/(kg*K)'), q(5, 'm3/h'));
 * // 1.379... K (8000 W / (998.2 x 4184 x 0.0013889 m3/s))
 * ```
 */
export function temperatureRise(
  shaftPower: Power,
  hydraulicPower: Power,
  density: Density,
  specificHeat: SpecificHeat,
  flow: Flow,
): number {
  const shaft = guardRange('shaftPower', shaftPower, { min: 0, unit: 'W' });
  const hyd = guardRange('hydraulicPower', hydraulicPower, { min: 0, unit: 'W' });
  const rho = guardRange('density', density, { min: 0, minOpen: true, unit: 'kg/m3' });
  const cp = guardRange('specificHeat', specificHeat, { min: 0, minOpen: true, unit: 'J/(kg*K)' });
  const q = guardRange('flow', flow, { min: 0, minOpen: true, unit: 'm3/s' });
  if (hyd > shaft) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `hydraulicPower = ${String(hyd)} W is above shaftPower = ${String(shaft)} W: a pump cannot ` +
        'give the liquid more power than its shaft takes (an efficiency above 1).',
      {
        parameter: 'hydraulicPower',
        value: hyd,
        unit: 'W',
        allowed: `<= shaftPower (${String(shaft)} W)`,
      },
    );
  }
  // A density, specific heat and flow whose product underflows would give Infinity: refused.
  return guardResult('temperature rise', (shaft - hyd) / (rho * cp * q), 'OUT_OF_RANGE');
}

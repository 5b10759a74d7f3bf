/**
 * The Joukowsky relation: the head change of an instantaneous change of velocity.
 *
 * @module
 */
import { guardNumber, guardRange, guardResult } from '../guards';
import { type Acceleration, type Length, STANDARD_GRAVITY, type Velocity } from '../units/index';

/**
 * Head change of a pressure wave when the velocity of the liquid changes at once (a sudden
 * valve closure, a pump trip that stops the flow faster than the wave's round trip):
 *
 * `dH = a dV / g`   (equivalently `dp = rho a dV`)
 *
 * with a the wave speed (see `waveSpeed`), dV the reduction of velocity (velocity before minus
 * velocity after) and g gravity. A reduction (dV > 0) raises the head on the upstream side of
 * the closure (and lowers it by as much downstream of it, or on the delivery side of a pump
 * that trips); an increase (dV < 0) gives a drop.
 *
 * Validity: a change faster than the wave's round trip 2L/a (for a slower one, see
 * {@link closureSurgeHead}); friction, line packing and the flow velocity itself are neglected
 * (dV << a). It is a screening estimate: a transient analysis is needed for design.
 *
 * Source: N. Joukowsky, "Über den hydraulischen Stoss in Wasserleitungsröhren", Mémoires de
 * l'Académie Impériale des Sciences de St.-Pétersbourg, 8e série, 9(5), 1900 (from memory);
 * checked against M. Massoud, "Engineering Thermofluids", Springer 2005, Example IIIb.7.1.
 *
 * @param waveSpeed - wave speed a (m/s), > 0
 * @param velocityChange - reduction of velocity dV (m/s), any finite value
 * @param g - gravity (m/s^2), > 0, default 9.80665
 * @returns head change dH (m of the liquid), with the sign of dV
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-positive or non-finite wave speed or g,
 *   or a non-finite velocity change; `OUT_OF_RANGE` where the head would overflow.
 * @example
 * ```ts
 * to(joukowskyHead(q(1200, 'm/s'), q(2, 'm/s')), 'm'); // 244.73... (1200 x 2 / 9.80665)
 * to(joukowskyHead(q(4900, 'ft/s'), q(1, 'ft/s'), q(32.2, 'ft/s2')), 'ft'); // 152.17... (Massoud: 152 ft)
 * ```
 */
export function joukowskyHead(
  waveSpeed: Velocity,
  velocityChange: Velocity,
  g: Acceleration = STANDARD_GRAVITY,
): Length {
  const a = guardRange('waveSpeed', waveSpeed, { min: 0, minOpen: true, unit: 'm/s' });
  const dv = guardNumber('velocityChange', velocityChange, 'm/s');
  const gg = guardRange('g', g, { min: 0, minOpen: true, unit: 'm/s2' });
  return guardResult('head', (a * dv) / gg, 'OUT_OF_RANGE') as Length;
}

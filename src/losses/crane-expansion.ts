import type { Length } from '../units/index';
import { checkAngle, diameterRatio } from './diameters';

/**
 * Loss coefficient of a gradual (conical) expansion from `d1` to `d2` with total included
 * cone angle `angle`, referred to the velocity head in the smaller, upstream pipe `d1`:
 *
 * - `angle <= 45 deg`: `K = 2.6 sin(angle/2) (1 - beta^2)^2`  (Crane formula 3)
 * - `45 deg < angle <= 180 deg`: `K = (1 - beta^2)^2`  (Crane formula 4, Borda-Carnot)
 *
 * with `beta = d1 / d2`. At 45 degrees the two agree within 0.6 % (2.6 sin 22.5 deg = 0.99498).
 * Refer K to the larger pipe with {@link referK}.
 *
 * Validity: turbulent flow; the source tabulates it for reducers and expanders and reduced-
 * port valves. Accuracy is that of the source's charts (no figure stated there).
 *
 * Source: Crane Co., "Flow of Fluids Through Valves, Fittings, and Pipe", Technical Paper
 * No. 410, page A-26, formulas 3 and 4 (K1 referred to the smaller diameter), as reproduced in
 * E. E. Ludwig, "Applied Process Design for Chemical and Petrochemical Plants", vol. 1, 3rd
 * ed., Table 2-2.
 *
 * @param d1 - inside diameter upstream, the smaller pipe (m), finite and > 0
 * @param d2 - inside diameter downstream, the larger pipe (m), finite and >= d1
 * @param angle - total included angle of the cone (degrees), 0 < angle <= 180
 * @returns K referred to the velocity head in `d1` (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive or NaN diameters, d1 > d2, or an
 *   angle outside (0, 180].
 * @example
 * ```ts
 * gradualExpansionK(q(50, 'mm'), q(100, 'mm'), 20); // 2.6 sin(10 deg) 0.5625 = 0.25396
 * ```
 */
export function gradualExpansionK(d1: Length, d2: Length, angle: number): number {
  const beta = diameterRatio(
    'd1',
    d1,
    'd2',
    d2,
    'An expansion goes from d1 (small) to d2 (large); for d1 > d2 use gradualContractionK.',
  );
  checkAngle(angle);
  const r = 1 - beta * beta;
  const borda = r * r;
  if (angle <= 45) return 2.6 * Math.sin((angle * Math.PI) / 360) * borda;
  return borda;
}

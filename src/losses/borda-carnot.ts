import type { Length } from '../units/index';
import { diameterRatio } from './diameters';

/**
 * Loss coefficient of a sudden expansion by Borda-Carnot: `K = (1 - (d1/d2)^2)^2`, referred
 * to the velocity head in the upstream, smaller pipe `d1`.
 *
 * From the momentum balance over the expansion with the upstream pressure acting on the
 * whole step face: exact in that model, and in good agreement with measurements in turbulent
 * flow. At `d2 -> infinity` it gives K = 1 (a pipe exit into a large tank). Refer it to the
 * larger pipe with {@link referK}: `K2 = K (d2/d1)^4`.
 *
 * Source: J.-C. Borda (1766), L. Carnot (1783); as in F. M. White, "Fluid Mechanics", the
 * sudden expansion loss `K = (1 - d^2/D^2)^2` (section on minor losses).
 *
 * @param d1 - inside diameter upstream, the smaller pipe (m), finite and > 0
 * @param d2 - inside diameter downstream, the larger pipe (m), finite, > 0 and >= d1
 * @returns K referred to the velocity head in `d1` (dimensionless, 0 <= K < 1)
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive or NaN diameters or d1 > d2
 *   (a contraction: see {@link suddenContractionK}).
 * @example
 * ```ts
 * suddenExpansionK(q(50, 'mm'), q(100, 'mm')); // (1 - 0.25)^2 = 0.5625
 * ```
 */
export function suddenExpansionK(d1: Length, d2: Length): number {
  const beta = diameterRatio(
    'd1',
    d1,
    'd2',
    d2,
    'An expansion goes from d1 (small) to d2 (large); for d1 > d2 use suddenContractionK.',
  );
  const r = 1 - beta * beta;
  return r * r;
}

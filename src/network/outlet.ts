/**
 * Outlets whose flow depends on their pressure: the rated coefficient.
 *
 * @module
 */
import { guardRange, guardResult } from '../guards';
import type { Flow, Pressure } from '../units/index';

/**
 * The coefficient k of an outlet `Q = k p^n` from one rated point: `k = Q / p^n` (SI: m3/s
 * and Pa gauge), as nozzles, sprinklers and emitters are rated (a K-factor).
 *
 * @param flow - rated flow (m3/s), > 0
 * @param gaugePressure - the pressure above the atmosphere at that flow (Pa), > 0
 * @param exponent - n, 0.3 to 3 (default 0.5, an orifice)
 * @throws HeadflowError `INVALID_ARGUMENT` for values outside those ranges; `OUT_OF_RANGE` where
 *   k would overflow (a pressure near 0 to the power n).
 * @example
 * ```ts
 * outletCoefficient(q(80, 'L/min'), q(1, 'bar')); // 4.216e-6 (m3/s per Pa^0.5)
 * ```
 */
export function outletCoefficient(flow: Flow, gaugePressure: Pressure, exponent = 0.5): number {
  const qv = guardRange('flow', flow, { min: 0, minOpen: true, unit: 'm3/s' });
  const p = guardRange('gaugePressure', gaugePressure, { min: 0, minOpen: true, unit: 'Pa' });
  const e = guardRange('exponent', exponent, { min: 0.3, max: 3 });
  // A tiny pressure to a power can underflow to 0 (k = Infinity): refused.
  return guardResult('coefficient', qv / p ** e, 'OUT_OF_RANGE');
}

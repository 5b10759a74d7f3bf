import { guardResult } from '../guards';
import { checkReynolds } from './validate';

/**
 * Darcy friction factor of fully developed laminar flow in a round pipe: `f = 64/Re`
 * (Hagen-Poiseuille). Exact for laminar flow; roughness plays no part.
 *
 * Validity: laminar flow, Re below about 2300 (the lower edge of the transition band used by
 * {@link frictionFactor}; common practice). Any Re > 0 is accepted.
 *
 * Source: the Hagen-Poiseuille law, as given in any fluid-mechanics text (for example
 * F. M. White, "Fluid Mechanics", section 6.4, f_lam = 64/Re_d).
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @returns the Darcy friction factor (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN or Infinity.
 * @example
 * ```ts
 * laminar(1600); // 0.04
 * ```
 */
export function laminar(re: number): number {
  checkReynolds(re);
  return guardResult('laminar', 64 / re, 'OUT_OF_RANGE');
}

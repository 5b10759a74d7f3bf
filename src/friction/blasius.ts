import { checkReynolds } from './validate';

/**
 * Darcy friction factor of turbulent flow in a hydraulically smooth pipe (Blasius 1913):
 * `f = 0.3164 Re^-0.25`.
 *
 * Validity: smooth pipes, 4000 <= Re <= 1e5 (Blasius's fit). Outside that band the formula
 * is still evaluated and is documented as unvalidated; above 1e5 it underestimates f.
 *
 * Accuracy: a fit to measurements, not an approximation of Colebrook. Against smooth
 * Colebrook (eps/D = 0) over 4000 <= Re <= 1e5 this project observes at most 2.84 %
 * (tests/reference/friction-approximations.test.ts).
 *
 * Source: H. Blasius, 1913, "Das Aehnlichkeitsgesetz bei Reibungsvorgängen in Flüssigkeiten",
 * Forschungsheft 131, VDI.
 *
 * @param re - Reynolds number (dimensionless), > 0
 * @returns the Darcy friction factor (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Re <= 0, NaN or Infinity.
 * @example
 * ```ts
 * blasius(1e4); // 0.03164 (smooth Colebrook 0.030883)
 * ```
 */
export function blasius(re: number): number {
  checkReynolds(re);
  return blasiusKernel(re);
}

/** @internal */
export function blasiusKernel(re: number): number {
  return 0.3164 / Math.sqrt(Math.sqrt(re));
}

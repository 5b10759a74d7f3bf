import { checkPositive } from '../errors';
import { guardResult } from '../guards';
import type { Length } from '../units/index';

/*
 * Derivation shared by the four functions (pipe of inside diameter D, area A = pi D^2 / 4).
 *
 * A loss coefficient K means dp = K rho V^2 / 2 with V = Q / A, so
 *   dp = K rho Q^2 / (2 A^2) = 8 K rho Q^2 / (pi^2 D^4).
 * A flow coefficient C is defined by a reference flow unit q_u, pressure drop dp_u and water
 * density rho_w:  Q = C q_u sqrt( (dp / dp_u) (rho_w / rho) ),  so
 *   dp = dp_u (rho / rho_w) Q^2 / (C q_u)^2.
 * Equating the two, rho cancels (both laws are turbulent, dp ~ rho Q^2):
 *   K = pi^2 D^4 dp_u / (8 rho_w q_u^2 C^2)   and   C = (pi D^2 / q_u) sqrt( dp_u / (8 rho_w K) ).
 */

/** 1 psi in Pa, exact: 0.45359237 kg x 9.80665 m/s^2 / (0.0254 m)^2 (NIST SP 811 B.8). */
const PSI = (0.45359237 * 9.80665) / (0.0254 * 0.0254);
/** 1 US gal/min in m^3/s, exact: 231 in^3 x (0.0254 m)^3 / 60 s (NIST SP 811 B.8). */
const GPM = (231 * 0.0254 ** 3) / 60;
/** 1 bar in Pa, exact. */
const BAR = 1e5;
/** 1 m^3/h in m^3/s, exact. */
const M3H = 1 / 3600;

/**
 * Reference water density of both flow coefficients, Cv and Kv (kg/m^3): water at 15 degC and
 * 101.325 kPa, 999.10 (IAPWS-IF97 region 1: 999.101, rounded).
 *
 * IEC 60534-2-1 (control-valve sizing equations) writes both coefficients with one relative
 * density rho / rho0, rho0 being water at 15 degC, and its numerical constants N1 (for
 * Q = N1 C sqrt(dp / (rho / rho0))) are 1e-1 for Kv (m^3/h, kPa), 8.65e-2 for Cv (m^3/h, kPa)
 * and 1 for Cv (US gal/min, psi): from memory, the standard's Table 1 was not at hand. One
 * reference density makes Kv and Cv a pure change of units,
 * Kv / Cv = (1 gal/min in m^3/h) sqrt(1 bar / 1 psi) = {@link KV_PER_CV} = 0.864978, which the
 * standard rounds to 0.865 (0.0865 / 0.1). ISA-75.01.01 refers Cv to water at 60 degF
 * (999.02 kg/m^3), 8e-5 from this value, far inside the accuracy of a tested coefficient;
 * valve handbooks often write 1000 kg/m^3 for Kv (P. Smith and R. W. Zappe, "Valve Selection
 * Handbook", 5th ed., 2004, Eq. 2-14), 0.09 % away.
 */
export const FLOW_COEFFICIENT_WATER_DENSITY = 999.1;

/** The reference density of Cv: {@link FLOW_COEFFICIENT_WATER_DENSITY} (one for both). */
export const CV_WATER_DENSITY = FLOW_COEFFICIENT_WATER_DENSITY;

/** The reference density of Kv: {@link FLOW_COEFFICIENT_WATER_DENSITY} (one for both). */
export const KV_WATER_DENSITY = FLOW_COEFFICIENT_WATER_DENSITY;

/**
 * Kv of a valve whose Cv is 1: `(1 US gal/min in m^3/h) x sqrt(1 bar / 1 psi)` = 0.864978
 * (exact unit factors, NIST SP 811 B.8), so `Kv = 0.864978 Cv` and `Cv = 1.15610 Kv`. IEC
 * 60534-2-1's constants give 0.865 (from memory, see {@link FLOW_COEFFICIENT_WATER_DENSITY}).
 */
export const KV_PER_CV = (GPM / M3H) * Math.sqrt(BAR / PSI);

/**
 * `K D^-4 Cv^2`, the constant of {@link kFromCv} with D in metres:
 * `pi^2 psi / (8 rho_w gpm^2)` = 2.1389e9 m^-4 (890.29 with D in inches).
 */
export const CV_CONSTANT = (Math.PI * Math.PI * PSI) / (8 * CV_WATER_DENSITY * GPM * GPM);

/**
 * `K D^-4 Kv^2`, the constant of {@link kFromKv} with D in metres:
 * `pi^2 bar / (8 rho_w (m^3/h)^2)` = 1.60032e9 m^-4 (1.60032e-3 with D in millimetres).
 */
export const KV_CONSTANT = (Math.PI * Math.PI * BAR) / (8 * KV_WATER_DENSITY * M3H * M3H);

/**
 * Loss coefficient K of a valve or fitting of flow coefficient Cv in a pipe of inside
 * diameter D: `K = C D^4 / Cv^2` with `C = pi^2 (1 psi) / (8 rho_w (1 gal/min)^2)`, where
 * `rho_w` = {@link FLOW_COEFFICIENT_WATER_DENSITY} (water at 15 degC, the reference of Kv
 * too, so that {@link kFromKv} gives the same K for the same valve). With D in inches,
 * `C` = 890.29.
 *
 * Cv is the flow of reference water in US gal/min that passes with a 1 psi pressure drop
 * (ISA-75.01 / IEC 60534 definition). Derivation: see the module source; it follows from
 * `dp = K rho V^2 / 2`, `V = Q / A`, `A = pi D^2 / 4` and the Cv definition
 * `Q = Cv sqrt(dp / G)` (gal/min, psi, G = rho / rho_w). K is referred to the velocity head
 * in the pipe of diameter D. Valid where the flow through the valve is turbulent and not
 * choked or cavitating (the Cv law itself assumes this).
 *
 * Source: the definitions above; unit factors exact from NIST SP 811 Appendix B.8. Crane
 * Technical Paper 410 gives the same relation as `Cv = 29.9 d^2 / sqrt(K)` (d in inches).
 *
 * @param cv - flow coefficient Cv (US gal/min per sqrt(psi)), finite and > 0
 * @param diameter - inside diameter of the pipe K is referred to (m), finite and > 0
 * @returns K (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Cv or diameter not finite and > 0.
 * @example
 * ```ts
 * kFromCv(100, q(2, 'in')); // 890.29 x 2^4 / 100^2 = 1.42446
 * ```
 */
export function kFromCv(cv: number, diameter: Length): number {
  checkPositive('cv', cv);
  checkPositive('diameter', diameter, 'm');
  const d2 = diameter * diameter;
  return guardResult('kFromCv', (CV_CONSTANT * d2 * d2) / (cv * cv), 'OUT_OF_RANGE');
}

/**
 * Flow coefficient Cv (US gal/min of water at 60 degF at 1 psi) equivalent to a loss
 * coefficient K in a pipe of inside diameter D: `Cv = D^2 sqrt(C / K)`, the inverse of
 * {@link kFromCv} (same constant and source).
 *
 * @param k - loss coefficient referred to the pipe's velocity head, finite and > 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @returns Cv (US gal/min per sqrt(psi))
 * @throws HeadflowError `INVALID_ARGUMENT` for K or diameter not finite and > 0.
 * @example
 * ```ts
 * cvFromK(1.42446, q(2, 'in')); // 100.0
 * ```
 */
export function cvFromK(k: number, diameter: Length): number {
  checkPositive('k', k);
  checkPositive('diameter', diameter, 'm');
  return guardResult('cvFromK', diameter * diameter * Math.sqrt(CV_CONSTANT / k), 'OUT_OF_RANGE');
}

/**
 * Loss coefficient K of a valve or fitting of flow coefficient Kv in a pipe of inside
 * diameter D: `K = C D^4 / Kv^2` with `C = pi^2 (1 bar) / (8 rho_w (1 m^3/h)^2)`, where
 * `rho_w` = {@link FLOW_COEFFICIENT_WATER_DENSITY} (the same reference water as Cv, so that
 * `kFromKv(KV_PER_CV x cv, D) = kFromCv(cv, D)`). With D in millimetres, `C` = 1.60032e-3.
 *
 * Kv is the flow of water in m^3/h that passes with a 1 bar pressure drop. Derivation as for
 * {@link kFromCv}, with the Kv definition `Q = Kv sqrt(dp / (rho / rho_w))` (m^3/h, bar).
 * Same validity (turbulent, not choked).
 *
 * Source: the Kv definition (m^3/h of water at 1 bar; P. Smith and R. W. Zappe, "Valve
 * Selection Handbook", 5th ed., 2004, Eq. 2-14), with the reference density of IEC 60534-2-1
 * (from memory: see {@link FLOW_COEFFICIENT_WATER_DENSITY}); unit factors exact.
 *
 * @param kv - flow coefficient Kv (m^3/h per sqrt(bar)), finite and > 0
 * @param diameter - inside diameter of the pipe K is referred to (m), finite and > 0
 * @returns K (dimensionless)
 * @throws HeadflowError `INVALID_ARGUMENT` for Kv or diameter not finite and > 0.
 * @example
 * ```ts
 * kFromKv(100, q(50, 'mm')); // 1.60032e-3 x 50^4 / 100^2 = 1.00020
 * ```
 */
export function kFromKv(kv: number, diameter: Length): number {
  checkPositive('kv', kv);
  checkPositive('diameter', diameter, 'm');
  const d2 = diameter * diameter;
  return guardResult('kFromKv', (KV_CONSTANT * d2 * d2) / (kv * kv), 'OUT_OF_RANGE');
}

/**
 * Flow coefficient Kv (m^3/h of water at 1 bar) equivalent to a loss coefficient K in a pipe
 * of inside diameter D: `Kv = D^2 sqrt(C / K)`, the inverse of {@link kFromKv} (same
 * constant and source).
 *
 * @param k - loss coefficient referred to the pipe's velocity head, finite and > 0
 * @param diameter - inside diameter of the pipe (m), finite and > 0
 * @returns Kv (m^3/h per sqrt(bar))
 * @throws HeadflowError `INVALID_ARGUMENT` for K or diameter not finite and > 0.
 * @example
 * ```ts
 * kvFromK(1.0002, q(50, 'mm')); // 100.0
 * ```
 */
export function kvFromK(k: number, diameter: Length): number {
  checkPositive('k', k);
  checkPositive('diameter', diameter, 'm');
  return guardResult('kvFromK', diameter * diameter * Math.sqrt(KV_CONSTANT / k), 'OUT_OF_RANGE');
}

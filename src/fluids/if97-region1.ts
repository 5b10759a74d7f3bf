/**
 * IAPWS-IF97 region 1 (compressed liquid water): the basic equation for the specific Gibbs
 * free energy g(p, T) and the density derived from it.
 *
 * @module
 */
import type { Density, Pressure, Temperature } from '../units/index';
import { checkSameLength } from './checks';
import { checkLiquidWater } from './water-range';

/** Specific gas constant of water in IAPWS-IF97, R = 0.461 526 kJ/(kg K) (IF97 Eq. 1). */
export const IF97_R = 461.526;
/** Reducing pressure of region 1, p* = 16.53 MPa (IF97 Eq. 7). */
const P_STAR = 16.53e6;
/** Reducing temperature of region 1, T* = 1386 K (IF97 Eq. 7). */
const T_STAR = 1386;

// IAPWS-IF97 (Revised Release, IAPWS R7-97(2012)), Table 2: coefficients n_i and exponents
// I_i, J_i of the dimensionless Gibbs free energy for region 1, Eq. (7).
const I = [
  0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29,
  30, 31, 32,
] as const;
const J = [
  -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6,
  -29, -31, -38, -39, -40, -41,
] as const;
const N = [
  0.14632971213167, -0.84548187169114, -0.3756360367204e1, 0.33855169168385e1, -0.95791963387872,
  0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3,
  -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1,
  -0.5283835796993e-4, -0.47184321073267e-3, -0.30001780793026e-3, 0.47661393906987e-4,
  -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
  -0.85205128120103e-9, -0.22425281908e-5, -0.65171222895601e-6, -0.14341729937924e-12,
  -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18,
  0.14478307828521e-19, 0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
  -0.93537087292458e-25,
] as const;

const TERMS = N.length;
/** Powers of (tau - 1.222) from -41 to +17, filled per call without allocation. */
const J_MIN = -41;
const J_MAX = 17;
const tauPow = new Float64Array(J_MAX - J_MIN + 1);
/** Powers of (7.1 - pi) from -1 to +31 (I - 1), filled per call. */
const piPow = new Float64Array(33);

function fillPowers(pi: number, tau: number): void {
  const t = tau - 1.222;
  const ti = 1 / t;
  const zero = -J_MIN;
  tauPow[zero] = 1;
  for (let k = 1; k <= J_MAX; k++) tauPow[zero + k] = (tauPow[zero + k - 1] as number) * t;
  for (let k = 1; k <= -J_MIN; k++) tauPow[zero - k] = (tauPow[zero - k + 1] as number) * ti;
  const u = 7.1 - pi;
  piPow[0] = 1 / u;
  piPow[1] = 1;
  for (let k = 2; k < piPow.length; k++) piPow[k] = (piPow[k - 1] as number) * u;
}

/**
 * Specific volume of water in region 1 (m^3/kg) from IF97 Eq. (7) and Table 3:
 * `v = R T pi gamma_pi / p`. Plain SI numbers, no checks, no allocation.
 * @internal
 */
export function region1SpecificVolume(temperature: number, pressure: number): number {
  const pi = pressure / P_STAR;
  const tau = T_STAR / temperature;
  fillPowers(pi, tau);
  let gPi = 0;
  for (let k = 0; k < TERMS; k++) {
    const ik = I[k] as number;
    if (ik === 0) continue;
    gPi -=
      (N[k] as number) * ik * (piPow[ik] as number) * (tauPow[(J[k] as number) - J_MIN] as number);
  }
  return (IF97_R * temperature * gPi) / P_STAR;
}

/**
 * Speed of sound w (m/s) and isobaric specific heat capacity c_p (J/(kg K)) of region 1 from
 * the derivatives of the dimensionless Gibbs free energy, IF97 Table 3:
 * `c_p = -R tau^2 gamma_tautau` and
 * `w^2 = R T gamma_pi^2 / ((gamma_pi - tau gamma_pitau)^2 / (tau^2 gamma_tautau) - gamma_pipi)`.
 * Writes `[w, c_p, rho]` into `out` (rho = 1 / v in kg/m^3, the same number as
 * `1 / region1SpecificVolume`). Plain SI numbers, no checks, no allocation.
 * @internal
 */
export function region1Acoustic(temperature: number, pressure: number, out: Float64Array): void {
  const pi = pressure / P_STAR;
  const tau = T_STAR / temperature;
  fillPowers(pi, tau);
  const u7 = 7.1 - pi;
  const t = tau - 1.222;
  let gPi = 0;
  let gPiPi = 0;
  let gTauTau = 0;
  let gPiTau = 0;
  for (let k = 0; k < TERMS; k++) {
    const n = N[k] as number;
    const ik = I[k] as number;
    const jk = J[k] as number;
    // n (7.1 - pi)^I (tau - 1.222)^J, then each derivative divides by (7.1 - pi) or (tau - 1.222).
    const tp = tauPow[jk - J_MIN] as number;
    const term = n * (ik === 0 ? 1 : (piPow[ik] as number) * u7) * tp;
    // gamma_pi summed exactly as region1SpecificVolume sums it, so the density is bit-identical
    if (ik !== 0) gPi -= n * ik * (piPow[ik] as number) * tp;
    gPiPi += (ik * (ik - 1) * term) / (u7 * u7);
    gTauTau += (jk * (jk - 1) * term) / (t * t);
    gPiTau -= (ik * jk * term) / (u7 * t);
  }
  const rt = IF97_R * temperature;
  const a = gPi - tau * gPiTau;
  out[0] = Math.sqrt((rt * gPi * gPi) / ((a * a) / (tau * tau * gTauTau) - gPiPi));
  out[1] = -IF97_R * tau * tau * gTauTau;
  out[2] = 1 / ((rt * gPi) / P_STAR);
}

/** Properties of region 1 from IF97 Table 3 (SI: m^3/kg, J/kg, J/(kg K), m/s). @internal */
export interface Region1Properties {
  readonly v: number;
  readonly h: number;
  readonly u: number;
  readonly s: number;
  readonly cp: number;
  readonly w: number;
}

/**
 * Every property of IF97 Table 3 for region 1 (for verification against IF97 Table 5; the
 * library itself needs only the density). Allocates its result.
 * @internal
 */
export function region1Properties(temperature: number, pressure: number): Region1Properties {
  const pi = pressure / P_STAR;
  const tau = T_STAR / temperature;
  fillPowers(pi, tau);
  const u7 = 7.1 - pi;
  const t = tau - 1.222;
  let g = 0;
  let gPi = 0;
  let gPiPi = 0;
  let gTau = 0;
  let gTauTau = 0;
  let gPiTau = 0;
  for (let k = 0; k < TERMS; k++) {
    const n = N[k] as number;
    const ik = I[k] as number;
    const jk = J[k] as number;
    const tp = tauPow[jk - J_MIN] as number;
    const pp = ik === 0 ? 1 : (piPow[ik] as number) * u7; // (7.1 - pi)^I
    g += n * pp * tp;
    gPi -= (n * ik * pp * tp) / u7;
    gPiPi += (n * ik * (ik - 1) * pp * tp) / (u7 * u7);
    gTau += (n * jk * pp * tp) / t;
    gTauTau += (n * jk * (jk - 1) * pp * tp) / (t * t);
    gPiTau -= (n * ik * jk * pp * tp) / (u7 * t);
  }
  const rt = IF97_R * temperature;
  const w2 = (rt * gPi * gPi) / ((gPi - tau * gPiTau) ** 2 / (tau * tau * gTauTau) - gPiPi);
  return {
    v: (pi * gPi * rt) / pressure,
    h: rt * tau * gTau,
    u: rt * (tau * gTau - pi * gPi),
    s: IF97_R * (tau * gTau - g),
    cp: -IF97_R * tau * tau * gTauTau,
    w: Math.sqrt(w2),
  };
}

/**
 * Density of liquid water from the IAPWS-IF97 basic equation for region 1.
 *
 * Equation: `rho = 1 / v` with `v = R T pi gamma_pi / p`, `gamma(pi, tau) = sum n_i (7.1 - pi)^I_i
 * (tau - 1.222)^J_i`, `pi = p / 16.53 MPa`, `tau = 1386 K / T`, R = 0.461 526 kJ/(kg K)
 * (IF97 Eq. 7, coefficients Table 2, relations Table 3).
 *
 * Validity: IF97 region 1, 273.15 K <= T <= 623.15 K and p_s(T) < p <= 100 MPa (absolute),
 * i.e. liquid water at a pressure above its saturation pressure. The melting line is taken as
 * the 273.15 K lower bound of region 1 (above about 0.1 MPa water stays liquid a little below
 * 273.15 K; such states are refused).
 *
 * Accuracy: reproduces IF97 Table 5 to all nine printed digits; IF97 represents the scientific
 * formulation IAPWS-95 in region 1 within the tolerances of Wagner et al. (2000).
 *
 * Source: IAPWS, "Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam", IAPWS R7-97(2012), Section 5.1; W. Wagner et
 * al., J. Eng. Gas Turbines Power 122 (2000) 150-182.
 *
 * @param temperature - temperature (K)
 * @param pressure - absolute pressure (Pa)
 * @returns density (kg/m^3)
 * @throws HeadflowError `INVALID_ARGUMENT` for NaN, infinite, negative absolute temperature
 *   or negative pressure; `OUT_OF_RANGE` for ice (below 273.15 K), for boiling water (at or
 *   above the saturation temperature of the pressure; the message names the pressure needed),
 *   above 623.15 K or above 100 MPa.
 * @example
 * ```ts
 * waterDensity(q(300, 'K'), q(3, 'MPa')); // 997.8530...(kg/m3), IF97 Table 5: v = 0.100215168e-2 m3/kg
 * waterDensity(q(20, 'degC'), q(1, 'atm')); // 998.2...(kg/m3)
 * ```
 */
export function waterDensity(temperature: Temperature, pressure: Pressure): Density {
  checkLiquidWater(temperature, pressure);
  return (1 / region1SpecificVolume(temperature, pressure)) as Density;
}

/**
 * Array form of {@link waterDensity}: fills `out[i]` with the density (kg/m^3) at
 * `temperatures[i]` (K) and one pressure (Pa, absolute); allocates nothing.
 *
 * @throws HeadflowError as {@link waterDensity}, naming the first offending element;
 *   `INVALID_ARGUMENT` when the arrays differ in length.
 * @example
 * ```ts
 * const t = Float64Array.of(283.15, 293.15, 303.15);
 * waterDensityInto(t, q(1, 'atm'), new Float64Array(3)); // [999.7..., 998.2..., 995.6...]
 * ```
 */
export function waterDensityInto(
  temperatures: ArrayLike<number>,
  pressure: Pressure,
  out: Float64Array,
): Float64Array {
  checkSameLength(temperatures, out);
  for (let i = 0; i < temperatures.length; i++) {
    const t = temperatures[i] as number;
    checkLiquidWater(t as Temperature, pressure, i);
    out[i] = 1 / region1SpecificVolume(t, pressure);
  }
  return out;
}

/**
 * Viscosity of liquid water from the IAPWS 2008 formulation, with the density from IAPWS-IF97.
 *
 * @module
 */
import type { DynamicViscosity, Pressure, Temperature } from '../units/index';
import { checkSameLength } from './checks';
import { region1SpecificVolume } from './if97-region1';
import { checkLiquidWater } from './water-range';

/** Reference constants of IAPWS 2008 Eqs. (3)-(6): T* = 647.096 K, rho* = 322 kg/m^3, mu* = 1e-6 Pa s. */
const T_STAR = 647.096;
const RHO_STAR = 322;
const MU_STAR = 1e-6;

// IAPWS R12-08, Table 1: coefficients H_i of the dilute-gas term mu0, Eq. (11).
const H0 = 1.67752;
const H1 = 2.20462;
const H2 = 0.6366564;
const H3 = -0.241605;

// IAPWS R12-08, Table 2: coefficients H_ij of the residual term mu1, Eq. (12), by row i = 0..5
// (power of 1/Tbar - 1) and column j = 0..6 (power of rhobar - 1). Blank entries are zero.
const HIJ = Float64Array.of(
  // i = 0
  5.20094e-1,
  2.22531e-1,
  -2.81378e-1,
  1.61913e-1,
  -3.25372e-2,
  0,
  0,
  // i = 1
  8.50895e-2,
  9.99115e-1,
  -9.06851e-1,
  2.57399e-1,
  0,
  0,
  0,
  // i = 2
  -1.08374,
  1.88797,
  -7.72479e-1,
  0,
  0,
  0,
  0,
  // i = 3
  -2.89555e-1,
  1.26613,
  -4.89837e-1,
  0,
  6.98452e-2,
  0,
  -4.35673e-3,
  // i = 4
  0,
  0,
  -2.5704e-1,
  0,
  0,
  8.72102e-3,
  0,
  // i = 5
  0,
  1.20573e-1,
  0,
  0,
  0,
  0,
  -5.93264e-4,
);

/**
 * Viscosity (Pa s) from temperature (K) and density (kg/m^3), IAPWS 2008 Eq. (2) with the
 * critical enhancement mu2 = 1; plain numbers, no checks, no allocation.
 * @internal
 */
export function viscosityFromDensity(temperature: number, density: number): number {
  const tb = temperature / T_STAR;
  const rb = density / RHO_STAR;
  const mu0 = (100 * Math.sqrt(tb)) / (H0 + H1 / tb + H2 / (tb * tb) + H3 / (tb * tb * tb));
  const x = 1 / tb - 1;
  const y = rb - 1;
  let sum = 0;
  let xi = 1;
  for (let i = 0; i < 6; i++) {
    const row = i * 7;
    // Horner in (rhobar - 1) for row i.
    let inner = HIJ[row + 6] as number;
    for (let j = 5; j >= 0; j--) inner = inner * y + (HIJ[row + j] as number);
    sum += xi * inner;
    xi *= x;
  }
  const mu1 = Math.exp(rb * sum);
  return mu0 * mu1 * MU_STAR;
}

/**
 * Dynamic viscosity of liquid water.
 *
 * Equation: IAPWS 2008 Eq. (2), `mu / mu* = mu0(Tbar) x mu1(Tbar, rhobar) x mu2`, with the
 * dilute-gas term `mu0 = 100 Tbar^0.5 / sum_{i=0..3} H_i / Tbar^i` (Eq. 11, Table 1), the
 * residual term `mu1 = exp[rhobar sum_i (1/Tbar - 1)^i sum_j H_ij (rhobar - 1)^j]` (Eq. 12,
 * Table 2), `Tbar = T / 647.096 K`, `rhobar = rho / 322 kg/m^3`, `mu* = 1e-6 Pa s`. The density
 * comes from IAPWS-IF97 region 1 ({@link waterDensity}), as the release allows for industrial
 * use. The critical enhancement mu2 is taken as 1: the release states it is significant only
 * very near the critical point and recommends omitting it in industrial use; in the liquid
 * range below 623.15 K it changes the viscosity by far less than the uncertainty.
 *
 * Validity: the liquid range of {@link waterDensity} (273.15 K to 623.15 K, above the
 * saturation pressure, up to 100 MPa), inside the range of the formulation (the stable fluid
 * region from the melting line up to 1173.15 K). Uncertainty of the formulation in this range
 * about 1 % to 2 % (release Fig. 1). Reproduces the verification values of the release
 * (Table 4) to their printed digits when given the same density.
 *
 * Source: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 * Water Substance" (2008); M. L. Huber et al., J. Phys. Chem. Ref. Data 38 (2009) 101-125.
 *
 * @param temperature - temperature (K)
 * @param pressure - absolute pressure (Pa)
 * @returns dynamic viscosity (Pa s)
 * @throws HeadflowError as {@link waterDensity}: `INVALID_ARGUMENT` for NaN, infinity,
 *   negative absolute temperature or negative pressure; `OUT_OF_RANGE` for ice, boiling water
 *   (the message names the pressure needed), T > 623.15 K or p > 100 MPa.
 * @example
 * ```ts
 * to(waterViscosity(q(20, 'degC'), q(1, 'atm')), 'mPa*s'); // 1.0016...
 * ```
 */
export function waterViscosity(temperature: Temperature, pressure: Pressure): DynamicViscosity {
  checkLiquidWater(temperature, pressure);
  const rho = 1 / region1SpecificVolume(temperature, pressure);
  return viscosityFromDensity(temperature, rho) as DynamicViscosity;
}

/**
 * Array form of {@link waterViscosity}: fills `out[i]` with the dynamic viscosity (Pa s) at
 * `temperatures[i]` (K) and one absolute pressure (Pa); allocates nothing.
 *
 * @throws HeadflowError as {@link waterViscosity}, naming the first offending element;
 *   `INVALID_ARGUMENT` when the arrays differ in length.
 * @example
 * ```ts
 * waterViscosityInto(Float64Array.of(293.15, 313.15), q(1, 'atm'), new Float64Array(2)); // [0.0010016..., 0.000653...]
 * ```
 */
export function waterViscosityInto(
  temperatures: ArrayLike<number>,
  pressure: Pressure,
  out: Float64Array,
): Float64Array {
  checkSameLength(temperatures, out);
  for (let i = 0; i < temperatures.length; i++) {
    const t = temperatures[i] as number;
    checkLiquidWater(t, pressure, i);
    out[i] = viscosityFromDensity(t, 1 / region1SpecificVolume(t, pressure));
  }
  return out;
}

/**
 * IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary Water
 * Substance", Table 4: sample points for computer-program verification of the correlating
 * equation, Eq. (2), with the critical enhancement mu2 = 1, at given temperature and density.
 * The release prints the viscosity in uPa s to six decimals; each check is to half a unit in
 * the last printed digit (5e-7 uPa s). The liquid points (298.15 K / 998 kg/m3, 373.15 K /
 * 1000 kg/m3, 433.15 K / 1000 kg/m3) are the ones headflow evaluates; the others check the
 * same coefficients over the rest of the formulation.
 */
import { describe, it } from 'vitest';
import { viscosityFromDensity } from '../../src/fluids/iapws-2008-viscosity';
import { expectAbsolute } from '../helpers/expect';

describe('IAPWS 2008 viscosity, Table 4 (mu2 = 1)', () => {
  // [T K, rho kg/m3, mu uPa s]
  const rows = [
    [298.15, 998, 889.7351],
    [298.15, 1200, 1437.649467],
    [373.15, 1000, 307.883622],
    [433.15, 1, 14.538324],
    [433.15, 1000, 217.685358],
    [873.15, 1, 32.619287],
    [873.15, 100, 35.802262],
    [873.15, 600, 77.430195],
    [1173.15, 1, 44.217245],
    [1173.15, 100, 47.640433],
    [1173.15, 400, 64.154608],
  ] as const;
  for (const [t, rho, mu] of rows) {
    it(`T = ${t} K, rho = ${rho} kg/m3: mu = ${mu} uPa s`, () => {
      expectAbsolute(viscosityFromDensity(t, rho) * 1e6, mu, 5e-7, `T=${t} K rho=${rho}`);
    });
  }
});

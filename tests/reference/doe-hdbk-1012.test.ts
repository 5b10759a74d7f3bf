/**
 * US Department of Energy, DOE-HDBK-1012/3-92, "DOE Fundamentals Handbook: Thermodynamics,
 * Heat Transfer, and Fluid Flow", Volume 3 of 3, Module 3 Fluid Flow, "Centrifugal Pumps",
 * worked example "Pump Laws" (page HT-03 p. 50, Rev. 0), and its equations 3-23 to 3-25.
 */
import { describe, it } from 'vitest';
import { type CataloguePoint, pumpCurve } from '../../src/pumps/index';
import { type Flow, q, to } from '../../src/units';
import { expectRelative } from '../helpers/expect';

describe('DOE-HDBK-1012/3-92, example "Pump Laws"', () => {
  it('1800 rpm, 400 gpm, 48 ft, 45 kW raised to 3600 rpm: 800 gpm, 192 ft, 360 kW', () => {
    // The example: a cooling water pump at 1800 rpm gives 400 gpm at 48 ft with 45 kW; find
    // flow, head and power at 3600 rpm. Its printed solution gives 800 gpm (seen); the head and
    // power follow from its eqs. 3-24 and 3-25 (48 x 2^2 = 192 ft, 45 x 2^3 = 360 kW; the rest
    // of the page was not in hand). The pump curve around the point is invented (only the point
    // matters); its efficiency is chosen so the shaft power at 400 gpm is 45 kW for water of
    // 1000 kg/m3.
    const rho = q(1000, 'kg/m3');
    const q0 = q(400, 'gal/min');
    const h0 = q(48, 'ft');
    const eta = (1000 * 9.80665 * q0 * h0) / 45000;
    const points: CataloguePoint[] = [
      { flow: q(0, 'gal/min'), head: q(60, 'ft'), efficiency: 0 },
      { flow: q(200, 'gal/min'), head: q(56, 'ft'), efficiency: eta * 0.75 },
      { flow: q0, head: h0, efficiency: eta },
      { flow: q(600, 'gal/min'), head: q(36, 'ft'), efficiency: eta * 0.9 },
    ];
    const pump = pumpCurve({
      speed: q(1800, 'rpm'),
      points,
      fit: { efficiency: { method: 'monotone' } },
    });
    expectRelative(to(pump.shaftPower(q0, rho), 'kW'), 45, 1e-12);
    const fast = pump.atSpeed(q(3600, 'rpm'));
    const q2 = q(800, 'gal/min') as Flow;
    expectRelative(to(fast.head(q2), 'ft'), 192, 1e-12);
    expectRelative(to(fast.shaftPower(q2, rho), 'kW'), 360, 1e-12);
    expectRelative(to(fast.flowRange.max, 'gal/min'), 1200, 1e-12);
  });
});

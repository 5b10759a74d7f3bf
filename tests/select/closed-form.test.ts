/**
 * Trim and speed against closed forms. Pump `H = A - B Q^2` at the full impeller and
 * catalogue speed; system `H = Hs + k Q^2` exactly (tests/select/fixtures.ts). Both the trim
 * law (Q ~ D, H ~ D^2) and the affinity laws (Q ~ n, H ~ n^2) scale the pump to
 * `H = r^2 A - B Q^2`, so the ratio r that meets the duty flow Q_d is, for either,
 *
 *   r = sqrt((Hs + (k + B) Q_d^2) / A)            (algebra on the two parabolas)
 *
 * and the throttled full pump burns `A - B Q_d^2 - (Hs + k Q_d^2)` of head in the valve.
 */
import { describe, expect, it } from 'vitest';
import { selectPumps } from '../../src/select/index';
import { q, to } from '../../src/units/index';
import { expectRelative } from '../helpers/expect';
import { catalogueOf, parabolicDesign, parabolicPump } from './fixtures';

const A = 40;
const B = 0.001;
const closedRatio = (hs: number, k: number, qd: number): number =>
  Math.sqrt((hs + (k + B) * qd * qd) / A);

// Tolerance 1e-9 relative: the head fit is the exact parabola to a few ulps and Brent stops
// at 1e-13 of the diameter; nothing else enters.
const TOL = 1e-9;

describe('selectPumps against closed forms', () => {
  const pump = parabolicPump('P', A, B, 110, {
    drive: { minSpeed: q(600, 'rpm'), maxSpeed: q(1750, 'rpm'), efficiency: 0.97 },
  });
  const catalogue = catalogueOf(pump);

  it('trims to r = sqrt((Hs + (k + B) Q^2) / A) in the one case (Hs 10 m, k 0.002, 80 m3/h)', () => {
    const sel = selectPumps(parabolicDesign(10, 0.002, 80), catalogue, { lowestTrimRatio: 0.7 });
    const trim = sel.ranked.find((e) => e.method === 'trim');
    const r = closedRatio(10, 0.002, 80); // sqrt(29.2 / 40) = 0.85440
    expect(trim?.trimBasis).toBe('trim law');
    expectRelative(to(trim?.trimDiameter ?? q(0, 'm'), 'mm'), 250 * r, TOL);
    expectRelative(trim?.trimRatio ?? 0, r, TOL);
    expect(trim?.trimIterations ?? 99).toBeLessThan(20);
    // The trimmed pump meets the system at the duty flow: no throttling left.
    expectRelative(to(trim?.cases[0]?.flow ?? q(0, 'm3/h'), 'm3/h'), 80, 1e-8);
    expect(to(trim?.cases[0]?.throttleHead ?? q(1, 'm'), 'm')).toBeLessThan(1e-8);
    // 85 % of diameter is beyond the law's accurate range (90 %): flagged.
    expect(trim?.checks.some((c) => c.id === 'trim-law' && c.severity === 'warning')).toBe(true);
  });

  it('sets the drive speed to r n0 in each case, and reports the highest', () => {
    const sel = selectPumps(parabolicDesign(10, 0.002, 80, [4]), catalogue);
    const speed = sel.ranked.find((e) => e.method === 'speed');
    const rDesign = closedRatio(10, 0.002, 80);
    const rHigh = closedRatio(14, 0.002, 80); // sqrt(33.2 / 40)
    expectRelative(to(speed?.cases[0]?.speed ?? q(0, 'rpm'), 'rpm'), 1750 * rDesign, TOL);
    expectRelative(to(speed?.cases[1]?.speed ?? q(0, 'rpm'), 'rpm'), 1750 * rHigh, TOL);
    expectRelative(to(speed?.speed ?? q(0, 'rpm'), 'rpm'), 1750 * rHigh, TOL);
    expect(speed?.cases[0]?.throttleHead).toBe(0);
    expect(speed?.passed).toBe(true);
  });

  it('trims for the case that needs the most head (static +4 m)', () => {
    const sel = selectPumps(parabolicDesign(10, 0.002, 80, [4]), catalogue);
    const trim = sel.ranked.find((e) => e.method === 'trim');
    expectRelative(trim?.trimRatio ?? 0, closedRatio(14, 0.002, 80), TOL);
    // In the design case the trimmed impeller has 4 m to spare at the duty flow: throttled.
    expectRelative(to(trim?.cases[0]?.throttleHead ?? q(0, 'm'), 'm'), 4, 1e-8);
  });

  it('throttles the full impeller by A - B Q^2 - (Hs + k Q^2)', () => {
    const sel = selectPumps(parabolicDesign(10, 0.002, 80), catalogue);
    const full = sel.ranked.find((e) => e.method === 'throttle');
    const dh = A - B * 6400 - (10 + 0.002 * 6400); // 40 - 6.4 - 22.8 = 10.8 m
    expectRelative(to(full?.cases[0]?.throttleHead ?? q(0, 'm'), 'm'), dh, 1e-9);
    const rhoG = 998.2 * 9.80665; // water at 20 degC is 998.21 kg/m3 (IAPWS-IF97); checked loosely
    expectRelative(full?.cases[0]?.throttlePower ?? 0, rhoG * (80 / 3600) * dh, 1e-4, 'rho g Q dH');
    // A year at the duty in the one case: input power x 8760 h, and the design's own energy.
    const year = ((full?.cases[0]?.inputPower ?? 0) * 8760) / 1000;
    expectRelative(full?.cases[0]?.energy?.kWh ?? 0, year, 1e-12, 'case energy');
    expectRelative(full?.energy?.kWh ?? 0, year, 1e-12, 'design energy');
    // Where the unthrottled full pump runs: A - B Q^2 = Hs + k Q^2, Q = sqrt(30 / 0.003).
    expectRelative(to(full?.cases[0]?.flow ?? q(0, 'm3/h'), 'm3/h'), Math.sqrt(30 / 0.003), 1e-9);
  });

  it('does not trim below the catalogue minimum: the smallest impeller is throttled', () => {
    const small = catalogueOf(parabolicPump('P', A, B, 110, { minImpellerDiameter: q(240, 'mm') }));
    const sel = selectPumps(parabolicDesign(10, 0.002, 80), small);
    const trim = sel.ranked.find((e) => e.method === 'trim');
    expectRelative(to(trim?.trimDiameter ?? q(0, 'm'), 'mm'), 240, 1e-12);
    const dh = 0.96 ** 2 * A - B * 6400 - 22.8;
    expectRelative(to(trim?.cases[0]?.throttleHead ?? q(0, 'm'), 'm'), dh, 1e-9);
  });
});

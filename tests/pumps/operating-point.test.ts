import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { operatingPoint, pumpCurve } from '../../src/pumps/index';
import { type Density, q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { EXACT_FITS, PUMP_A, quadraticPoints, quadraticPump, quadraticSystem } from './fixtures';

const pump = quadraticPump();

/** Closed-form crossing of H = h0 - a Q^2 and H = hs + k Q^2 (Q in m3/h). */
function exactFlow(hs: number, k: number): number {
  return Math.sqrt((PUMP_A.h0 - hs) / (PUMP_A.a + k));
}

describe('operatingPoint', () => {
  it('rejects bad options and a NaN system', () => {
    const sys = quadraticSystem(10, 0.002);
    expectHeadflowError(
      () => operatingPoint(pump, sys, { density: q(0, 'kg/m3') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => operatingPoint(pump, sys, { g: q(0, 'm/s2') }), 'INVALID_ARGUMENT');
    const nan = { staticHead: q(10, 'm'), head: () => q(Number.NaN, 'm') };
    expectHeadflowError(() => operatingPoint(pump, nan), 'INVALID_ARGUMENT');
  });
  it('NO_SOLUTION: shut-off head below static head', () => {
    const err = expectHeadflowError(
      () => operatingPoint(pump, quadraticSystem(45, 0.001)),
      'NO_SOLUTION',
    );
    expect(err.message).toContain(
      'the pump cannot reach the static head: shut-off 40 m < static 45 m',
    );
  });
  it('NO_SOLUTION: the catalogue starts above zero flow and is already below the system', () => {
    const p = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A).slice(1),
      fit: EXACT_FITS,
    });
    const err = expectHeadflowError(
      () => operatingPoint(p, quadraticSystem(39.5, 0.001)),
      'NO_SOLUTION',
    );
    expect(err.message).toContain('first catalogue flow');
  });
  it('NO_SOLUTION: the system needs more flow than the catalogue covers', () => {
    const err = expectHeadflowError(
      () => operatingPoint(pump, quadraticSystem(-20, 0.0001)),
      'NO_SOLUTION',
    );
    expect(err.message).toContain('the system needs more flow than the catalogue covers');
    expect(err.message).toContain('Q_max = 0.05 m3/s');
  });
  it('equals the closed-form intersection to 1e-9 (exact quadratic pump and system)', () => {
    // pump H = 40 - 0.001 Q^2, system 10 + 0.002 Q^2: Q = 100 m3/h, H = 30 m, BEP.
    const op = operatingPoint(pump, quadraticSystem(10, 0.002), { density: q(1000, 'kg/m3') });
    expectRelative(to(op.flow, 'm3/h'), 100, 1e-9);
    expectRelative(to(op.head, 'm'), 30, 1e-9);
    expectRelative(op.efficiency ?? 0, 0.75, 1e-9);
    expectRelative(op.shaftPower ?? 0, (1000 * 9.80665 * (100 / 3600) * 30) / 0.75, 1e-9);
    expectRelative(to(op.npshRequired ?? q(0, 'm'), 'm'), 1 + 0.0002 * 100 * 100, 1e-9);
    expectRelative(op.percentOfBep ?? 0, 100, 1e-7);
    expect(op.inPreferredRegion).toBe(true);
    expect(op.inAllowableRegion).toBe(true);
    expect(op.shares).toHaveLength(1);
    expect(op.iterations).toBeGreaterThan(0);
    expect(op.iterations).toBeLessThan(20);
    expect(op.evaluations).toBe(op.iterations + 2);
    expect(op.warnings).toEqual([]);
  });
  it('sweep: closed-form intersections to 1e-9 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 39, noNaN: true }),
        fc.double({ min: 0.0003, max: 0.05, noNaN: true }),
        (hs, k) => {
          const qx = exactFlow(hs, k);
          if (qx > PUMP_A.qMax) return;
          const op = operatingPoint(pump, quadraticSystem(hs, k));
          expectRelative(to(op.flow, 'm3/h'), qx, 1e-9, `hs=${hs}, k=${k}`);
          expectRelative(to(op.head, 'm'), PUMP_A.h0 - PUMP_A.a * qx * qx, 1e-9);
        },
      ),
    );
  });
  it('raising the static head lowers the operating flow (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 35, noNaN: true }),
        fc.double({ min: 0.01, max: 4, noNaN: true }),
        fc.double({ min: 0.001, max: 0.02, noNaN: true }),
        (hs, dh, k) => {
          const a = operatingPoint(pump, quadraticSystem(hs, k));
          const b = operatingPoint(pump, quadraticSystem(hs + dh, k));
          expect(b.flow).toBeLessThan(a.flow);
        },
      ),
    );
  });
  it('warns outside the preferred region and without NPSH data; no power without density', () => {
    const op = operatingPoint(pump, quadraticSystem(0, 0.0005)); // 163 m3/h, 163 % of BEP
    expect(op.shaftPower).toBeUndefined();
    expect(op.inPreferredRegion).toBe(false);
    expect(op.warnings.join(' ')).toContain('outside the preferred operating region');
    const low = operatingPoint(pump, quadraticSystem(39.9, 0.001));
    expect(low.npshRequired).toBeUndefined();
    expect(low.warnings.join(' ')).toContain('NPSH required is not known');
    const bare = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A).map((p) => ({ flow: p.flow, head: p.head })),
    });
    const b = operatingPoint(bare, quadraticSystem(10, 0.002), { density: 1000 as Density });
    expect(b.efficiency).toBeUndefined();
    expect(b.shaftPower).toBeUndefined();
    expect(b.percentOfBep).toBeUndefined();
    expect(b.warnings.join(' ')).toContain('no NPSH-required data');
  });
  it('a system whose static head equals the shut-off head runs at (about) zero flow', () => {
    // the fitted shut-off head is 40 m within round-off, so the crossing is within ~1e-9 m3/h of 0
    const op = operatingPoint(pump, quadraticSystem(to(pump.shutoffHead ?? q(0, 'm'), 'm'), 0.002));
    expect(op.flow).toBe(0);
    expect(op.iterations).toBe(0);
  });
});

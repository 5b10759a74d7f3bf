import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { operatingPoint, pumpCurve, speedForFlow } from '../../src/pumps/index';
import { type Length, q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { EXACT_FITS, PUMP_A, quadraticPoints, quadraticPump, quadraticSystem } from './fixtures';

const pump = quadraticPump();

describe('speedForFlow', () => {
  it('rejects bad input', () => {
    const sys = quadraticSystem(10, 0.002);
    expectHeadflowError(() => speedForFlow(pump, sys, q(0, 'm3/h')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => speedForFlow(pump, sys, q(-1, 'm3/h')), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => speedForFlow(pump, sys, q(50, 'm3/h'), { maxSpeed: q(0, 'rpm') }),
      'INVALID_ARGUMENT',
    );
    const nan = { staticHead: q(1, 'm'), head: () => Number.NaN as Length };
    expectHeadflowError(() => speedForFlow(pump, nan, q(50, 'm3/h')), 'INVALID_ARGUMENT');
  });
  it('doc example: closed form r^2 = (Hs + (k + a) Q^2) / h0', () => {
    const s = speedForFlow(pump, quadraticSystem(10, 0.002), q(80, 'm3/h'));
    expectRelative(to(s.speed, 'rpm'), 1750 * Math.sqrt(29.2 / 40), 1e-12);
    expectRelative(to(s.head, 'm'), 10 + 0.002 * 6400, 1e-15);
    expectRelative(s.efficiency ?? 0, pump.efficiency(q(80 / s.speedRatio, 'm3/h')), 1e-12);
    expect(s.iterations).toBeLessThan(20);
  });
  it('lands on the required flow within 1e-9 relative (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0.0005, max: 0.01, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        (hs, k, u) => {
          const sys = quadraticSystem(hs, k);
          const full = operatingPoint(pump, sys).flow;
          const want = u * full;
          let s: ReturnType<typeof speedForFlow>;
          try {
            s = speedForFlow(pump, sys, want as never);
          } catch {
            return; // speeds so low the duty falls past the catalogue: covered below
          }
          const op = operatingPoint(s.pump, sys);
          expectRelative(op.flow, want, 1e-9, `hs=${hs} k=${k} u=${u}`);
        },
      ),
    );
  });
  it('honours the static head: not the parabola through the origin', () => {
    // With 25 m of static head, halving the flow needs far more than half the speed.
    const sys = quadraticSystem(25, 0.0015);
    const full = operatingPoint(pump, sys).flow;
    const s = speedForFlow(pump, sys, (full / 2) as never);
    expect(s.speedRatio).toBeGreaterThan(0.75);
    expectRelative(operatingPoint(s.pump, sys).flow, full / 2, 1e-9);
  });
  it('NO_SOLUTION: too much flow even at full speed, or a speed past the catalogue', () => {
    const sys = quadraticSystem(10, 0.002);
    const err = expectHeadflowError(() => speedForFlow(pump, sys, q(110, 'm3/h')), 'NO_SOLUTION');
    expect(err.message).toContain('even at');
    expectHeadflowError(() => speedForFlow(pump, sys, q(200, 'm3/h')), 'NO_SOLUTION');
    // a faster drive is allowed when asked
    const fast = speedForFlow(pump, sys, q(110, 'm3/h'), { maxSpeed: q(2000, 'rpm') });
    expectRelative(to(fast.speed, 'rpm'), 1750 * Math.sqrt((10 + 0.003 * 110 * 110) / 40), 1e-12);
    // a system with no static head at a tiny flow would need a speed where Q/r passes 180 m3/h
    const late = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A).slice(0, 4),
      fit: EXACT_FITS,
    });
    expectHeadflowError(
      () => speedForFlow(late, quadraticSystem(0, 0.0001), q(5, 'm3/h')),
      'NO_SOLUTION',
    );
  });
});

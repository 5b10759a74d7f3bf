import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pumpCurve } from '../../src/pumps/index';
import { type Flow, q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { PUMP_A, quadraticPoints, quadraticPump } from './fixtures';

const pump = quadraticPump();
const rho = q(1000, 'kg/m3');

describe('affinity laws: atSpeed and trimmedTo', () => {
  it('rejects bad speeds and diameters', () => {
    expectHeadflowError(() => pump.atSpeed(q(0, 'rpm')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pump.trimmedTo(q(-1, 'mm')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pump.trimmedTo(q(260, 'mm')), 'OUT_OF_RANGE');
    const noD = pumpCurve({ speed: q(1750, 'rpm'), points: quadraticPoints(PUMP_A) });
    expectHeadflowError(() => noD.trimmedTo(q(240, 'mm')), 'INVALID_ARGUMENT');
  });
  it('flow, head and power scale as n, n^2, n^3; efficiency is carried along the parabola', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 1.5, noNaN: true }),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        (r, u) => {
          const p2 = pump.atSpeed((pump.speed * r) as never);
          const q1 = (u * pump.flowRange.max) as Flow;
          const q2 = (q1 * r) as Flow;
          expectRelative(p2.flowRange.max, pump.flowRange.max * r, 1e-15);
          expectRelative(p2.head(q2), pump.head(q1) * r * r, 1e-13);
          expectRelative(p2.shaftPower(q2, rho), pump.shaftPower(q1, rho) * r ** 3, 1e-12);
          expectRelative(p2.efficiency(q2), pump.efficiency(q1), 1e-13);
          expectRelative(
            p2.bestEfficiencyPoint?.flow ?? 0,
            (pump.bestEfficiencyPoint?.flow ?? 0) * r,
            1e-15,
          );
          expectRelative(p2.preferredRegion?.max ?? 0, (pump.preferredRegion?.max ?? 0) * r, 1e-15);
        },
      ),
    );
  });
  it('speed change and back is the identity', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 2, noNaN: true }),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        (r, u) => {
          const back = pump.atSpeed((pump.speed * r) as never).atSpeed(pump.speed);
          const x = (u * pump.flowRange.max) as Flow;
          expectRelative(back.speed, pump.speed, 1e-15);
          expectRelative(back.head(x), pump.head(x), 1e-14);
          expectRelative(back.shaftPower(x, rho), pump.shaftPower(x, rho), 1e-13);
          expect(back.ratedSpeed).toBe(pump.ratedSpeed);
        },
      ),
    );
  });
  it('NPSH required scales with n^2 at Q n; trims keep the full-diameter NPSHr', () => {
    const p2 = pump.atSpeed(q(1400, 'rpm'));
    const r = 1400 / 1750;
    expectRelative(
      p2.npshRequired(q(90 * r, 'm3/h')),
      pump.npshRequired(q(90, 'm3/h')) * r * r,
      1e-13,
    );
    expectRelative(p2.npshRange?.max ?? 0, (pump.npshRange?.max ?? 0) * r, 1e-15);
    const t = pump.trimmedTo(q(230, 'mm'));
    expectRelative(t.npshRequired(q(90, 'm3/h')), pump.npshRequired(q(90, 'm3/h')), 1e-15);
  });
  it('trim: flow scales with D/D0, head with (D/D0)^2 at constant speed', () => {
    const t = pump.trimmedTo(q(225, 'mm'));
    const d = 225 / 250;
    expectRelative(to(t.impellerDiameter ?? q(0, 'm'), 'mm'), 225, 1e-14);
    expectRelative(t.speed, pump.speed, 1e-15);
    expectRelative(to(t.shutoffHead ?? q(0, 'm'), 'm'), 40 * d * d, 1e-12);
    expectRelative(t.head(q(100 * d, 'm3/h')), pump.head(q(100, 'm3/h')) * d * d, 1e-13);
    expectRelative(t.flowRange.max, pump.flowRange.max * d, 1e-15);
    // trims compose with speed changes
    const both = t.atSpeed(q(1450, 'rpm'));
    const r = (1450 / 1750) * d;
    expectRelative(both.head(q(100 * r, 'm3/h')), pump.head(q(100, 'm3/h')) * r * r, 1e-13);
    expectRelative(to(both.ratedImpellerDiameter ?? q(0, 'm'), 'mm'), 250, 1e-14);
  });
});

import { describe, expect, it } from 'vitest';
import { annualEnergy, pumpCurve, speedForFlow } from '../../src/pumps/index';
import { q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { PUMP_A, quadraticPoints, quadraticPump, quadraticSystem } from './fixtures';

const pump = quadraticPump();
const system = quadraticSystem(10, 0.002);
const rho = q(998.2, 'kg/m3');
const base = { pump, system, density: rho, motorEfficiency: 0.93 };

describe('annualEnergy', () => {
  it('rejects bad input', () => {
    const profile = [{ flow: q(80, 'm3/h'), hours: 1000 }];
    expectHeadflowError(
      () => annualEnergy({ ...base, profile, control: 'valve' as never }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => annualEnergy({ ...base, profile: [], control: 'speed' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => annualEnergy({ ...base, profile, motorEfficiency: 1.1, control: 'speed' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => annualEnergy({ ...base, profile, driveEfficiency: 0, control: 'speed' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => annualEnergy({ ...base, profile, density: q(0, 'kg/m3'), control: 'speed' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        annualEnergy({ ...base, profile: [{ flow: q(80, 'm3/h'), hours: -1 }], control: 'speed' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        annualEnergy({
          ...base,
          profile,
          control: 'speed',
          price: { perKWh: -1, currency: 'EUR' },
        }),
      'INVALID_ARGUMENT',
    );
    const bare = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A, 5, false).map((p) => ({ flow: p.flow, head: p.head })),
    });
    expectHeadflowError(
      () => annualEnergy({ ...base, pump: bare, profile, control: 'speed' }),
      'INVALID_ARGUMENT',
    );
  });
  it('throttling: full speed on the pump curve, the valve burns the difference', () => {
    const r = annualEnergy({
      ...base,
      control: 'throttle',
      profile: [{ flow: q(80, 'm3/h'), hours: 4000 }],
      price: { perKWh: 0.12, currency: 'EUR' },
    });
    const row = r.rows[0];
    expectRelative(to(row?.pumpHead ?? q(0, 'm'), 'm'), 40 - 0.001 * 6400, 1e-12);
    expectRelative(
      to(row?.valveLoss ?? q(0, 'm'), 'm'),
      40 - 0.001 * 6400 - (10 + 0.002 * 6400),
      1e-12,
    );
    const shaft = pump.shaftPower(q(80, 'm3/h'), rho);
    expectRelative(r.totalKWh, ((shaft / 0.93) * 4000) / 1000, 1e-12);
    expectRelative(r.total, r.totalKWh * 3.6e6, 1e-15);
    expect(r.cost?.currency).toBe('EUR');
    expectRelative(r.cost?.amount ?? 0, r.totalKWh * 0.12, 1e-15);
    expect(row?.speed).toBe(pump.speed);
  });
  it('speed control: speedForFlow then the affinity-scaled curve; uses less energy than throttling', () => {
    const profile = [
      { flow: q(100, 'm3/h'), hours: 2000 },
      { flow: q(70, 'm3/h'), hours: 3000 },
      { flow: q(40, 'm3/h'), hours: 1000 },
      { flow: q(0, 'm3/h'), hours: 2760 },
    ];
    const speed = annualEnergy({ ...base, profile, control: 'speed', driveEfficiency: 0.97 });
    const throttle = annualEnergy({ ...base, profile, control: 'throttle' });
    expect(speed.totalKWh).toBeLessThan(throttle.totalKWh);
    const s70 = speedForFlow(pump, system, q(70, 'm3/h'));
    const row = speed.rows[1];
    expectRelative(row?.speed ?? 0, s70.speed, 1e-15);
    expectRelative(row?.shaftPower ?? 0, s70.pump.shaftPower(q(70, 'm3/h'), rho), 1e-15);
    expectRelative(
      row?.kWh ?? 0,
      ((s70.pump.shaftPower(q(70, 'm3/h'), rho) / (0.93 * 0.97)) * 3000) / 1000,
      1e-12,
    );
    expect(row?.valveLoss).toBe(0);
    // efficiency constant along the affinity parabola
    expectRelative(
      row?.pumpEfficiency ?? 0,
      pump.efficiency(q(70 / s70.speedRatio, 'm3/h')),
      1e-12,
    );
    // a zero-flow row is the pump off
    expect(speed.rows[3]?.kWh).toBe(0);
    expect(speed.rows[3]?.speed).toBeUndefined();
    expect(speed.cost).toBeUndefined();
    // at the full-speed duty both controls agree
    const one = [{ flow: q(100, 'm3/h'), hours: 1 }];
    expectRelative(
      annualEnergy({ ...base, profile: one, control: 'speed' }).totalKWh,
      annualEnergy({ ...base, profile: one, control: 'throttle' }).totalKWh,
      1e-9,
    );
    // a faster drive may be allowed for speed control
    const fast = annualEnergy({
      ...base,
      profile: [{ flow: q(110, 'm3/h'), hours: 1 }],
      control: 'speed',
      maxSpeed: q(2000, 'rpm'),
    });
    expect(fast.rows[0]?.speed ?? 0).toBeGreaterThan(pump.speed);
  });
  it('NO_SOLUTION: a throttled pump cannot raise head', () => {
    expectHeadflowError(
      () =>
        annualEnergy({
          ...base,
          control: 'throttle',
          profile: [{ flow: q(110, 'm3/h'), hours: 1 }],
        }),
      'NO_SOLUTION',
    );
  });
});

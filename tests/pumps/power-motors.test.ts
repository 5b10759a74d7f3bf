import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  hydraulicPower,
  IEC_60072_KW_RATINGS,
  motorForPump,
  NEMA_MG1_HP_RATINGS,
  powerChain,
  pumpCurve,
  selectMotor,
} from '../../src/pumps/index';
import { type Power, q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { PUMP_A, quadraticPoints, quadraticPump } from './fixtures';

describe('hydraulicPower', () => {
  it('rejects negative or non-finite input', () => {
    expectHeadflowError(
      () => hydraulicPower(q(-1, 'm3/h'), q(1, 'm'), q(1000, 'kg/m3')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => hydraulicPower(q(1, 'm3/h'), q(-1, 'm'), q(1000, 'kg/m3')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => hydraulicPower(q(1, 'm3/h'), q(1, 'm'), q(0, 'kg/m3')),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => hydraulicPower(q(1, 'm3/h'), q(1, 'm'), q(1000, 'kg/m3'), q(0, 'm/s2')),
      'INVALID_ARGUMENT',
    );
    expect(hydraulicPower(q(0, 'm3/h'), q(10, 'm'), q(1000, 'kg/m3'))).toBe(0);
  });
  it('equals rho g Q H in SI (doc example: 100 m3/h, 30 m, 1000 kg/m3 -> 8.17221 kW)', () => {
    expectRelative(
      to(hydraulicPower(q(100, 'm3/h'), q(30, 'm'), q(1000, 'kg/m3')), 'kW'),
      8.172208333,
      1e-9,
    );
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.double({ min: 0.1, max: 1000, noNaN: true }),
        fc.double({ min: 500, max: 2000, noNaN: true }),
        (Q, H, rho) => {
          expectRelative(
            hydraulicPower(Q as never, H as never, rho as never),
            rho * 9.80665 * Q * H,
            1e-15,
          );
        },
      ),
    );
  });
  it('US units: hp = gal/min x ft x SG / 3960 (common practice), to the 0.15 % that 3960 rounds', () => {
    // 3960 is exact for SG referred to water of 998.55 kg/m3; with 1000 kg/m3 the exact constant
    // is 3954.27 (NIST SP 811 factors for gal, ft, hp).
    for (const [gpm, ft, sg] of [
      [500, 120, 1],
      [1200, 350, 0.85],
      [100, 100, 1.2],
    ] as const) {
      const P = hydraulicPower(q(gpm, 'gal/min'), q(ft, 'ft'), q(1000 * sg, 'kg/m3'));
      expectRelative(to(P, 'hp'), (gpm * ft * sg) / 3960, 1.5e-3, `${gpm} gpm ${ft} ft SG ${sg}`);
      expectRelative(to(P, 'hp'), (gpm * ft * sg) / 3954.2721, 1e-7);
      const P2 = hydraulicPower(q(gpm, 'gal/min'), q(ft, 'ft'), q(998.55 * sg, 'kg/m3'));
      expectRelative(to(P2, 'hp'), (gpm * ft * sg) / 3960, 1e-5);
    }
  });
});

describe('powerChain', () => {
  it('rejects efficiencies outside (0, 1]', () => {
    const base = { flow: q(100, 'm3/h'), head: q(30, 'm'), density: q(1000, 'kg/m3') };
    expectHeadflowError(() => powerChain({ ...base, pumpEfficiency: 1.2 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => powerChain({ ...base, pumpEfficiency: 0 }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => powerChain({ ...base, pumpEfficiency: 0.7, motorEfficiency: 1.01 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => powerChain({ ...base, pumpEfficiency: 0.7, driveEfficiency: -1 }),
      'INVALID_ARGUMENT',
    );
  });
  it('divides through the chain (doc example)', () => {
    const c = powerChain({
      flow: q(100, 'm3/h'),
      head: q(30, 'm'),
      density: q(1000, 'kg/m3'),
      pumpEfficiency: 0.75,
      motorEfficiency: 0.92,
      driveEfficiency: 0.97,
    });
    expectRelative(to(c.shaft, 'kW'), 10.896277778, 1e-9);
    expectRelative(c.motorInput, c.shaft / 0.92, 1e-15);
    expectRelative(c.driveInput, c.shaft / 0.92 / 0.97, 1e-15);
    expectRelative(c.wireToWater, 0.6693, 1e-12);
    expectRelative(c.hydraulic / c.driveInput, c.wireToWater, 1e-14);
    const bare = powerChain({
      flow: q(100, 'm3/h'),
      head: q(30, 'm'),
      density: q(1000, 'kg/m3'),
      pumpEfficiency: 0.5,
    });
    expect(bare.driveInput).toBe(bare.shaft);
  });
});

describe('selectMotor', () => {
  const hp = q(1, 'hp');
  it('rejects bad input and powers above the series', () => {
    expectHeadflowError(() => selectMotor(q(-1, 'kW'), { series: 'iec' }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => selectMotor(q(1, 'kW'), { series: 'nema', serviceFactor: 0.9 }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => selectMotor(q(1, 'kW'), { series: 'abc' as never }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => selectMotor(q(1001, 'kW'), { series: 'iec' }), 'OUT_OF_RANGE');
    expectHeadflowError(() => selectMotor(q(501, 'hp'), { series: 'nema' }), 'OUT_OF_RANGE');
  });
  it('picks the rating at each step and the next one just across it, in both series', () => {
    // NEMA MG 1 and IEC 60072-1 series (values from memory, see src/pumps/motors.ts)
    for (const [series, table, unit] of [
      ['nema', NEMA_MG1_HP_RATINGS, hp],
      ['iec', IEC_60072_KW_RATINGS, 1000],
    ] as const) {
      table.forEach((r, i) => {
        const at = (r * unit) as Power;
        expect(selectMotor(at, { series }).nameplate, `${series} at ${r}`).toBe(r);
        const next = table[i + 1];
        if (next !== undefined) {
          const across = (r * unit * (1 + 1e-9)) as Power;
          expect(selectMotor(across, { series }).nameplate, `${series} across ${r}`).toBe(next);
          const below = (r * unit * (1 - 1e-9)) as Power;
          expect(selectMotor(below, { series }).nameplate).toBe(r);
        }
      });
    }
    expect(selectMotor(q(0, 'W'), { series: 'iec' }).nameplate).toBe(0.06);
  });
  it('doc example and the service factor', () => {
    expect(selectMotor(q(10.9, 'kW'), { series: 'iec' }).nameplate).toBe(11);
    const n = selectMotor(q(10.9, 'kW'), { series: 'nema' });
    expect(n.nameplate).toBe(15);
    expect(n.unit).toBe('hp');
    expectRelative(n.loadFraction, 10900 / (15 * 745.6998715822702), 1e-12);
    // 11 hp needs 15 hp at SF 1.0, but 10 hp x 1.15 covers it when the caller relies on SF
    expect(selectMotor(q(11, 'hp'), { series: 'nema' }).nameplate).toBe(15);
    expect(selectMotor(q(11, 'hp'), { series: 'nema', serviceFactor: 1.15 }).nameplate).toBe(10);
  });
});

describe('motorForPump', () => {
  const pump = quadraticPump();
  const rho = q(998, 'kg/m3');
  it('non-overloading covers the largest power to the end of the curve; duty covers the duty', () => {
    const m = motorForPump({ pump, density: rho, dutyFlow: q(100, 'm3/h'), series: 'iec' });
    expect(m.duty.motor.nameplate).toBe(11);
    expectRelative(m.duty.shaftPower, pump.shaftPower(q(100, 'm3/h'), rho), 1e-15);
    // for this pump the shaft power keeps rising to the end of the curve
    expectRelative(to(m.nonOverloading.flow, 'm3/h'), 180, 1e-9);
    // rho g Q H / eta at 180 m3/h: 998 x 9.80665 x 0.05 x 7.6 / 0.27 = 13.775 kW -> 15 kW
    expectRelative(
      to(m.nonOverloading.shaftPower, 'kW'),
      (998 * 9.80665 * 0.05 * 7.6) / 0.27 / 1000,
      1e-9,
    );
    expect(m.nonOverloading.motor.nameplate).toBe(15);
    const upTo = motorForPump({
      pump,
      density: rho,
      dutyFlow: q(100, 'm3/h'),
      series: 'nema',
      upTo: q(130, 'm3/h'),
      serviceFactor: 1.15,
    });
    expect(upTo.nonOverloading.flow).toBeLessThanOrEqual(q(130, 'm3/h') * (1 + 1e-12));
    expect(upTo.nonOverloading.motor.serviceFactor).toBe(1.15);
  });
  it('rejects pumps without efficiency data and flows off the curve', () => {
    const bare = pumpCurve({
      speed: q(1750, 'rpm'),
      points: quadraticPoints(PUMP_A, 5, false).map((p) => ({ flow: p.flow, head: p.head })),
    });
    expectHeadflowError(
      () => motorForPump({ pump: bare, density: rho, dutyFlow: q(100, 'm3/h'), series: 'iec' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        motorForPump({
          pump,
          density: rho,
          dutyFlow: q(100, 'm3/h'),
          series: 'iec',
          upTo: q(200, 'm3/h'),
        }),
      'OUT_OF_RANGE',
    );
    expectHeadflowError(
      () => motorForPump({ pump, density: q(0, 'kg/m3'), dutyFlow: q(100, 'm3/h'), series: 'iec' }),
      'INVALID_ARGUMENT',
    );
  });
});

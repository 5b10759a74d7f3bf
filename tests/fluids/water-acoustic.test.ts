import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  constantFluid,
  tabulatedFluid,
  water,
  waterDensity,
  waterSpecificHeat,
  waterSpeedOfSound,
} from '../../src/fluids/index';
import { type Pressure, q, type Temperature, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('waterSpeedOfSound and waterSpecificHeat: special values and domain', () => {
  it('refuse NaN, infinity, non-numbers, ice, boiling water and states past region 1', () => {
    for (const f of [waterSpeedOfSound, waterSpecificHeat]) {
      expectHeadflowError(() => f(Number.NaN as Temperature, q(1, 'atm')), 'INVALID_ARGUMENT');
      expectHeadflowError(
        () => f(q(20, 'degC'), Number.POSITIVE_INFINITY as Pressure),
        'INVALID_ARGUMENT',
      );
      expectHeadflowError(
        () => f('300' as unknown as Temperature, q(1, 'atm')),
        'INVALID_ARGUMENT',
      );
      expectHeadflowError(() => f(q(-5, 'degC'), q(1, 'atm')), 'OUT_OF_RANGE');
      expectHeadflowError(() => f(q(100, 'degC'), q(1, 'atm')), 'OUT_OF_RANGE');
      expectHeadflowError(() => f(q(20, 'degC'), q(200, 'MPa')), 'OUT_OF_RANGE');
    }
  });
});

describe('water().at carries the bulk modulus and the specific heat', () => {
  it('bulkModulus is rho w^2 with w the IF97 speed of sound, specificHeat is the IF97 c_p', () => {
    for (const t of [1, 20, 60, 95]) {
      const s = water().at(q(t, 'degC'));
      const w = waterSpeedOfSound(q(t, 'degC'), q(1, 'atm'));
      // same formulation, one rounding apart: 1e-14
      expectRelative(s.bulkModulus ?? 0, s.density * w * w, 1e-14, `${t} degC K`);
      expectRelative(
        s.specificHeat ?? 0,
        waterSpecificHeat(q(t, 'degC'), q(1, 'atm')),
        1e-15,
        `${t} degC cp`,
      );
      expect(s.density).toBe(waterDensity(q(t, 'degC'), q(1, 'atm')));
    }
  });
  it('doc example: 20 degC, 1 atm: K = 2196.6 MPa, c_p = 4.1848 kJ/(kg K)', () => {
    const s = water().at(q(20, 'degC'));
    expectRelative(to(s.bulkModulus ?? q(0, 'Pa'), 'MPa'), 2196.58, 1e-5);
    expectRelative(to(s.specificHeat ?? q(0, 'J/(kg*K)'), 'kJ/(kg*K)'), 4.18479, 1e-5);
  });
  it('over the liquid range: K and c_p finite and positive; K rises with pressure (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 274, max: 440, noNaN: true }),
        fc.double({ min: 1, max: 90, noNaN: true }),
        (t, pMpa) => {
          const lo = water().at(t as Temperature, (pMpa * 1e6) as Pressure);
          const hi = water().at(t as Temperature, ((pMpa + 5) * 1e6) as Pressure);
          const k = lo.bulkModulus ?? Number.NaN;
          const cp = lo.specificHeat ?? Number.NaN;
          return (
            Number.isFinite(k) &&
            k > 0 &&
            Number.isFinite(cp) &&
            cp > 3000 &&
            cp < 6000 &&
            (hi.bulkModulus ?? 0) > k
          );
        },
      ),
    );
  });
});

describe('constant and tabulated fluids take the bulk modulus and the specific heat optionally', () => {
  const base = { name: 'demo oil', density: q(870, 'kg/m3'), dynamicViscosity: q(30, 'cP') };
  it('constant fluid: absent by default, carried when given, refused when not positive', () => {
    const s0 = constantFluid(base).at(q(40, 'degC'));
    expect(s0.bulkModulus).toBeUndefined();
    expect(s0.specificHeat).toBeUndefined();
    const s1 = constantFluid({
      ...base,
      bulkModulus: q(1500, 'MPa'),
      specificHeat: q(2, 'kJ/(kg*K)'),
    }).at(q(40, 'degC'));
    expect(s1.bulkModulus).toBe(1.5e9);
    expect(s1.specificHeat).toBe(2000);
    expectHeadflowError(
      () => constantFluid({ ...base, bulkModulus: q(0, 'Pa') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => constantFluid({ ...base, specificHeat: Number.NaN as never }),
      'INVALID_ARGUMENT',
    );
  });
  it('tabulated fluid: interpolates the columns when every row has them; all or none', () => {
    const rows = [
      {
        temperature: q(0, 'degC'),
        density: q(1100, 'kg/m3'),
        dynamicViscosity: q(4, 'cP'),
        bulkModulus: q(2000, 'MPa'),
        specificHeat: q(3.5, 'kJ/(kg*K)'),
      },
      {
        temperature: q(20, 'degC'),
        density: q(1090, 'kg/m3'),
        dynamicViscosity: q(2, 'cP'),
        bulkModulus: q(2200, 'MPa'),
        specificHeat: q(3.6, 'kJ/(kg*K)'),
      },
    ];
    const f = tabulatedFluid({ name: 'demo brine (invented numbers)', rows });
    const mid = f.at(q(10, 'degC'));
    // two rows: the monotone cubic is the straight line between them
    expectRelative(mid.bulkModulus ?? 0, 2.1e9, 1e-12);
    expectRelative(mid.specificHeat ?? 0, 3550, 1e-12);
    const [r0, r1] = rows as [(typeof rows)[0], (typeof rows)[0]];
    const { bulkModulus: _k, ...noK } = r1;
    expectHeadflowError(() => tabulatedFluid({ name: 'x', rows: [r0, noK] }), 'INVALID_ARGUMENT');
    const plain = tabulatedFluid({
      name: 'y',
      rows: rows.map(({ bulkModulus: _b, specificHeat: _c, ...r }) => r),
    }).at(q(10, 'degC'));
    expect(plain.bulkModulus).toBeUndefined();
    expect(plain.specificHeat).toBeUndefined();
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type FluidTableRow, tabulatedFluid } from '../../src/fluids/index';
import { type Density, type Pressure, q, type Temperature, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

// Invented demo numbers (not property data of any real fluid).
const rows: FluidTableRow[] = [
  {
    temperature: q(0, 'degC'),
    density: q(1100, 'kg/m3'),
    dynamicViscosity: q(4, 'cP'),
    vaporPressure: q(0.5, 'kPa'),
  },
  {
    temperature: q(20, 'degC'),
    density: q(1090, 'kg/m3'),
    dynamicViscosity: q(2, 'cP'),
    vaporPressure: q(2, 'kPa'),
  },
  {
    temperature: q(40, 'degC'),
    density: q(1078, 'kg/m3'),
    dynamicViscosity: q(1.2, 'cP'),
    vaporPressure: q(6, 'kPa'),
  },
  {
    temperature: q(60, 'degC'),
    density: q(1065, 'kg/m3'),
    dynamicViscosity: q(0.8, 'cP'),
    vaporPressure: q(16, 'kPa'),
  },
];
const demo = tabulatedFluid({ name: 'demo brine', rows, source: 'invented for tests' });

describe('tabulatedFluid: bad definitions', () => {
  it('refuses names, short tables, unsorted rows, bad values and partial vapour pressure', () => {
    expectHeadflowError(() => tabulatedFluid({ name: '', rows }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => tabulatedFluid({ name: 'x', rows: rows.slice(0, 1) }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => tabulatedFluid({ name: 'x', rows: [rows[1], rows[0]] as FluidTableRow[] }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        tabulatedFluid({
          name: 'x',
          rows: [
            rows[0] as FluidTableRow,
            { ...(rows[1] as FluidTableRow), density: -1 as Density },
          ],
        }),
      'INVALID_ARGUMENT',
    );
    const { vaporPressure: _drop, ...noPv } = rows[1] as FluidTableRow;
    expectHeadflowError(
      () => tabulatedFluid({ name: 'x', rows: [rows[0] as FluidTableRow, noPv] }),
      'INVALID_ARGUMENT',
    );
  });
});

describe('tabulatedFluid: states', () => {
  it('reproduces every row exactly', () => {
    for (const r of rows) {
      const s = demo.at(r.temperature);
      expectRelative(s.density, r.density, 1e-14);
      expectRelative(s.dynamicViscosity, r.dynamicViscosity, 1e-14);
      expectRelative(s.vaporPressure ?? 0, r.vaporPressure ?? 0, 1e-14);
    }
  });
  it('interpolates viscosity in log space (two rows: the geometric mean at the midpoint, doc example)', () => {
    const two = tabulatedFluid({
      name: 'two',
      rows: rows.slice(0, 2).map(({ vaporPressure: _v, ...r }) => r),
    });
    expectRelative(to(two.at(q(10, 'degC')).dynamicViscosity, 'cP'), Math.sqrt(8), 1e-13);
    expect(two.hasVaporPressure).toBe(false);
    expectHeadflowError(
      () => two.vaporPressureInto(Float64Array.of(280), new Float64Array(1)),
      'OUT_OF_RANGE',
    );
  });
  it('outside the table is OUT_OF_RANGE with the table span; impossible input INVALID_ARGUMENT', () => {
    const e = expectHeadflowError(() => demo.at(q(70, 'degC')), 'OUT_OF_RANGE');
    expect(e.message).toMatch(/extend the table/);
    expectHeadflowError(() => demo.at(Number.NaN as Temperature), 'INVALID_ARGUMENT');
    expectHeadflowError(() => demo.at(q(20, 'degC'), -1 as Pressure), 'INVALID_ARGUMENT');
    expect(demo.validRange.minTemperature).toBe(273.15);
    expect(demo.validRange.maxTemperature).toBeCloseTo(333.15, 12);
    expect(demo.validRange.description).toMatch(/invented for tests/);
  });
  it('array forms agree with at()', () => {
    const t = Float64Array.of(275, 290, 310, 333);
    const rho = demo.densityInto(t, new Float64Array(4));
    const mu = demo.dynamicViscosityInto(t, new Float64Array(4));
    const pv = demo.vaporPressureInto(t, new Float64Array(4));
    t.forEach((x, i) => {
      const s = demo.at(x as Temperature);
      expect(rho[i]).toBe(s.density);
      expect(mu[i]).toBe(s.dynamicViscosity);
      expect(pv[i]).toBe(s.vaporPressure);
    });
    expectHeadflowError(
      () => demo.densityInto(Float64Array.of(200), new Float64Array(1)),
      'OUT_OF_RANGE',
    );
  });
  it('monotone data give monotone properties between rows (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 273.15, max: 333.15, noNaN: true }),
        fc.double({ min: 273.15, max: 333.15, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a < b ? [a, b] : [b, a];
          const sl = demo.at(lo as Temperature);
          const sh = demo.at(hi as Temperature);
          expect(sh.density).toBeLessThanOrEqual(sl.density);
          expect(sh.dynamicViscosity).toBeLessThanOrEqual(sl.dynamicViscosity);
          expect(sh.vaporPressure ?? 0).toBeGreaterThanOrEqual(sl.vaporPressure ?? 0);
        },
      ),
    );
  });
});

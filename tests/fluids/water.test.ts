import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  water,
  waterDensity,
  waterDensityInto,
  waterSaturationPressure,
  waterSaturationPressureInto,
  waterSaturationTemperature,
  waterViscosity,
  waterViscosityInto,
} from '../../src/fluids/index';
import { type Pressure, q, type Temperature, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const ATM = q(1, 'atm');
const K = (v: number): Temperature => v as Temperature;
const Pa = (v: number): Pressure => v as Pressure;

describe('special values', () => {
  it('NaN, infinity and negative absolute input are INVALID_ARGUMENT', () => {
    for (const f of [waterDensity, waterViscosity]) {
      expectHeadflowError(() => f(K(Number.NaN), ATM), 'INVALID_ARGUMENT');
      expectHeadflowError(() => f(K(Number.POSITIVE_INFINITY), ATM), 'INVALID_ARGUMENT');
      expectHeadflowError(() => f(K(-1), ATM), 'INVALID_ARGUMENT');
      expectHeadflowError(() => f(K(300), Pa(Number.NaN)), 'INVALID_ARGUMENT');
      expectHeadflowError(() => f(K(300), Pa(-1)), 'INVALID_ARGUMENT');
    }
    expectHeadflowError(() => waterSaturationPressure(K(Number.NaN)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => waterSaturationPressure(K(-5)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => waterSaturationTemperature(Pa(Number.NaN)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => waterSaturationTemperature(Pa(-5)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => water().at(K(Number.NaN)), 'INVALID_ARGUMENT');
  });
  it('region boundaries: 273.15 K and 623.15 K and 100 MPa are inside, just beyond is not', () => {
    expect(waterDensity(K(273.15), ATM)).toBeGreaterThan(999);
    expect(waterDensity(K(623.15), q(100, 'MPa'))).toBeGreaterThan(600);
    expectHeadflowError(() => waterDensity(K(623.16), q(100, 'MPa')), 'OUT_OF_RANGE');
    expectHeadflowError(() => waterDensity(K(300), Pa(100e6 + 1)), 'OUT_OF_RANGE');
    expect(waterSaturationPressure(K(273.15))).toBeCloseTo(611.213, 2);
    expect(waterSaturationPressure(K(647.096))).toBeCloseTo(22.064e6, -2);
    expectHeadflowError(() => waterSaturationPressure(K(273.14)), 'OUT_OF_RANGE');
    expectHeadflowError(() => waterSaturationPressure(K(647.1)), 'OUT_OF_RANGE');
    expectHeadflowError(() => waterSaturationTemperature(Pa(611)), 'OUT_OF_RANGE');
    expectHeadflowError(() => waterSaturationTemperature(Pa(22.1e6)), 'OUT_OF_RANGE');
  });
});

describe('states that are not liquid', () => {
  it('ice: below 273.15 K is OUT_OF_RANGE and says to raise the temperature', () => {
    const e = expectHeadflowError(() => waterDensity(q(-5, 'degC'), ATM), 'OUT_OF_RANGE');
    expect(e.message).toMatch(/ice/);
    expect(e.message).toMatch(/Raise the temperature/);
    expect(e.parameter).toBe('temperature');
  });
  it('steam: at or above the boiling point of the pressure says which pressure is needed', () => {
    const e = expectHeadflowError(() => water().at(q(120, 'degC')), 'OUT_OF_RANGE');
    expect(e.message).toMatch(
      /Raise the pressure above the saturation pressure 1986\d+ Pa \(198\.6\d* kPa\)/,
    );
    expect(e.message).toMatch(/absolute/);
    // exactly at the saturation temperature is refused
    const ts = waterSaturationTemperature(q(0.1, 'MPa'));
    expectHeadflowError(() => waterDensity(ts, q(0.1, 'MPa')), 'OUT_OF_RANGE');
    // below the triple-point pressure water is vapour at every temperature of region 1
    expectHeadflowError(() => waterViscosity(K(273.15), Pa(500)), 'OUT_OF_RANGE');
    expectHeadflowError(() => waterDensity(K(300), Pa(0)), 'OUT_OF_RANGE');
    // just below the boiling point, liquid
    expect(waterDensity(K(ts - 1e-6), q(0.1, 'MPa'))).toBeGreaterThan(950);
  });
  it('hot water stays liquid under enough pressure (120 degC at 3 bar absolute)', () => {
    const s = water().at(q(120, 'degC'), q(3, 'bar'));
    expect(s.density).toBeGreaterThan(940);
    expect(s.vaporPressure).toBeLessThan(3e5);
  });
});

describe('water() as a Fluid', () => {
  it('states at 20 degC and 1 atm (default pressure), as in docs/fluids.md', () => {
    const s = water().at(q(20, 'degC'));
    expect(s.pressure).toBe(101325);
    expect(s.temperature).toBeCloseTo(293.15, 12);
    expectRelative(to(s.density, 'kg/m3'), 998.2061, 1e-7);
    expectRelative(to(s.dynamicViscosity, 'mPa*s'), 1.0016, 1e-4);
    expectRelative(s.kinematicViscosity, s.dynamicViscosity / s.density, 1e-15);
    expectRelative(to(s.vaporPressure ?? q(0, 'Pa'), 'kPa'), 2.3392, 1e-4);
    expect(water()).toBe(water());
    expect(water().hasVaporPressure).toBe(true);
  });
  it('validRange states the region in quantities', () => {
    const r = water().validRange;
    expect(r.minTemperature).toBe(273.15);
    expect(r.maxTemperature).toBe(623.15);
    expect(r.maxPressure).toBe(100e6);
    expect(r.minPressure).toBeCloseTo(611.2, 0);
    expect(r.description).toMatch(/liquid/);
  });
  it('array forms agree with the scalar functions element by element', () => {
    const t = Float64Array.of(275, 293.15, 313.15, 350, 370);
    const rho = water().densityInto(t, new Float64Array(5));
    const mu = water().dynamicViscosityInto(t, new Float64Array(5), ATM);
    const pv = water().vaporPressureInto(t, new Float64Array(5));
    for (let i = 0; i < t.length; i++) {
      const ti = K(t[i] as number);
      expect(rho[i]).toBe(waterDensity(ti, ATM));
      expect(mu[i]).toBe(waterViscosity(ti, ATM));
      expect(pv[i]).toBe(waterSaturationPressure(ti));
    }
    expect(waterDensityInto(t, q(5, 'bar'), new Float64Array(5))[0]).toBe(
      waterDensity(K(275), q(5, 'bar')),
    );
    expect(waterViscosityInto(t, ATM, new Float64Array(5))[1]).toBe(waterViscosity(K(293.15), ATM));
    expect(waterSaturationPressureInto(t, new Float64Array(5))[2]).toBe(
      waterSaturationPressure(K(313.15)),
    );
  });
  it('array forms name the offending element and refuse a wrong output length', () => {
    const e = expectHeadflowError(
      () => waterDensityInto(Float64Array.of(300, 400), ATM, new Float64Array(2)),
      'OUT_OF_RANGE',
    );
    expect(e.parameter).toBe('temperatures[1]');
    expectHeadflowError(
      () => waterViscosityInto(Float64Array.of(300), ATM, new Float64Array(2)),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => waterSaturationPressureInto(Float64Array.of(200), new Float64Array(1)),
      'OUT_OF_RANGE',
    );
  });
});

describe('laws (fast-check)', () => {
  it('density decreases with temperature above 4 degC at 1 atm', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 277.2, max: 372.5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.2, noNaN: true }),
        (t, dt) => {
          expect(waterDensity(K(t + dt), ATM)).toBeLessThan(waterDensity(K(t), ATM));
        },
      ),
    );
  });
  it('the density maximum lies near 4 degC at 1 atm (denser than at 0 and 8 degC)', () => {
    const at4 = waterDensity(q(4, 'degC'), ATM);
    expect(at4).toBeGreaterThan(waterDensity(q(0, 'degC'), ATM));
    expect(at4).toBeGreaterThan(waterDensity(q(8, 'degC'), ATM));
  });
  it('viscosity decreases with temperature (1 atm and 10 MPa)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 273.15, max: 372.5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.2, noNaN: true }),
        fc.constantFrom(101325, 10e6),
        (t, dt, p) => {
          expect(waterViscosity(K(t + dt), Pa(p))).toBeLessThan(waterViscosity(K(t), Pa(p)));
        },
      ),
    );
  });
  it('density increases with pressure (compressed liquid)', () => {
    fc.assert(
      fc.property(fc.double({ min: 273.15, max: 450, noNaN: true }), (t) => {
        expect(waterDensity(K(t), q(50, 'MPa'))).toBeGreaterThan(waterDensity(K(t), q(2, 'MPa')));
      }),
    );
  });
  it('saturation pressure and temperature are inverse to 1e-9', () => {
    fc.assert(
      fc.property(fc.double({ min: 273.15, max: 647.096, noNaN: true }), (t) => {
        const back = waterSaturationTemperature(waterSaturationPressure(K(t)));
        expectRelative(back, t, 1e-9, `T=${t}`);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 611.2127, max: 22.064e6, noNaN: true }), (p) => {
        const back = waterSaturationPressure(waterSaturationTemperature(Pa(p)));
        expectRelative(back, p, 1e-9, `p=${p}`);
      }),
    );
  });
  it('liquid exactly when T < T_s(p) inside region 1 (fast-check over T and p)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 273.15, max: 623.15, noNaN: true }),
        fc.double({ min: 700, max: 20e6, noNaN: true }),
        (t, p) => {
          const liquid = t < waterSaturationTemperature(Pa(p));
          if (liquid) expect(waterDensity(K(t), Pa(p))).toBeGreaterThan(500);
          else expectHeadflowError(() => waterDensity(K(t), Pa(p)), 'OUT_OF_RANGE');
        },
      ),
    );
  });
});

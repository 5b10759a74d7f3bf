import { describe, expect, it } from 'vitest';
import { constantFluid } from '../../src/fluids/index';
import {
  type Density,
  type DynamicViscosity,
  type Pressure,
  q,
  type Temperature,
  to,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const oil = constantFluid({
  name: 'light oil',
  density: q(870, 'kg/m3'),
  dynamicViscosity: q(30, 'cP'),
});

describe('constantFluid', () => {
  it('refuses impossible definitions', () => {
    const d = { name: 'x', density: q(1000, 'kg/m3'), dynamicViscosity: q(1, 'cP') };
    expectHeadflowError(() => constantFluid({ ...d, name: ' ' }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => constantFluid({ ...d, density: 0 as Density }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => constantFluid({ ...d, density: Number.NaN as Density }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => constantFluid({ ...d, dynamicViscosity: -1 as DynamicViscosity }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => constantFluid({ ...d, vaporPressure: -1 as Pressure }),
      'INVALID_ARGUMENT',
    );
  });
  it('refuses impossible states', () => {
    expectHeadflowError(() => oil.at(Number.NaN as Temperature), 'INVALID_ARGUMENT');
    expectHeadflowError(() => oil.at(-1 as Temperature), 'INVALID_ARGUMENT');
    expectHeadflowError(() => oil.at(q(20, 'degC'), -1 as Pressure), 'INVALID_ARGUMENT');
  });
  it('returns the same properties at any state (doc example)', () => {
    const s = oil.at(q(40, 'degC'));
    expect(s.density).toBe(870);
    expectRelative(to(s.kinematicViscosity, 'cSt'), 30 / 0.87, 1e-14);
    expect(s.pressure).toBe(101325);
    expect('vaporPressure' in s).toBe(false);
    expect(oil.hasVaporPressure).toBe(false);
    expect(oil.validRange.maxTemperature).toBe(Number.POSITIVE_INFINITY);
    expect(oil.at(q(80, 'degC'), q(5, 'bar')).dynamicViscosity).toBe(s.dynamicViscosity);
  });
  it('array forms and vapour pressure', () => {
    const t = Float64Array.of(280, 300);
    expect(oil.densityInto(t, new Float64Array(2))).toEqual(Float64Array.of(870, 870));
    expect(oil.dynamicViscosityInto(t, new Float64Array(2))[1]).toBeCloseTo(0.03, 15);
    expectHeadflowError(() => oil.vaporPressureInto(t, new Float64Array(2)), 'OUT_OF_RANGE');
    expectHeadflowError(
      () => oil.densityInto(Float64Array.of(Number.NaN), new Float64Array(1)),
      'INVALID_ARGUMENT',
    );
    const v = constantFluid({
      name: 'v',
      density: q(800, 'kg/m3'),
      dynamicViscosity: q(1, 'cP'),
      vaporPressure: q(10, 'kPa'),
    });
    expect(v.at(q(20, 'degC')).vaporPressure).toBe(10000);
    expect(v.vaporPressureInto(t, new Float64Array(2))).toEqual(Float64Array.of(10000, 10000));
  });
});

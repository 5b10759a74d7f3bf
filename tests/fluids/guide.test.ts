/** The samples of docs/fluids.md, run with the numbers the guide prints. */
import { describe, expect, it } from 'vitest';
import {
  constantFluid,
  tabulatedFluid,
  water,
  waterDensityInto,
  waterViscosityInto,
} from '../../src/fluids/index';
import { q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('docs/fluids.md samples', () => {
  it('water at 20 degC and 120 degC / 3 bar', () => {
    const cold = water().at(q(20, 'degC'));
    expectRelative(to(cold.density, 'kg/m3'), 998.206, 1e-6);
    expectRelative(to(cold.dynamicViscosity, 'mPa*s'), 1.0016, 1e-4);
    expectRelative(to(cold.kinematicViscosity, 'cSt'), 1.0034, 1e-4);
    expectRelative(to(cold.vaporPressure ?? q(0, 'Pa'), 'kPa'), 2.339, 1e-3);
    const hot = water().at(q(120, 'degC'), q(3, 'bar'));
    expectRelative(to(hot.density, 'kg/m3'), 943.2, 1e-4);
  });
  it('array forms over a 5..45 degC loop', () => {
    const t = Float64Array.from({ length: 9 }, (_, i) => 278.15 + 5 * i);
    const rho = waterDensityInto(t, q(1, 'atm'), new Float64Array(t.length));
    const mu = waterViscosityInto(t, q(1, 'atm'), new Float64Array(t.length));
    expect(rho[8]).toBeLessThan(rho[0] ?? 0);
    expectRelative((mu[0] ?? 0) / (mu[8] ?? 1), 2.5, 0.05);
  });
  it('boiling water message', () => {
    const e = expectHeadflowError(() => water().at(q(100, 'degC')), 'OUT_OF_RANGE');
    expect(e.message).toMatch(/boils at 373\.124 K \(99\.9743 degC\)/);
  });
  it('constant and tabulated fluids', () => {
    const oil = constantFluid({
      name: 'light oil',
      density: q(870, 'kg/m3'),
      dynamicViscosity: q(30, 'cP'),
    });
    expectRelative(to(oil.at(q(40, 'degC')).kinematicViscosity, 'cSt'), 34.48, 1e-3);
    const brine = tabulatedFluid({
      name: 'demo brine (invented numbers)',
      source: 'invented for this guide',
      rows: [
        { temperature: q(0, 'degC'), density: q(1100, 'kg/m3'), dynamicViscosity: q(4, 'cP') },
        { temperature: q(20, 'degC'), density: q(1090, 'kg/m3'), dynamicViscosity: q(2, 'cP') },
      ],
    });
    expectRelative(to(brine.at(q(10, 'degC')).dynamicViscosity, 'cP'), 2.828, 1e-3);
    expectHeadflowError(() => brine.at(q(30, 'degC')), 'OUT_OF_RANGE');
  });
});

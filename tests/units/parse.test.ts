import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DIMENSIONS,
  formatQuantity,
  parseQuantity,
  q,
  to,
  UNITS,
  type UnitSymbol,
  unitsOf,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

describe('parseQuantity: special values and errors', () => {
  it('rejects empty and blank strings', () => {
    expectHeadflowError(() => parseQuantity(''), 'INVALID_ARGUMENT');
    expectHeadflowError(() => parseQuantity('   '), 'INVALID_ARGUMENT');
    expectHeadflowError(() => parseQuantity(undefined as unknown as string), 'INVALID_ARGUMENT');
  });
  it('rejects a missing number or a missing unit, saying which', () => {
    expect(expectHeadflowError(() => parseQuantity('ft'), 'INVALID_ARGUMENT').message).toContain(
      'does not start with a number',
    );
    expect(expectHeadflowError(() => parseQuantity('350'), 'INVALID_ARGUMENT').message).toContain(
      'unit is missing',
    );
    expectHeadflowError(() => parseQuantity('NaN m'), 'INVALID_ARGUMENT');
    expectHeadflowError(() => parseQuantity('Infinity m'), 'INVALID_ARGUMENT');
  });
  it('rejects unknown units and overflow', () => {
    expectHeadflowError(() => parseQuantity('3 furlongs'), 'UNKNOWN_UNIT');
    expectHeadflowError(() => parseQuantity('3 m m'), 'UNKNOWN_UNIT');
    expectHeadflowError(() => parseQuantity('1e999 m'), 'INVALID_ARGUMENT');
  });
  it('rejects a unit of the wrong dimension, naming both', () => {
    const err = expectHeadflowError(() => parseQuantity('45 psi', 'length'), 'WRONG_DIMENSION');
    expect(err.message).toContain('pressure');
    expect(err.message).toContain('length');
  });
  it('rejects a temperature below absolute zero', () => {
    expectHeadflowError(() => parseQuantity('-500 degF', 'temperature'), 'OUT_OF_RANGE');
  });
});

describe('parseQuantity: accepted forms', () => {
  const cases: readonly (readonly [string, number])[] = [
    ['350 ft', 106.68],
    ['1,200 gal/min', 0.07570823568],
    ['1,234,567.5 L', 1234.5675],
    ['45 psi', 310264.07819257624],
    ['60 degF', 288.7055555555556],
    ['2.5e-3 Pa*s', 0.0025],
    ['2.5E-3 Pa*s', 0.0025],
    ['-12.5 m', -12.5],
    ['+3 m', 3],
    ['.5 m', 0.5],
    ['7.m', 7],
    ['  10   m3/h  ', 10 / 3600],
    ['10m3/h', 10 / 3600],
    ['20 °C', 293.15],
    ['68 °F', 293.15],
    ['10 m³/h', 10 / 3600],
    ['10 m^3/h', 10 / 3600],
    ['1 mPa·s', 1e-3],
    ['9.81 m/s²', 9.81],
  ];
  it.each(cases)('%s', (text, expected) => {
    expectRelative(parseQuantity(text), expected, 1e-15, text);
  });
  it('checks the dimension when asked', () => {
    const flow = parseQuantity('1,200 gal/min', 'flow');
    expectRelative(to(flow, 'm3/h'), 272.549648448, 1e-14); // 1200 x 3.785411784 L x 60 min/h, exact
  });
});

describe('formatQuantity', () => {
  it('writes significant digits and the symbol', () => {
    expect(formatQuantity(q(1200, 'gal/min'), 'm3/h')).toBe('272.5 m3/h');
    expect(formatQuantity(q(20, 'degC'), 'degF', 3)).toBe('68 degF');
    expect(formatQuantity(q(0, 'm'), 'ft')).toBe('0 ft');
    expect(formatQuantity(q(-1e-9, 'm'), 'm', 2)).toBe('-1e-9 m');
  });
  it('rejects bad digit counts', () => {
    for (const d of [0, 18, 2.5, Number.NaN]) {
      expectHeadflowError(() => formatQuantity(q(1, 'm'), 'm', d), 'INVALID_ARGUMENT');
    }
  });
});

describe('parse/format round trip (fast-check)', () => {
  it('parseQuantity(formatQuantity(x, u, 17)) === x within 1e-15 relative', () => {
    const pair = fc
      .constantFrom(...DIMENSIONS)
      .chain((d) => fc.tuple(fc.constant(d), fc.constantFrom(...unitsOf(d))));
    fc.assert(
      fc.property(pair, fc.double({ min: 1e-6, max: 1e9, noNaN: true }), ([d, u], x) => {
        const value = q(x, u as UnitSymbol);
        const text = formatQuantity(value as never, u as never, 17);
        const back = parseQuantity(text, d);
        const def = UNITS[u as UnitSymbol];
        const scale = Math.abs(value) + def.offset * def.factor;
        expect(Math.abs(back - value)).toBeLessThanOrEqual(4e-15 * scale);
      }),
      { numRuns: 3000 },
    );
  });
});

describe('specific heat capacity units', () => {
  it("parse with '*' or '·' and convert: 1 Btu/(lb degF) = 4.1868 kJ/(kg K) (NIST SP 811 B.8, exact)", () => {
    expect(parseQuantity('4.18 kJ/(kg*K)', 'specificHeat')).toBeCloseTo(4180, 9);
    expect(parseQuantity('1 Btu/(lb·degF)', 'specificHeat')).toBe(4186.8);
    expectHeadflowError(() => parseQuantity('4.18 kJ/(kg*K)', 'energy'), 'WRONG_DIMENSION');
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  convert,
  DIMENSIONS,
  type Dimension,
  isUnit,
  q,
  to,
  UNITS,
  type UnitSymbol,
  unitsOf,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const ALL = Object.keys(UNITS) as UnitSymbol[];

describe('q and to: special values', () => {
  it('rejects NaN and infinities with INVALID_ARGUMENT', () => {
    for (const v of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      const err = expectHeadflowError(() => q(v, 'm'), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe('value');
      expectHeadflowError(() => to(v as ReturnType<typeof q<'m'>>, 'ft'), 'INVALID_ARGUMENT');
    }
  });

  it('rejects unknown units, the empty string and wrong case with UNKNOWN_UNIT', () => {
    for (const u of ['', 'furlong', 'M', 'pa']) {
      const err = expectHeadflowError(() => q(1, u as UnitSymbol), 'UNKNOWN_UNIT');
      expect(err.message).toContain('not a known unit');
    }
    // An alias is read from text only; q names the symbol to write.
    const alias = expectHeadflowError(() => q(1, 'GPM' as UnitSymbol), 'UNKNOWN_UNIT');
    expect(alias.message).toContain('alias of gal/min');
    expectHeadflowError(() => to(q(1, 'm'), 'parsec' as 'm'), 'UNKNOWN_UNIT');
  });

  it('does not accept inherited object keys as units', () => {
    expect(isUnit('toString')).toBe(false);
    expect(isUnit('constructor')).toBe(false);
    expect(isUnit(3)).toBe(false);
  });

  it('keeps zero and negative values of non-absolute quantities', () => {
    expect(q(0, 'ft')).toBe(0);
    expect(q(-3, 'ft')).toBeCloseTo(-0.9144, 15);
  });

  it('rejects temperatures below absolute zero with OUT_OF_RANGE', () => {
    expectHeadflowError(() => q(-300, 'degC'), 'OUT_OF_RANGE');
    expectHeadflowError(() => q(-460, 'degF'), 'OUT_OF_RANGE');
    expectHeadflowError(() => q(-1, 'K'), 'OUT_OF_RANGE');
    expect(q(-273.15, 'degC')).toBe(0);
  });
});

describe('temperature at known points (NIST SP 811 B.9, exact relations)', () => {
  // t/degC = T/K - 273.15; t/degF = 1.8 t/degC + 32; T/degR = 1.8 T/K.
  const points: readonly (readonly [number, 'degC' | 'degF' | 'degR' | 'K', number])[] = [
    [0, 'degC', 273.15],
    [100, 'degC', 373.15],
    [32, 'degF', 273.15],
    [212, 'degF', 373.15],
    [-40, 'degF', 233.15],
    [-40, 'degC', 233.15],
    [491.67, 'degR', 273.15],
    [0, 'degR', 0],
    [-459.67, 'degF', 0],
    [68, 'degF', 293.15],
  ];
  it.each(points)('%d %s = %d K', (value, unit, kelvin) => {
    expectRelative(q(value, unit), kelvin, 1e-15, `${value} ${unit}`);
  });
  it('reads back in other temperature units', () => {
    expectRelative(to(q(20, 'degC'), 'degF'), 68, 1e-14);
    expectRelative(to(q(100, 'degC'), 'degR'), 671.67, 1e-14);
    expectRelative(convert(-40, 'degC', 'degF'), -40, 1e-14);
  });
});

describe('convert checks dimensions at run time', () => {
  it('converts within a dimension', () => {
    expectRelative(convert(45, 'psi', 'kPa'), 310.2640781925763, 1e-15);
    expectRelative(convert(1, 'hp', 'kW'), 0.7456998715822702, 1e-15);
  });
  it('throws WRONG_DIMENSION across dimensions, naming both', () => {
    const err = expectHeadflowError(() => convert(3, 'ft', 'psi'), 'WRONG_DIMENSION');
    expect(err.message).toContain('length');
    expect(err.message).toContain('pressure');
  });
  it('throws UNKNOWN_UNIT naming which side is unknown', () => {
    expect(expectHeadflowError(() => convert(3, 'fathom', 'm'), 'UNKNOWN_UNIT').parameter).toBe(
      'from',
    );
    expect(expectHeadflowError(() => convert(3, 'm', 'fathom'), 'UNKNOWN_UNIT').parameter).toBe(
      'into',
    );
    expectHeadflowError(() => convert(Number.NaN, 'm', 'ft'), 'INVALID_ARGUMENT');
  });
});

describe('unitsOf', () => {
  it('lists the symbols of each dimension, SI unit first', () => {
    expect(unitsOf('rotationalSpeed')).toEqual(['rad/s', 'rpm', 'rev/s']);
    expect(unitsOf('flow')).toEqual([
      'm3/s',
      'm3/h',
      'L/s',
      'L/min',
      'gal/min',
      'impgal/min',
      'ft3/s',
      'ft3/min',
      'Mgal/d',
      'm3/d',
      'ML/d',
      'L/h',
    ]);
    for (const d of DIMENSIONS) expect(UNITS[unitsOf(d)[0] as UnitSymbol].factor).toBe(1);
  });
  it('has 18 dimensions and lists every unit exactly once', () => {
    expect(DIMENSIONS).toHaveLength(19);
    expect(DIMENSIONS.flatMap((d) => unitsOf(d)).sort()).toEqual([...ALL].sort());
  });
  it('rejects a name that is not a dimension', () => {
    expectHeadflowError(() => unitsOf('speed' as Dimension), 'INVALID_ARGUMENT');
  });
});

describe('properties (fast-check)', () => {
  const unitArb = fc.constantFrom(...ALL);
  const value = fc.double({ min: -1e12, max: 1e12, noNaN: true, noDefaultInfinity: true });

  it('to(q(x, u), u) returns x within 1e-15 relative (offset units: relative to |x| + offset)', () => {
    fc.assert(
      fc.property(unitArb, value, (u, x) => {
        const def = UNITS[u];
        if (def.dimension === 'temperature' && (x + def.offset) * def.factor < 0) return;
        if (x !== 0 && Math.abs(x) < 1e-280) return; // subnormal products lose relative precision
        const back = to(q(x, u) as never, u as never);
        // An offset unit adds and removes the offset, so its error is relative to |x| + offset.
        const scale = Math.abs(x) + def.offset;
        const tol = 1e-15 * (def.offset === 0 ? 1 : 2);
        expect(Math.abs(back - x)).toBeLessThanOrEqual(tol * scale);
      }),
      { numRuns: 5000 },
    );
  });

  it('conversion through SI agrees with a direct factor ratio between any two units of a dimension', () => {
    const pairArb = fc
      .constantFrom(...DIMENSIONS)
      .chain((d) => fc.tuple(fc.constantFrom(...unitsOf(d)), fc.constantFrom(...unitsOf(d))));
    fc.assert(
      fc.property(pairArb, fc.double({ min: 1e-6, max: 1e9, noNaN: true }), ([a, b], x) => {
        const da = UNITS[a as UnitSymbol];
        const db = UNITS[b as UnitSymbol];
        const direct = ((x + da.offset) * da.factor) / db.factor - db.offset;
        expectRelative(convert(x, a, b), direct, 1e-15, `${x} ${a} -> ${b}`);
        // and back again
        const back = convert(convert(x, a, b), b, a);
        expect(Math.abs(back - x)).toBeLessThanOrEqual(4e-15 * (x + da.offset + db.offset));
      }),
      { numRuns: 3000 },
    );
  });
});

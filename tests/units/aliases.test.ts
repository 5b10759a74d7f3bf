import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  aliasesOf,
  convert,
  DIMENSIONS,
  type Dimension,
  parsePressure,
  parseQuantity,
  q,
  UNIT_ALIASES,
  UNITS,
  type UnitSymbol,
  unitsOf,
} from '../../src/units';
import { expectHeadflowError } from '../helpers/expect';

describe('aliases: special values and errors', () => {
  it('aliasesOf refuses a name that is not a dimension', () => {
    expectHeadflowError(() => aliasesOf('speed' as Dimension), 'INVALID_ARGUMENT');
  });
  it('q and to take catalogue symbols only; the message names the symbol of an alias', () => {
    const err = expectHeadflowError(() => q(1, 'feet' as UnitSymbol), 'UNKNOWN_UNIT');
    expect(err.message).toContain('alias of ft');
  });
  it('refuses ambiguous spellings with a "did you mean" list', () => {
    const cases: readonly (readonly [string, string])[] = [
      ['3 deg', 'is ambiguous: did you mean degC, degF, degR or K?'],
      ['3 degrees', 'is ambiguous: did you mean degC, degF, degR or K?'],
      ['3 gallon', 'is ambiguous: did you mean gal or impgal?'],
      ['3 mgd', 'is ambiguous: did you mean Mgal/d or ML/d?'],
    ];
    for (const [text, said] of cases) {
      expect(expectHeadflowError(() => parseQuantity(text), 'UNKNOWN_UNIT').message).toContain(
        said,
      );
    }
  });
  it('refuses a wrong letter case with the unit it may have meant (symbols are case-sensitive)', () => {
    const cases: readonly (readonly [string, string])[] = [
      ['3 KPA', 'Did you mean kPa?'],
      ['3 Mbar', 'Did you mean mbar?'],
      ['3 Gpm', 'Did you mean gal/min?'],
      ['3 PSIG', 'Did you mean psig?'],
      ['3 M3/H', 'Did you mean m3/h?'],
    ];
    for (const [text, said] of cases) {
      expect(expectHeadflowError(() => parseQuantity(text), 'UNKNOWN_UNIT').message).toContain(
        said,
      );
    }
    const none = expectHeadflowError(() => parseQuantity('3 furlongs'), 'UNKNOWN_UNIT');
    expect(none.message).not.toContain('mean');
  });
  it('convert refuses non-string units and unknown spellings', () => {
    expectHeadflowError(() => convert(1, 5 as unknown as string, 'm'), 'UNKNOWN_UNIT');
    expectHeadflowError(() => convert(1, 'ft', 'KM'), 'UNKNOWN_UNIT');
    expectHeadflowError(() => convert(1, 'gpm', 'ft'), 'WRONG_DIMENSION');
  });
});

describe('aliases: the spellings engineers write', () => {
  // Each alias and the symbol it stands for (the list; 'common practice' spellings).
  const expected: readonly (readonly [string, UnitSymbol])[] = [
    ['gpm', 'gal/min'],
    ['GPM', 'gal/min'],
    ['USgpm', 'gal/min'],
    ['lpm', 'L/min'],
    ['l/s', 'L/s'],
    ['l/min', 'L/min'],
    ['m3/hr', 'm3/h'],
    ['m³/hr', 'm3/h'],
    ['cfm', 'ft3/min'],
    ['MGD', 'Mgal/d'],
    ['RPM', 'rpm'],
    ['HP', 'hp'],
    ['feet', 'ft'],
    ['foot', 'ft'],
    ['inch', 'in'],
    ['inches', 'in'],
    ['°F', 'degF'],
    ['°C', 'degC'],
    ['deg F', 'degF'],
    ['deg C', 'degC'],
  ];
  it.each(expected)('"12.5 %s" reads as 12.5 %s', (alias, symbol) => {
    expect(parseQuantity(`12.5 ${alias}`)).toBe(q(12.5, symbol));
    expect(convert(12.5, alias, symbol)).toBeCloseTo(12.5, 12);
  });
  it('aliasesOf lists every alias under its unit, and unitsOf lists symbols only', () => {
    const listed = DIMENSIONS.flatMap((d) => aliasesOf(d));
    expect(listed.map((a) => a.alias).sort()).toEqual(Object.keys(UNIT_ALIASES).sort());
    for (const { alias, unit } of listed) {
      expect(UNIT_ALIASES[alias as keyof typeof UNIT_ALIASES]).toBe(unit);
      expect(unitsOf(UNITS[unit].dimension)).not.toContain(alias);
    }
    expect(aliasesOf('rotationalSpeed')).toEqual([{ alias: 'RPM', unit: 'rpm' }]);
    expect(aliasesOf('mass')).toEqual([]);
  });
  it('no alias is also a symbol, and every alias maps to a symbol', () => {
    for (const [alias, symbol] of Object.entries(UNIT_ALIASES)) {
      expect(Object.hasOwn(UNITS, alias)).toBe(false);
      expect(Object.hasOwn(UNITS, symbol)).toBe(true);
    }
  });
  it('an alias reads exactly as its symbol for any value (property)', () => {
    const pairs = Object.entries(UNIT_ALIASES).filter(([, s]) => UNITS[s].offset === 0);
    fc.assert(
      fc.property(
        fc.constantFrom(...pairs),
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        ([alias, symbol], x) => {
          const text = `${x} ${alias}`;
          return parseQuantity(text) === parseQuantity(`${x} ${symbol}`);
        },
      ),
    );
  });
});

describe('pressure with a gauge or absolute mark', () => {
  it('parseQuantity reads absolute marks and refuses gauge marks (they need an atmosphere)', () => {
    expect(parseQuantity('30 psia', 'pressure')).toBe(q(30, 'psi'));
    expect(parseQuantity('2 bara')).toBe(q(2, 'bar'));
    expect(parseQuantity('101 kPaa')).toBe(q(101, 'kPa'));
    expect(parseQuantity('2 bar(a)')).toBe(q(2, 'bar'));
    const err = expectHeadflowError(() => parseQuantity('15 psig'), 'INVALID_ARGUMENT');
    expect(err.message).toContain('parsePressure');
    expectHeadflowError(() => parseQuantity('15 psig', 'length'), 'WRONG_DIMENSION');
  });
  it('parsePressure reads every mark the trade writes', () => {
    const cases: readonly (readonly [string, number, 'gauge' | 'absolute'])[] = [
      ['15 psig', q(15, 'psi'), 'gauge'],
      ['15 psia', q(15, 'psi'), 'absolute'],
      ['1.5 barg', q(1.5, 'bar'), 'gauge'],
      ['1.5 bara', q(1.5, 'bar'), 'absolute'],
      ['200 kPag', q(200, 'kPa'), 'gauge'],
      ['200 kPaa', q(200, 'kPa'), 'absolute'],
      ['200 kPa(g)', q(200, 'kPa'), 'gauge'],
      ['1.5 bar(g)', q(1.5, 'bar'), 'gauge'],
      ['1.5 bar (a)', q(1.5, 'bar'), 'absolute'],
      ['-300 mbarg', q(-300, 'mbar'), 'gauge'],
      ['0.4 MPag', q(0.4, 'MPa'), 'gauge'],
    ];
    for (const [text, value, reference] of cases) {
      expect(parsePressure(text), text).toEqual({
        value,
        reference,
        marked: true,
        unit: expect.any(String),
      });
    }
  });
  it('parsePressure reads an unmarked unit as the caller says (absolute by default)', () => {
    expect(parsePressure('45 psi')).toMatchObject({ reference: 'absolute', marked: false });
    expect(parsePressure('45 psi', { unmarked: 'gauge' })).toMatchObject({
      reference: 'gauge',
      marked: false,
      unit: 'psi',
    });
    expect(parsePressure('45 psi', null)).toMatchObject({ reference: 'absolute' });
    expect(parsePressure('10 ftH2O', { unmarked: 'gauge' }).value).toBe(q(10, 'ftH2O'));
  });
  it('parsePressure refuses what is not a pressure, a negative absolute and bad options', () => {
    expectHeadflowError(() => parsePressure('15 ft'), 'WRONG_DIMENSION');
    expectHeadflowError(() => parsePressure('-1 psia'), 'INVALID_ARGUMENT');
    expectHeadflowError(() => parsePressure('-1 psi'), 'INVALID_ARGUMENT');
    expect(parsePressure('-1 psi', { unmarked: 'gauge' }).value).toBe(q(-1, 'psi'));
    expectHeadflowError(
      () => parsePressure('1 psi', { unmarked: 'vacuum' as 'gauge' }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => parsePressure('1 psi', 3 as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => parsePressure('1 Pag'), 'UNKNOWN_UNIT');
    expectHeadflowError(() => parsePressure('x'.repeat(10_000)), 'INVALID_ARGUMENT');
  });
});

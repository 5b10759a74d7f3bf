/**
 * Values in words in one unit system (the helper every report message uses). Conversion
 * factors are the exact NIST SP 811 definitions the units module holds.
 */
import { describe, expect, it } from 'vitest';
import { sayIn, short, symbol } from '../../src/design/say';
import { q } from '../../src/units/index';

describe('sayIn', () => {
  it('writes each quantity in the units of its system', () => {
    const si = sayIn('si');
    const us = sayIn('us', 'unicode');
    expect(si.flow(q(40, 'L/s'))).toBe('144 m3/h');
    expect(us.flow(q(40, 'L/s'))).toBe('634 gal/min');
    expect(si.head(q(100, 'ft'))).toBe('30.5 m');
    expect(us.temperature(q(15, 'degC'))).toBe('59 °F');
    expect(si.density(q(62.4, 'lb/ft3'))).toBe('999.55 kg/m3');
    expect(si.absolute(q(101.325, 'kPa'))).toBe('101.3 kPa abs');
    expect(us.absolute(q(101.325, 'kPa'))).toBe('14.7 psia');
    expect(us.speed(q(1750, 'rpm'))).toBe('1750 rpm');
    expect(si.velocity(q(2, 'm/s'))).toBe('2 m/s');
    expect(us.length(q(3, 'm'))).toBe('9.843 ft');
  });
  it('gives the energy per volume per m3 or per 1000 US gallons', () => {
    // 0.2 kWh/m3 = 720 000 J/m3; x 3.785411784 m3 per 1000 gal = 0.757 kWh/kgal.
    expect(sayIn('si').specificEnergy(720_000)).toBe('0.2 kWh/m3');
    expect(sayIn('us').specificEnergy(720_000)).toBe('0.757 kWh/kgal');
    expect(sayIn('si', 'unicode').specificEnergy(720_000)).toBe('0.2 kWh/m³');
  });
  it('motors: the report unit first, the other series nameplate in brackets', () => {
    // NEMA 60 hp = 44.74 kW; IEC 37 kW = 49.62 hp (hp = 745.69987 W).
    expect(sayIn('si').motor(q(60, 'hp'), 60, 'hp')).toBe('44.7 kW (60 hp)');
    expect(sayIn('us').motor(37_000, 37, 'kW')).toBe('49.6 hp (37 kW)');
    expect(sayIn('si').motor(37_000, 37, 'kW')).toBe('37 kW');
    expect(sayIn('us').motor(Number.NaN, 60, 'hp')).toBe('-');
  });
  it('a missing number is a dash, never NaN', () => {
    const s = sayIn('si');
    expect(s.flow(Number.NaN)).toBe('-');
    expect(s.speed(Number.NaN)).toBe('-');
    expect(s.absolute(Number.POSITIVE_INFINITY)).toBe('-');
    expect(short(Number.NaN)).toBe('-');
    expect(short(123456.7)).toBe('123457');
    expect(short(-0.00001)).toBe('-0.00001');
  });
  it('symbols in ASCII or Unicode', () => {
    expect(symbol('m3/h', 'unicode')).toBe('m³/h');
    expect(symbol('degC', 'unicode')).toBe('°C');
    expect(symbol('m3/h', 'ascii')).toBe('m3/h');
    expect(symbol('ft', 'unicode')).toBe('ft');
  });
});

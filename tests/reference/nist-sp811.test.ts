/**
 * Every conversion factor against its definition in NIST Special Publication 811 (2008),
 * "Guide for the Use of the International System of Units (SI)", Appendix B.8 (factors for
 * units listed alphabetically) and B.9 (by kind of quantity). Where SP 811 prints the factor
 * exactly (boldface), the check is to 1e-15 relative; where it prints a value rounded to 7
 * significant digits for a unit that is exactly defined by others, the check is to the
 * printed digits (5e-7 relative) and the exact definition is checked as well.
 */
import { describe, it } from 'vitest';
import { UNITS, type UnitSymbol } from '../../src/units';
import { expectRelative } from '../helpers/expect';

/** [symbol, factor to SI, relative tolerance, where it comes from]. */
const EXACT = 1e-15;
const PRINTED = 5e-7;
const rows: readonly (readonly [UnitSymbol, number, number, string])[] = [
  ['m', 1, EXACT, 'SI base unit'],
  ['mm', 1e-3, EXACT, 'SI prefix'],
  ['cm', 1e-2, EXACT, 'SI prefix'],
  ['km', 1e3, EXACT, 'SI prefix'],
  ['in', 2.54e-2, EXACT, 'B.8 inch, exact'],
  ['ft', 3.048e-1, EXACT, 'B.8 foot, exact'],
  ['yd', 9.144e-1, EXACT, 'B.8 yard, exact'],
  ['mi', 1.609344e3, EXACT, 'B.8 mile (international), exact'],
  ['m2', 1, EXACT, 'SI'],
  ['cm2', 1e-4, EXACT, 'SI prefix'],
  ['mm2', 1e-6, EXACT, 'SI prefix'],
  ['in2', 6.4516e-4, EXACT, 'B.8 square inch, exact'],
  ['ft2', 9.290304e-2, EXACT, 'B.8 square foot, exact'],
  ['m3', 1, EXACT, 'SI'],
  ['L', 1e-3, EXACT, 'B.8 liter, exact'],
  ['mL', 1e-6, EXACT, 'SI prefix of liter'],
  ['gal', 3.785411784e-3, EXACT, 'B.8 gallon (U.S.), exact'],
  ['impgal', 4.54609e-3, EXACT, 'B.8 gallon [Canadian and U.K. (Imperial)], exact'],
  ['ft3', 2.8316846592e-2, EXACT, 'B.8 cubic foot, exact'],
  ['in3', 1.6387064e-5, EXACT, 'B.8 cubic inch, exact'],
  ['m3/s', 1, EXACT, 'SI'],
  ['m3/h', 1 / 3600, EXACT, 'SI with hour (B.8 hour = 3600 s)'],
  ['L/s', 1e-3, EXACT, 'B.8 liter'],
  ['L/min', 1.666667e-5, PRINTED, 'B.8 liter per minute (printed to 7 digits)'],
  ['gal/min', 6.30902e-5, PRINTED, 'B.8 gallon (U.S.) per minute (printed to 7 digits)'],
  ['gal/min', 3.785411784e-3 / 60, EXACT, 'B.8 gallon (U.S.) / minute, exact quotient'],
  ['impgal/min', 4.54609e-3 / 60, EXACT, 'B.8 gallon (Imperial) / minute, exact quotient'],
  ['ft3/s', 2.8316846592e-2, EXACT, 'B.8 cubic foot per second, exact'],
  ['ft3/min', 4.719474e-4, PRINTED, 'B.8 cubic foot per minute (printed to 7 digits)'],
  ['Mgal/d', 4.381264e-2, PRINTED, 'B.8 gallon (U.S.) per day x 1e6 (printed to 7 digits)'],
  ['m3/d', 1 / 86400, EXACT, 'SI with B.8 day = 86 400 s, exact'],
  ['ML/d', (1e6 * 1e-3) / 86400, EXACT, 'B.8 liter x SI prefix mega, per B.8 day, exact'],
  ['L/h', 1e-3 / 3600, EXACT, 'B.8 liter per B.8 hour, exact'],
  ['kg/s', 1, EXACT, 'SI'],
  ['kg/h', 1 / 3600, EXACT, 'SI with hour'],
  ['lb/s', 4.5359237e-1, EXACT, 'B.8 pound per second, exact'],
  ['lb/h', 1.259979e-4, PRINTED, 'B.8 pound per hour (printed to 7 digits)'],
  ['m/s', 1, EXACT, 'SI'],
  ['ft/s', 3.048e-1, EXACT, 'B.8 foot per second, exact'],
  ['ft/min', 5.08e-3, EXACT, 'B.8 foot per minute, exact'],
  ['m/s2', 1, EXACT, 'SI'],
  ['ft/s2', 3.048e-1, EXACT, 'B.8 foot per second squared, exact'],
  ['Pa', 1, EXACT, 'SI'],
  ['kPa', 1e3, EXACT, 'SI prefix'],
  ['MPa', 1e6, EXACT, 'SI prefix'],
  ['bar', 1e5, EXACT, 'B.8 bar, exact'],
  ['mbar', 1e2, EXACT, 'B.8 millibar, exact'],
  ['atm', 1.01325e5, EXACT, 'B.8 atmosphere, standard, exact'],
  ['psi', 6.894757e3, PRINTED, 'B.8 pound-force per square inch (printed to 7 digits)'],
  ['psi', 4.4482216152605 / 6.4516e-4, EXACT, 'B.8 lbf / in^2, exact quotient'],
  ['psf', 4.788026e1, PRINTED, 'B.8 pound-force per square foot (printed to 7 digits)'],
  ['inHg', 3.386389e3, PRINTED, 'B.8 inch of mercury, conventional (printed to 7 digits)'],
  ['mmHg', 1.333224e2, PRINTED, 'B.8 millimeter of mercury, conventional (printed to 7 digits)'],
  ['ftH2O', 2.989067e3, PRINTED, 'B.8 foot of water, conventional (printed to 7 digits)'],
  ['mH2O', 9.80665e3, EXACT, 'B.8 note: conventional water column, 1000 kg/m3 x g_n'],
  ['inH2O', 2.490889e2, PRINTED, 'B.8 inch of water, conventional (printed to 7 digits)'],
  ['kg/m3', 1, EXACT, 'SI'],
  ['g/cm3', 1e3, EXACT, 'B.8 gram per cubic centimeter, exact'],
  ['lb/ft3', 1.601846e1, PRINTED, 'B.8 pound per cubic foot (printed to 7 digits)'],
  ['slug/ft3', 5.153788e2, PRINTED, 'B.8 slug per cubic foot (printed to 7 digits)'],
  ['Pa*s', 1, EXACT, 'SI'],
  ['mPa*s', 1e-3, EXACT, 'SI prefix'],
  ['cP', 1e-3, EXACT, 'B.8 centipoise, exact'],
  ['P', 1e-1, EXACT, 'B.8 poise, exact'],
  ['lbf*s/ft2', 4.788026e1, PRINTED, 'B.8 pound-force second per square foot (printed)'],
  ['m2/s', 1, EXACT, 'SI'],
  ['mm2/s', 1e-6, EXACT, 'SI prefix'],
  ['cSt', 1e-6, EXACT, 'B.8 centistokes, exact'],
  ['St', 1e-4, EXACT, 'B.8 stokes, exact'],
  ['ft2/s', 9.290304e-2, EXACT, 'B.8 square foot per second, exact'],
  ['W', 1, EXACT, 'SI'],
  ['kW', 1e3, EXACT, 'SI prefix'],
  ['MW', 1e6, EXACT, 'SI prefix'],
  ['hp', 7.456999e2, PRINTED, 'B.8 horsepower (550 ft lbf/s) (printed to 7 digits)'],
  ['hp', 550 * 0.3048 * 4.4482216152605, EXACT, 'B.8 horsepower = 550 ft x lbf / s, exact'],
  ['J', 1, EXACT, 'SI'],
  ['kJ', 1e3, EXACT, 'SI prefix'],
  ['MJ', 1e6, EXACT, 'SI prefix'],
  ['GJ', 1e9, EXACT, 'SI prefix'],
  ['kWh', 3.6e6, EXACT, 'B.8 kilowatt hour, exact'],
  ['MWh', 3.6e9, EXACT, 'B.8 kilowatt hour x 1000, exact'],
  ['Btu', 1.05505585262e3, EXACT, 'B.8 British thermal unit (IT), exact'],
  ['J/(kg*K)', 1, EXACT, 'SI'],
  ['kJ/(kg*K)', 1e3, EXACT, 'SI prefix'],
  [
    'Btu/(lb*degF)',
    4.1868e3,
    EXACT,
    'B.8 British thermal unit_IT per pound degree Fahrenheit = 4.1868 E+03 J/(kg K), exact',
  ],
  ['N', 1, EXACT, 'SI'],
  ['kN', 1e3, EXACT, 'SI prefix'],
  ['lbf', 4.4482216152605, EXACT, 'B.8 pound-force, exact'],
  ['kg', 1, EXACT, 'SI base unit'],
  ['g', 1e-3, EXACT, 'SI'],
  ['lb', 4.5359237e-1, EXACT, 'B.8 pound (avoirdupois), exact'],
  ['slug', 1.45939e1, PRINTED, 'B.8 slug (printed to 7 digits)'],
  ['s', 1, EXACT, 'SI base unit'],
  ['min', 60, EXACT, 'B.8 minute, exact'],
  ['h', 3600, EXACT, 'B.8 hour, exact'],
  ['d', 86400, EXACT, 'B.8 day, exact'],
  ['rad/s', 1, EXACT, 'SI'],
  ['rpm', (2 * Math.PI) / 60, EXACT, 'B.8 revolution per minute = 2 pi rad / 60 s'],
  ['rev/s', 2 * Math.PI, EXACT, 'B.8 revolution = 2 pi rad'],
  ['K', 1, EXACT, 'SI base unit'],
  ['degR', 5 / 9, EXACT, 'B.8 degree Rankine, exact'],
];

describe('unit factors against NIST SP 811 Appendix B', () => {
  it.each(rows)('%s factor = %d (%#)', (symbol, factor, tol, source) => {
    expectRelative(UNITS[symbol].factor, factor, tol, `${symbol} (${source})`);
  });

  it('covers every unit in the catalogue', () => {
    const checked = new Set<string>(rows.map((r) => r[0]));
    checked.add('degC');
    checked.add('degF');
    const missing = Object.keys(UNITS).filter((u) => !checked.has(u));
    expectRelative(missing.length, 0, 0, `units without a NIST check: ${missing.join(', ')}`);
  });
});

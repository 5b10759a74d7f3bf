/**
 * Cross-check of a broad sample of conversions against mathjs (npm `mathjs`, a general-purpose
 * math library with its own unit table), an implementation independent of ours.
 * mathjs stores some derived factors rounded (psi to 6894.75729276459, hp to 745.6998715386,
 * mmHg to 133.322), so the tolerance is 1e-9 relative and mmHg is compared at 5e-6; every
 * other unit agrees to the digits mathjs stores.
 */
import { unit } from 'mathjs';
import { describe, it } from 'vitest';
import { convert } from '../../src/units';
import { expectRelative } from '../helpers/expect';

/** [ours, mathjs spelling, mathjs SI target, tolerance]. */
const pairs: readonly (readonly [string, string, string, number])[] = [
  ['ft', 'ft', 'm', 1e-15],
  ['in', 'inch', 'm', 1e-15],
  ['yd', 'yard', 'm', 1e-15],
  ['mi', 'mile', 'm', 1e-15],
  ['km', 'km', 'm', 1e-15],
  ['in2', 'sqin', 'm^2', 1e-15],
  ['ft2', 'sqft', 'm^2', 1e-15],
  ['gal', 'gal', 'm^3', 1e-15],
  ['ft3', 'cuft', 'm^3', 1e-15],
  ['in3', 'cuin', 'm^3', 1e-15],
  ['L', 'L', 'm^3', 1e-15],
  ['gal/min', 'gal/minute', 'm^3/s', 1e-9],
  ['ft3/s', 'cuft/s', 'm^3/s', 1e-15],
  ['L/min', 'L/minute', 'm^3/s', 1e-15],
  ['m3/h', 'm^3/hour', 'm^3/s', 1e-15],
  ['lb/s', 'lbm/s', 'kg/s', 1e-15],
  ['ft/s', 'ft/s', 'm/s', 1e-15],
  ['ft/min', 'ft/minute', 'm/s', 1e-15],
  ['ft/s2', 'ft/s^2', 'm/s^2', 1e-15],
  ['psi', 'psi', 'Pa', 1e-9],
  ['bar', 'bar', 'Pa', 1e-15],
  ['atm', 'atm', 'Pa', 1e-15],
  ['mmHg', 'mmHg', 'Pa', 5e-6],
  ['lb/ft3', 'lbm/cuft', 'kg/m^3', 1e-15],
  ['hp', 'hp', 'W', 1e-9],
  ['kWh', 'kWh', 'J', 1e-15],
  ['Btu', 'BTU', 'J', 1e-15],
  ['lbf', 'lbf', 'N', 1e-15],
  ['lb', 'lbm', 'kg', 1e-15],
  ['min', 'minute', 's', 1e-15],
  ['h', 'hour', 's', 1e-15],
  ['d', 'day', 's', 1e-15],
];

const SI: Record<string, string> = {
  m: 'm',
  'm^2': 'm2',
  'm^3': 'm3',
  'm^3/s': 'm3/s',
  'kg/s': 'kg/s',
  'm/s': 'm/s',
  'm/s^2': 'm/s2',
  Pa: 'Pa',
  'kg/m^3': 'kg/m3',
  W: 'W',
  J: 'J',
  N: 'N',
  kg: 'kg',
  s: 's',
};

describe('conversions agree with mathjs', () => {
  it.each(pairs)('%s', (ours, theirs, target, tol) => {
    for (const x of [1, 3.7, 1234.5]) {
      const expected = unit(x, theirs).toNumber(target);
      expectRelative(convert(x, ours, SI[target] ?? target), expected, tol, `${x} ${ours}`);
    }
  });

  it('temperatures agree with mathjs at several points', () => {
    for (const [x, u, m] of [
      [50, 'degF', 'degF'],
      [-40, 'degC', 'degC'],
      [500, 'degR', 'degR'],
      [212, 'degF', 'degF'],
    ] as const) {
      expectRelative(convert(x, u, 'K'), unit(x, m).toNumber('K'), 1e-14, `${x} ${u}`);
    }
  });
});

import { describe, expect, it } from 'vitest';
import {
  argumentError,
  checkFinite,
  checkFraction,
  checkNonNegative,
  checkPositive,
  describeValue,
  HeadflowError,
} from '../src/errors';
import { si } from '../src/units';
import { expectHeadflowError } from './helpers/expect';

describe('HeadflowError', () => {
  it('carries code, parameter, value, unit and allowed range', () => {
    const err = argumentError(
      'INVALID_ARGUMENT',
      'diameter',
      -3,
      'm',
      '> 0',
      'Give the inside diameter.',
    );
    expect(err).toBeInstanceOf(Error);
    expect(err).toBeInstanceOf(HeadflowError);
    expect(err.name).toBe('HeadflowError');
    expect(err.code).toBe('INVALID_ARGUMENT');
    expect(err.parameter).toBe('diameter');
    expect(err.value).toBe(-3);
    expect(err.unit).toBe('m');
    expect(err.allowed).toBe('> 0');
    expect(err.message).toBe(
      'diameter = -3 m is not allowed (allowed: > 0). Give the inside diameter.',
    );
  });
  it('omits the unit when there is none', () => {
    const err = argumentError('INVALID_ARGUMENT', 'efficiency', 1.3, undefined, '0 < value <= 1');
    expect(err.unit).toBeUndefined();
    expect(err.message).toBe('efficiency = 1.3 is not allowed (allowed: 0 < value <= 1).');
    expect(new HeadflowError('NO_SOLUTION', 'no root').parameter).toBeUndefined();
  });
  it('describes values of any type', () => {
    expect(describeValue('abc')).toBe('"abc"');
    expect(describeValue(Number.NaN, 'm')).toBe('NaN m');
    expect(describeValue(2)).toBe('2');
    expect(describeValue(undefined)).toBe('undefined');
    expect(describeValue(null)).toBe('null');
    expect(describeValue({})).toBe('object');
  });
});

describe('input checks', () => {
  it('checkFinite', () => {
    checkFinite('x', -1);
    expectHeadflowError(() => checkFinite('x', Number.NaN), 'INVALID_ARGUMENT');
    expectHeadflowError(() => checkFinite('x', '1' as unknown as number), 'INVALID_ARGUMENT');
  });
  it('checkPositive', () => {
    checkPositive('x', 1e-300);
    for (const v of [0, -1, Number.POSITIVE_INFINITY, Number.NaN]) {
      expectHeadflowError(() => checkPositive('x', v, 'm'), 'INVALID_ARGUMENT');
    }
  });
  it('checkNonNegative', () => {
    checkNonNegative('x', 0);
    for (const v of [-1e-300, Number.POSITIVE_INFINITY, Number.NaN]) {
      expectHeadflowError(() => checkNonNegative('x', v), 'INVALID_ARGUMENT');
    }
  });
  it('checkFraction', () => {
    checkFraction('eta', 1);
    checkFraction('eta', 0.01);
    for (const v of [0, 1.0000001, -0.5, Number.NaN]) {
      expectHeadflowError(() => checkFraction('eta', v), 'INVALID_ARGUMENT');
    }
  });
});

describe('si', () => {
  it('brands an SI number without changing it', () => {
    expect(si<'length'>(0.1023)).toBe(0.1023);
  });
});

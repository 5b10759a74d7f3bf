import { describe, expect, it } from 'vitest';
import { HeadflowError } from '../src/errors';
import {
  guardArray,
  guardBuffer,
  guardField,
  guardInteger,
  guardNumber,
  guardNumberArray,
  guardOneOf,
  guardOptions,
  guardRange,
  guardRecord,
  guardResult,
  guardString,
} from '../src/guards';
import { expectHeadflowError } from './helpers/expect';

describe('shared guards', () => {
  it('numbers: finite only, with the parameter named', () => {
    expect(guardNumber('x', 3)).toBe(3);
    for (const bad of [
      Number.NaN,
      Number.POSITIVE_INFINITY,
      '3',
      null,
      undefined,
      {},
      Symbol('s'),
    ]) {
      const e = expectHeadflowError(() => guardNumber('x', bad), 'INVALID_ARGUMENT');
      expect(e.parameter).toBe('x');
    }
  });

  it('ranges: open and closed bounds', () => {
    expect(guardRange('e', 1, { min: 0, max: 1, minOpen: true })).toBe(1);
    expectHeadflowError(() => guardRange('e', 0, { min: 0, minOpen: true }), 'INVALID_ARGUMENT');
    const e = expectHeadflowError(
      () => guardRange('d', 5, { max: 2, unit: 'm' }),
      'INVALID_ARGUMENT',
    );
    expect(e.message).toContain('<= 2 m');
    expect(guardInteger('n', 3, 1, 5)).toBe(3);
    expectHeadflowError(() => guardInteger('n', 2.5, 1, 5), 'INVALID_ARGUMENT');
  });

  it('strings: bounded length, refused at once', () => {
    expect(guardString('id', 'abc')).toBe('abc');
    expectHeadflowError(() => guardString('id', 'x'.repeat(201)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardString('id', 3), 'INVALID_ARGUMENT');
    expect(guardOneOf('m', 'a', ['a', 'b'] as const)).toBe('a');
    expectHeadflowError(() => guardOneOf('m', 'c', ['a', 'b'] as const), 'INVALID_ARGUMENT');
  });

  it('records, options and fields', () => {
    expect(guardOptions('options', null)).toEqual({});
    expect(guardOptions('options', undefined)).toEqual({});
    expectHeadflowError(() => guardOptions('options', 3 as unknown as object), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardRecord('pump', [1]), 'INVALID_ARGUMENT');
    const r = guardRecord('system', Object.create(null));
    const e = expectHeadflowError(() => guardField('system', r, 'head'), 'INVALID_ARGUMENT');
    expect(e.parameter).toBe('system.head');
  });

  it('arrays: dense, bounded; buffers sized', () => {
    // biome-ignore lint/suspicious/noSparseArray: the hole is what is tested
    const sparse = [1, , 3];
    expectHeadflowError(() => guardArray('a', sparse), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardArray('a', [], { min: 1 }), 'INVALID_ARGUMENT');
    expect(guardNumberArray('a', new Float64Array([1, 2]))).toHaveLength(2);
    expectHeadflowError(() => guardNumberArray('a', [1, Number.NaN]), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardBuffer('out', new Float64Array(1), 2), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardBuffer('out', [0, 0], 2), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardResult('f', Number.NaN), 'NO_SOLUTION');
  });

  it('arrays with their own constructor or iterator, and typed arrays as records, are refused', () => {
    const a = [1, 2];
    Object.defineProperty(a, 'constructor', { value: 1, enumerable: true });
    expectHeadflowError(() => guardArray('a', a), 'INVALID_ARGUMENT');
    expectHeadflowError(() => guardRecord('options', new Float64Array(2)), 'INVALID_ARGUMENT');
  });

  it('results: NO_SOLUTION by default, OUT_OF_RANGE for an overflow', () => {
    expect(guardResult('f', 0.02)).toBe(0.02);
    const e = expectHeadflowError(
      () => guardResult('area', Number.POSITIVE_INFINITY, 'OUT_OF_RANGE'),
      'OUT_OF_RANGE',
    );
    expect(e.message).toContain('floating-point');
  });

  it('a huge string is named by its start and length in a message', () => {
    const e = expectHeadflowError(
      () => guardOneOf('m', 'x'.repeat(1e6), ['a'] as const),
      'INVALID_ARGUMENT',
    );
    expect(e.message.length).toBeLessThan(200);
  });

  it('HeadflowError constructs with any arguments', () => {
    const make = HeadflowError as unknown as new (...a: unknown[]) => HeadflowError;
    expect(() => new make()).not.toThrow();
    expect(() => new make('INVALID_ARGUMENT', 'm', null)).not.toThrow();
    expect(() => new make(Symbol('c'), Symbol('m'), 3)).not.toThrow();
    expect(() => new make('NO_SOLUTION', Object.create(null))).not.toThrow();
  });
});

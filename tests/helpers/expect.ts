import { expect } from 'vitest';
import { HeadflowError, type HeadflowErrorCode } from '../../src/errors';

/**
 * Asserts |actual - expected| <= tol * |expected| (or <= tol when expected is 0) and, on
 * failure, prints the input, expected, actual, difference and tolerance.
 */
export function expectRelative(actual: number, expected: number, tol: number, input = ''): void {
  const diff = Math.abs(actual - expected);
  const scale = expected === 0 ? 1 : Math.abs(expected);
  if (!(diff <= tol * scale)) {
    expect.fail(
      `${input ? `${input}: ` : ''}expected ${expected}, got ${actual}, ` +
        `difference ${diff} (relative ${diff / scale}) exceeds tolerance ${tol}`,
    );
  }
}

/** Asserts |actual - expected| <= tol. */
export function expectAbsolute(actual: number, expected: number, tol: number, input = ''): void {
  const diff = Math.abs(actual - expected);
  if (!(diff <= tol)) {
    expect.fail(
      `${input ? `${input}: ` : ''}expected ${expected}, got ${actual}, difference ${diff} exceeds tolerance ${tol}`,
    );
  }
}

/** Runs `fn`, asserts it throws a HeadflowError with `code`, and returns the error. */
export function expectHeadflowError(fn: () => unknown, code: HeadflowErrorCode): HeadflowError {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(HeadflowError);
    const err = e as HeadflowError;
    expect(err.code, err.message).toBe(code);
    return err;
  }
  return expect.fail(`expected HeadflowError ${code}, but nothing was thrown`);
}

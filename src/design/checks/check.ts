/**
 * What every check shares: the finding's builder and the description each check file gives
 * of itself (id, what it guards against, its inputs, its severity rules, its source).
 *
 * @module
 */
import type { Check } from '../types';

/** The source of a fact of the trade with no published reference. */
export const COMMON = 'common practice';

/** How a check describes itself, for docs/checks.md and for readers of the code. */
export interface CheckInfo {
  /** Stable id, as in the report. */
  readonly id: string;
  /** What it guards against, in a few words. */
  readonly guards: string;
  /** The inputs it needs (design input fields, curve data). */
  readonly inputs: string;
  /** When it is an error, a warning or a note. */
  readonly severity: string;
  /** Its source, or 'common practice'. */
  readonly source: string;
}

/**
 * A check without its message: `evaluateDesign` writes every message at the end, in the
 * report's units, from the values and words (`checkMessage`).
 */
export function check(
  id: string,
  severity: Check['severity'],
  candidate: string | undefined,
  caseName: string | undefined,
  values: Record<string, number>,
  source: string,
  words: Record<string, string> = {},
): Check {
  return { id, severity, candidate, case: caseName, message: '', values, words, source };
}

/**
 * The problems found in a scenario file: each with its path in the file, what was expected,
 * what was found and an error code; gathered into one {@link ScenarioFileError}.
 *
 * @module
 */
import type * as v from 'valibot';
import { HeadflowError, type HeadflowErrorCode } from '../errors';

/** One problem in a scenario file. */
export interface ScenarioIssue {
  /** Where it is, for example `line[2].run.length` (`(file)` for the whole file). */
  readonly path: string;
  /** What was expected and what was found, in plain words. */
  readonly message: string;
  /** The error code this problem alone would have. */
  readonly code: HeadflowErrorCode;
}

/**
 * A scenario file that cannot be read: every problem found, each with its path. It is a
 * {@link HeadflowError}; its `code` is the code of the first problem, its `parameter` the
 * first problem's path.
 */
export class ScenarioFileError extends HeadflowError {
  /** Every problem found, in file order. */
  readonly issues: readonly ScenarioIssue[];

  /**
   * Constructs with any arguments without throwing: issues that are not `{ path, message,
   * code }` records are left out, and a source that is not a string is not named.
   */
  constructor(issues: readonly [ScenarioIssue, ...ScenarioIssue[]], source?: string) {
    const list = Array.isArray(issues) ? issues.filter(isIssue) : [];
    const first = list[0];
    const where =
      typeof source === 'string' ? `scenario file ${source.slice(0, 200)}` : 'the scenario file';
    const count = list.length === 1 ? 'a problem' : `${list.length} problems`;
    const shown = list.slice(0, MAX_LISTED).map((i) => `\n  - ${i.path}: ${i.message}`);
    const more = list.length > MAX_LISTED ? `\n  ... and ${list.length - MAX_LISTED} more` : '';
    super(first?.code ?? 'INVALID_ARGUMENT', `${where} has ${count}:${shown.join('')}${more}`, {
      ...(first === undefined ? {} : { parameter: first.path }),
      allowed: 'see the scenario file format (docs/scenario-format.md)',
    });
    this.issues = list;
  }
}

function isIssue(x: unknown): x is ScenarioIssue {
  if (typeof x !== 'object' || x === null) return false;
  const i = x as Record<string, unknown>;
  return (
    typeof i['path'] === 'string' &&
    typeof i['message'] === 'string' &&
    typeof i['code'] === 'string'
  );
}

/** Problems listed in the message (all are kept in `issues`). */
const MAX_LISTED = 50;

/** Codes of the issues this module raised itself (others are INVALID_ARGUMENT). */
const CODES = new WeakMap<object, HeadflowErrorCode>();

/** Describes a JSON value for a message: `"12 psi"`, `350`, `a list`, `an object`, `nothing`. */
export function found(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value);
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  return `a ${typeof value}`;
}

/** A valibot message function: `expected <what>, found <value>`. */
export function expecting(what: string): (issue: v.BaseIssue<unknown>) => string {
  return (issue) => `expected ${what}, found ${found(issue.input)}`;
}

/** The context a raw transform receives (only what is used here). */
export interface IssueSink {
  readonly dataset: { readonly value: unknown };
  addIssue(info: {
    message: string;
    input?: unknown;
    path?: [v.IssuePathItem, ...v.IssuePathItem[]];
  }): void;
}

/** Path items for a relative path such as `['points', 2, 'flow']` under `base`. */
function pathItems(
  base: unknown,
  keys: readonly (string | number)[],
): [v.IssuePathItem, ...v.IssuePathItem[]] | undefined {
  const items: v.IssuePathItem[] = [];
  let input = base;
  for (const key of keys) {
    const value =
      input !== null && typeof input === 'object'
        ? (input as Record<string | number, unknown>)[key]
        : undefined;
    items.push({ type: 'unknown', origin: 'value', input, key, value });
    input = value;
  }
  const [first, ...rest] = items;
  return first === undefined ? undefined : [first, ...rest];
}

/**
 * Adds an issue with a code from inside a raw transform; `at` is a path below the value being
 * transformed (for example `['points', 2, 'flow']`).
 */
export function report(
  sink: IssueSink,
  code: HeadflowErrorCode,
  message: string,
  at: readonly (string | number)[] = [],
): void {
  const path = pathItems(sink.dataset.value, at);
  sink.addIssue(path === undefined ? { message } : { message, path });
  const issues = (sink.dataset as { readonly issues?: readonly object[] }).issues;
  const last = issues?.[issues.length - 1];
  if (last !== undefined) CODES.set(last, code);
}

/**
 * Splits a parameter name such as `points[2].flow` into keys (`['points', 2, 'flow']`);
 * undefined when it does not look like a path.
 */
export function parameterPath(parameter: string | undefined): (string | number)[] | undefined {
  if (
    parameter === undefined ||
    !/^[A-Za-z_$][\w$]*(?:\[\d+\]|\.[A-Za-z_$][\w$]*)*$/.test(parameter)
  ) {
    return undefined;
  }
  const keys: (string | number)[] = [];
  for (const m of parameter.matchAll(/([A-Za-z_$][\w$]*)|\[(\d+)\]/g)) {
    keys.push(m[1] ?? Number(m[2]));
  }
  return keys;
}

/**
 * Reports a HeadflowError thrown by a library function as an issue at `at` (extended by the
 * error's parameter when `followParameter` and it names a field below), keeping its code;
 * rethrows anything else.
 */
export function reportError(
  sink: IssueSink,
  error: unknown,
  at: readonly (string | number)[] = [],
  followParameter = false,
): void {
  if (!(error instanceof HeadflowError)) throw error;
  let below = followParameter ? parameterPath(error.parameter) : undefined;
  // Follow the parameter only into a field the file has (not an inner name such as `x`).
  let node: unknown = sink.dataset.value;
  for (const key of at) node = (node as Record<string | number, unknown> | null)?.[key];
  const first = below?.[0];
  if (first === undefined || node === null || typeof node !== 'object' || !(first in node)) {
    below = undefined;
  }
  report(sink, error.code, fileMessage(error), below === undefined ? at : [...at, ...below]);
}

/**
 * Rewords a library message (`id = "x" is not allowed (allowed: ...). Hint.`) in the file's
 * terms (`expected ..., found "x". Hint.`); other messages are kept.
 */
export function fileMessage(error: HeadflowError): string {
  const { parameter, allowed, message } = error;
  const close = allowed === undefined ? -1 : message.indexOf(`(allowed: ${allowed}).`);
  if (parameter === undefined || allowed === undefined || close === -1) return message;
  if (!message.startsWith(`${parameter} = `)) return message;
  const hint = message.slice(close + `(allowed: ${allowed}).`.length).trim();
  const value =
    typeof error.value === 'number' && error.unit !== undefined
      ? `${error.value} ${error.unit}`
      : found(error.value);
  return `expected ${allowed}, found ${value}${hint === '' ? '' : `. ${hint}`}`;
}

/** Writes a valibot path as `line[2].run.length`. */
export function pathText(path: readonly v.IssuePathItem[] | undefined): string {
  if (path === undefined || path.length === 0) return '(file)';
  let text = '';
  for (const item of path) {
    const key = item.key;
    if (typeof key === 'number') text += `[${key}]`;
    else if (typeof key === 'string' && /^[A-Za-z_$][\w$]*$/.test(key)) {
      text += text === '' ? key : `.${key}`;
    } else text += `[${JSON.stringify(String(key))}]`;
  }
  return text;
}

/** Turns valibot issues into scenario issues (path, message, code). */
export function scenarioIssues(
  issues: readonly v.BaseIssue<unknown>[],
): readonly [ScenarioIssue, ...ScenarioIssue[]] | undefined {
  const out: ScenarioIssue[] = issues.map((issue) => ({
    path: pathText(issue.path),
    message: issue.message,
    code: CODES.get(issue) ?? 'INVALID_ARGUMENT',
  }));
  const [first, ...rest] = out;
  return first === undefined ? undefined : [first, ...rest];
}

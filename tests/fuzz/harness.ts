/**
 * The fuzz harness: runs one table entry per exported function with valid inputs drawn across
 * the function's documented domain and with hostile inputs made by breaking one place in a valid
 * input (a number turned NaN or 1e300, a field removed or added, an array made sparse, an object
 * given a null prototype, a value of the wrong type).
 *
 * What must hold, for every call:
 * - a call returns, or throws a HeadflowError with a code (never a TypeError, RangeError ...);
 * - a returned value holds no NaN and no ±Infinity anywhere inside it (absent values are
 *   `undefined` or, in plain JSON data, `null`);
 * - valid input is not refused, except with the codes an entry lists in `validMayThrow`
 *   (an operating point that random pumps and systems need not have, for example).
 *
 * Runs: HEADFLOW_FUZZ_RUNS calls of each kind per function (default 1000 valid and 1000
 * hostile); CI fixes fast-check's seed (tests/setup/fast-check.ts).
 *
 * Adding a new export: add one row to the table of its module in tests/fuzz/entries/
 * (basics.ts: units, fluids, pipes, friction, losses; machines.ts: system, network, pumps;
 * documents.ts: design, scenario files, reports; a new module may get its own file, added to
 * ENTRIES in tests/fuzz/exports.test.ts and run by a `<name>.test.ts` beside the others):
 *
 * ```ts
 * {
 *   name: 'headLossOf',                       // the export's name in src/index.ts
 *   valid: fc.tuple(systemDefinition, flow),  // valid argument lists, across the domain
 *   call: (d, q) => api.headLossOf(d, q),     // or the export itself: call: api.headLossOf
 *   validMayThrow: ['NO_SOLUTION'],           // codes valid input may be refused with
 * },
 * ```
 *
 * A whole-job function whose single call takes milliseconds states its own `runs` (calls of
 * each kind at the default 1000, scaled with HEADFLOW_FUZZ_RUNS), so that the suite keeps
 * within its minute in `npm test`.
 *
 * Hostile calls need nothing more: they are made from the valid ones. Where the function
 * returns an object with methods (a curve, a fluid), let `call` use them too, so that the
 * methods meet hostile arguments. tests/fuzz/exports.test.ts fails while an export has no row.
 */
import fc from 'fast-check';
import { expect } from 'vitest';
import { HeadflowError, type HeadflowErrorCode } from '../../src/errors';

/** One table row: an exported function, how to call it, and its valid inputs. */
export interface FuzzEntry {
  /** The export's name in src/index.ts (several rows may share one, e.g. a method of a result). */
  readonly name: string;
  /** Valid argument lists, across the documented domain. */
  readonly valid: fc.Arbitrary<readonly unknown[]>;
  /** Calls the function (and, where it returns an object with methods, exercises them). */
  readonly call: (...args: never[]) => unknown;
  /** Codes valid input may be refused with (default none). */
  readonly validMayThrow?: readonly HeadflowErrorCode[];
  /** Extra check of a result of valid input. */
  readonly check?: (result: unknown, args: readonly unknown[]) => void;
  /**
   * Paths in a result (as `nonFinitePath` writes them, `$.validRange.maxTemperature`) where
   * Infinity is the documented value (an unbounded end of a range).
   */
  readonly documentedInfinity?: readonly string[];
  /** A type brand that returns its first argument unchanged (`si`): only that is checked. */
  readonly identity?: boolean;
  /**
   * Calls of each kind for a whole-job function (selectPumps, economicPipeSize, solveNetwork)
   * whose single call takes milliseconds, at the default HEADFLOW_FUZZ_RUNS of 1000; scaled
   * with HEADFLOW_FUZZ_RUNS for a long local run. Every other row runs FUZZ_RUNS.
   */
  readonly runs?: number;
}

/** Calls of each kind for `entry`: FUZZ_RUNS, or its own `runs` scaled by FUZZ_RUNS / 1000. */
export function runsOf(entry: FuzzEntry): number {
  return entry.runs === undefined
    ? FUZZ_RUNS
    : Math.max(1, Math.round((entry.runs * FUZZ_RUNS) / 1000));
}

/** A test timeout that grows with the number of runs (given for the default 1000). */
export function fuzzTimeout(ms: number): number {
  return Math.ceil((ms * FUZZ_RUNS) / 1000);
}

/** Calls per kind (valid, hostile) and per function. */
export const FUZZ_RUNS = Math.max(
  1000,
  Number.parseInt(process.env['HEADFLOW_FUZZ_RUNS'] ?? '', 10) || 1000,
);

// ---------------------------------------------------------------- valid-value arbitraries

/** Log-uniform positive number in [min, max] (covers every decade of a wide domain). */
export function logUniform(min: number, max: number): fc.Arbitrary<number> {
  const lo = Math.log(min);
  const hi = Math.log(max);
  return fc
    .double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true })
    .map((x) => Math.min(max, Math.max(min, Math.exp(x))));
}

/** Uniform number in [min, max], with both ends drawn now and then. */
export function uniform(min: number, max: number): fc.Arbitrary<number> {
  return fc.oneof(
    { weight: 8, arbitrary: fc.double({ min, max, noNaN: true, noDefaultInfinity: true }) },
    { weight: 1, arbitrary: fc.constantFrom(min, max) },
  );
}

/** `undefined`, `null` or the given options (null and undefined mean "no options"). */
export function optionsOf<T>(arb: fc.Arbitrary<T>): fc.Arbitrary<T | null | undefined> {
  return fc.oneof(fc.constant(undefined), fc.constant(null), arb);
}

// ---------------------------------------------------------------- hostile values

const HUGE_STRING = 'x'.repeat(1_000_000);
const BIG_ID = 'elbow-'.repeat(20_000);
const HUGE_HOLEY: unknown[] = new Array(1_000_000);

function sparse(): unknown[] {
  const a: unknown[] = [1, 2, 3];
  delete a[1];
  return a;
}

/** Values no public function should choke on. Fresh objects each time (they may be mutated). */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(
    Number.NaN,
    Number.POSITIVE_INFINITY,
    Number.NEGATIVE_INFINITY,
    0,
    -0,
    -1,
    1e300,
    -1e300,
    1e-300,
    -1e-300,
    Number.MAX_VALUE,
    Number.MIN_VALUE,
    2 ** 53 + 2,
    0.5,
    3,
    '',
    ' ',
    '3',
    'NaN',
    '1e309 m',
    '__proto__',
    'constructor',
    HUGE_STRING,
    BIG_ID,
    null,
    undefined,
    true,
    false,
    10n,
  ),
  fc.constant(null).map(() => Symbol('hostile')),
  fc.constant(null).map(() => ({})),
  fc.constant(null).map(() => []),
  fc.constant(null).map(() => [undefined]),
  fc.constant(null).map(() => [Number.NaN]),
  fc.constant(null).map(sparse),
  fc.constant(null).map(() => Object.create(null) as object),
  fc.constant(null).map(() => JSON.parse('{"__proto__": {"x": 1}, "constructor": 1}') as object),
  fc.constant(null).map(() => ({ valueOf: () => Number.NaN, toString: () => 'NaN' })),
  fc.constant(null).map(() => () => Number.NaN),
  fc.constant(null).map(() => () => 1),
  fc.constant(null).map(() => new Float64Array(0)),
  fc.constant(null).map(() => Float64Array.of(Number.NaN, 1)),
  fc.constant(null).map(() => new Date(0)),
  // One shared array of a million holes (allocating one per draw would cost 9 ms).
  fc.constant(HUGE_HOLEY),
);

// ---------------------------------------------------------------- breaking a valid input

type Path = readonly (string | number)[];

function isPlain(x: unknown): x is Record<string, unknown> {
  if (typeof x !== 'object' || x === null) return false;
  const p: unknown = Object.getPrototypeOf(x);
  return p === Object.prototype || p === null;
}

/** Copies arrays and plain objects deeply; typed arrays are copied; other objects are shared. */
export function cloneArgs<T>(x: T): T {
  if (Array.isArray(x)) {
    const a: unknown[] = new Array(x.length);
    for (let i = 0; i < x.length; i++) if (i in x) a[i] = cloneArgs(x[i]);
    return a as T;
  }
  if (x instanceof Float64Array) return x.slice() as T;
  if (isPlain(x)) {
    const o: Record<string, unknown> = Object.getPrototypeOf(x) === null ? Object.create(null) : {};
    for (const k of Object.keys(x)) {
      Object.defineProperty(o, k, {
        value: cloneArgs(x[k]),
        enumerable: true,
        writable: true,
        configurable: true,
      });
    }
    return o as T;
  }
  return x;
}

function paths(root: unknown, limit = 4000): Path[] {
  const out: Path[] = [];
  const walk = (x: unknown, p: Path, depth: number): void => {
    if (out.length >= limit || depth > 12) return;
    if (p.length > 0) out.push(p);
    if (Array.isArray(x)) {
      for (let i = 0; i < x.length && i < 64; i++) walk(x[i], [...p, i], depth + 1);
    } else if (isPlain(x)) {
      for (const k of Object.keys(x)) walk(x[k], [...p, k], depth + 1);
    }
  };
  walk(root, [], 0);
  return out;
}

function parentOf(root: unknown, path: Path): Record<string | number, unknown> | undefined {
  let x: unknown = root;
  for (let i = 0; i < path.length - 1; i++) {
    x = (x as Record<string | number, unknown>)[path[i] as string | number];
  }
  return typeof x === 'object' && x !== null ? (x as Record<string | number, unknown>) : undefined;
}

const EXTRA_KEYS = ['__proto__', 'constructor', 'toString', 'valueOf', 'prototype', 'extra'];

type Mutation = 'replace' | 'delete' | 'extra' | 'sparse' | 'nullProto' | 'scale' | 'args';

/** A description of one way to break a valid input, applied by {@link breakInput}. */
export interface Breakage {
  readonly kind: Mutation;
  readonly at: number;
  readonly value: unknown;
  readonly key: string;
  readonly factor: number;
}

export const breakage: fc.Arbitrary<Breakage> = fc.record({
  kind: fc.constantFrom<Mutation>(
    'replace',
    'replace',
    'replace',
    'delete',
    'extra',
    'sparse',
    'nullProto',
    'scale',
    'args',
  ),
  at: fc.nat(),
  value: hostileValue,
  key: fc.constantFrom(...EXTRA_KEYS),
  factor: fc.constantFrom(-1, 0, 1e300, 1e-300, -1e-300, 1e16, 1e-16, Number.NaN),
});

/** Returns a broken copy of `args` (the valid argument list), per `b`. */
export function breakInput(args: readonly unknown[], b: Breakage): unknown[] {
  const root = cloneArgs([...args]);
  if (b.kind === 'args') {
    // Too few or too many arguments, or one argument replaced outright.
    const i = b.at % (root.length + 2);
    if (i === root.length) return root.slice(0, Math.max(0, root.length - 1));
    if (i === root.length + 1) return [...root, b.value];
    root[i] = b.value;
    return root;
  }
  const all = paths(root);
  if (all.length === 0) return [b.value];
  const path = all[b.at % all.length] as Path;
  const parent = parentOf(root, path);
  const key = path[path.length - 1] as string | number;
  if (parent === undefined) return root;
  const current = parent[key];
  switch (b.kind) {
    case 'replace':
      parent[key] = b.value;
      break;
    case 'delete':
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete parent[key];
      break;
    case 'extra': {
      const target = isPlain(current) ? current : parent;
      Object.defineProperty(target, b.key, {
        value: b.value,
        enumerable: true,
        writable: true,
        configurable: true,
      });
      break;
    }
    case 'sparse':
      if (Array.isArray(current) && current.length > 0) {
        delete current[b.at % current.length];
      } else if (Array.isArray(parent)) {
        delete parent[key as number];
      } else {
        parent[key] = sparse();
      }
      break;
    case 'nullProto':
      if (isPlain(current)) {
        const o = Object.create(null) as Record<string, unknown>;
        for (const k of Object.keys(current)) o[k] = current[k];
        parent[key] = o;
      } else {
        parent[key] = Object.create(null);
      }
      break;
    case 'scale':
      parent[key] = typeof current === 'number' ? current * b.factor : b.factor;
      break;
  }
  return root;
}

// ---------------------------------------------------------------- checking outcomes

/** Where in `value` a NaN or ±Infinity hides (a path), or undefined when there is none. */
export function nonFinitePath(
  value: unknown,
  seen = new Set<object>(),
  at = '$',
  documented: readonly string[] = [],
): string | undefined {
  if (typeof value === 'number') {
    if (Number.isFinite(value)) return undefined;
    const allowed = value === Number.POSITIVE_INFINITY && documented.includes(at);
    return allowed ? undefined : `${at} = ${value}`;
  }
  if (typeof value !== 'object' || value === null) return undefined;
  if (seen.has(value)) return undefined;
  seen.add(value);
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const a = value as unknown as ArrayLike<number>;
    for (let i = 0; i < a.length; i++) {
      if (!Number.isFinite(a[i])) return `${at}[${i}] = ${a[i]}`;
    }
    return undefined;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = nonFinitePath(value[i], seen, `${at}[${i}]`, documented);
      if (p) return p;
    }
    return undefined;
  }
  for (const k of Object.keys(value)) {
    const p = nonFinitePath((value as Record<string, unknown>)[k], seen, `${at}.${k}`, documented);
    if (p) return p;
  }
  return undefined;
}

function callerObjects(args: readonly unknown[]): Set<object> {
  const set = new Set<object>();
  const walk = (x: unknown, depth: number): void => {
    if (typeof x !== 'object' || x === null || set.has(x) || depth > 12) return;
    if (ArrayBuffer.isView(x)) return;
    set.add(x);
    if (Array.isArray(x)) {
      for (let i = 0; i < x.length && i < 1000; i++) walk(x[i], depth + 1);
    } else if (isPlain(x)) {
      for (const k of Object.keys(x)) walk(x[k], depth + 1);
    }
  };
  walk(args, 0);
  set.delete(args as object);
  return set;
}

function describeArgs(args: readonly unknown[]): string {
  try {
    const s = JSON.stringify(args, (_k, v: unknown) => {
      if (v === undefined) return 'undefined';
      if (typeof v === 'number' && !Number.isFinite(v)) return String(v);
      if (typeof v === 'bigint') return `${v}n`;
      if (typeof v === 'symbol') return v.toString();
      if (typeof v === 'function') return 'function';
      if (typeof v === 'object' && v !== null && !Array.isArray(v) && !isPlain(v)) {
        return `(${(v as { constructor?: { name?: string } }).constructor?.name ?? 'object'})`;
      }
      if (typeof v === 'string' && v.length > 80) return `${v.slice(0, 20)}...(${v.length} chars)`;
      return v;
    });
    return s.length > 2000 ? `${s.slice(0, 2000)}...` : s;
  } catch {
    return '(arguments that cannot be shown)';
  }
}

/** Calls `entry.call(...args)` and asserts the outcome; returns the result when it returned. */
function callChecked(entry: FuzzEntry, args: readonly unknown[], valid: boolean): void {
  let result: unknown;
  if (entry.identity) {
    expect(Object.is((entry.call as (...a: unknown[]) => unknown)(...args), args[0])).toBe(true);
    return;
  }
  try {
    result = (entry.call as (...a: unknown[]) => unknown)(...args);
  } catch (e) {
    if (!(e instanceof HeadflowError)) {
      expect.fail(`${entry.name}(${describeArgs(args)}) threw ${String(e)} (not a HeadflowError)`);
    }
    expect(typeof e.code).toBe('string');
    if (valid && !(entry.validMayThrow ?? []).includes(e.code)) {
      expect.fail(
        `${entry.name}(${describeArgs(args)}) refused valid input: ${e.code} ${e.message}`,
      );
    }
    return;
  }
  // Objects the caller passed in and the function hands back unchanged (a run's `input`, a
  // curve's `definition`) are the caller's, not results: they are not searched. Output
  // buffers (typed arrays) are always searched.
  const bad = nonFinitePath(result, callerObjects(args), '$', entry.documentedInfinity);
  if (bad !== undefined) {
    expect.fail(`${entry.name}(${describeArgs(args)}) returned a non-finite value at ${bad}`);
  }
  if (valid && entry.check) entry.check(result, args);
}

/** Runs one entry: valid calls, then hostile calls. */
export function runEntry(entry: FuzzEntry): void {
  const numRuns = runsOf(entry);
  fc.assert(
    fc.property(entry.valid, (args) => callChecked(entry, args, true)),
    { numRuns },
  );
  fc.assert(
    fc.property(entry.valid, breakage, (args, b) => callChecked(entry, breakInput(args, b), false)),
    { numRuns },
  );
}

/**
 * The shape check at the entry of every renderer: a report is an object whose lists are dense
 * lists of objects and whose names are strings, so that a report built or edited by hand is
 * refused with a HeadflowError naming the field (`duty[1]`, `candidates[0].cases`), never
 * with a TypeError or a loop deep inside a table. Numbers that are missing or not finite are
 * printed as a dash, as a missing value is.
 *
 * @module
 * @internal
 */
import type { DesignReport } from '../design/core';
import { HeadflowError } from '../errors';
import { guardArray, guardNumber, guardRecord, guardString, kindOf } from '../guards';

const MAX_ITEMS = 100_000;

function records(path: string, list: unknown): readonly Readonly<Record<string, unknown>>[] {
  return guardArray(path, list, { max: MAX_ITEMS }).map((x, i) => guardRecord(`${path}[${i}]`, x));
}

/** A list of checks: each with an id, severity, message and source that are strings. */
function checks(path: string, list: unknown): void {
  for (const [i, k] of records(path, list).entries()) {
    for (const f of ['id', 'severity', 'message', 'source'] as const) {
      guardString(`${path}[${i}].${f}`, k[f], 10_000);
    }
    guardRecord(`${path}[${i}].values`, k['values']);
    if (k['words'] !== undefined) {
      const words = guardRecord(`${path}[${i}].words`, k['words']);
      for (const [key, w] of Object.entries(words))
        guardString(`${path}[${i}].words.${key}`, w, 10_000);
    }
  }
}

/** Nodes of a report searched at most (a report of the examples has a few thousand). */
const MAX_NODES = 2_000_000;

/**
 * A report is plain data: numbers, strings, booleans, `undefined` or `null` in lists and plain
 * objects. Anything else (a Symbol, a function, a bigint, an object without a prototype or of
 * a class) cannot be printed and is refused, naming where it is.
 */
function checkPlainData(report: object): void {
  const stack: [unknown, string, number][] = [[report, 'report', 0]];
  const seen = new Set<object>();
  let nodes = 0;
  while (stack.length > 0) {
    const [x, path, depth] = stack.pop() as [unknown, string, number];
    if (++nodes > MAX_NODES || depth > 32) {
      throw new HeadflowError('INVALID_ARGUMENT', `${path} is nested too deep or too large.`, {
        parameter: path,
        allowed: `at most ${MAX_NODES} values, 32 levels deep`,
      });
    }
    const t = typeof x;
    if (x === null || t === 'undefined' || t === 'number' || t === 'string' || t === 'boolean') {
      continue;
    }
    const proto: unknown = t === 'object' ? Object.getPrototypeOf(x) : undefined;
    const plain = Array.isArray(x) || proto === Object.prototype;
    if (!plain) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${path} is ${kindOf(x)}${t === 'object' ? ' that is not plain data' : ''}, which a report cannot hold.`,
        { parameter: path, allowed: 'numbers, strings, booleans, lists and plain objects' },
      );
    }
    if (seen.has(x as object)) continue;
    seen.add(x as object);
    if (Array.isArray(x)) {
      guardArray(path, x, { max: MAX_ITEMS });
      for (let i = 0; i < x.length; i++) stack.push([x[i], `${path}[${i}]`, depth + 1]);
    } else {
      for (const k of Object.keys(x as object)) {
        stack.push([(x as Record<string, unknown>)[k], `${path}.${k}`, depth + 1]);
      }
    }
  }
}

/** The sampled curves, when the report has them (`evaluateDesign(input, { curves: true })`). */
function checkCurves(curves: Readonly<Record<string, unknown>>): void {
  for (const k of ['systems', 'pumps', 'efficiency', 'npshRequired', 'npshAvailable'] as const) {
    for (const [i, c] of records(`report.curves.${k}`, curves[k] ?? []).entries()) {
      guardString(`report.curves.${k}[${i}].name`, c['name'], 10_000);
      if (c['group'] !== undefined)
        guardString(`report.curves.${k}[${i}].group`, c['group'], 10_000);
      guardArray(`report.curves.${k}[${i}].flows`, c['flows'], { max: MAX_ITEMS });
      guardArray(`report.curves.${k}[${i}].values`, c['values'], { max: MAX_ITEMS });
    }
  }
  for (const k of ['preferredRegions', 'points'] as const) {
    for (const [i, c] of records(`report.curves.${k}`, curves[k] ?? []).entries()) {
      guardString(`report.curves.${k}[${i}].name`, c['name'], 10_000);
      if (c['group'] !== undefined)
        guardString(`report.curves.${k}[${i}].group`, c['group'], 10_000);
    }
  }
  for (const [i, d] of records('report.curves.dutyPoints', curves['dutyPoints'] ?? []).entries()) {
    guardString(`report.curves.dutyPoints[${i}].case`, d['case'], 10_000);
  }
}

/** Throws `INVALID_ARGUMENT` naming the first part of `report` that has the wrong shape. */
export function checkReportShape(report: DesignReport): void {
  const r = guardRecord('report', report);
  guardString('report.name', r['name'], 10_000);
  if (r['fluid'] !== undefined) {
    guardString('report.fluid.name', guardRecord('report.fluid', r['fluid'])['name'], 10_000);
  }
  for (const f of ['verdict', 'inputs'] as const) {
    if (r[f] !== undefined) guardRecord(`report.${f}`, r[f]);
  }
  for (const [i, d] of records('report.duty', r['duty']).entries()) {
    guardString(`report.duty[${i}].case`, d['case'], 10_000);
    for (const [j, run] of records(`report.duty[${i}].runs`, d['runs']).entries()) {
      guardString(`report.duty[${i}].runs[${j}].name`, run['name'], 10_000);
    }
  }
  for (const [i, c] of records('report.candidates', r['candidates']).entries()) {
    const at = `report.candidates[${i}]`;
    guardString(`${at}.name`, c['name'], 10_000);
    guardNumber(`${at}.count`, c['count']);
    for (const [j, k] of records(`${at}.cases`, c['cases']).entries()) {
      records(`${at}.cases[${j}].velocities`, k['velocities']);
    }
    checks(`${at}.checks`, c['checks']);
    for (const m of ['motor', 'dutyOnlyMotor', 'energy'] as const) {
      if (c[m] !== undefined) guardRecord(`${at}.${m}`, c[m]);
    }
    const energy = c['energy'] as Readonly<Record<string, unknown>> | undefined;
    if (energy?.['cost'] !== undefined) guardRecord(`${at}.energy.cost`, energy['cost']);
  }
  checks('report.checks', r['checks']);
  for (const [i, text] of guardArray('report.cautions', r['cautions'], {
    max: MAX_ITEMS,
  }).entries()) {
    guardString(`report.cautions[${i}]`, text, 100_000);
  }
  if (r['curves'] !== undefined) checkCurves(guardRecord('report.curves', r['curves']));
  checkPlainData(r);
}

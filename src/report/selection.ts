/**
 * A pump selection rendered as terminal text, Markdown or JSON: the ranked ways with their
 * trim or speed, % of BEP, NPSH margin, throttling loss, motor, energy and life-cycle cost,
 * the reasons the failing ones fail, and the cautions.
 *
 * @module
 */

import { displayUnits, type UnitSystem } from '../design/core';
import { guardInteger, guardOneOf, guardOptions, guardRange, guardRecord } from '../guards';
import type { Selection, SelectionEntry } from '../select/index';
import { type Flow, formatQuantity, type Length, type Power, to } from '../units/index';
import { checkSelectionShape } from './report-shape';

/** Options of {@link renderSelection}. */
export interface SelectionRenderOptions {
  /** `'text'` (default), `'markdown'` or `'json'`. */
  readonly format?: 'text' | 'markdown' | 'json';
  /** Units of the text (default `'si'`); JSON numbers carry their unit. */
  readonly units?: UnitSystem;
  /** Most entries listed (default all). */
  readonly limit?: number;
}

/** The format name of a selection's JSON. */
export const SELECTION_FORMAT = 'headflow-selection/1';

function round(v: number, digits = 4): number {
  return Number(v.toPrecision(digits));
}

interface Row {
  readonly rank: string;
  readonly way: string;
  readonly passed: string;
  readonly setting: string;
  readonly bep: string;
  readonly npsh: string;
  readonly throttle: string;
  readonly motor: string;
  readonly energy: string;
  readonly lcc: string;
}

function range(values: readonly number[]): [number, number] | undefined {
  if (values.length === 0) return undefined;
  return [Math.min(...values), Math.max(...values)];
}

function numbers(xs: readonly (number | undefined)[]): number[] {
  return xs.filter((x): x is number => x !== undefined);
}

function rowOf(e: SelectionEntry, units: UnitSystem): Row {
  const u = displayUnits(units);
  const dia = units === 'us' ? 'in' : 'mm';
  const setting =
    e.method === 'trim' && e.trimDiameter !== undefined
      ? `${formatQuantity(e.trimDiameter, dia, 4)} (${round(100 * (e.trimRatio ?? 1), 3)} %)`
      : e.speed !== undefined
        ? formatQuantity(e.speed, u.speed, 4)
        : '-';
  const bep = range(numbers(e.cases.map((c) => c.percentOfBep)));
  const npsh = range(numbers(e.cases.map((c) => c.npshMargin)));
  const loss = range(numbers(e.cases.map((c) => c.throttlePower)));
  return {
    rank: String(e.rank),
    way: e.label,
    passed: e.passed ? 'yes' : 'no',
    setting,
    bep: bep === undefined ? '-' : `${round(bep[0], 3)}-${round(bep[1], 3)}`,
    npsh: npsh === undefined ? '-' : formatQuantity(npsh[0] as Length, u.head, 3),
    throttle: loss === undefined ? '-' : formatQuantity(loss[1] as Power, u.power, 3),
    motor: e.motor === undefined ? '-' : `${e.motor.nameplate} ${e.motor.unit}`,
    energy: e.energy === undefined ? '-' : `${round(e.energy.kWh, 4)}`,
    lcc: e.lifeCycleCost === undefined ? '-' : `${Math.round(e.lifeCycleCost.total)}`,
  };
}

const HEADERS: Row = {
  rank: 'rank',
  way: 'pump and way',
  passed: 'passed',
  setting: 'trim / speed',
  bep: '% of BEP',
  npsh: 'least NPSH margin',
  throttle: 'valve loss',
  motor: 'motor',
  energy: 'kWh a year',
  lcc: 'life-cycle cost',
};

const KEYS = Object.keys(HEADERS) as (keyof Row)[];

function head(selection: Selection, units: UnitSystem): string[] {
  const u = displayUnits(units);
  const lines = [
    `Duty: ${formatQuantity(selection.dutyFlow as Flow, u.flow)}; head needed in each case: ${selection.duty
      .map((d) => `${d.case} ${formatQuantity(d.head, u.head, 4)}`)
      .join(', ')}.`,
    `Ranked by ${selection.rankedBy}${selection.rankedBy === 'life-cycle cost' ? ` (${selection.currency ?? 'currency of the prices'}, present value over ${selection.costs?.years ?? 20} years at ${round(100 * (selection.costs?.discountRate ?? 0), 3)} % discount, energy escalating ${round(100 * (selection.costs?.energyEscalation ?? 0), 3)} % a year)` : ' (kWh a year over the duty profile, design case)'}; every passing way ranks above every failing one.`,
    `% of BEP: range over the cases; valve loss: the largest hydraulic power a throttling valve burns to hold the duty flow.`,
    ...(selection.notes ?? []).map((n) => `Note: ${n}`),
  ];
  return lines;
}

function failures(entries: readonly SelectionEntry[]): string[] {
  return entries
    .filter((e) => !e.passed)
    .map((e) => {
      const first = e.checks.find((c) => c.severity === 'error');
      return `${e.label}: ${first === undefined ? 'failed' : `${first.case === undefined ? '' : `${first.case}: `}${first.message}`}`;
    });
}

function warnings(entries: readonly SelectionEntry[]): string[] {
  const out: string[] = [];
  for (const e of entries.filter((x) => x.passed).slice(0, 3)) {
    const seen = new Set<string>();
    for (const c of e.checks) {
      if (c.severity !== 'warning' || seen.has(c.id)) continue;
      seen.add(c.id);
      out.push(`${e.label}: ${c.case === undefined ? '' : `${c.case}: `}${c.message}`);
    }
  }
  return out;
}

function text(selection: Selection, entries: readonly SelectionEntry[], units: UnitSystem): string {
  const rows = [HEADERS, ...entries.map((e) => rowOf(e, units))];
  const width = KEYS.map((k) => Math.max(...rows.map((r) => r[k].length)));
  const line = (r: Row): string =>
    KEYS.map((k, i) => r[k].padEnd(width[i] ?? 0))
      .join('  ')
      .trimEnd();
  const parts = [
    `Pump selection: ${selection.name}${selection.catalogue === undefined ? '' : ` from ${selection.catalogue}`}`,
    '',
    ...head(selection, units),
    '',
    line(HEADERS),
    ...rows.slice(1).map(line),
  ];
  const w = warnings(entries);
  if (w.length > 0) parts.push('', 'Warnings of the leading ways:', ...w.map((x) => `  - ${x}`));
  const f = failures(entries);
  if (f.length > 0)
    parts.push('', 'Why the failing ways fail (first error):', ...f.map((x) => `  - ${x}`));
  parts.push('', 'Cautions:', ...selection.cautions.map((c) => `  - ${c}`));
  return `${parts.join('\n')}\n`;
}

function cell(s: string): string {
  return s.replace(/\|/g, '\\|');
}

function markdown(
  selection: Selection,
  entries: readonly SelectionEntry[],
  units: UnitSystem,
): string {
  const row = (r: Row): string => `| ${KEYS.map((k) => cell(r[k])).join(' | ')} |`;
  const parts = [
    `# Pump selection: ${selection.name}`,
    '',
    ...head(selection, units),
    '',
    row(HEADERS),
    `|${KEYS.map(() => ' --- ').join('|')}|`,
    ...entries.map((e) => row(rowOf(e, units))),
  ];
  const w = warnings(entries);
  if (w.length > 0)
    parts.push('', '## Warnings of the leading ways', '', ...w.map((x) => `- ${x}`));
  const f = failures(entries);
  if (f.length > 0) parts.push('', '## Why the failing ways fail', '', ...f.map((x) => `- ${x}`));
  parts.push('', '## Cautions', '', ...selection.cautions.map((c) => `- ${c}`));
  return `${parts.join('\n')}\n`;
}

function quantity(value: number | undefined, unit: string, convert: (v: number) => number) {
  return value === undefined ? null : { value: round(convert(value), 6), unit };
}

function json(selection: Selection, entries: readonly SelectionEntry[], units: UnitSystem): string {
  const u = displayUnits(units);
  const dia = units === 'us' ? 'in' : 'mm';
  const doc = {
    format: SELECTION_FORMAT,
    name: selection.name,
    catalogue: selection.catalogue ?? null,
    units,
    rankedBy: selection.rankedBy,
    currency: selection.currency ?? null,
    costs: selection.costs ?? null,
    notes: selection.notes ?? [],
    dutyFlow: quantity(selection.dutyFlow, u.flow, (v) => to(v as Flow, u.flow)),
    duty: selection.duty.map((d) => ({
      case: d.case,
      head: quantity(d.head, u.head, (v) => to(v as Length, u.head)),
    })),
    ranked: entries.map((e) => ({
      rank: e.rank,
      name: e.name,
      method: e.method,
      label: e.label,
      passed: e.passed,
      trimDiameter: quantity(e.trimDiameter, dia, (v) => to(v as Length, dia)),
      trimRatio: e.trimRatio ?? null,
      trimBasis: e.trimBasis ?? null,
      speed: quantity(e.speed, u.speed, (v) => to(v as never, u.speed)),
      motor: e.motor === undefined ? null : { nameplate: e.motor.nameplate, unit: e.motor.unit },
      energy:
        e.energy === undefined
          ? null
          : { kWh: round(e.energy.kWh, 6), cost: e.energy.cost ?? null },
      lifeCycleCost: e.lifeCycleCost ?? null,
      cases: e.cases.map((c) => ({
        case: c.case,
        failure: c.failure ?? null,
        speed: quantity(c.speed, u.speed, (v) => to(v as never, u.speed)),
        flow: quantity(c.flow, u.flow, (v) => to(v as Flow, u.flow)),
        head: quantity(c.head, u.head, (v) => to(v as Length, u.head)),
        efficiency: c.efficiency ?? null,
        percentOfBep: c.percentOfBep ?? null,
        npshMargin: quantity(c.npshMargin, u.head, (v) => to(v as Length, u.head)),
        throttleHead: quantity(c.throttleHead, u.head, (v) => to(v as Length, u.head)),
        throttlePower: quantity(c.throttlePower, u.power, (v) => to(v as Power, u.power)),
        inputPower: quantity(c.inputPower, u.power, (v) => to(v as Power, u.power)),
        energy:
          c.energy === undefined
            ? null
            : { kWh: round(c.energy.kWh, 6), cost: c.energy.cost ?? null },
      })),
      checks: e.checks.map((c) => ({
        id: c.id,
        severity: c.severity,
        case: c.case ?? null,
        message: c.message,
        source: c.source,
      })),
    })),
    cautions: selection.cautions,
  };
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/** The shape a rendering reads (a selection from `selectPumps` always has it). */
function checkSelection(selection: Selection): void {
  const s = guardRecord('selection', selection);
  guardRange('selection.dutyFlow', s['dutyFlow'], { min: 0, minOpen: true, unit: 'm3/s' });
  checkSelectionShape(s);
}

/**
 * Renders a pump selection (from `selectPumps`) as terminal text, Markdown or JSON (format
 * `headflow-selection/1`, every quantity `{ value, unit }` in the chosen units). The text and
 * Markdown list every way in rank order with its trim or speed, the range of % of BEP over
 * the cases, the least NPSH margin, the largest valve loss, the motor, the year's energy and
 * the life-cycle cost; then the warnings of the three leading passing ways, the first error
 * of each failing way, and the cautions.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a selection that is not an object or bad options.
 * @example
 * ```ts
 * process.stdout.write(renderSelection(selectPumps(design, catalogue), { format: 'markdown' }));
 * ```
 */
export function renderSelection(
  selection: Selection,
  options?: SelectionRenderOptions | null,
): string {
  checkSelection(selection);
  const o = guardOptions<SelectionRenderOptions>('options', options);
  const format =
    o.format === undefined
      ? 'text'
      : guardOneOf('options.format', o.format, ['text', 'markdown', 'json'] as const);
  const units =
    o.units === undefined ? 'si' : guardOneOf('options.units', o.units, ['si', 'us'] as const);
  const limit =
    o.limit === undefined
      ? selection.ranked.length
      : guardInteger('options.limit', o.limit, 0, 1e7);
  const entries = selection.ranked.slice(0, limit);
  if (format === 'json') return json(selection, entries, units);
  if (format === 'markdown') return markdown(selection, entries, units);
  return text(selection, entries, units);
}

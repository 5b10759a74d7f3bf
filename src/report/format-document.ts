/**
 * The content of a printed report, once, as a list of neutral blocks (headings, fields,
 * tables, lists) that the text and Markdown renderers lay out in their own way. Both outputs
 * therefore carry the same sections, numbers and words.
 *
 * @module
 * @internal
 */
import type {
  CandidateReport,
  CaseResult,
  Check,
  DesignReport,
  DisplayUnits,
  Severity,
  UnitSystem,
} from '../design/index';
import { displayUnits } from '../design/index';
import type { FitReport, MotorRating } from '../pumps/index';
import type { Length, Power, Pressure } from '../units/index';
import {
  DASH,
  formatFixed,
  formatFixedIn,
  formatGrouped,
  formatIn,
  formatPercent,
  formatShort,
  formatWithUnit,
} from './format-values';

/** A table column: its header (lines split by `\n`) and how its cells align. */
export interface Column {
  readonly header: string;
  readonly align: 'left' | 'right';
}

/** One block of a printed report. Text in blocks is raw: each renderer escapes its own way. */
export type Block =
  | { readonly kind: 'title'; readonly text: string }
  | { readonly kind: 'heading'; readonly text: string }
  | { readonly kind: 'subheading'; readonly text: string }
  | { readonly kind: 'paragraph'; readonly text: string }
  | { readonly kind: 'fields'; readonly rows: readonly (readonly [string, string])[] }
  | {
      readonly kind: 'table';
      readonly columns: readonly Column[];
      readonly rows: readonly (readonly string[])[];
    }
  | { readonly kind: 'list'; readonly items: readonly string[] };

/** Said when a report comes without cautions (the evaluation always adds them). */
export const DEFAULT_CAUTION =
  'Results support, and do not replace, licensed engineering judgement and local codes.';

const SEVERITIES: readonly { readonly severity: Severity; readonly title: string }[] = [
  { severity: 'error', title: 'Errors' },
  { severity: 'warning', title: 'Warnings' },
  { severity: 'info', title: 'Notes' },
];

const left = (header: string): Column => ({ header, align: 'left' });
const right = (header: string): Column => ({ header, align: 'right' });

/** Every check of a report: the system's first, then each candidate's, in report order. */
export function allChecks(report: DesignReport): Check[] {
  const checks: Check[] = [...report.checks];
  for (const c of report.candidates) checks.push(...c.checks);
  return checks;
}

function plural(n: number, one: string, many: string): string {
  return `${n} ${n === 1 ? one : many}`;
}

function resultLine(report: DesignReport, checks: readonly Check[]): string {
  const count = (s: Severity): number => checks.filter((c) => c.severity === s).length;
  const tally = [
    plural(count('error'), 'error', 'errors'),
    plural(count('warning'), 'warning', 'warnings'),
    plural(count('info'), 'note', 'notes'),
  ].join(', ');
  return `${report.passed ? 'passed' : 'FAILED'} (${tally})`;
}

function unitsLine(system: UnitSystem, u: DisplayUnits): string {
  const name = system === 'si' ? 'SI' : 'US customary';
  return `${name}: flow ${u.flow}, head ${u.head}, power ${u.power}, speed ${u.speed}, energy kWh`;
}

function dutyTable(report: DesignReport, u: DisplayUnits): Block {
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Static head\n(${u.head})`),
      right(`Losses\n(${u.head})`),
      right(`Total head\n(${u.head})`),
      right(`NPSH available\n(${u.head})`),
    ],
    rows: report.duty.map((d) => [
      d.case,
      formatIn(d.staticHead, u.head),
      formatIn(d.lossHead, u.head),
      formatIn(d.head, u.head),
      formatIn(d.npshAvailable, u.head),
    ]),
  };
}

/** `psia`/`psig` in US units, `kPa abs`/`kPa gauge` in SI: the reference in the column head. */
function referenced(unit: string, reference: 'absolute' | 'gauge'): string {
  if (unit === 'psi') return reference === 'absolute' ? 'psia' : 'psig';
  return `${unit} ${reference === 'absolute' ? 'abs' : 'gauge'}`;
}

/**
 * Each end's pressure in each case, absolute and gauge (against the report's atmosphere), so
 * that a gauge reading entered as absolute (or the reverse) shows at a glance.
 */
function endsTable(report: DesignReport, u: DisplayUnits): Block {
  const p = u.pressure;
  const gauge = (x: number) => formatIn((x - report.atmosphere) as Pressure, p);
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Suction\n(${referenced(p, 'absolute')})`),
      right(`Suction\n(${referenced(p, 'gauge')})`),
      right(`Discharge\n(${referenced(p, 'absolute')})`),
      right(`Discharge\n(${referenced(p, 'gauge')})`),
    ],
    rows: report.duty.map((d) => [
      d.case,
      formatIn(d.suctionPressure, p),
      gauge(d.suctionPressure),
      formatIn(d.dischargePressure, p),
      gauge(d.dischargePressure),
    ]),
  };
}

function caseRow(r: CaseResult, u: DisplayUnits): string[] {
  return [
    r.case,
    formatFixedIn(r.speed, u.speed, 0),
    formatIn(r.flow, u.flow),
    formatIn(r.head, u.head),
    formatPercent(r.efficiency),
    formatIn(r.shaftPower, u.power),
    formatFixed(r.percentOfBep, 1),
    r.region ?? DASH,
    formatIn(r.npshAvailable, u.head),
    formatIn(r.npshRequired, u.head),
    formatFixed(r.npshRatio, 2),
  ];
}

function casesTable(c: CandidateReport, u: DisplayUnits): Block {
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Speed\n(${u.speed})`),
      right(`Flow\n(${u.flow})`),
      right(`Head\n(${u.head})`),
      right('Eff.\n(%)'),
      right(`Shaft\npower\n(${u.power})`),
      right('% of\nBEP'),
      left('Region'),
      right(`NPSHa\n(${u.head})`),
      right(`NPSHr\n(${u.head})`),
      right('NPSHa/\nNPSHr'),
    ],
    rows: c.cases.map((r) => caseRow(r, u)),
  };
}

function arrangementText(c: CandidateReport): string {
  const pumps = plural(c.count, 'pump', 'pumps');
  const how = c.count > 1 ? ` in ${c.arrangement}` : '';
  const control = c.control === 'speed' ? 'variable-speed drive' : 'fixed speed';
  return `${pumps}${how}, ${control}`;
}

function motorText(m: MotorRating | undefined, u: DisplayUnits, at: string): string {
  if (m === undefined) return `${DASH} (not sized)`;
  const series = m.series === 'iec' ? 'IEC 60072-1 series' : 'NEMA MG 1 series';
  const inDisplay = m.unit === u.power ? '' : ` (${formatWithUnit(m.rating as Power, u.power, 4)})`;
  const sf =
    m.serviceFactor === 1 ? '' : `, relying on service factor ${formatShort(m.serviceFactor)}`;
  return `${formatShort(m.nameplate)} ${m.unit}${inDisplay}, ${series}; load ${formatPercent(m.loadFraction)} % ${at}${sf}`;
}

function energyRows(c: CandidateReport): [string, string][] {
  const e = c.energy;
  const cost = e?.cost === undefined ? DASH : `${formatGrouped(e.cost.amount)} ${e.cost.currency}`;
  return [
    ['Yearly energy (design case)', e === undefined ? DASH : `${formatGrouped(e.kWh)} kWh`],
    ['Yearly energy cost', cost],
  ];
}

function fitMethod(f: FitReport): string {
  const how =
    f.method === 'polynomial'
      ? `least-squares polynomial of degree ${f.degree ?? DASH}`
      : 'monotone cubic through every point';
  return `${how} (${f.selection})`;
}

function toleranceNote(f: FitReport): string {
  return f.withinTolerance === false ? '; OUTSIDE the catalogue tolerance' : '';
}

/** The curve-fit rows: method and largest residual of the head and efficiency fits. */
function fitRows(c: CandidateReport, u: DisplayUnits): [string, string][] {
  const { head, efficiency } = c.curveFit;
  const rows: [string, string][] = [
    [
      'Head curve fit',
      `${fitMethod(head)}; largest residual ${formatWithUnit(head.maxResidual as Length, u.head, 3)} (${formatFixed(100 * head.maxRelativeResidual, 2)} % of the point's head)${toleranceNote(head)}`,
    ],
  ];
  if (efficiency !== undefined) {
    rows.push([
      'Efficiency curve fit',
      `${fitMethod(efficiency)}; largest residual ${formatFixed(100 * efficiency.maxResidual, 2)} percentage points${toleranceNote(efficiency)}`,
    ]);
  }
  return rows;
}

function candidateBlocks(c: CandidateReport, u: DisplayUnits): Block[] {
  const blocks: Block[] = [
    {
      kind: 'heading',
      text: `Candidate ${c.rank}: ${c.name} (${c.passed ? 'passes' : 'fails'})`,
    },
    { kind: 'fields', rows: [['Pump set', arrangementText(c)]] },
  ];
  if (c.cases.length > 0) blocks.push(casesTable(c, u));
  else blocks.push({ kind: 'paragraph', text: 'No operating case was evaluated.' });
  const failures = c.cases.filter((r) => r.failure !== undefined);
  if (failures.length > 0) {
    blocks.push({
      kind: 'list',
      items: failures.map((r) => `No operating point in case "${r.case}": ${r.failure ?? DASH}`),
    });
  }
  blocks.push({
    kind: 'fields',
    rows: [
      ['Largest shaft power per pump', formatWithUnit(c.maxShaftPower, u.power)],
      ['Non-overloading motor per pump', motorText(c.motor, u, 'at the largest shaft power')],
      ['Duty-only motor per pump', motorText(c.dutyOnlyMotor, u, 'at the duty')],
      ...energyRows(c),
      ...fitRows(c, u),
    ],
  });
  return blocks;
}

function rankingTable(report: DesignReport): Block {
  const sorted = [...report.candidates].sort((a, b) => a.rank - b.rank);
  return {
    kind: 'table',
    columns: [
      right('Rank'),
      left('Candidate'),
      left('Result'),
      right('Yearly energy\n(kWh)'),
      right('Yearly cost'),
      right('Errors'),
      right('Warnings'),
    ],
    rows: sorted.map((c) => [
      String(c.rank),
      c.name,
      c.passed ? 'passes' : 'fails',
      formatGrouped(c.energy?.kWh),
      c.energy?.cost === undefined
        ? DASH
        : `${formatGrouped(c.energy.cost.amount)} ${c.energy.cost.currency}`,
      String(c.checks.filter((k) => k.severity === 'error').length),
      String(c.checks.filter((k) => k.severity === 'warning').length),
    ]),
  };
}

/** One check in words: `[npsh-margin] candidate A, case "low level": message (source: ...)`. */
export function checkText(check: Check): string {
  const about: string[] = [];
  if (check.candidate !== undefined) about.push(check.candidate);
  if (check.case !== undefined) about.push(`case "${check.case}"`);
  const where = about.length > 0 ? ` ${about.join(', ')}:` : ' system:';
  return `[${check.id}]${where} ${check.message} (source: ${check.source})`;
}

function checkBlocks(checks: readonly Check[]): Block[] {
  const blocks: Block[] = [{ kind: 'heading', text: 'Checks' }];
  for (const { severity, title } of SEVERITIES) {
    const group = checks.filter((c) => c.severity === severity);
    blocks.push({ kind: 'subheading', text: `${title} (${group.length})` });
    if (group.length === 0) blocks.push({ kind: 'paragraph', text: 'None.' });
    else blocks.push({ kind: 'list', items: group.map(checkText) });
  }
  return blocks;
}

/**
 * The blocks of a printed report, in order: title and summary fields; duty per case; the
 * ends' pressures per case, absolute and gauge; each
 * candidate (cases, motor, energy); ranking; checks by severity; cautions (always).
 */
export function reportBlocks(report: DesignReport, system: UnitSystem): Block[] {
  const u = displayUnits(system);
  const checks = allChecks(report);
  const blocks: Block[] = [
    { kind: 'title', text: `Pump selection report: ${report.name}` },
    {
      kind: 'fields',
      rows: [
        ['Result', resultLine(report, checks)],
        ['Fluid', report.fluid],
        ['Duty flow', formatWithUnit(report.dutyFlow, u.flow)],
        [
          'Atmosphere',
          `${formatIn(report.atmosphere, u.pressure)} ${referenced(u.pressure, 'absolute')}`,
        ],
        ['Units', unitsLine(system, u)],
      ],
    },
    { kind: 'heading', text: 'Duty by operating case' },
  ];
  if (report.duty.length > 0) {
    blocks.push(dutyTable(report, u));
    blocks.push({ kind: 'heading', text: 'End pressures by operating case' });
    blocks.push(endsTable(report, u));
  } else blocks.push({ kind: 'paragraph', text: 'No operating case was evaluated.' });
  if (report.candidates.length === 0) {
    blocks.push({
      kind: 'paragraph',
      text: 'No candidate pumps were given: this report gives the duty only.',
    });
  } else {
    for (const c of report.candidates) blocks.push(...candidateBlocks(c, u));
    blocks.push({ kind: 'heading', text: 'Ranking' }, rankingTable(report));
  }
  blocks.push(...checkBlocks(checks));
  blocks.push({ kind: 'heading', text: 'Cautions' });
  blocks.push({
    kind: 'list',
    items: report.cautions.length > 0 ? [...report.cautions] : [DEFAULT_CAUTION],
  });
  return blocks;
}

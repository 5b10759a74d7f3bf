/**
 * The content of a printed report, once, as a list of neutral blocks (headings, fields,
 * tables, lists) that the text, Markdown and HTML renderers lay out in their own way. All
 * outputs therefore carry the same sections, numbers and words; every number is written in
 * the one unit system asked for, messages included.
 *
 * @module
 * @internal
 */
import type {
  CandidateReport,
  CaseResult,
  Check,
  DesignReport,
  Severity,
  UnitSystem,
} from '../design/core';
import { checkMessage } from '../design/core';
import { type Say, type SymbolStyle, sayIn } from '../design/say';
import type { FitReport, MotorRating } from '../pumps/index';
import type { Flow, Length, Power, Pressure } from '../units/index';
import {
  DASH,
  formatFixed,
  formatFixedIn,
  formatGrouped,
  formatIn,
  formatNumber,
  formatPercent,
} from './format-values';
import { networkBlocks } from './network-tables';

/** A table column: its header (lines split by `\n`) and how its cells align. */
export interface Column {
  readonly header: string;
  readonly align: 'left' | 'right';
}

/** One block of a printed report. Text in blocks is raw: each renderer escapes its own way. */
export type Block =
  | { readonly kind: 'title'; readonly text: string }
  | { readonly kind: 'heading'; readonly text: string; readonly candidate?: boolean }
  | { readonly kind: 'subheading'; readonly text: string }
  | { readonly kind: 'paragraph'; readonly text: string }
  | { readonly kind: 'fields'; readonly rows: readonly (readonly [string, string])[] }
  | {
      readonly kind: 'table';
      readonly columns: readonly Column[];
      readonly rows: readonly (readonly string[])[];
    }
  | { readonly kind: 'list'; readonly items: readonly string[] };

/** How a report is laid out: the full calculation sheet or the short form. */
export interface BlockOptions {
  /** Symbols as ASCII (`m3/h`) or Unicode (`m³/h`). */
  readonly style: SymbolStyle;
  /** The short form: verdict, duty, candidates, ranking, checks, cautions. */
  readonly summary: boolean;
}

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

/**
 * The headline: how many candidates pass and which one is recommended
 * (`1 of 2 candidates passes; recommended: pump B with drive`).
 */
export function verdictLine(report: DesignReport): string {
  const v = report.verdict;
  const systemErrors = report.checks.filter((k) => k.severity === 'error').length;
  const system =
    systemErrors > 0 ? `; the system itself fails ${plural(systemErrors, 'check', 'checks')}` : '';
  if (v.candidates === 0) {
    return `Duty only: no candidate pumps were given${system}.`;
  }
  const passes = `${v.passing} of ${plural(v.candidates, 'candidate', 'candidates')} ${v.passing === 1 ? 'passes' : 'pass'}`;
  if (v.passing === 0) {
    return `No candidate passes (0 of ${v.candidates}); none is recommended (the best ranked is ${v.recommended ?? DASH})${system}.`;
  }
  return `${passes}; recommended: ${v.recommended ?? DASH}${system}.`;
}

function tallyLine(checks: readonly Check[]): string {
  const count = (s: Severity): number => checks.filter((c) => c.severity === s).length;
  return [
    plural(count('error'), 'error', 'errors'),
    plural(count('warning'), 'warning', 'warnings'),
    plural(count('info'), 'note', 'notes'),
  ].join(', ');
}

function unitsLine(s: Say): string {
  const u = s.units;
  const name = s.system === 'si' ? 'SI' : 'US customary';
  return `${name}: flow ${s.sym(u.flow)}, head ${u.head}, pressure ${u.pressure}, power ${u.power}, speed ${u.speed}, temperature ${s.sym(s.more.temperature)}, energy kWh`;
}

/** `psia`/`psig` in US units, `kPa abs`/`kPa gauge` in SI: the reference in the column head. */
function referenced(unit: string, reference: 'absolute' | 'gauge'): string {
  if (unit === 'psi') return reference === 'absolute' ? 'psia' : 'psig';
  return `${unit} ${reference === 'absolute' ? 'abs' : 'gauge'}`;
}

function fluidTable(report: DesignReport, s: Say): Block {
  const m = s.more;
  return {
    kind: 'table',
    columns: [
      left('Case'),
      left('Liquid'),
      right(`Temperature\n(${s.sym(m.temperature)})`),
      right(`Density\n(${s.sym(m.density)})`),
      right(`Kinematic\nviscosity\n(${s.sym(m.kinematicViscosity)})`),
      right(`Vapour\npressure\n(${referenced(s.units.pressure, 'absolute')})`),
    ],
    rows: report.duty.map((d) => [
      d.case,
      d.fluid.name,
      formatIn(d.fluid.temperature, m.temperature),
      formatIn(d.fluid.density, m.density, 5),
      formatIn(d.fluid.kinematicViscosity, m.kinematicViscosity),
      formatIn(d.fluid.vaporPressure, s.units.pressure),
    ]),
  };
}

/** Each end's elevation and pressure in each case, absolute and gauge. */
function endsTable(report: DesignReport, s: Say): Block {
  const p = s.units.pressure;
  const h = s.units.length;
  const gauge = (x: number) => formatIn((x - report.atmosphere) as Pressure, p);
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Suction\nlevel\n(${h})`),
      right(`Suction\n(${referenced(p, 'absolute')})`),
      right(`Suction\n(${referenced(p, 'gauge')})`),
      right(`Discharge\nlevel\n(${h})`),
      right(`Discharge\n(${referenced(p, 'absolute')})`),
      right(`Discharge\n(${referenced(p, 'gauge')})`),
      left('Pipe'),
    ],
    rows: report.duty.map((d) => [
      d.case,
      formatIn(d.suctionElevation, h),
      formatIn(d.suctionPressure, p),
      gauge(d.suctionPressure),
      formatIn(d.dischargeElevation, h),
      formatIn(d.dischargePressure, p),
      gauge(d.dischargePressure),
      d.aged ? 'aged' : 'new',
    ]),
  };
}

function runsTable(report: DesignReport, s: Say): Block {
  const m = s.more;
  return {
    kind: 'table',
    columns: [
      left('Run'),
      left('Size'),
      right(`Inside\ndiameter\n(${m.diameter})`),
      right(`Length\n(${s.units.length})`),
      left('Material'),
      right(`Roughness\nnew\n(${m.roughness})`),
      right(`Roughness\naged\n(${m.roughness})`),
      right(`Rise\n(${s.units.length})`),
    ],
    rows: report.inputs.runs.map((r) => [
      r.group ? `${r.group} / ${r.name}` : r.name,
      r.size ?? 'as given',
      formatIn(r.insideDiameter, m.diameter),
      formatIn(r.length, s.units.length),
      r.material ?? 'as given',
      formatIn(r.roughness, m.roughness, 3),
      formatIn(r.agedRoughness, m.roughness, 3),
      formatIn(r.elevationChange, s.units.length),
    ]),
  };
}

function lossItems(report: DesignReport, s: Say): string[] {
  const items: string[] = [];
  for (const r of report.inputs.runs) {
    const name = r.group ? `${r.group} / ${r.name}` : r.name;
    for (const f of r.fittings) {
      items.push(
        `${name}: ${f.count} x ${f.description} (${f.id}), K ${formatNumber(f.k, 3)} each at the duty (source: ${f.source})`,
      );
    }
    for (const v of r.valves) {
      const given =
        v.given === 'k'
          ? 'K given'
          : `${v.given === 'cv' ? 'Cv' : 'Kv'} ${formatNumber(v.coefficient, 4)}`;
      items.push(`${name}: ${v.name}, ${given}, K ${formatNumber(v.k, 3)} at this diameter`);
    }
    for (const e of r.equipment) {
      items.push(`${name}: ${e.name}, loss ${s.head(e.loss)} at the duty (design case)`);
    }
  }
  return items;
}

function profileTable(report: DesignReport, s: Say): Block {
  return {
    kind: 'table',
    columns: [right(`Flow\n(${s.sym(s.units.flow)})`), right('Hours\na year')],
    rows: report.inputs.profile.map((r) => [
      formatIn(r.flow, s.units.flow),
      formatGrouped(r.hours),
    ]),
  };
}

function dutyTable(report: DesignReport, s: Say): Block {
  const u = s.units;
  const p = u.pressure;
  const gauge = (x: Pressure | undefined) =>
    x === undefined ? DASH : formatIn((x - report.atmosphere) as Pressure, p);
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Static head\n(${u.head})`),
      right(`Losses\n(${u.head})`),
      right(`Total head\n(${u.head})`),
      right(`NPSH\navailable\n(${u.head})`),
      right(`Pump outlet\n(${referenced(p, 'absolute')})`),
      right(`Pump outlet\n(${referenced(p, 'gauge')})`),
    ],
    rows: report.duty.map((d) => [
      d.case,
      formatIn(d.staticHead, u.head),
      formatIn(d.lossHead, u.head),
      formatIn(d.head, u.head),
      formatIn(d.npshAvailable, u.head),
      formatIn(d.pumpDischargePressure, p),
      gauge(d.pumpDischargePressure),
    ]),
  };
}

/**
 * The regime of a run, with the friction law where the run states one instead of the
 * friction policy: `turbulent (Hazen-Williams C 130)`, `turbulent (stated f 0.02)`.
 */
function regimeCell(r: DesignReport['duty'][number]['runs'][number]): string {
  if (r.law === 'hazen-williams') return `${r.regime} (Hazen-Williams C ${r.lawValue ?? '?'})`;
  if (r.law === 'constant-factor') return `${r.regime} (stated f ${r.lawValue ?? '?'})`;
  return r.regime;
}

function runLossTable(report: DesignReport, k: number, s: Say): Block {
  const u = s.units;
  const d = report.duty[k];
  return {
    kind: 'table',
    columns: [
      left('Run'),
      right(`Flow\n(${s.sym(u.flow)})`),
      right(`Velocity\n(${u.velocity})`),
      right('Re'),
      left('Regime'),
      right('Friction\nfactor'),
      right(`Pipe\n(${u.head})`),
      right(`Fittings\n(${u.head})`),
      right(`Equipment\n(${u.head})`),
      right(`Total\n(${u.head})`),
    ],
    rows: (d?.runs ?? []).map((r) => [
      r.group ? `${r.group} / ${r.name}` : r.name,
      formatIn(r.flow, u.flow),
      formatIn(r.velocity, u.velocity),
      formatGrouped(r.reynolds),
      regimeCell(r),
      formatFixed(r.frictionFactor, 4),
      formatIn(r.pipeLoss, u.head),
      formatIn(r.fittingsLoss, u.head),
      formatIn(r.componentLoss, u.head),
      formatIn(r.totalLoss, u.head),
    ]),
  };
}

function npshTable(report: DesignReport, s: Say): Block | undefined {
  const rows = report.duty.filter((d) => d.npshTerms !== undefined);
  if (rows.length === 0) return undefined;
  const h = s.units.head;
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(`Surface\npressure\nhead (${h})`),
      right(`- Vapour\npressure\nhead (${h})`),
      right(`+ Static\nheight\n(${h})`),
      right(`- Suction\nloss\n(${h})`),
      right(`+ Velocity\nhead\n(${h})`),
      right(`= NPSH\navailable\n(${h})`),
    ],
    rows: rows.map((d) => {
      const t = d.npshTerms;
      return [
        d.case,
        formatIn(t?.surfacePressureHead, h),
        formatIn(t?.vaporPressureHead, h),
        formatIn(t?.staticHeight, h),
        formatIn(t?.suctionLoss, h),
        formatIn(t?.velocityHead, h),
        formatIn(t?.total, h),
      ];
    }),
  };
}

/** Header text with "per set" / "per pump" for a set of more than one pump. */
function per(c: CandidateReport, name: string, which: 'set' | 'pump', unit: string): string {
  const unitLine = unit === '' ? '' : `\n(${unit})`;
  return c.count > 1 ? `${name}\nper ${which}${unitLine}` : `${name}${unitLine}`;
}

function casesTables(c: CandidateReport, s: Say): Block[] {
  const u = s.units;
  const perPumpPower = (r: CaseResult): Power | undefined =>
    r.shaftPower === undefined ? undefined : ((r.shaftPower / c.count) as Power);
  const perPumpFlow = (r: CaseResult): Flow | undefined =>
    r.flow === undefined
      ? undefined
      : c.arrangement === 'parallel'
        ? ((r.flow / c.count) as Flow)
        : r.flow;
  if (c.count === 1) {
    return [
      {
        kind: 'table',
        columns: [
          left('Case'),
          right(`Speed\n(${u.speed})`),
          right(`Flow\n(${s.sym(u.flow)})`),
          right(`Head\n(${u.head})`),
          right('Eff.\n(%)'),
          right(`Shaft\npower\n(${u.power})`),
          right('% of\nBEP'),
          left('Region'),
          right(`NPSHa\n(${u.head})`),
          right(`NPSHr\n(${u.head})`),
          right('NPSH\nratio'),
        ],
        rows: c.cases.map((r) => [
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
        ]),
      },
    ];
  }
  const perSetHead = (r: CaseResult): Length | undefined => r.head;
  return [
    { kind: 'subheading', text: 'The set' },
    {
      kind: 'table',
      columns: [
        left('Case'),
        right(`Speed\n(${u.speed})`),
        right(per(c, 'Flow', 'set', s.sym(u.flow))),
        right(per(c, 'Head', 'set', u.head)),
        right(per(c, 'Shaft power', 'set', u.power)),
        right(`NPSHa\n(${u.head})`),
      ],
      rows: c.cases.map((r) => [
        r.case,
        formatFixedIn(r.speed, u.speed, 0),
        formatIn(r.flow, u.flow),
        formatIn(perSetHead(r), u.head),
        formatIn(r.shaftPower, u.power),
        formatIn(r.npshAvailable, u.head),
      ]),
    },
    { kind: 'subheading', text: 'Each pump' },
    {
      kind: 'table',
      columns: [
        left('Case'),
        right(per(c, 'Flow', 'pump', s.sym(u.flow))),
        right(per(c, 'Eff.', 'pump', '%')),
        right(per(c, 'Shaft power', 'pump', u.power)),
        right(per(c, '% of BEP', 'pump', '')),
        left('Region'),
        right(per(c, 'NPSHr', 'pump', u.head)),
        right('NPSH\nratio'),
      ],
      rows: c.cases.map((r) => [
        r.case,
        formatIn(perPumpFlow(r), u.flow),
        formatPercent(r.efficiency),
        formatIn(perPumpPower(r), u.power),
        formatFixed(r.percentOfBep, 1),
        r.region ?? DASH,
        formatIn(r.npshRequired, u.head),
        formatFixed(r.npshRatio, 2),
      ]),
    },
  ];
}

function energyTable(c: CandidateReport, s: Say): Block {
  const u = s.units;
  return {
    kind: 'table',
    columns: [
      left('Case'),
      right(per(c, 'Input power', 'set', u.power)),
      right(`Energy per volume\n(${s.sym(s.more.specificEnergy)})`),
    ],
    rows: c.cases.map((r) => [
      r.case,
      formatIn(r.inputPower, u.power),
      r.specificEnergy === undefined
        ? DASH
        : formatNumber(Number(s.specificEnergy(r.specificEnergy).split(' ')[0]), 3),
    ]),
  };
}

function arrangementText(c: CandidateReport): string {
  const pumps = plural(c.count, 'pump', 'pumps');
  const how = c.count > 1 ? ` in ${c.arrangement}` : '';
  const control = c.control === 'speed' ? 'variable-speed drive' : 'fixed speed';
  return `${pumps}${how}, ${control}`;
}

function motorText(m: MotorRating | undefined, s: Say, at: string): string {
  if (m === undefined) return `${DASH} (not sized: no operating point)`;
  const series = m.series === 'iec' ? 'IEC 60072-1 series' : 'NEMA MG 1 series';
  const sf =
    m.serviceFactor === 1 ? '' : `, relying on service factor ${formatNumber(m.serviceFactor, 3)}`;
  return `${s.motor(m.rating, m.nameplate, m.unit)}, ${series}; load ${formatPercent(m.loadFraction)} % ${at}${sf}`;
}

function energyRows(c: CandidateReport): [string, string][] {
  const e = c.energy;
  const cost = e?.cost === undefined ? DASH : `${formatGrouped(e.cost.amount)} ${e.cost.currency}`;
  const how =
    e === undefined
      ? ''
      : e.control === 'speed'
        ? `, speed-controlled to each flow of the duty profile (${formatGrouped(e.hours)} h), design case`
        : `, at full speed throttled by a valve to each flow of the duty profile (${formatGrouped(e.hours)} h), design case`;
  return [
    ['Yearly energy', e === undefined ? DASH : `${formatGrouped(e.kWh)} kWh${how}`],
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
function fitRows(c: CandidateReport, s: Say): [string, string][] {
  const { head, efficiency } = c.curveFit;
  const residual =
    head.maxResidual === 0
      ? 'none (the curve passes through every point)'
      : s.head(head.maxResidual);
  const rows: [string, string][] = [
    [
      'Head curve fit',
      `${fitMethod(head)}; largest residual ${residual}${head.maxResidual === 0 ? '' : ` (${formatFixed(100 * head.maxRelativeResidual, 2)} % of the point's head)`}${toleranceNote(head)}`,
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

function catalogueBlocks(c: CandidateReport, s: Say): Block[] {
  const p = c.pump;
  const u = s.units;
  const rows: [string, string][] = [
    ['Catalogue speed', s.speed(p.ratedSpeed)],
    [
      'Highest speed',
      `${s.speed(p.maxSpeed)}${c.control === 'speed' ? " (the drive's limit)" : ''}`,
    ],
    [
      'Efficiencies',
      `motor ${formatPercent(p.motorEfficiency)} %${p.driveEfficiency === undefined ? '' : `, drive ${formatPercent(p.driveEfficiency)} %`}`,
    ],
  ];
  if (p.bep !== undefined) {
    rows.push([
      'Best efficiency point (one pump)',
      `${s.flow(p.bep.flow)}, ${s.head(p.bep.head)}, ${formatPercent(p.bep.efficiency)} % at ${s.speed(p.speed)}`,
    ]);
  }
  const blocks: Block[] = [{ kind: 'fields', rows }];
  if (p.points.length > 0) {
    const hasPower = p.points.some((pt) => pt.shaftPower !== undefined);
    blocks.push({
      kind: 'subheading',
      text: `Catalogue points (one pump, ${s.speed(p.ratedSpeed)})`,
    });
    blocks.push({
      kind: 'table',
      columns: [
        right(`Flow\n(${s.sym(u.flow)})`),
        right(`Head\n(${u.head})`),
        right('Eff.\n(%)'),
        right(`NPSHr\n(${u.head})`),
        ...(hasPower ? [right(`Shaft power\n(${u.power})`)] : []),
      ],
      rows: p.points.map((pt) => [
        formatIn(pt.flow, u.flow),
        formatIn(pt.head, u.head),
        formatPercent(pt.efficiency),
        formatIn(pt.npshRequired, u.head),
        ...(hasPower ? [formatIn(pt.shaftPower, u.power)] : []),
      ]),
    });
  }
  return blocks;
}

function candidateBlocks(c: CandidateReport, s: Say, options: BlockOptions): Block[] {
  const blocks: Block[] = [
    {
      kind: 'heading',
      text: `Candidate ${c.rank}: ${c.name} (${c.passed ? 'passes' : 'fails'})`,
      candidate: true,
    },
    { kind: 'fields', rows: [['Pump set', arrangementText(c)]] },
  ];
  if (!options.summary) blocks.push(...catalogueBlocks(c, s));
  if (c.cases.length > 0) {
    if (!options.summary) blocks.push({ kind: 'subheading', text: 'Operating points' });
    blocks.push(...casesTables(c, s));
  } else blocks.push({ kind: 'paragraph', text: 'No operating case was evaluated.' });
  const failures = c.checks.filter((k) => k.id === 'no-operating-point');
  if (failures.length > 0) {
    blocks.push({
      kind: 'list',
      items: failures.map((k) => `Case "${k.case ?? DASH}": ${checkMessage(k, s.system, s.style)}`),
    });
  }
  if (!options.summary && c.cases.length > 0) {
    blocks.push({ kind: 'subheading', text: 'Energy by case' });
    blocks.push(energyTable(c, s));
  }
  blocks.push({
    kind: 'fields',
    rows: [
      [
        'Largest shaft power per pump',
        c.maxShaftPower === undefined ? DASH : s.power(c.maxShaftPower, 4),
      ],
      ['Non-overloading motor per pump', motorText(c.motor, s, 'at the largest shaft power')],
      ['Duty-only motor per pump', motorText(c.dutyOnlyMotor, s, 'at the duty')],
      ...energyRows(c),
      ...(options.summary ? [] : fitRows(c, s)),
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

/** One check in words: `[npsh-margin] A, case "low level": message (source: ...)`. */
export function checkText(check: Check, units: UnitSystem, style: SymbolStyle = 'ascii'): string {
  const about: string[] = [];
  if (check.candidate !== undefined) about.push(check.candidate);
  if (check.case !== undefined) about.push(`case "${check.case}"`);
  const where = about.length > 0 ? ` ${about.join(', ')}:` : ' system:';
  return `[${check.id}]${where} ${checkMessage(check, units, style)} (source: ${check.source})`;
}

function checkBlocks(checks: readonly Check[], s: Say): Block[] {
  const blocks: Block[] = [{ kind: 'heading', text: 'Checks' }];
  for (const { severity, title } of SEVERITIES) {
    const group = checks.filter((c) => c.severity === severity);
    blocks.push({ kind: 'subheading', text: `${title} (${group.length})` });
    if (group.length === 0) blocks.push({ kind: 'paragraph', text: 'None.' });
    else blocks.push({ kind: 'list', items: group.map((c) => checkText(c, s.system, s.style)) });
  }
  return blocks;
}

function inputBlocks(report: DesignReport, s: Say): Block[] {
  const blocks: Block[] = [{ kind: 'heading', text: 'Inputs' }];
  if (report.duty.length > 0) {
    blocks.push({ kind: 'subheading', text: 'Liquid by operating case' }, fluidTable(report, s));
    blocks.push({ kind: 'subheading', text: 'Ends by operating case' }, endsTable(report, s));
  }
  const loc = report.inputs.pumpLocation;
  blocks.push({
    kind: 'fields',
    rows: [
      [
        'Pump location',
        loc === undefined
          ? 'not given (NPSH and line velocities are not checked)'
          : `impeller eye at ${s.length(loc.elevation)}; suction line: ${
              loc.suctionRuns === 0
                ? 'none (the pump takes from the suction end)'
                : loc.suctionRuns === 1
                  ? 'the first run'
                  : `the first ${loc.suctionRuns} runs`
            }`,
      ],
      [
        'Atmosphere',
        `${formatIn(report.atmosphere, s.units.pressure)} ${referenced(s.units.pressure, 'absolute')}`,
      ],
    ],
  });
  if (report.inputs.runs.length > 0) {
    blocks.push({ kind: 'subheading', text: 'Runs' }, runsTable(report, s));
    const items = lossItems(report, s);
    if (items.length > 0) {
      blocks.push({ kind: 'subheading', text: 'Fittings, valves and equipment' });
      blocks.push({ kind: 'list', items });
    }
  }
  blocks.push({ kind: 'subheading', text: 'Duty profile' }, profileTable(report, s));
  const price = report.inputs.energyPrice;
  if (price !== undefined) {
    blocks.push({
      kind: 'fields',
      rows: [['Price of energy', `${formatNumber(price.perKWh, 4)} ${price.currency} per kWh`]],
    });
  }
  return blocks;
}

/**
 * The blocks of a printed report, in order: title and verdict; the inputs restated (full
 * form); the duty per case with each run's loss and the NPSH available in its terms (the run
 * and NPSH tables in the full form); each candidate; ranking; checks by severity; cautions
 * (always).
 */
export function reportBlocks(
  report: DesignReport,
  system: UnitSystem,
  options: BlockOptions = { style: 'ascii', summary: false },
): Block[] {
  const s = sayIn(system, options.style);
  const checks = allChecks(report);
  const blocks: Block[] = [
    { kind: 'title', text: `Pump selection report: ${report.name}` },
    {
      kind: 'fields',
      rows: [
        ['Verdict', verdictLine(report)],
        ['Findings', tallyLine(checks)],
        [
          'Fluid',
          `${report.fluid.name} at ${s.temperature(report.fluid.temperature)}, ${s.density(report.fluid.density)} (design case)`,
        ],
        ['Duty flow', `${formatIn(report.dutyFlow, s.units.flow)} ${s.sym(s.units.flow)}`],
        ['Units', unitsLine(s)],
      ],
    },
  ];
  if (!options.summary) blocks.push(...inputBlocks(report, s));
  blocks.push({ kind: 'heading', text: 'Duty by operating case' });
  if (report.duty.length > 0) {
    blocks.push(dutyTable(report, s));
    if (!options.summary) {
      report.duty.forEach((d, k) => {
        if (d.network !== undefined) return;
        blocks.push({ kind: 'subheading', text: `Run losses at the duty flow: ${d.case}` });
        blocks.push(runLossTable(report, k, s));
      });
      // A network: its nodes and links at each case's duty (network-tables.ts).
      blocks.push(...networkBlocks(report, s));
      const npsh = npshTable(report, s);
      if (npsh !== undefined) {
        blocks.push({ kind: 'subheading', text: 'NPSH available at the duty flow, by term' }, npsh);
      }
    }
  } else blocks.push({ kind: 'paragraph', text: 'No operating case was evaluated.' });
  if (report.candidates.length === 0) {
    blocks.push({
      kind: 'paragraph',
      text: 'No candidate pumps were given: this report gives the duty only.',
    });
  } else {
    for (const c of report.candidates) blocks.push(...candidateBlocks(c, s, options));
    blocks.push({ kind: 'heading', text: 'Ranking' }, rankingTable(report));
  }
  blocks.push(...checkBlocks(checks, s));
  blocks.push({ kind: 'heading', text: 'Cautions' });
  blocks.push({
    kind: 'list',
    items: report.cautions.length > 0 ? [...report.cautions] : [DEFAULT_CAUTION],
  });
  return blocks;
}

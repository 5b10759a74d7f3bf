/**
 * From a duty and a pump catalogue to ranked ways of meeting it: every pump, full impeller
 * throttled, trimmed, or on a drive, evaluated by `evaluateDesign` in every case with every
 * check, and costed over its life.
 *
 * @module
 */

import {
  type CandidateInput,
  type CandidateReport,
  type CaseDuty,
  type Check,
  DESIGN_DEFAULTS,
  type DesignInput,
  type DesignReport,
  evaluateDesign,
} from '../design/index';
import { checkDesignShape } from '../design/input-shape';
import { HeadflowError } from '../errors';
import {
  guardArray,
  guardOneOf,
  guardOptions,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import { annualEnergy, type ProfileRow, type PumpCurve } from '../pumps/index';
import { type ScenarioCurve, systemScenarios } from '../system/index';
import {
  type Flow,
  type Length,
  type Power,
  type RotationalSpeed,
  STANDARD_GRAVITY,
} from '../units/index';
import { type CheckedPump, checkCatalogue } from './catalogue';
import { curveAt, type TrimBasis, trimForDuties } from './impeller';
import { DEFAULT_LIFE_YEARS, lifeCycleCost } from './life-cycle-cost';
import type {
  PumpCatalogue,
  Selection,
  SelectionCase,
  SelectionCosts,
  SelectionEntry,
  SelectionMethod,
  SelectOptions,
} from './types';

/** Defaults of {@link SelectOptions}. */
export const SELECT_DEFAULTS = {
  methods: ['throttle', 'trim', 'speed'] as readonly SelectionMethod[],
  /** Smallest trim the law may scale to, as a fraction of the curve scaled (common practice). */
  lowestTrimRatio: 0.75,
  /** Trims below this fraction by the law alone are flagged as approximate (common practice). */
  trimLawAccurateRatio: 0.9,
} as const;

const METHODS: readonly SelectionMethod[] = ['throttle', 'trim', 'speed'];

/** Ways evaluated by one evaluateDesign call. */
const BATCH = 128;
const COST_KEYS: readonly (keyof SelectionCosts)[] = [
  'years',
  'discountRate',
  'energyEscalation',
  'escalation',
  'installation',
  'operationPerYear',
  'maintenancePerYear',
  'downtimePerYear',
  'environmentalPerYear',
  'decommissioning',
  'trim',
];
const TRIM_SOURCE =
  'common practice: the trim law assumes geometric similarity, which a cut impeller loses; trust it for trims of about 5-10 % of diameter and confirm larger trims with the maker (curves at several diameters, then interpolation)';

/** Resolved options. */
interface Settings {
  readonly methods: ReadonlySet<SelectionMethod>;
  readonly costs: SelectionCosts | undefined;
  readonly energyPrice: { readonly perKWh: number; readonly currency: string } | undefined;
  readonly lowestTrimRatio: number;
  readonly trimLawAccurateRatio: number;
}

/** One way of one pump, ready for the design evaluation. */
interface Way {
  readonly pump: CheckedPump;
  readonly method: SelectionMethod;
  readonly label: string;
  readonly curve: PumpCurve;
  readonly motorSpeed: number | undefined;
  readonly trim:
    | {
        readonly diameter: number;
        readonly ratio: number;
        readonly basis: TrimBasis;
        readonly lawRatio: number;
        readonly iterations: number;
      }
    | undefined;
  readonly candidate: CandidateInput;
}

function settingsOf(design: DesignInput, options: SelectOptions | null | undefined): Settings {
  const o = guardOptions<SelectOptions>('options', options);
  const methods =
    o.methods === undefined
      ? METHODS
      : guardArray('options.methods', o.methods, { min: 1, max: 3 }).map((m, i) =>
          guardOneOf(`options.methods[${i}]`, m, METHODS),
        );
  let costs: SelectionCosts | undefined;
  if (o.costs !== undefined && o.costs !== null) {
    const c = guardRecord('options.costs', o.costs);
    for (const key of Object.keys(c)) {
      guardOneOf('options.costs (field)', key, COST_KEYS);
    }
    // Check every value now, by the rules of lifeCycleCost, so a bad cost fails at once.
    const { trim, installation, ...rest } = c as SelectionCosts;
    lifeCycleCost(rest);
    if (installation !== undefined)
      guardRange('options.costs.installation', installation, { min: 0 });
    if (trim !== undefined) guardRange('options.costs.trim', trim, { min: 0 });
    costs = c as SelectionCosts;
  }
  let energyPrice = design.energyPrice;
  if (o.energyPrice !== undefined) {
    const p = guardRecord('options.energyPrice', o.energyPrice);
    energyPrice = {
      perKWh: guardRange('options.energyPrice.perKWh', p['perKWh'], { min: 0 }),
      currency: guardString('options.energyPrice.currency', p['currency']),
    };
  }
  const lowestTrimRatio =
    o.lowestTrimRatio === undefined
      ? SELECT_DEFAULTS.lowestTrimRatio
      : guardRange('options.lowestTrimRatio', o.lowestTrimRatio, { min: 0, minOpen: true, max: 1 });
  const trimLawAccurateRatio =
    o.trimLawAccurateRatio === undefined
      ? SELECT_DEFAULTS.trimLawAccurateRatio
      : guardRange('options.trimLawAccurateRatio', o.trimLawAccurateRatio, {
          min: 0,
          minOpen: true,
          max: 1,
        });
  return {
    methods: new Set(methods),
    costs,
    energyPrice,
    lowestTrimRatio,
    trimLawAccurateRatio,
  };
}

function rpm(speed: number): string {
  return `${Number(((speed * 60) / (2 * Math.PI)).toPrecision(4))} rpm`;
}

function mm(length: number): string {
  return `${Number((length * 1000).toPrecision(4))} mm`;
}

/** The ways of one pump: throttle and trim at each motor speed, and a drive. */
function waysOf(
  p: CheckedPump,
  needs: readonly { readonly flow: number; readonly head: number }[],
  settings: Settings,
): Way[] {
  const ways: Way[] = [];
  const base = {
    motorEfficiency: p.motorEfficiency,
    ...(p.input.motorSeries === undefined ? {} : { motorSeries: p.input.motorSeries }),
  };
  const several = p.motorSpeeds.length > 1;
  const smallest = p.family.members[0]?.diameter ?? p.family.full;
  const lowest = Math.max(p.minDiameter, settings.lowestTrimRatio * smallest);
  for (const n of p.motorSpeeds) {
    const at = several ? ` at ${rpm(n)}` : '';
    const full = n === p.reference.speed ? p.reference : p.reference.atSpeed(n as RotationalSpeed);
    if (settings.methods.has('throttle')) {
      const label = `${p.name}${at}, full impeller`;
      ways.push({
        pump: p,
        method: 'throttle',
        label,
        curve: full,
        motorSpeed: n,
        trim: undefined,
        candidate: { name: label, pump: full, ...base },
      });
    }
    if (settings.methods.has('trim') && lowest < p.family.full * (1 - 1e-9)) {
      const found = trimForDuties(p.family, n / p.family.speed, needs, lowest);
      if (found !== undefined && found.diameter < p.family.full * (1 - 1e-9)) {
        const { curve, basis } = curveAt(p.family, found.diameter);
        const running = n === p.family.speed ? curve : curve.atSpeed(n as RotationalSpeed);
        const label = `${p.name}${at}, trimmed to ${mm(found.diameter)}`;
        ways.push({
          pump: p,
          method: 'trim',
          label,
          curve: running,
          motorSpeed: n,
          trim: {
            diameter: found.diameter,
            ratio: found.diameter / p.family.full,
            basis,
            lawRatio: found.diameter / smallest,
            iterations: found.iterations,
          },
          candidate: { name: label, pump: running, ...base },
        });
      }
    }
  }
  if (settings.methods.has('speed') && p.drive !== undefined) {
    const label = `${p.name}, variable speed`;
    ways.push({
      pump: p,
      method: 'speed',
      label,
      curve: p.reference,
      motorSpeed: undefined,
      trim: undefined,
      candidate: {
        name: label,
        pump: p.reference,
        control: 'speed',
        maxSpeed: p.drive.maxSpeed,
        ...(p.drive.efficiency === undefined ? {} : { driveEfficiency: p.drive.efficiency }),
        ...base,
      },
    });
  }
  return ways;
}

function check(
  id: string,
  severity: Check['severity'],
  candidate: string,
  caseName: string | undefined,
  message: string,
  values: Record<string, number>,
  source: string,
): Check {
  // Percentages and rpm read the same in both unit systems, so the message is kept as written.
  return { id, severity, candidate, case: caseName, message, values, words: {}, source };
}

/** The selection's own checks of a way (trim law range, drive speed range). */
function wayChecks(way: Way, report: CandidateReport, settings: Settings): Check[] {
  const out: Check[] = [];
  const t = way.trim;
  if (t !== undefined && t.basis === 'trim law' && t.lawRatio < settings.trimLawAccurateRatio) {
    out.push(
      check(
        'trim-law',
        'warning',
        way.label,
        undefined,
        `The impeller is cut to ${Number((100 * t.lawRatio).toPrecision(3))} % of the diameter of the curve it is scaled from; the trim law is approximate beyond about ${Number((100 * (1 - settings.trimLawAccurateRatio)).toPrecision(3))} % (head and efficiency fall faster than it says). Confirm the trimmed curve with the maker.`,
        { trimRatio: t.lawRatio, accurateRatio: settings.trimLawAccurateRatio },
        TRIM_SOURCE,
      ),
    );
  }
  const drive = way.pump.drive;
  if (way.method === 'speed' && drive !== undefined) {
    for (const c of report.cases) {
      if (c.speed !== undefined && c.speed < drive.minSpeed * (1 - 1e-9)) {
        out.push(
          check(
            'drive-speed',
            'error',
            way.label,
            c.case,
            `The duty needs ${rpm(c.speed)}, below the drive's lowest speed ${rpm(drive.minSpeed)}.`,
            { speed: c.speed, minSpeed: drive.minSpeed },
            "the pump's catalogue (drive speed range)",
          ),
        );
      }
    }
  }
  return out;
}

/** Per-case figures of a way from its evaluation. */
function casesOf(
  way: Way,
  report: CandidateReport,
  duty: readonly CaseDuty[],
  family: readonly ScenarioCurve[],
  dutyFlow: number,
  profile: readonly ProfileRow[],
  price: Settings['energyPrice'],
): SelectionCase[] {
  const driveEfficiency = way.method === 'speed' ? (way.pump.drive?.efficiency ?? 1) : 1;
  const chain = way.pump.motorEfficiency * driveEfficiency;
  return report.cases.map((c, i) => {
    const def = family[i]?.curve.definition;
    const need = duty[i]?.head;
    const margin =
      c.npshAvailable === undefined || c.npshRequired === undefined
        ? undefined
        : ((c.npshAvailable - c.npshRequired) as Length);
    let throttleHead: number | undefined;
    let throttlePower: number | undefined;
    let inputPower: number | undefined;
    if (c.failure === undefined && def !== undefined && need !== undefined) {
      const rhoG = def.fluid.density * (def.g ?? STANDARD_GRAVITY);
      if (way.method === 'speed') {
        throttleHead = 0;
        throttlePower = 0;
        inputPower = c.shaftPower === undefined ? undefined : c.shaftPower / chain;
      } else {
        const range = way.curve.flowRange;
        const at = dutyFlow >= range.min && dutyFlow <= range.max;
        const dh = at ? way.curve.head(dutyFlow as Flow) - need : -1;
        if (dh >= 0) {
          throttleHead = dh;
          throttlePower = rhoG * dutyFlow * dh;
          inputPower = way.curve.shaftPower(dutyFlow as Flow, def.fluid.density, def.g) / chain;
        } else {
          throttleHead = 0;
          throttlePower = 0;
          inputPower = c.shaftPower === undefined ? undefined : c.shaftPower / chain;
        }
      }
    }
    let energy: SelectionCase['energy'];
    const curve = family[i]?.curve;
    if (c.failure === undefined && def !== undefined && curve !== undefined) {
      try {
        const year = annualEnergy({
          pump: way.curve,
          system: curve,
          profile,
          density: def.fluid.density,
          motorEfficiency: way.pump.motorEfficiency,
          driveEfficiency,
          control: way.method === 'speed' ? 'speed' : 'throttle',
          ...(way.method === 'speed' && way.pump.drive !== undefined
            ? { maxSpeed: way.pump.drive.maxSpeed }
            : {}),
          ...(price === undefined ? {} : { price }),
          ...(def.g === undefined ? {} : { g: def.g }),
        });
        energy = { kWh: year.totalKWh, cost: year.cost };
      } catch (e) {
        if (!(e instanceof HeadflowError)) throw e;
        energy = undefined;
      }
    }
    return {
      case: c.case,
      failure: c.failure,
      speed: c.speed,
      flow: c.flow,
      head: c.head,
      efficiency: c.efficiency,
      percentOfBep: c.percentOfBep,
      npshMargin: margin,
      npshRatio: c.npshRatio,
      throttleHead: throttleHead as Length | undefined,
      throttlePower: throttlePower as Power | undefined,
      inputPower: inputPower as Power | undefined,
      energy,
    };
  });
}

/**
 * Ranks every way a catalogue's pumps can meet a design's duty.
 *
 * For each pump and each of its motor speeds: the full impeller, throttled by a valve to the
 * duty flow (`'throttle'`); the smallest impeller that meets the duty flow in every case
 * (`'trim'`), within the catalogue's trim range and the trim law's limit
 * (`options.lowestTrimRatio`, default 75 % of the curve it is scaled from) — scaled by the trim
 * law below the smallest catalogue curve, interpolated between catalogue curves at several
 * diameters above it; and, when the pump may run on a drive, the full impeller with the speed
 * set for each case (`'speed'`). Each way is evaluated by `evaluateDesign` as a candidate in
 * every operating case with every check (duty flow, operating region, NPSH margin, motor,
 * energy, shut-off pressure ...), plus the selection's own: `trim-law` (a warning for a trim by
 * the law below `options.trimLawAccurateRatio`, default 90 %) and `drive-speed` (an error when
 * a case needs less than the drive's lowest speed).
 *
 * Each entry reports the trim diameter or speed, per case the throttling loss (head and
 * power), % of BEP, NPSH margin, input power and the year's energy were the system in that
 * case all year, the motor, the year's energy (design case,
 * over the duty profile) and the life-cycle cost ({@link lifeCycleCost}: initial = the pump's
 * price, plus the drive's for `'speed'` and `costs.trim` for a trim; energy = the year's
 * energy cost; the other components from `options.costs`).
 *
 * Ranking: every passing entry above every failing one; within each, by life-cycle cost when
 * costs are given (`options.costs`, or a price on any pump), else by the year's energy; ties
 * by energy. Without an energy price the life-cycle cost leaves energy out (a note says so).
 *
 * @param design - the design (its candidates are ignored)
 * @param catalogue - the pumps to choose from
 * @throws HeadflowError `INVALID_ARGUMENT` for a bad catalogue or options (naming the field),
 *   and what `evaluateDesign` throws for the design.
 * @example
 * ```ts
 * const { ranked } = selectPumps(design, catalogue, { costs: { years: 15, discountRate: 0.06 } });
 * ranked[0]?.label; // the cheapest passing way over 15 years, e.g. '65-160 2p, trimmed to 152.3 mm'
 * ```
 */
export function selectPumps(
  design: DesignInput,
  catalogue: PumpCatalogue,
  options?: SelectOptions | null,
): Selection {
  checkDesign(design);
  const pumps = checkCatalogue(catalogue);
  const settings = settingsOf(design, options);
  return selectChecked(design, catalogue, pumps, settings);
}

/**
 * The checks of a design that the selection relies on before `evaluateDesign` checks the rest.
 * @internal
 */
export function checkDesign(design: DesignInput): void {
  const d = guardRecord('design', design);
  // The shape evaluateDesign checks (runs that are objects, names that are strings ...), before
  // the selection or the pipe sizing walks the design itself.
  checkDesignShape(design);
  guardRecord('design.system', d['system']);
  guardRange('design.dutyFlow', d['dutyFlow'], { min: 0, minOpen: true, unit: 'm3/s' });
  if (d['cases'] !== undefined) guardArray('design.cases', d['cases'], { max: 1000 });
}

/** {@link selectPumps} on a checked catalogue and resolved options. @internal */
export function selectChecked(
  design: DesignInput,
  catalogue: PumpCatalogue,
  pumps: readonly CheckedPump[],
  settings: Settings,
): Selection {
  const family = systemScenarios(
    { ...design.system, name: design.system.name ?? 'design case' },
    design.cases ?? [],
  );
  const dutyFlow = design.dutyFlow as number;
  const needs = family.map((s) => ({ flow: dutyFlow, head: s.curve.head(design.dutyFlow) }));
  const ways = pumps.flatMap((p) => waysOf(p, needs, settings));
  const profile = design.profile ?? [
    { flow: design.dutyFlow, hours: DESIGN_DEFAULTS.hoursPerYear },
  ];
  // The ways go to evaluateDesign in batches, so that the sampled chart curves of each batch's
  // report are dropped early (a long catalogue otherwise holds them all at once).
  const byName = new Map<string, CandidateReport>();
  let report: DesignReport | undefined;
  for (let start = 0; start === 0 || start < ways.length; start += BATCH) {
    report = evaluateDesign({
      ...design,
      candidates: ways.slice(start, start + BATCH).map((w) => w.candidate),
      ...(settings.energyPrice === undefined ? {} : { energyPrice: settings.energyPrice }),
    });
    for (const r of report.candidates) byName.set(r.name, r);
  }
  if (report === undefined) throw new HeadflowError('NO_SOLUTION', 'no evaluation was made.');
  const costed =
    settings.costs !== undefined ||
    pumps.some((p) => p.price !== undefined || p.drive?.price !== undefined);
  const currency = settings.energyPrice?.currency ?? catalogue.currency;
  const costs = settings.costs ?? {};
  const entries = ways.map((way, index) => {
    const r = byName.get(way.label);
    if (r === undefined) {
      throw new HeadflowError('NO_SOLUTION', `no evaluation of ${way.label}.`);
    }
    const own = wayChecks(way, r, settings);
    const checks = [...r.checks, ...own];
    const passed = r.passed && !own.some((k) => k.severity === 'error');
    const cases = casesOf(way, r, report.duty, family, dutyFlow, profile, settings.energyPrice);
    const initial =
      (way.pump.price ?? 0) +
      (way.method === 'speed' ? (way.pump.drive?.price ?? 0) : 0) +
      (way.method === 'trim' ? (costs.trim ?? 0) : 0);
    const { trim: _trim, ...money } = costs;
    const lcc =
      r.energy === undefined
        ? undefined
        : lifeCycleCost({
            ...money,
            initial,
            energyPerYear: r.energy.cost?.amount ?? 0,
          });
    const speed =
      way.method === 'speed' ? maxSpeed(r) : (way.motorSpeed as RotationalSpeed | undefined);
    const entry: Omit<SelectionEntry, 'rank'> = {
      name: way.pump.name,
      method: way.method,
      label: way.label,
      curve: way.curve,
      trimDiameter: way.trim === undefined ? undefined : (way.trim.diameter as Length),
      trimRatio: way.trim?.ratio,
      trimBasis: way.trim?.basis,
      trimIterations: way.trim?.iterations,
      speed,
      passed,
      checks,
      cases,
      motor: r.motor,
      energy: r.energy,
      lifeCycleCost: lcc,
      report: r,
      candidate: way.candidate,
    };
    return { entry, index };
  });
  const key = (e: Omit<SelectionEntry, 'rank'>): number => {
    const v = costed ? e.lifeCycleCost?.total : e.energy?.kWh;
    return v === undefined ? Number.POSITIVE_INFINITY : v;
  };
  entries.sort((a, b) => {
    if (a.entry.passed !== b.entry.passed) return a.entry.passed ? -1 : 1;
    const ka = key(a.entry);
    const kb = key(b.entry);
    if (ka !== kb) return ka < kb ? -1 : 1;
    const ea = a.entry.energy?.kWh ?? Number.POSITIVE_INFINITY;
    const eb = b.entry.energy?.kWh ?? Number.POSITIVE_INFINITY;
    if (ea !== eb) return ea < eb ? -1 : 1;
    return a.index - b.index;
  });
  return {
    name: design.name,
    catalogue: catalogue.name,
    dutyFlow: design.dutyFlow,
    duty: report.duty,
    cautions: report.cautions,
    costs: costed ? { years: DEFAULT_LIFE_YEARS, ...costs } : undefined,
    ranked: entries.map(({ entry }, k) => ({ ...entry, rank: k + 1 })),
    rankedBy: costed ? 'life-cycle cost' : 'energy',
    currency,
    systemChecks: report.checks,
    notes:
      costed && settings.energyPrice === undefined
        ? [
            'No energy price was given (the design has none and options.energyPrice is not set): the life-cycle cost leaves energy out, and ways of equal cost are ordered by energy.',
          ]
        : [],
  };
}

function maxSpeed(r: CandidateReport): RotationalSpeed | undefined {
  let best: number | undefined;
  for (const c of r.cases)
    if (c.speed !== undefined && (best === undefined || c.speed > best)) best = c.speed;
  return best as RotationalSpeed | undefined;
}

export type { Settings as SelectSettings };
export { settingsOf as resolveSelectOptions };

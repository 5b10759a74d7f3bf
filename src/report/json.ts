/**
 * The design report as self-describing JSON: a versioned envelope in which every quantity is
 * a number in the chosen display unit beside its unit symbol.
 *
 * @module
 */
import type {
  CandidateReport,
  CaseDuty,
  CaseResult,
  Check,
  DesignReport,
  DisplayUnits,
  ReportFluid,
  RunInputSummary,
  SampledCurve,
  UnitSystem,
} from '../design/core';
import { checkMessage, displayUnits } from '../design/core';
import { moreUnits } from '../design/say';
import { HeadflowError } from '../errors';
import { guardOptions } from '../guards';
import type { FitReport, MotorRating } from '../pumps/index';
import type { RunDetails } from '../system/index';
import {
  convert,
  type Dimension,
  type Pressure,
  type Quantity,
  si,
  to,
  type UnitOf,
} from '../units/index';
import { chosenUnits } from './format-values';
import { networkJson } from './network-tables';

/** The `format` tag of the envelope; the number changes when the shape changes incompatibly. */
export const REPORT_FORMAT = 'headflow-report/2';

/** Significant digits of every number written. */
const DIGITS = 6;

/** A quantity: the number in `unit` (a unit symbol of the catalogue). */
export interface JsonQuantity {
  readonly value: number;
  readonly unit: string;
}

/** Sampled values of one quantity, all in `unit` (`'1'` for a fraction such as efficiency). */
export interface JsonSamples {
  readonly unit: string;
  readonly values: readonly (number | null)[];
}

/** A curve: `value.values[i]` at `flow.values[i]`. */
export interface JsonCurve {
  readonly name: string;
  readonly flow: JsonSamples;
  readonly value: JsonSamples;
}

/** The units of the envelope: the display units and the unit of yearly energy. */
export interface JsonUnits extends DisplayUnits {
  readonly energy: 'kWh';
}

/** A check; `siValues` are the numbers behind it as the evaluation wrote them, coherent SI. */
export interface JsonCheck {
  readonly id: string;
  readonly severity: Check['severity'];
  readonly candidate: string | null;
  readonly case: string | null;
  /** The message in the document's unit system. */
  readonly message: string;
  readonly source: string;
  readonly siValues: Readonly<Record<string, number | null>>;
  /** The words behind the message (names, reasons). */
  readonly words: Readonly<Record<string, string>>;
}

/** The liquid in one case. */
export interface JsonFluid {
  readonly name: string;
  readonly temperature: JsonQuantity | null;
  readonly density: JsonQuantity | null;
  readonly kinematicViscosity: JsonQuantity | null;
  readonly vaporPressure: JsonQuantity | null;
}

/** One run's figures at the duty flow. */
export interface JsonRun {
  readonly name: string;
  readonly group: string | null;
  readonly flow: JsonQuantity | null;
  readonly insideDiameter: JsonQuantity | null;
  readonly velocity: JsonQuantity | null;
  readonly reynolds: number | null;
  readonly regime: RunDetails['regime'];
  readonly frictionFactor: number | null;
  /** The friction law: `darcy-weisbach` (the policy), `constant-factor` or `hazen-williams`. */
  readonly law: RunDetails['law'];
  /** The stated friction factor or Hazen-Williams C, or null for the policy. */
  readonly lawValue: number | null;
  readonly pipeLoss: JsonQuantity | null;
  readonly fittingsLoss: JsonQuantity | null;
  readonly componentLoss: JsonQuantity | null;
  readonly totalLoss: JsonQuantity | null;
  readonly pressureDrop: JsonQuantity | null;
  readonly elevationChange: JsonQuantity | null;
}

/** The duty in one operating case. */
export interface JsonCaseDuty {
  readonly case: string;
  readonly fluid: JsonFluid;
  readonly aged: boolean;
  readonly suctionElevation: JsonQuantity | null;
  readonly dischargeElevation: JsonQuantity | null;
  /** NPSH available in its terms (heads in the head unit), or null. */
  readonly npshTerms: Readonly<Record<string, JsonQuantity | null>> | null;
  /** Static pressure just after the pump at the duty: absolute and gauge. */
  readonly pumpDischargePressure: JsonEndPressure | null;
  readonly head: JsonQuantity | null;
  readonly staticHead: JsonQuantity | null;
  readonly lossHead: JsonQuantity | null;
  readonly npshAvailable: JsonQuantity | null;
  /** Pressure at the suction end: absolute, and gauge against the report's atmosphere. */
  readonly suctionPressure: JsonEndPressure;
  /** Pressure at the discharge end: absolute and gauge. */
  readonly dischargePressure: JsonEndPressure;
  readonly runs: readonly JsonRun[];
  /** On a network: the duty flow of the case and the node and link tables at the duty. */
  readonly network?: { readonly dutyFlow: JsonQuantity | null } & ReturnType<typeof networkJson>;
}

/** An end's pressure both ways, in the report's pressure unit. */
export interface JsonEndPressure {
  readonly absolute: JsonQuantity | null;
  readonly gauge: JsonQuantity | null;
}

/** Where a candidate runs in one case; every figure is null when `failure` says why not. */
export interface JsonCaseResult {
  readonly case: string;
  readonly failure: string | null;
  readonly speed: JsonQuantity | null;
  readonly flow: JsonQuantity | null;
  readonly head: JsonQuantity | null;
  /** Fraction 0..1. */
  readonly efficiency: number | null;
  readonly shaftPower: JsonQuantity | null;
  readonly percentOfBep: number | null;
  readonly region: CaseResult['region'] | null;
  readonly npshAvailable: JsonQuantity | null;
  readonly npshRequired: JsonQuantity | null;
  readonly npshRatio: number | null;
  readonly velocities: readonly { readonly run: string; readonly velocity: JsonQuantity | null }[];
  /** Electrical input power of the set. */
  readonly inputPower: JsonQuantity | null;
  /** Electrical energy per volume pumped, kWh/m3 (SI) or kWh/kgal (US: per 1000 gallons). */
  readonly specificEnergy: JsonQuantity | null;
  readonly iterations: number;
}

/** A standard motor; `nameplate` is in the series' own unit (kW for IEC, hp for NEMA). */
export interface JsonMotor {
  readonly series: MotorRating['series'];
  readonly rating: JsonQuantity | null;
  readonly nameplate: JsonQuantity | null;
  readonly loadFraction: number | null;
  readonly serviceFactor: number | null;
}

/**
 * How one catalogue curve was fitted: the method, the degree (null for the monotone cubic),
 * `'default'` or `'given'`, the largest residual at a catalogue point (head in the head unit;
 * efficiency as a fraction, so 0.005 is half a percentage point), the largest residual relative
 * to the point's value, and whether the fit lies within the catalogue tolerance.
 */
export interface JsonCurveFit {
  readonly method: FitReport['method'];
  readonly degree: number | null;
  readonly selection: FitReport['selection'];
  readonly points: number;
  readonly maxResidual: JsonQuantity | number | null;
  readonly maxRelativeResidual: number | null;
  readonly withinTolerance: boolean | null;
}

/** A candidate's evaluation. */
export interface JsonCandidate {
  readonly name: string;
  readonly rank: number;
  readonly passed: boolean;
  readonly count: number;
  readonly arrangement: CandidateReport['arrangement'];
  readonly control: CandidateReport['control'];
  readonly cases: readonly JsonCaseResult[];
  readonly maxShaftPower: JsonQuantity | null;
  readonly motor: JsonMotor | null;
  readonly dutyOnlyMotor: JsonMotor | null;
  readonly energy: {
    readonly yearly: JsonQuantity | null;
    /** `'throttle'` (full speed, throttled to each flow) or `'speed'` (speed-controlled). */
    readonly control: 'throttle' | 'speed';
    readonly hours: number;
    readonly cost: { readonly amount: number | null; readonly currency: string } | null;
  } | null;
  /** Fits of the head curve and (when efficiency is given) of the efficiency curve. */
  readonly curveFit: { readonly head: JsonCurveFit; readonly efficiency: JsonCurveFit | null };
  /** The catalogue points of one pump, at `ratedSpeed`. */
  readonly catalogue: {
    readonly ratedSpeed: JsonQuantity | null;
    readonly maxSpeed: JsonQuantity | null;
    readonly points: readonly {
      readonly flow: JsonQuantity | null;
      readonly head: JsonQuantity | null;
      readonly efficiency: number | null;
      readonly npshRequired: JsonQuantity | null;
    }[];
  };
  readonly checks: readonly JsonCheck[];
}

/** The curves behind the report, in display units. */
export interface JsonCurves {
  readonly systems: readonly JsonCurve[];
  readonly pumps: readonly JsonCurve[];
  readonly efficiency: readonly JsonCurve[];
  readonly npshRequired: readonly JsonCurve[];
  readonly npshAvailable: readonly JsonCurve[];
  readonly preferredRegions: readonly {
    readonly name: string;
    readonly minFlow: JsonQuantity | null;
    readonly maxFlow: JsonQuantity | null;
  }[];
  readonly points: readonly {
    readonly name: string;
    readonly flow: JsonQuantity | null;
    readonly head: JsonQuantity | null;
  }[];
}

/** The report itself; `units` is the unit system it was written in. */
export interface JsonReport {
  readonly name: string;
  readonly units: UnitSystem;
  readonly passed: boolean;
  /** How many candidates pass and which is recommended. */
  readonly verdict: {
    readonly candidates: number;
    readonly passing: number;
    readonly recommended: string | null;
    readonly passed: boolean;
  };
  readonly fluid: JsonFluid;
  readonly dutyFlow: JsonQuantity | null;
  /** Atmospheric pressure at the site (absolute), against which gauge pressures are given. */
  readonly atmosphere: JsonQuantity | null;
  readonly duty: readonly JsonCaseDuty[];
  readonly candidates: readonly JsonCandidate[];
  readonly checks: readonly JsonCheck[];
  readonly cautions: readonly string[];
  /** The runs as given (in the design case), and the duty profile. */
  readonly inputs: {
    readonly runs: readonly Readonly<Record<string, unknown>>[];
    readonly profile: readonly { readonly flow: JsonQuantity | null; readonly hours: number }[];
  };
  /** The chart's curves, when the report was evaluated with them; else null. */
  readonly curves: JsonCurves | null;
}

/** The whole JSON document. */
export interface JsonEnvelope {
  readonly format: typeof REPORT_FORMAT;
  readonly units: JsonUnits;
  readonly report: JsonReport;
}

/** A number to six significant digits; null when it is missing or not finite. */
function round(x: number | undefined): number | null {
  if (x === undefined || !Number.isFinite(x)) return null;
  const r = Number(x.toPrecision(DIGITS));
  return r === 0 ? 0 : r;
}

/** An SI quantity as `{ value, unit }` in a display unit; null when missing. */
function quantity<D extends Dimension>(
  x: Quantity<D> | undefined,
  unit: UnitOf<D>,
): JsonQuantity | null {
  const value = x === undefined || !Number.isFinite(x) ? null : round(to(x, unit));
  return value === null ? null : { value, unit };
}

function curve(c: SampledCurve, flowUnit: string, valueUnit: string, toValue: number): JsonCurve {
  const flowFactor = convert(1, flowUnit, 'm3/s');
  return {
    name: c.name,
    flow: { unit: flowUnit, values: c.flows.map((f) => round(f / flowFactor)) },
    value: { unit: valueUnit, values: c.values.map((v) => round(v * toValue)) },
  };
}

function check(c: Check, system: UnitSystem): JsonCheck {
  const siValues: Record<string, number | null> = {};
  for (const [k, v] of Object.entries(c.values)) siValues[k] = round(v);
  return {
    id: c.id,
    severity: c.severity,
    candidate: c.candidate ?? null,
    case: c.case ?? null,
    message: checkMessage(c, system),
    source: c.source,
    siValues,
    words: { ...(c.words ?? {}) },
  };
}

function fluid(f: ReportFluid, system: UnitSystem): JsonFluid {
  const m = moreUnits(system);
  return {
    name: f.name,
    temperature: quantity(f.temperature, m.temperature),
    density: quantity(f.density, m.density),
    kinematicViscosity: quantity(f.kinematicViscosity, m.kinematicViscosity),
    vaporPressure: quantity(f.vaporPressure, displayUnits(system).pressure),
  };
}

function run(r: RunDetails, u: DisplayUnits): JsonRun {
  return {
    name: r.name,
    group: r.group ?? null,
    flow: quantity(r.flow, u.flow),
    insideDiameter: quantity(r.insideDiameter, u.length),
    velocity: quantity(r.velocity, u.velocity),
    reynolds: round(r.reynolds),
    regime: r.regime,
    frictionFactor: round(r.frictionFactor),
    law: r.law,
    lawValue: r.lawValue ?? null,
    pipeLoss: quantity(r.pipeLoss, u.head),
    fittingsLoss: quantity(r.fittingsLoss, u.head),
    componentLoss: quantity(r.componentLoss, u.head),
    totalLoss: quantity(r.totalLoss, u.head),
    pressureDrop: quantity(r.pressureDrop, u.pressure),
    elevationChange: quantity(r.elevationChange, u.head),
  };
}

function endPressure(p: Pressure, atmosphere: Pressure, u: DisplayUnits): JsonEndPressure {
  return {
    absolute: quantity(p, u.pressure),
    gauge: quantity((p - atmosphere) as Pressure, u.pressure),
  };
}

function duty(
  d: CaseDuty,
  atmosphere: Pressure,
  u: DisplayUnits,
  system: UnitSystem,
): JsonCaseDuty {
  const t = d.npshTerms;
  return {
    case: d.case,
    fluid: fluid(d.fluid, system),
    aged: d.aged,
    suctionElevation: quantity(d.suctionElevation, u.length),
    dischargeElevation: quantity(d.dischargeElevation, u.length),
    npshTerms:
      t === undefined
        ? null
        : {
            surfacePressureHead: quantity(t.surfacePressureHead, u.head),
            vaporPressureHead: quantity(t.vaporPressureHead, u.head),
            staticHeight: quantity(t.staticHeight, u.head),
            suctionLoss: quantity(t.suctionLoss, u.head),
            velocityHead: quantity(t.velocityHead, u.head),
            total: quantity(t.total, u.head),
          },
    pumpDischargePressure:
      d.pumpDischargePressure === undefined
        ? null
        : endPressure(d.pumpDischargePressure, atmosphere, u),
    head: quantity(d.head, u.head),
    staticHead: quantity(d.staticHead, u.head),
    lossHead: quantity(d.lossHead, u.head),
    npshAvailable: quantity(d.npshAvailable, u.head),
    suctionPressure: endPressure(d.suctionPressure, atmosphere, u),
    dischargePressure: endPressure(d.dischargePressure, atmosphere, u),
    runs: d.runs.map((r) => run(r, u)),
    ...(d.network === undefined
      ? {}
      : {
          network: {
            dutyFlow: quantity(d.network.dutyFlow, u.flow),
            ...networkJson(d.network.tables, atmosphere, u),
          },
        }),
  };
}

function caseResult(r: CaseResult, u: DisplayUnits, system: UnitSystem): JsonCaseResult {
  const perM3 = r.specificEnergy === undefined ? undefined : r.specificEnergy / 3.6e6;
  const specific =
    perM3 === undefined
      ? null
      : system === 'us'
        ? { value: round(perM3 * 3.785411784) ?? 0, unit: 'kWh/kgal' }
        : { value: round(perM3) ?? 0, unit: 'kWh/m3' };
  return {
    case: r.case,
    failure: r.failure ?? null,
    speed: quantity(r.speed, u.speed),
    flow: quantity(r.flow, u.flow),
    head: quantity(r.head, u.head),
    efficiency: round(r.efficiency),
    shaftPower: quantity(r.shaftPower, u.power),
    percentOfBep: round(r.percentOfBep),
    region: r.region ?? null,
    npshAvailable: quantity(r.npshAvailable, u.head),
    npshRequired: quantity(r.npshRequired, u.head),
    npshRatio: round(r.npshRatio),
    velocities: r.velocities.map((v) => ({
      run: v.run,
      velocity: quantity(v.velocity, u.velocity),
    })),
    inputPower: quantity(r.inputPower, u.power),
    specificEnergy: specific,
    iterations: r.iterations,
  };
}

function motor(m: MotorRating | undefined, u: DisplayUnits): JsonMotor | null {
  if (m === undefined) return null;
  const nameplate = round(m.nameplate);
  return {
    series: m.series,
    rating: quantity(m.rating, u.power),
    nameplate: nameplate === null ? null : { value: nameplate, unit: m.unit },
    loadFraction: round(m.loadFraction),
    serviceFactor: round(m.serviceFactor),
  };
}

function curveFit(f: FitReport, maxResidual: JsonQuantity | number | null): JsonCurveFit {
  return {
    method: f.method,
    degree: f.degree ?? null,
    selection: f.selection,
    points: f.points,
    maxResidual,
    maxRelativeResidual: round(f.maxRelativeResidual),
    withinTolerance: f.withinTolerance ?? null,
  };
}

function candidate(c: CandidateReport, u: DisplayUnits, system: UnitSystem): JsonCandidate {
  const e = c.energy;
  const kWh = e === undefined ? null : round(e.kWh);
  return {
    name: c.name,
    rank: c.rank,
    passed: c.passed,
    count: c.count,
    arrangement: c.arrangement,
    control: c.control,
    cases: c.cases.map((r) => caseResult(r, u, system)),
    maxShaftPower: quantity(c.maxShaftPower, u.power),
    motor: motor(c.motor, u),
    dutyOnlyMotor: motor(c.dutyOnlyMotor, u),
    energy:
      e === undefined
        ? null
        : {
            yearly: kWh === null ? null : { value: kWh, unit: 'kWh' },
            control: e.control,
            hours: e.hours,
            cost:
              e.cost === undefined
                ? null
                : { amount: round(e.cost.amount), currency: e.cost.currency },
          },
    curveFit: {
      head: curveFit(c.curveFit.head, quantity(si<'length'>(c.curveFit.head.maxResidual), u.head)),
      efficiency:
        c.curveFit.efficiency === undefined
          ? null
          : curveFit(c.curveFit.efficiency, round(c.curveFit.efficiency.maxResidual)),
    },
    catalogue: {
      ratedSpeed: quantity(c.pump.ratedSpeed, u.speed),
      maxSpeed: quantity(c.pump.maxSpeed, u.speed),
      points: c.pump.points.map((p) => ({
        flow: quantity(p.flow, u.flow),
        head: quantity(p.head, u.head),
        efficiency: round(p.efficiency),
        npshRequired: quantity(p.npshRequired, u.head),
      })),
    },
    checks: c.checks.map((k) => check(k, system)),
  };
}

function curves(report: DesignReport, u: DisplayUnits): JsonCurves | null {
  const c = report.curves;
  if (c === undefined) return null;
  const head = 1 / convert(1, u.head, 'm');
  return {
    systems: c.systems.map((s) => curve(s, u.flow, u.head, head)),
    pumps: c.pumps.map((s) => curve(s, u.flow, u.head, head)),
    efficiency: c.efficiency.map((s) => curve(s, u.flow, '1', 1)),
    npshRequired: c.npshRequired.map((s) => curve(s, u.flow, u.head, head)),
    npshAvailable: c.npshAvailable.map((s) => curve(s, u.flow, u.head, head)),
    preferredRegions: c.preferredRegions.map((r) => ({
      name: r.name,
      minFlow: quantity(si<'flow'>(r.minFlow), u.flow),
      maxFlow: quantity(si<'flow'>(r.maxFlow), u.flow),
    })),
    points: c.points.map((p) => ({
      name: p.name,
      flow: quantity(si<'flow'>(p.flow), u.flow),
      head: quantity(si<'length'>(p.head), u.head),
    })),
  };
}

function runInput(r: RunInputSummary, system: UnitSystem): Readonly<Record<string, unknown>> {
  const u = displayUnits(system);
  const m = moreUnits(system);
  return {
    name: r.name,
    group: r.group ?? null,
    size: r.size ?? null,
    insideDiameter: quantity(r.insideDiameter, m.diameter),
    length: quantity(r.length, u.length),
    material: r.material ?? null,
    roughness: quantity(r.roughness, m.roughness),
    agedRoughness: quantity(r.agedRoughness, m.roughness),
    fittings: r.fittings.map((f) => ({ ...f, k: round(f.k) })),
    valves: r.valves.map((v) => ({ ...v, k: round(v.k) })),
    equipment: r.equipment.map((e) => ({ name: e.name, loss: quantity(e.loss, u.head) })),
    elevationChange: quantity(r.elevationChange, u.length),
  };
}

/**
 * The report as a plain object ready for `JSON.stringify`: the envelope of
 * {@link renderJson}, with every quantity converted to the display units of `units` and
 * rounded to six significant digits, and every missing value `null`.
 *
 * @param report - a report from `evaluateDesign`
 * @param units - `'si'` or `'us'`; default `report.units`
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'`.
 * @example
 * ```ts
 * // report = evaluateDesign(design) of docs/examples/cooling-loop.ts (duty 105 m3/h)
 * reportToPlain(report, 'si').report.dutyFlow; // { value: 105, unit: 'm3/h' }
 * reportToPlain(report, 'us').report.dutyFlow; // { value: 462.301, unit: 'gal/min' }
 * ```
 */
export function reportToPlain(report: DesignReport, units?: UnitSystem): JsonEnvelope {
  const system = chosenUnits(report, units);
  const u = displayUnits(system);
  return finiteOnly({
    format: REPORT_FORMAT,
    units: { ...u, energy: 'kWh' },
    report: {
      name: report.name,
      units: system,
      passed: report.passed,
      verdict: {
        candidates: report.verdict.candidates,
        passing: report.verdict.passing,
        recommended: report.verdict.recommended ?? null,
        passed: report.verdict.passed,
      },
      fluid: fluid(report.fluid, system),
      dutyFlow: quantity(report.dutyFlow, u.flow),
      atmosphere: quantity(report.atmosphere, u.pressure),
      duty: report.duty.map((d) => duty(d, report.atmosphere, u, system)),
      candidates: report.candidates.map((c) => candidate(c, u, system)),
      checks: report.checks.map((k) => check(k, system)),
      cautions: [...report.cautions],
      inputs: {
        runs: report.inputs.runs.map((r) => runInput(r, system)),
        profile: report.inputs.profile.map((p) => ({
          flow: quantity(p.flow, u.flow),
          hours: p.hours,
        })),
      },
      curves: curves(report, u),
    },
  });
}

/**
 * Passes the envelope through when every number in it is finite. Missing values are already
 * `null`; a number that is not finite here came from a field the report must fill (a count, a
 * rank, a value copied as it is) and is refused, naming where it would have gone.
 */
function finiteOnly(envelope: JsonEnvelope): JsonEnvelope {
  const stack: [unknown, string][] = [[envelope.report, 'report']];
  while (stack.length > 0) {
    const [x, path] = stack.pop() as [unknown, string];
    if (typeof x === 'number' && !Number.isFinite(x)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `the report holds ${String(x)} where a finite number is required (${path}).`,
        { parameter: path, value: x, allowed: 'a finite number' },
      );
    }
    if (typeof x === 'object' && x !== null) {
      for (const [k, v] of Object.entries(x))
        stack.push([v, Array.isArray(x) ? `${path}[${k}]` : `${path}.${k}`]);
    }
  }
  return envelope;
}

/** Options of {@link renderJson}. */
export interface JsonOptions {
  /** Units to write in; default the report's own (`report.units`). */
  readonly units?: UnitSystem;
}

/**
 * Writes a design report as stable, pretty JSON (two-space indent, fixed key order, a final
 * newline) in a versioned envelope:
 *
 * ```json
 * { "format": "headflow-report/1", "units": { "flow": "m3/h", ... }, "report": { ... } }
 * ```
 *
 * Every quantity is an object `{ "value": 272.5, "unit": "m3/h" }` with the number in the
 * chosen display unit (see {@link displayUnits}; yearly energy in kWh, motor nameplates in
 * their series' unit), so the file explains itself; dimensionless numbers (efficiency and
 * load as fractions, % of BEP, NPSH ratio, Reynolds number) are plain numbers. Numbers are
 * rounded to six significant digits (a relative change of at most 5e-6), enough to read the
 * values back to SI well within engineering precision. A missing value is `null`. The
 * numbers behind each check are written unconverted, in coherent SI, as `siValues`.
 * Curves are written as `{ name, flow: { unit, values }, value: { unit, values } }`.
 *
 * @param report - a report from `evaluateDesign`
 * @param options - `units` (`'si'` or `'us'`, default `report.units`)
 * @returns the JSON text
 * @throws HeadflowError `INVALID_ARGUMENT` for units other than `'si'` and `'us'`.
 * @example
 * ```ts
 * // report = evaluateDesign(design) of docs/examples/cooling-loop.ts (duty 105 m3/h)
 * const doc = JSON.parse(renderJson(report, { units: 'si' })) as JsonEnvelope;
 * doc.format; // 'headflow-report/1'
 * doc.report.dutyFlow; // { value: 105, unit: 'm3/h' }
 * ```
 */
export function renderJson(report: DesignReport, options?: JsonOptions | null): string {
  const o = guardOptions<JsonOptions>('options', options);
  return `${JSON.stringify(reportToPlain(report, o.units as UnitSystem | undefined), null, 2)}\n`;
}

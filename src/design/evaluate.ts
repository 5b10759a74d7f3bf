/**
 * The whole job: evaluate a design into a report.
 *
 * @module
 */
import { argumentError, checkFraction, checkPositive, HeadflowError } from '../errors';
import { guardBoolean, guardOptions, guardRange } from '../guards';
import { fitting, fittingK, kFromCv, kFromKv } from '../losses/index';
import { type PipeDimensions, material as pipeMaterial } from '../pipes/index';
import {
  annualEnergy,
  motorForPump,
  npshAvailable,
  operatingPoint,
  type ProfileRow,
  type PumpCurve,
  type PumpShare,
  type SystemCurveLike,
  selectMotor,
  speedForFlow,
} from '../pumps/index';
import {
  type LineElement,
  type PipeRunInput,
  type ScenarioCurve,
  type SystemCurve,
  systemScenarios,
} from '../system/index';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Length,
  type Power,
  type Pressure,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';
import { CAUTIONS } from './cautions';
import { checkMessage } from './check-message';
import {
  allowableRegionCheck,
  CANDIDATE_CHECKS,
  CASE_CHECKS,
  type Candidate,
  curveFitChecks,
  deadHeadCheck,
  dutyFlowCheck,
  energyCheck,
  flowRegimeCheck,
  guardCheckInputs,
  type Limits,
  motorOverloadAtRunOut,
  motorOverloadInCase,
  motorSizingError,
  motorSizingNote,
  nearBoilingCheck,
  noOperatingPointCheck,
  npshMarginCheck,
  npshNoDataCheck,
  npshNoVaporPressureCheck,
  preferredRegionCheck,
  shutoffPressureCheck,
  velocityCheck,
  viscousCorrection,
} from './checks/index';
import { checkDesignShape } from './input-shape';
import { evaluateNetworkDesign, isNetworkDesign } from './network-design';
import type {
  Arrangement,
  CandidateInput,
  CandidateReport,
  CaseDuty,
  CaseResult,
  Check,
  DesignInput,
  DesignReport,
  EvaluateOptions,
  NetworkDesignInput,
  NpshTerms,
  ReportCurves,
  ReportFluid,
  RunInputSummary,
  SampledCurve,
  SpeedControl,
  UnitSystem,
} from './types';

/** Defaults of the checks (see {@link DesignLimits}). */
export const DESIGN_DEFAULTS = {
  npshMarginRatio: 1.1,
  npshMinimumMargin: 0.6,
  suctionVelocity: { min: 0.5, max: 1.5 },
  dischargeVelocity: { min: 1, max: 3 },
  nearBoilingRatio: 0.8,
  dutyFlowTolerance: 0.02,
  hoursPerYear: 8760,
} as const;

const SAMPLES = 61;

/** The checks with their messages written in a unit system. */
export function withMessages(checks: readonly Check[], units: UnitSystem): Check[] {
  return checks.map((k) => ({ ...k, message: checkMessage(k, units) }));
}

export function resolveLimits(input: Pick<DesignInput, 'limits' | 'units'>): Limits {
  const l = input.limits ?? {};
  const ratio = l.npshMarginRatio ?? DESIGN_DEFAULTS.npshMarginRatio;
  if (!Number.isFinite(ratio) || ratio < 1) {
    throw argumentError('INVALID_ARGUMENT', 'limits.npshMarginRatio', ratio, undefined, '>= 1');
  }
  const minimum = l.npshMinimumMargin ?? DESIGN_DEFAULTS.npshMinimumMargin;
  if (!Number.isFinite(minimum) || minimum < 0) {
    throw argumentError('INVALID_ARGUMENT', 'limits.npshMinimumMargin', minimum, 'm', '>= 0');
  }
  const range = (
    name: string,
    r: { readonly min: number; readonly max: number } | undefined,
    d: { readonly min: number; readonly max: number },
  ) => {
    const v = r ?? d;
    if (!Number.isFinite(v.min) || !Number.isFinite(v.max) || v.min < 0 || v.max <= v.min) {
      throw argumentError(
        'INVALID_ARGUMENT',
        name,
        `${v.min} to ${v.max}`,
        'm/s',
        '0 <= min < max',
      );
    }
    return v;
  };
  const near = l.nearBoilingRatio ?? DESIGN_DEFAULTS.nearBoilingRatio;
  checkFraction('limits.nearBoilingRatio', near);
  if (l.designPressure !== undefined)
    checkPositive('limits.designPressure', l.designPressure, 'Pa');
  const dutyFlowTolerance =
    l.dutyFlowTolerance === undefined
      ? DESIGN_DEFAULTS.dutyFlowTolerance
      : guardRange('limits.dutyFlowTolerance', l.dutyFlowTolerance, { min: 0, max: 1 });
  return {
    units: input.units ?? 'si',
    npshMarginRatio: ratio,
    npshMinimumMargin: minimum,
    suction: range('limits.suctionVelocity', l.suctionVelocity, DESIGN_DEFAULTS.suctionVelocity),
    discharge: range(
      'limits.dischargeVelocity',
      l.dischargeVelocity,
      DESIGN_DEFAULTS.dischargeVelocity,
    ),
    nearBoilingRatio: near,
    designPressure: l.designPressure,
    dutyFlowTolerance,
  };
}

function resolveCandidate(c: CandidateInput, i: number): Candidate {
  const where = `candidates[${i}]`;
  if (typeof c.name !== 'string' || c.name.trim() === '') {
    throw argumentError('INVALID_ARGUMENT', `${where}.name`, c.name, undefined, 'a non-empty name');
  }
  const count = c.count ?? 1;
  if (!Number.isInteger(count) || count < 1 || count > 20) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${where}.count`,
      count,
      'pumps',
      'a whole number from 1 to 20',
    );
  }
  const arrangement: Arrangement = c.arrangement ?? (count === 1 ? 'single' : 'parallel');
  if (arrangement !== 'single' && arrangement !== 'parallel' && arrangement !== 'series') {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${where}.arrangement`,
      arrangement,
      undefined,
      "'single', 'parallel' or 'series'",
    );
  }
  if (arrangement === 'single' && count !== 1) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${where}.arrangement`,
      arrangement,
      undefined,
      "'parallel' or 'series' for more than one pump",
    );
  }
  const control: SpeedControl = c.control ?? 'fixed';
  if (control !== 'fixed' && control !== 'speed') {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${where}.control`,
      control,
      undefined,
      "'fixed' or 'speed'",
    );
  }
  if (!c.pump.hasEfficiency) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${where}.pump`,
      'no efficiency data',
      undefined,
      'a pump curve with efficiency or shaft power at its catalogue points',
    );
  }
  checkFraction(`${where}.motorEfficiency`, c.motorEfficiency);
  if (c.driveEfficiency !== undefined) checkFraction(`${where}.driveEfficiency`, c.driveEfficiency);
  if (c.motorRating !== undefined) checkPositive(`${where}.motorRating`, c.motorRating, 'W');
  const maxSpeed = c.maxSpeed ?? c.pump.speed;
  checkPositive(`${where}.maxSpeed`, maxSpeed, 'rad/s');
  const n = arrangement === 'parallel' ? count : 1;
  const m = arrangement === 'series' ? count : 1;
  return {
    input: c,
    name: c.name,
    pump: c.pump,
    count,
    arrangement,
    control,
    maxSpeed,
    fullSpeed: maxSpeed === c.pump.speed ? c.pump : c.pump.atSpeed(maxSpeed),
    label: count > 1 ? `${c.name} (${count} in ${arrangement})` : c.name,
    setFlow: (q) => q * n,
    pumpFlow: (q) => q / n,
    setHead: (h) => h * m,
  };
}

/**
 * The system as one pump of a set of identical pumps sees it: N in parallel share the flow
 * (each carries Q/N at the full head), N in series share the head (each adds H/N at the full
 * flow). Exact for identical pumps.
 */
export function perPump(c: Candidate, system: SystemCurveLike): SystemCurveLike {
  const m = c.arrangement === 'series' ? c.count : 1;
  return {
    staticHead: (system.staticHead / m) as Length,
    head: (q: Flow) => (system.head(c.setFlow(q) as Flow) / m) as Length,
  };
}

/**
 * NPSH available at a set flow in one case, or undefined where it cannot be known. The suction
 * end's velocity head counts when the end is a point in a pipe (`velocityDiameter`), as it
 * does in the system curve: the suction line carries the set's whole flow.
 */
function npshAvailableAt(input: DesignInput, curve: SystemCurve, flow: number): Length | undefined {
  const location = input.pumpLocation;
  const fluid = curve.definition.fluid;
  if (location === undefined || fluid.vaporPressure === undefined) return undefined;
  const n = location.suctionRuns ?? 1;
  const details = curve.details(flow as Flow);
  let loss = 0;
  for (let i = 0; i < n; i++) loss += details.runs[i]?.totalLoss ?? 0;
  const suction = curve.definition.suction;
  const d = suction.velocityDiameter;
  const velocity = d === undefined ? 0 : flow / ((Math.PI * d * d) / 4);
  return npshAvailable({
    surfacePressure: suction.pressure,
    vaporPressure: fluid.vaporPressure,
    density: fluid.density,
    staticHeadAboveImpeller: (suction.elevation - location.elevation) as Length,
    suctionLoss: loss as Length,
    suctionVelocity: velocity as Velocity,
    ...(curve.definition.g === undefined ? {} : { g: curve.definition.g }),
  });
}

function checkLocation(input: DesignInput): void {
  const location = input.pumpLocation;
  if (location === undefined) return;
  const n = location.suctionRuns ?? 1;
  const runs = input.system.runs;
  if (!Number.isInteger(n) || n < 0 || n > runs.length) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'pumpLocation.suctionRuns',
      n,
      'runs',
      `a whole number from 0 to ${runs.length}`,
    );
  }
  for (let i = 0; i < n; i++) {
    const el = runs[i];
    if (el !== undefined && 'kind' in el && el.kind === 'parallel') {
      throw argumentError(
        'INVALID_ARGUMENT',
        'pumpLocation.suctionRuns',
        n,
        'runs',
        'suction elements that are runs, not parallel groups',
      );
    }
  }
}

/** The liquid of a case, restated. */
function fluidOf(input: DesignInput, s: ScenarioCurve): ReportFluid {
  const f = s.curve.definition.fluid;
  return {
    name: input.fluidName ?? 'liquid',
    temperature: f.temperature,
    density: f.density,
    kinematicViscosity: f.kinematicViscosity,
    vaporPressure: f.vaporPressure,
  };
}

/** Head loss of the suction runs at a flow (m). */
function suctionLoss(input: DesignInput, curve: SystemCurve, flow: number): number {
  const n = input.pumpLocation?.suctionRuns ?? 1;
  const details = curve.details(flow as Flow);
  let loss = 0;
  for (let i = 0; i < n; i++) loss += details.runs[i]?.totalLoss ?? 0;
  return loss;
}

/** Velocity head of the suction end at a flow (m); 0 for a still surface. */
function suctionVelocityHead(curve: SystemCurve, flow: number): number {
  const d = curve.definition.suction.velocityDiameter;
  if (d === undefined) return 0;
  const v = flow / ((Math.PI * d * d) / 4);
  return (v * v) / (2 * (curve.definition.g ?? STANDARD_GRAVITY));
}

/** NPSH available at a flow in its terms (the same balance `npshAvailable` solves). */
function npshTermsAt(input: DesignInput, curve: SystemCurve, flow: number): NpshTerms | undefined {
  const location = input.pumpLocation;
  const def = curve.definition;
  const pv = def.fluid.vaporPressure;
  if (location === undefined || pv === undefined) return undefined;
  const total = npshAvailableAt(input, curve, flow);
  if (total === undefined) return undefined;
  const rhoG = def.fluid.density * (def.g ?? STANDARD_GRAVITY);
  return {
    surfacePressureHead: (def.suction.pressure / rhoG) as Length,
    vaporPressureHead: (pv / rhoG) as Length,
    staticHeight: (def.suction.elevation - location.elevation) as Length,
    suctionLoss: suctionLoss(input, curve, flow) as Length,
    velocityHead: suctionVelocityHead(curve, flow) as Length,
    total,
  };
}

/**
 * Absolute static pressure just after the pump at a flow whose head the pump adds is `head`:
 * the suction surface's pressure and height, less the suction losses, plus the pump's head,
 * less the velocity head of the first discharge run (the pipe the pump discharges into).
 */
function pumpOutletPressure(
  input: DesignInput,
  curve: SystemCurve,
  flow: number,
  head: number,
): Pressure | undefined {
  const location = input.pumpLocation;
  if (location === undefined) return undefined;
  const def = curve.definition;
  const g = def.g ?? STANDARD_GRAVITY;
  const rhoG = def.fluid.density * g;
  const n = location.suctionRuns ?? 1;
  const first = curve.details(flow as Flow).runs[n];
  const v = first !== undefined && first.group === undefined ? first.velocity : 0;
  const energyHead =
    def.suction.pressure / rhoG +
    (def.suction.elevation - location.elevation) -
    suctionLoss(input, curve, flow) +
    suctionVelocityHead(curve, flow) +
    head;
  return ((energyHead - (v * v) / (2 * g)) * rhoG) as Pressure;
}

/** The nominal size of a catalogue pipe in words: `NPS 6 (DN 150) sch 40`. */
function sizeName(pipe: PipeDimensions): string {
  const dn = pipe.dn === undefined ? '' : ` (DN ${pipe.dn})`;
  return `NPS ${pipe.nps}${dn} sch ${pipe.schedule}`;
}

/** Every run of the line as given, with its figures in the design case at the duty. */
function restateRuns(input: DesignInput, design: ScenarioCurve): RunInputSummary[] {
  const details = design.curve.details(input.dutyFlow).runs;
  const flat: PipeRunInput[] = [];
  const walk = (elements: readonly LineElement[]): void => {
    for (const el of elements) {
      if ('kind' in el && el.kind === 'parallel') {
        for (const branch of el.branches) flat.push(...branch);
      } else flat.push(el as PipeRunInput);
    }
  };
  walk(input.system.runs);
  const g = design.curve.definition.g;
  const density = design.curve.definition.fluid.density;
  return flat.map((r, i) => {
    const d = details[i];
    const diameter = (d?.insideDiameter ??
      r.insideDiameter ??
      r.pipe?.insideDiameter ??
      0) as Length;
    const re = d?.reynolds ?? 0;
    const mat = r.material === undefined ? undefined : pipeMaterial(r.material);
    const flow = d?.flow ?? input.dutyFlow;
    return {
      name: d?.name ?? r.name ?? `run ${i + 1}`,
      group: d?.group,
      size: r.pipe === undefined ? undefined : sizeName(r.pipe),
      insideDiameter: diameter,
      length: r.length,
      material: r.material,
      roughness: r.roughness ?? mat?.roughness,
      agedRoughness: r.agedRoughness ?? mat?.agedRoughness?.max,
      fittings: (r.fittings ?? []).map((f) => {
        const entry = fitting(f.id);
        return {
          id: entry.id,
          description: entry.description,
          count: f.count ?? 1,
          k: re > 0 ? fittingK(f.id, re, diameter) : Number.NaN,
          source: entry.sources.join('; '),
        };
      }),
      valves: (r.valves ?? []).map((v, j) => {
        const name = v.name ?? `valve ${j + 1}`;
        if (v.cv !== undefined) {
          return { name, given: 'cv' as const, coefficient: v.cv, k: kFromCv(v.cv, diameter) };
        }
        if (v.kv !== undefined) {
          return { name, given: 'kv' as const, coefficient: v.kv, k: kFromKv(v.kv, diameter) };
        }
        return { name, given: 'k' as const, coefficient: v.k ?? 0, k: v.k ?? 0 };
      }),
      equipment: (r.components ?? []).map((c, j) => ({
        name: c.name ?? `equipment ${j + 1}`,
        loss: c.headLoss(flow, density, g),
      })),
      elevationChange: r.elevationChange,
    };
  });
}

/** The duty head and its parts in one case, with the system checks of that case. */
function dutyInCase(
  input: DesignInput,
  s: ScenarioCurve,
  limits: Limits,
  checks: Check[],
): CaseDuty {
  const d = s.curve.details(input.dutyFlow);
  const fluid = s.curve.definition.fluid;
  const suctionPressure = s.curve.definition.suction.pressure;
  const boiling = nearBoilingCheck(s.name, fluid.vaporPressure, suctionPressure, limits);
  if (boiling !== undefined) checks.push(boiling);
  const suctionCount = input.pumpLocation?.suctionRuns ?? 1;
  d.runs.forEach((r, i) => {
    const regime = flowRegimeCheck(s.name, runLabel(r), r.regime, r.reynolds);
    if (regime !== undefined) checks.push(regime);
    if (input.pumpLocation !== undefined && r.group === undefined && r.flow > 0) {
      const isSuction = i < suctionCount;
      const range = isSuction ? limits.suction : limits.discharge;
      const side = isSuction ? 'suction' : 'discharge';
      const fast = velocityCheck(s.name, r.name, side, r.velocity, range);
      if (fast !== undefined) checks.push(fast);
    }
  });
  const def = s.curve.definition;
  return {
    case: s.name,
    fluid: fluidOf(input, s),
    aged: def.aged ?? false,
    suctionElevation: def.suction.elevation,
    dischargeElevation: def.discharge.elevation,
    npshTerms: npshTermsAt(input, s.curve, input.dutyFlow),
    pumpDischargePressure: pumpOutletPressure(input, s.curve, input.dutyFlow, d.head),
    head: d.head,
    staticHead: d.staticHead,
    lossHead: d.lossHead,
    npshAvailable: npshAvailableAt(input, s.curve, input.dutyFlow),
    suctionPressure: s.curve.definition.suction.pressure,
    dischargePressure: s.curve.definition.discharge.pressure,
    runs: d.runs,
  };
}

/** The operating region of a pump's share, from the pumps module's own region test. */
export function regionOf(share: PumpShare | undefined): CaseResult['region'] {
  if (share?.inPreferredRegion === undefined || share.inAllowableRegion === undefined) {
    return undefined;
  }
  if (share.inPreferredRegion) return 'preferred';
  return share.inAllowableRegion ? 'allowable' : 'outside';
}

export function message(e: unknown): string {
  if (e instanceof HeadflowError) return e.message;
  throw e;
}

/** A run's name with its branch path (`loop / branch 2 / hose`). */
function runLabel(r: { readonly name: string; readonly group: string | undefined }): string {
  return r.group ? `${r.group} / ${r.name}` : r.name;
}

/** Where the point checks of one candidate in one case are written, and what they need. */
export interface PointContext {
  readonly caseName: string;
  readonly density: Density;
  readonly g: Acceleration | undefined;
  readonly limits: Limits;
  readonly checks: Check[];
  /** Whether NPSH is to be checked (a pump location is known): missing NPSHr data warns. */
  readonly npshExpected: boolean;
}

/**
 * A candidate at one pump's flow `q` on curve `pump` (at the speed it runs): head of the set,
 * efficiency, shaft power of the set, % of BEP and region, NPSH required and the margin, with
 * the region, NPSH and motor-overload checks. Shared by lines and networks.
 */
export function pointAt(
  c: Candidate,
  pump: PumpCurve,
  q: number,
  npsha: Length | undefined,
  at: PointContext,
) {
  const flow = c.setFlow(q);
  const { caseName: name, density, limits, checks } = at;
  const head = c.setHead(pump.head(q as Flow));
  const efficiency = pump.efficiency(q as Flow);
  const shaftPower = c.count * pump.shaftPower(q as Flow, density, at.g);
  const share = pump.shares(q as Flow)[0];
  const percentOfBep = share?.percentOfBep;
  const region = regionOf(share);
  if (region === 'allowable') {
    checks.push(preferredRegionCheck(c.name, name, percentOfBep));
  } else if (region === 'outside') {
    checks.push(allowableRegionCheck(c.name, name, percentOfBep));
  }
  const npshr =
    pump.npshRange !== undefined && q >= pump.npshRange.min && q <= pump.npshRange.max
      ? pump.npshRequired(q as Flow)
      : undefined;
  let npshRatio: number | undefined;
  if (npsha !== undefined && npshr !== undefined) {
    const m = npshMarginCheck(c.name, name, npsha, npshr, limits);
    npshRatio = m.ratio;
    if (m.check !== undefined) checks.push(m.check);
  } else if (at.npshExpected && npshr === undefined) {
    checks.push(npshNoDataCheck(c.name, name, flow));
  }
  if (c.input.motorRating !== undefined) {
    const perPumpPower = shaftPower / c.count;
    const sf = c.input.serviceFactor ?? 1;
    const overload = motorOverloadInCase(c.name, name, perPumpPower, c.input.motorRating, sf);
    if (overload !== undefined) checks.push(overload);
  }
  return { head, efficiency, shaftPower, percentOfBep, region, npshr, npshRatio };
}

/** A case where a set has no operating point: every figure absent (the failure is added). */
export function emptyCase(name: string): Omit<CaseResult, 'failure'> {
  return {
    case: name,
    speed: undefined,
    flow: undefined,
    head: undefined,
    efficiency: undefined,
    shaftPower: undefined,
    percentOfBep: undefined,
    region: undefined,
    npshAvailable: undefined,
    npshRequired: undefined,
    npshRatio: undefined,
    velocities: [],
    inputPower: undefined,
    specificEnergy: undefined,
    iterations: 0,
  };
}

/** One candidate in one case: where it runs and the checks there. */
function runCase(
  input: DesignInput,
  c: Candidate,
  s: ScenarioCurve,
  limits: Limits,
  checks: Check[],
): CaseResult {
  const fluid = s.curve.definition.fluid;
  const system = perPump(c, s.curve);
  const empty = emptyCase(s.name);
  let pump: PumpCurve = c.pump;
  let q: number;
  let iterations = 0;
  const dutyPerPump = c.pumpFlow(input.dutyFlow);
  try {
    if (c.control === 'speed') {
      const sp = speedForFlow(c.pump, system, dutyPerPump as Flow, { maxSpeed: c.maxSpeed });
      pump = sp.pump;
      q = dutyPerPump;
      iterations = sp.iterations;
    } else {
      pump = c.fullSpeed;
      const op = operatingPoint(pump, system);
      q = op.flow;
      iterations = op.iterations;
    }
  } catch (e) {
    message(e);
    const k = noOperatingPointCheck(c, system, input.dutyFlow, s.name);
    checks.push(k);
    return { ...empty, failure: checkMessage(k, limits.units) };
  }
  const flow = c.setFlow(q);
  if (c.control === 'fixed') dutyFlowCheck(input.dutyFlow, flow, c.name, s.name, limits, checks);
  const npsha = npshAvailableAt(input, s.curve, flow);
  const { head, efficiency, shaftPower, percentOfBep, region, npshr, npshRatio } = pointAt(
    c,
    pump,
    q,
    npsha,
    {
      caseName: s.name,
      density: fluid.density,
      g: s.curve.definition.g,
      limits,
      checks,
      npshExpected: input.pumpLocation !== undefined,
    },
  );
  const details = s.curve.details(flow as Flow);
  const drive = c.input.driveEfficiency ?? 1;
  const inputPower = shaftPower / (c.input.motorEfficiency * drive);
  return {
    case: s.name,
    failure: undefined,
    inputPower: inputPower as Power,
    specificEnergy: flow > 0 ? inputPower / flow : undefined,
    speed: pump.speed,
    flow: flow as Flow,
    head: head as Length,
    efficiency,
    shaftPower: shaftPower as Power,
    percentOfBep,
    region,
    npshAvailable: npsha,
    npshRequired: npshr,
    npshRatio,
    velocities: details.runs.map((r) => ({
      run: runLabel(r),
      velocity: r.velocity as Velocity,
    })),
    iterations,
  };
}

function evaluateCandidate(
  input: DesignInput,
  c: Candidate,
  family: readonly ScenarioCurve[],
  limits: Limits,
  profile: readonly ProfileRow[],
): Omit<CandidateReport, 'rank'> {
  const checks: Check[] = [];
  curveFitChecks(c, checks);
  // The set as it runs on each case's liquid: its water curve corrected for viscosity where due.
  const onLiquid = family.map((s) => viscousCorrection(c, s.curve.definition.fluid, s.name));
  for (const v of onLiquid) if (v.check !== undefined) checks.push(v.check);
  const inCase = onLiquid.map((v) => v.candidate);
  const cases = family.map((s, i) => runCase(input, inCase[i] ?? c, s, limits, checks));
  const design = family[0] as ScenarioCurve;
  // The motor is sized on the most viscous case's (corrected) curve, the energy on the design
  // case's: both are the water curve itself for a water-like liquid.
  const mostViscous = family.reduce(
    (best, s, i) =>
      s.curve.definition.fluid.kinematicViscosity >
      (family[best] as ScenarioCurve).curve.definition.fluid.kinematicViscosity
        ? i
        : best,
    0,
  );
  return finishCandidate(c, cases, checks, {
    system: design.curve,
    caseName: design.name,
    density: design.curve.definition.fluid.density,
    g: design.curve.definition.g,
    profile,
    energyPrice: input.energyPrice,
    limits,
    motorSet: inCase[mostViscous] ?? c,
    energySet: inCase[0] ?? c,
    shutoffChecks: (setShutoff) => {
      if (limits.designPressure !== undefined) {
        for (const s of family) {
          const def = s.curve.definition;
          const rhoG = def.fluid.density * (def.g ?? STANDARD_GRAVITY);
          const pumpElevation = input.pumpLocation?.elevation ?? def.suction.elevation;
          const maxPressure =
            def.suction.pressure +
            rhoG * (def.suction.elevation - pumpElevation) +
            rhoG * setShutoff;
          const k = shutoffPressureCheck(c.name, s.name, maxPressure, limits.designPressure);
          if (k !== undefined) checks.push(k);
        }
      }
      const context = {
        input,
        candidate: c,
        inCase,
        family,
        cases,
        limits,
        npshAvailableAt: (curve: SystemCurve, flow: number) => npshAvailableAt(input, curve, flow),
      };
      for (const k of CANDIDATE_CHECKS) checks.push(...k.run(context));
    },
  });
}

/** What {@link finishCandidate} needs of the design case. */
export interface CandidateContext {
  /** The system as the whole set sees it in the design case (head the set must add at a set flow). */
  readonly system: SystemCurveLike;
  /** Name of the design case. */
  readonly caseName: string;
  readonly density: Density;
  readonly g: number | undefined;
  readonly profile: readonly ProfileRow[];
  readonly energyPrice: DesignInput['energyPrice'];
  readonly limits: Limits;
  /** The set whose full-speed curve sizes the motor (default the candidate itself). */
  readonly motorSet?: Candidate;
  /** The set whose curve the year's energy uses (default the candidate itself). */
  readonly energySet?: Candidate;
  /** Adds the shut-off pressure checks (and any others of the whole set) for its shut-off head (m). */
  readonly shutoffChecks: (setShutoffHead: number) => void;
}

/**
 * The rest of a candidate's evaluation once its cases are known: the motor that never
 * overloads and the duty-only motor, the year's energy over the profile, the dead-head and
 * shut-off checks, the pump restated. Shared by lines and networks.
 */
export function finishCandidate(
  c: Candidate,
  cases: readonly CaseResult[],
  checks: Check[],
  context: CandidateContext,
): Omit<CandidateReport, 'rank'> {
  const { density, profile, limits } = context;
  const design = { name: context.caseName };
  const fullSpeed = (context.motorSet ?? c).fullSpeed;
  const onDesign = context.energySet ?? c;
  const series = c.input.motorSeries ?? 'iec';
  let maxShaftPower: Power | undefined;
  let motor: CandidateReport['motor'];
  let dutyOnlyMotor: CandidateReport['dutyOnlyMotor'];
  const motorOptions =
    c.input.serviceFactor === undefined
      ? { series }
      : { series, serviceFactor: c.input.serviceFactor };
  try {
    const m = motorForPump({
      pump: fullSpeed,
      density,
      dutyFlow: fullSpeed.flowRange.max,
      ...motorOptions,
    });
    maxShaftPower = m.nonOverloading.shaftPower;
    motor = m.nonOverloading.motor;
    const powers = cases.flatMap((r) => (r.shaftPower === undefined ? [] : [r.shaftPower]));
    // With no operating point in any case there is no duty to size a motor for.
    dutyOnlyMotor =
      powers.length === 0
        ? undefined
        : selectMotor((Math.max(...powers) / c.count) as Power, motorOptions);
    if (dutyOnlyMotor !== undefined) {
      const note = motorSizingNote(c.name, series, dutyOnlyMotor, motor, maxShaftPower);
      if (note !== undefined) checks.push(note);
    }
    if (c.input.motorRating !== undefined) {
      const sf = c.input.serviceFactor ?? 1;
      const runOut = motorOverloadAtRunOut(c.name, maxShaftPower, c.input.motorRating, sf);
      if (runOut !== undefined) checks.push(runOut);
    }
  } catch (e) {
    message(e);
    const power = e instanceof HeadflowError && typeof e.value === 'number' ? e.value : Number.NaN;
    checks.push(motorSizingError(c.name, power));
  }
  let energy: CandidateReport['energy'];
  try {
    const perPumpProfile = profile.map((r) => ({
      flow: c.pumpFlow(r.flow) as Flow,
      hours: r.hours,
    }));
    const e = annualEnergy({
      pump: c.control === 'speed' ? onDesign.pump : onDesign.fullSpeed,
      system: perPump(c, context.system),
      profile: perPumpProfile,
      density,
      motorEfficiency: c.input.motorEfficiency,
      ...(c.input.driveEfficiency === undefined
        ? {}
        : { driveEfficiency: c.input.driveEfficiency }),
      control: c.control === 'speed' ? 'speed' : 'throttle',
      ...(context.energyPrice === undefined ? {} : { price: context.energyPrice }),
      ...(c.control === 'speed' ? { maxSpeed: c.maxSpeed } : {}),
      ...(context.g === undefined ? {} : { g: context.g as Acceleration }),
    });
    energy = {
      kWh: e.totalKWh * c.count,
      cost:
        e.cost === undefined
          ? undefined
          : { amount: e.cost.amount * c.count, currency: e.cost.currency },
      control: c.control === 'speed' ? 'speed' : 'throttle',
      hours: profile.reduce((a, r) => a + r.hours, 0),
    };
  } catch (e) {
    message(e);
    // The flow the energy sum failed at, when the error names it; else the profile's largest.
    const failedAt =
      e instanceof HeadflowError && typeof e.value === 'number' && Number.isFinite(e.value)
        ? c.setFlow(e.value)
        : profile.reduce((m, r) => Math.max(m, r.flow), 0);
    checks.push(energyCheck(c.name, design.name, failedAt, c.control));
  }
  const shutoff = fullSpeed.shutoffHead ?? fullSpeed.head(fullSpeed.flowRange.min);
  const setShutoff = c.setHead(shutoff);
  checks.push(deadHeadCheck(c.name, setShutoff));
  context.shutoffChecks(setShutoff);
  return {
    name: c.name,
    count: c.count,
    arrangement: c.arrangement,
    control: c.control,
    cases,
    maxShaftPower,
    motor,
    dutyOnlyMotor,
    energy,
    curveFit: { head: c.pump.fits.head, efficiency: c.pump.fits.efficiency },
    pump: {
      points: c.pump.catalogue ?? [],
      ratedSpeed: c.pump.ratedSpeed,
      speed: c.pump.speed,
      maxSpeed: c.maxSpeed,
      motorEfficiency: c.input.motorEfficiency,
      driveEfficiency: c.input.driveEfficiency,
      motorSeries: series,
      bep: c.pump.bestEfficiencyPoint,
    },
    checks: withMessages(checks, limits.units),
    passed: !checks.some((k) => k.severity === 'error'),
  };
}

export function sample(
  name: string,
  from: number,
  to: number,
  f: (q: number) => number,
  group?: string,
  speed?: { readonly speed: number; readonly max: boolean },
): SampledCurve {
  const flows: number[] = [];
  const values: number[] = [];
  for (let i = 0; i < SAMPLES; i++) {
    const q = from + ((to - from) * i) / (SAMPLES - 1);
    let v: number;
    try {
      v = f(q);
    } catch {
      continue;
    }
    if (Number.isFinite(v)) {
      flows.push(q);
      values.push(v);
    }
  }
  return {
    name,
    ...(group === undefined ? {} : { group }),
    ...(speed === undefined ? {} : { speed: speed.speed, maxSpeed: speed.max }),
    flows,
    values,
  };
}

/** Where {@link sampleCandidate} writes a candidate's full-speed curves. */
export interface CandidateCurves {
  readonly pumps: SampledCurve[];
  readonly efficiency: SampledCurve[];
  readonly npshRequired: SampledCurve[];
  readonly preferredRegions: { name: string; group: string; minFlow: number; maxFlow: number }[];
}

/**
 * Samples a candidate set at its highest speed for a chart: head, efficiency and NPSH required
 * against the set's flow, and its preferred region. Shared by lines and networks.
 */
export function sampleCandidate(c: Candidate, out: CandidateCurves): void {
  const { pumps, efficiency, npshRequired, preferredRegions } = out;
  const full = c.fullSpeed;
  const label = c.label;
  const { min, max } = full.flowRange;
  pumps.push(
    sample(
      label,
      c.setFlow(min),
      c.setFlow(max),
      (q) => c.setHead(full.head(c.pumpFlow(q) as Flow)),
      label,
      { speed: full.speed, max: true },
    ),
  );
  efficiency.push(
    sample(
      label,
      c.setFlow(min),
      c.setFlow(max),
      (q) => full.efficiency(c.pumpFlow(q) as Flow),
      label,
    ),
  );
  if (full.npshRange !== undefined) {
    const r = full.npshRange;
    npshRequired.push(
      sample(
        label,
        c.setFlow(r.min),
        c.setFlow(r.max),
        (q) => full.npshRequired(c.pumpFlow(q) as Flow),
        label,
      ),
    );
  }
  if (full.preferredRegion !== undefined) {
    preferredRegions.push({
      name: label,
      group: label,
      minFlow: c.setFlow(full.preferredRegion.min),
      maxFlow: c.setFlow(full.preferredRegion.max),
    });
  }
}

function curvesOf(
  input: DesignInput,
  candidates: readonly Candidate[],
  reports: readonly Omit<CandidateReport, 'rank'>[],
  family: readonly ScenarioCurve[],
  duty: readonly CaseDuty[],
): ReportCurves {
  let qMax = input.dutyFlow * 1.5;
  for (const c of candidates) qMax = Math.max(qMax, c.setFlow(c.fullSpeed.flowRange.max));
  const systems = family.map((s) => sample(s.name, 0, qMax, (q) => s.curve.head(q as Flow)));
  const pumps: SampledCurve[] = [];
  const efficiency: SampledCurve[] = [];
  const npshRequired: SampledCurve[] = [];
  const preferredRegions: { name: string; group: string; minFlow: number; maxFlow: number }[] = [];
  candidates.forEach((c, i) => {
    const full = c.fullSpeed;
    const label = c.label;
    sampleCandidate(c, { pumps, efficiency, npshRequired, preferredRegions });
    const report = reports[i];
    const speeds = new Set<number>();
    for (const r of report?.cases ?? []) {
      if (
        r.speed !== undefined &&
        Math.abs(r.speed - full.speed) > 1e-9 * full.speed &&
        !speeds.has(r.speed)
      ) {
        speeds.add(r.speed);
        const at = c.pump.atSpeed(r.speed);
        pumps.push(
          sample(
            `${label} at ${Math.round((r.speed * 60) / (2 * Math.PI))} rpm`,
            c.setFlow(at.flowRange.min),
            c.setFlow(at.flowRange.max),
            (q) => c.setHead(at.head(c.pumpFlow(q) as Flow)),
            label,
            { speed: r.speed, max: false },
          ),
        );
      }
    }
  });
  const npshAvailableCurves = family
    .map((s) =>
      sample(
        s.name,
        qMax / (SAMPLES - 1),
        qMax,
        (q) => npshAvailableAt(input, s.curve, q) ?? Number.NaN,
      ),
    )
    .filter((c) => c.flows.length > 0);
  const points = reports.flatMap((r) =>
    r.cases
      .filter((k) => k.flow !== undefined && k.head !== undefined)
      .map((k) => ({
        name: `${r.name} / ${k.case}`,
        candidate: r.name,
        case: k.case,
        flow: k.flow ?? 0,
        head: k.head ?? 0,
      })),
  );
  const dutyPoints = duty.map((d) => ({ case: d.case, flow: input.dutyFlow, head: d.head }));
  return {
    systems,
    pumps,
    efficiency,
    npshRequired,
    npshAvailable: npshAvailableCurves,
    preferredRegions,
    points,
    dutyPoints,
  };
}

/**
 * The candidates with their defaults filled in, checked, names unique.
 * @throws HeadflowError `INVALID_ARGUMENT` as {@link evaluateDesign}.
 */
export function resolveCandidates(inputs: readonly CandidateInput[]): Candidate[] {
  const names = new Set<string>();
  return inputs.map((c, i) => {
    const r = resolveCandidate(c, i);
    if (names.has(r.name)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `candidates[${i}].name`,
        r.name,
        undefined,
        'a name no other candidate has',
      );
    }
    names.add(r.name);
    return r;
  });
}

/**
 * The duty profile with its default (the duty flow all year), checked.
 * @throws HeadflowError `INVALID_ARGUMENT` for a negative flow or hours outside 0 to 8784.
 */
export function resolveProfile(
  given: readonly ProfileRow[] | undefined,
  dutyFlow: number,
): readonly ProfileRow[] {
  const profile = given ?? [{ flow: dutyFlow as Flow, hours: DESIGN_DEFAULTS.hoursPerYear }];
  profile.forEach((row, i) => {
    if (!Number.isFinite(row.flow) || row.flow < 0) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `profile[${i}].flow`,
        row.flow,
        'm3/s',
        'a finite flow >= 0',
      );
    }
    if (!Number.isFinite(row.hours) || row.hours < 0 || row.hours > 8784) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `profile[${i}].hours`,
        row.hours,
        'h',
        '0 to 8784 hours',
      );
    }
  });
  return profile;
}

/**
 * Evaluates a design: for every operating case, the head the duty needs; for every candidate
 * pump set and case, where it runs (full speed, or the speed a drive needs for the duty flow),
 * its efficiency, shaft power, % of BEP flow and region, NPSH available and required; the
 * motor that never overloads and the one that covers only the duty; the year's energy and
 * cost over the duty profile; every check with its severity, numbers and source; a ranking
 * (passing candidates first, then by yearly energy); the cautions; and sampled curves for a
 * chart.
 *
 * Identical pumps in a set are handled exactly by the view each pump has of the system:
 * N in parallel each carry Q/N at the full head, N in series each add H/N at the full flow.
 * The suction line is taken to carry the set's whole flow. NPSH is checked at the first pump
 * of a series set only.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for impossible input (a duty flow <= 0, a candidate
 *   without efficiency data, duplicate names, bad limits), and whatever the system and
 *   pumps modules throw for their parts (for example `OUT_OF_RANGE` when the fluid boils
 *   at the suction). A candidate that cannot meet a case is not an exception: it gets a
 *   failure in that case and an error check.
 * @example
 * ```ts
 * const report = evaluateDesign({ name: 'transfer', system, dutyFlow: q(12, 'L/s'),
 *   candidates: [{ name: 'A', pump, motorEfficiency: 0.9 }] });
 * report.candidates[0]?.cases[0]?.flow; // where candidate A runs
 * ```
 */
export function evaluateDesign(
  input: DesignInput | NetworkDesignInput,
  options: EvaluateOptions | null = {},
): DesignReport {
  // --- network hook: a design whose system is a network goes to network-design.ts ---
  if (isNetworkDesign(input)) return evaluateNetworkDesign(input, options);
  // --- end of network hook ---
  const o = guardOptions<EvaluateOptions>('options', options);
  const wantCurves = o.curves === undefined ? false : guardBoolean('options.curves', o.curves);
  checkDesignShape(input);
  checkPositive('dutyFlow', input.dutyFlow, 'm3/s');
  const units = input.units ?? 'si';
  if (units !== 'si' && units !== 'us') {
    throw argumentError('INVALID_ARGUMENT', 'units', units, undefined, "'si' or 'us'");
  }
  const atmosphere =
    input.atmosphere === undefined
      ? STANDARD_ATMOSPHERE
      : (guardRange('atmosphere', input.atmosphere, {
          min: 0,
          minOpen: true,
          unit: 'Pa',
        }) as Pressure);
  const limits = resolveLimits(input);
  checkLocation(input);
  guardCheckInputs(input);
  const family = systemScenarios(
    { ...input.system, name: input.system.name ?? 'design case' },
    input.cases ?? [],
  );
  const candidates = resolveCandidates(input.candidates ?? []);
  const profile = resolveProfile(input.profile, input.dutyFlow);
  const systemChecks: Check[] = [];
  const duty = family.map((s) => dutyInCase(input, s, limits, systemChecks));
  family.forEach((scenario, i) => {
    const d = duty[i] as CaseDuty;
    for (const k of CASE_CHECKS) systemChecks.push(...k.run({ input, scenario, duty: d, limits }));
  });
  if (
    input.pumpLocation !== undefined &&
    family.some((s) => s.curve.definition.fluid.vaporPressure === undefined)
  ) {
    systemChecks.push(npshNoVaporPressureCheck());
  }
  const evaluated = candidates.map((c) => evaluateCandidate(input, c, family, limits, profile));
  const order = evaluated
    .map((r, i) => ({ r, i }))
    .sort((a, b) => {
      if (a.r.passed !== b.r.passed) return a.r.passed ? -1 : 1;
      const ea = a.r.energy?.kWh ?? Number.POSITIVE_INFINITY;
      const eb = b.r.energy?.kWh ?? Number.POSITIVE_INFINITY;
      if (ea !== eb) return ea - eb;
      return a.i - b.i;
    });
  const ranked: CandidateReport[] = order.map(({ r }, k) => ({ ...r, rank: k + 1 }));
  const curves = wantCurves ? curvesOf(input, candidates, evaluated, family, duty) : undefined;
  // Passed: the recommended (first-ranked) candidate passes every check and no system check
  // is an error; another candidate failing does not fail the design.
  const systemOk = !systemChecks.some((k) => k.severity === 'error');
  const first = ranked[0];
  const passed = systemOk && (first === undefined || first.passed);
  const design = family[0] as ScenarioCurve;
  return {
    name: input.name,
    units,
    dutyFlow: input.dutyFlow,
    fluid: fluidOf(input, design),
    verdict: {
      candidates: ranked.length,
      passing: ranked.filter((r) => r.passed).length,
      recommended: first?.name,
      passed,
    },
    inputs: {
      runs: restateRuns(input, design),
      pumpLocation:
        input.pumpLocation === undefined
          ? undefined
          : {
              elevation: input.pumpLocation.elevation,
              suctionRuns: input.pumpLocation.suctionRuns ?? 1,
            },
      profile,
      energyPrice: input.energyPrice,
    },
    atmosphere,
    duty,
    candidates: ranked,
    checks: withMessages(systemChecks, units),
    cautions: CAUTIONS,
    passed,
    curves,
  };
}

/**
 * The whole job: evaluate a design into a report.
 *
 * @module
 */
import { argumentError, checkFraction, checkPositive, HeadflowError } from '../errors';
import {
  annualEnergy,
  motorForPump,
  npshAvailable,
  npshMargin,
  operatingPoint,
  type ProfileRow,
  type PumpCurve,
  type PumpShare,
  type SystemCurveLike,
  selectMotor,
  speedForFlow,
} from '../pumps/index';
import { type ScenarioCurve, type SystemCurve, systemScenarios } from '../system/index';
import {
  type Flow,
  formatQuantity,
  type Length,
  type Power,
  type Pressure,
  type RotationalSpeed,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';
import { CAUTIONS } from './cautions';
import { displayUnits } from './display-units';
import { checkDesignShape } from './input-shape';
import type {
  Arrangement,
  CandidateInput,
  CandidateReport,
  CaseDuty,
  CaseResult,
  Check,
  DesignInput,
  DesignReport,
  ReportCurves,
  SampledCurve,
  SpeedControl,
} from './types';

/** Defaults of the checks (see {@link DesignLimits}). */
export const DESIGN_DEFAULTS = {
  npshMarginRatio: 1.1,
  npshMinimumMargin: 0.6,
  suctionVelocity: { min: 0.5, max: 1.5 },
  dischargeVelocity: { min: 1, max: 3 },
  nearBoilingRatio: 0.8,
  hoursPerYear: 8760,
} as const;

const NPSH_SOURCE =
  'ANSI/HI 9.6.1 (NPSH margin by application, as summarized in the pumps module; use the edition your project names)';
const REGION_SOURCE = 'ANSI/HI 9.6.3 (preferred operating region 70-120 % of BEP flow by default)';
const COMMON = 'common practice';
const SAMPLES = 61;

/** Formats numbers for check messages in the report's units. */
interface Say {
  flow(v: number): string;
  head(v: number): string;
  pressure(v: number): string;
  power(v: number): string;
  velocity(v: number): string;
}

function sayIn(units: DesignInput['units']): Say {
  const u = displayUnits(units ?? 'si');
  return {
    flow: (v) => formatQuantity(v as Flow, u.flow),
    head: (v) => formatQuantity(v as Length, u.head, 3),
    pressure: (v) => formatQuantity(v as Pressure, u.pressure),
    power: (v) => formatQuantity(v as Power, u.power, 3),
    velocity: (v) => formatQuantity(v as Velocity, u.velocity, 3),
  };
}

interface Limits {
  readonly say: Say;
  readonly npshMarginRatio: number;
  readonly npshMinimumMargin: number;
  readonly suction: { readonly min: number; readonly max: number };
  readonly discharge: { readonly min: number; readonly max: number };
  readonly nearBoilingRatio: number;
  readonly designPressure: number | undefined;
}

/** A candidate with its defaults filled in and its per-pump view of each system. */
interface Candidate {
  readonly input: CandidateInput;
  readonly name: string;
  readonly pump: PumpCurve;
  readonly count: number;
  readonly arrangement: Arrangement;
  readonly control: SpeedControl;
  readonly maxSpeed: RotationalSpeed;
  /** The pump at its highest speed (the curve itself unless `maxSpeed` differs). */
  readonly fullSpeed: PumpCurve;
  /** Name of the set for charts: `"A (2 in parallel)"`, or the candidate's name. */
  readonly label: string;
  /** Set flow from one pump's flow. */
  readonly setFlow: (q: number) => number;
  /** One pump's flow from the set's flow. */
  readonly pumpFlow: (q: number) => number;
  /** Set head from one pump's head. */
  readonly setHead: (h: number) => number;
}

function fmt(v: number, digits = 4): string {
  return Number(v.toPrecision(digits)).toString();
}

function check(
  id: string,
  severity: Check['severity'],
  candidate: string | undefined,
  caseName: string | undefined,
  message: string,
  values: Record<string, number>,
  source: string,
): Check {
  return { id, severity, candidate, case: caseName, message, values, source };
}

function resolveLimits(input: DesignInput): Limits {
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
  return {
    say: sayIn(input.units),
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
function perPump(c: Candidate, system: SystemCurve): SystemCurveLike {
  const m = c.arrangement === 'series' ? c.count : 1;
  return {
    staticHead: (system.staticHead / m) as Length,
    head: (q: Flow) => (system.head(c.setFlow(q) as Flow) / m) as Length,
  };
}

/** NPSH available at a set flow in one case, or undefined where it cannot be known. */
function npshAvailableAt(input: DesignInput, curve: SystemCurve, flow: number): Length | undefined {
  const location = input.pumpLocation;
  const fluid = curve.definition.fluid;
  if (location === undefined || fluid.vaporPressure === undefined) return undefined;
  const n = location.suctionRuns ?? 1;
  const details = curve.details(flow as Flow);
  let loss = 0;
  for (let i = 0; i < n; i++) loss += details.runs[i]?.totalLoss ?? 0;
  return npshAvailable({
    surfacePressure: curve.definition.suction.pressure,
    vaporPressure: fluid.vaporPressure,
    density: fluid.density,
    staticHeadAboveImpeller: (curve.definition.suction.elevation - location.elevation) as Length,
    suctionLoss: loss as Length,
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
  if (
    fluid.vaporPressure !== undefined &&
    fluid.vaporPressure >= limits.nearBoilingRatio * suctionPressure
  ) {
    checks.push(
      check(
        'near-boiling',
        'warning',
        undefined,
        s.name,
        `The liquid is near boiling at the suction: vapour pressure ${limits.say.pressure(fluid.vaporPressure)} is ` +
          `${fmt((100 * fluid.vaporPressure) / suctionPressure, 3)} % of the suction surface pressure. ` +
          'Small changes of temperature or pressure can flash it; check NPSH with care.',
        {
          vaporPressure: fluid.vaporPressure,
          suctionPressure,
          ratio: fluid.vaporPressure / suctionPressure,
        },
        COMMON,
      ),
    );
  }
  const suctionCount = input.pumpLocation?.suctionRuns ?? 1;
  d.runs.forEach((r, i) => {
    if (r.regime === 'laminar' || r.regime === 'transition') {
      checks.push(
        check(
          'flow-regime',
          'warning',
          undefined,
          s.name,
          r.regime === 'laminar'
            ? `Run '${r.name}' is laminar at the duty (Re ${fmt(r.reynolds)}): catalogue pump curves are for water; a viscous liquid lowers head and efficiency (correct the curves, for example by ANSI/HI 9.6.7).`
            : `Run '${r.name}' is in the laminar-turbulent transition at the duty (Re ${fmt(r.reynolds)}): its friction is uncertain; the loss uses the conservative friction factor.`,
          { reynolds: r.reynolds },
          r.regime === 'laminar'
            ? 'ANSI/HI 9.6.7 (viscosity correction)'
            : 'common practice (transition 2300 < Re < 4000)',
        ),
      );
    }
    if (input.pumpLocation !== undefined && r.group === undefined && r.flow > 0) {
      const isSuction = i < suctionCount;
      const range = isSuction ? limits.suction : limits.discharge;
      if (r.velocity < range.min || r.velocity > range.max) {
        checks.push(
          check(
            'velocity',
            'warning',
            undefined,
            s.name,
            `Velocity in ${isSuction ? 'suction' : 'discharge'} run '${r.name}' is ${limits.say.velocity(r.velocity)}, ` +
              `outside the usual ${limits.say.velocity(range.min)} to ${limits.say.velocity(range.max)} for ${isSuction ? 'suction' : 'discharge'} lines` +
              (r.velocity > range.max
                ? ' (erosion, noise, surge and suction losses grow).'
                : ' (settling, air pockets, an oversized pipe).'),
            { velocity: r.velocity, min: range.min, max: range.max },
            COMMON,
          ),
        );
      }
    }
  });
  return {
    case: s.name,
    head: d.head,
    staticHead: d.staticHead,
    lossHead: d.lossHead,
    npshAvailable: npshAvailableAt(input, s.curve, input.dutyFlow),
    runs: d.runs,
  };
}

/** The operating region of a pump's share, from the pumps module's own region test. */
function regionOf(share: PumpShare | undefined): CaseResult['region'] {
  if (share?.inPreferredRegion === undefined || share.inAllowableRegion === undefined) {
    return undefined;
  }
  if (share.inPreferredRegion) return 'preferred';
  return share.inAllowableRegion ? 'allowable' : 'outside';
}

function message(e: unknown): string {
  if (e instanceof HeadflowError) return e.message;
  throw e;
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
  const empty = {
    case: s.name,
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
    iterations: 0,
  } as const;
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
    const why = message(e);
    checks.push(
      check(
        'no-operating-point',
        'error',
        c.name,
        s.name,
        `No operating point at the duty: ${why}`,
        { dutyFlow: input.dutyFlow },
        COMMON,
      ),
    );
    return { ...empty, failure: why };
  }
  const flow = c.setFlow(q);
  const head = c.setHead(pump.head(q as Flow));
  const efficiency = pump.efficiency(q as Flow);
  const shaftPower = c.count * pump.shaftPower(q as Flow, fluid.density, s.curve.definition.g);
  const share = pump.shares(q as Flow)[0];
  const percentOfBep = share?.percentOfBep;
  const region = regionOf(share);
  if (c.control === 'fixed' && Math.abs(flow - input.dutyFlow) > 0.02 * input.dutyFlow) {
    const short = flow < input.dutyFlow;
    checks.push(
      check(
        'duty-flow',
        short ? 'error' : 'info',
        c.name,
        s.name,
        short
          ? `Delivers ${limits.say.flow(flow)}, short of the duty ${limits.say.flow(input.dutyFlow)}.`
          : `Runs at ${limits.say.flow(flow)}, above the duty ${limits.say.flow(input.dutyFlow)}: a valve would throttle it (or trim the impeller).`,
        { flow, dutyFlow: input.dutyFlow },
        COMMON,
      ),
    );
  }
  if (region === 'allowable') {
    checks.push(
      check(
        'preferred-region',
        'warning',
        c.name,
        s.name,
        `Runs at ${fmt(percentOfBep ?? 0, 3)} % of its BEP flow, outside its preferred operating region.`,
        { percentOfBep: percentOfBep ?? 0 },
        REGION_SOURCE,
      ),
    );
  } else if (region === 'outside') {
    checks.push(
      check(
        'allowable-region',
        'error',
        c.name,
        s.name,
        `Runs at ${fmt(percentOfBep ?? 0, 3)} % of its BEP flow, outside its allowable operating region (vibration, recirculation, overheating).`,
        { percentOfBep: percentOfBep ?? 0 },
        'ANSI/HI 9.6.3 (allowable operating region; the manufacturer states it)',
      ),
    );
  }
  const npsha = npshAvailableAt(input, s.curve, flow);
  const npshr =
    pump.npshRange !== undefined && q >= pump.npshRange.min && q <= pump.npshRange.max
      ? pump.npshRequired(q as Flow)
      : undefined;
  let npshRatio: number | undefined;
  if (npsha !== undefined && npshr !== undefined) {
    const m = npshMargin({
      available: npsha,
      required: npshr,
      marginRatio: limits.npshMarginRatio,
      minimumMargin: limits.npshMinimumMargin as Length,
    });
    npshRatio = m.ratio;
    if (npsha < npshr) {
      checks.push(
        check(
          'npsh-margin',
          'error',
          c.name,
          s.name,
          `Cavitation: NPSH available ${limits.say.head(npsha)} is below NPSH required ${limits.say.head(npshr)}. Raise the suction level or pressure, lower the pump, shorten or enlarge the suction line, or cool the liquid.`,
          { npshAvailable: npsha, npshRequired: npshr, ratio: m.ratio },
          NPSH_SOURCE,
        ),
      );
    } else if (!m.ok) {
      checks.push(
        check(
          'npsh-margin',
          'warning',
          c.name,
          s.name,
          `NPSH margin too small: ${limits.say.head(npsha)} available against ${limits.say.head(npshr)} required (ratio ${fmt(m.ratio, 3)}); the design asks for at least ${limits.say.head(m.requiredAvailable)}.`,
          {
            npshAvailable: npsha,
            npshRequired: npshr,
            ratio: m.ratio,
            requiredAvailable: m.requiredAvailable,
          },
          NPSH_SOURCE,
        ),
      );
    }
  } else if (input.pumpLocation !== undefined && npshr === undefined) {
    checks.push(
      check(
        'npsh-data',
        'warning',
        c.name,
        s.name,
        'No NPSH-required data at this flow: cavitation is not checked. Ask the manufacturer for NPSH3 over the whole range.',
        { flow },
        COMMON,
      ),
    );
  }
  if (c.input.motorRating !== undefined) {
    const perPumpPower = shaftPower / c.count;
    const sf = c.input.serviceFactor ?? 1;
    if (perPumpPower > c.input.motorRating * sf) {
      checks.push(
        check(
          'motor-overload',
          'error',
          c.name,
          s.name,
          `Motor overload: the pump needs ${limits.say.power(perPumpPower)}, above the ${limits.say.power(c.input.motorRating)} motor${sf > 1 ? ` times its service factor ${sf}` : ''}.`,
          { shaftPower: perPumpPower, motorRating: c.input.motorRating, serviceFactor: sf },
          'NEMA MG 1 / IEC 60034-1 (rated output)',
        ),
      );
    }
  }
  const details = s.curve.details(flow as Flow);
  return {
    case: s.name,
    failure: undefined,
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
      run: r.group ? `${r.group} / ${r.name}` : r.name,
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
  const cases = family.map((s) => runCase(input, c, s, limits, checks));
  const design = family[0] as ScenarioCurve;
  const density = design.curve.definition.fluid.density;
  const series = c.input.motorSeries ?? 'iec';
  const fullSpeed = c.fullSpeed;
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
    const dutyPower = Math.max(0, ...cases.map((r) => (r.shaftPower ?? 0) / c.count));
    dutyOnlyMotor = selectMotor(dutyPower as Power, motorOptions);
    if (dutyOnlyMotor.rating < motor.rating) {
      checks.push(
        check(
          'motor-sizing',
          'info',
          c.name,
          undefined,
          `A ${dutyOnlyMotor.nameplate} ${dutyOnlyMotor.unit} motor covers the duty points, but the pump can draw ${limits.say.power(maxShaftPower)} at the end of its curve (a burst pipe, an open bypass, a low static head): the ${motor.nameplate} ${motor.unit} motor never overloads.`,
          { dutyOnly: dutyOnlyMotor.rating, nonOverloading: motor.rating, maxShaftPower },
          series === 'nema' ? 'NEMA MG 1 (standard ratings)' : 'IEC 60072-1 (standard ratings)',
        ),
      );
    }
    if (
      c.input.motorRating !== undefined &&
      maxShaftPower > c.input.motorRating * (c.input.serviceFactor ?? 1)
    ) {
      checks.push(
        check(
          'motor-overload',
          'warning',
          c.name,
          undefined,
          `The ${limits.say.power(c.input.motorRating)} motor would overload if the pump ran out to the end of its curve (${limits.say.power(maxShaftPower)}).`,
          { maxShaftPower, motorRating: c.input.motorRating },
          COMMON,
        ),
      );
    }
  } catch (e) {
    checks.push(
      check(
        'motor-sizing',
        'error',
        c.name,
        undefined,
        `No standard motor found: ${message(e)}`,
        {},
        COMMON,
      ),
    );
  }
  let energy: CandidateReport['energy'];
  try {
    const perPumpProfile = profile.map((r) => ({
      flow: c.pumpFlow(r.flow) as Flow,
      hours: r.hours,
    }));
    const e = annualEnergy({
      pump: c.control === 'speed' ? c.pump : fullSpeed,
      system: perPump(c, design.curve),
      profile: perPumpProfile,
      density,
      motorEfficiency: c.input.motorEfficiency,
      ...(c.input.driveEfficiency === undefined
        ? {}
        : { driveEfficiency: c.input.driveEfficiency }),
      control: c.control === 'speed' ? 'speed' : 'throttle',
      ...(input.energyPrice === undefined ? {} : { price: input.energyPrice }),
      ...(c.control === 'speed' ? { maxSpeed: c.maxSpeed } : {}),
      ...(design.curve.definition.g === undefined ? {} : { g: design.curve.definition.g }),
    });
    energy = {
      kWh: e.totalKWh * c.count,
      cost:
        e.cost === undefined
          ? undefined
          : { amount: e.cost.amount * c.count, currency: e.cost.currency },
    };
  } catch (e) {
    checks.push(
      check(
        'energy',
        'error',
        c.name,
        design.name,
        `The duty profile cannot be met: ${message(e)}`,
        {},
        COMMON,
      ),
    );
  }
  const shutoff = fullSpeed.shutoffHead ?? fullSpeed.head(fullSpeed.flowRange.min);
  const setShutoff = c.setHead(shutoff);
  checks.push(
    check(
      'dead-head',
      'warning',
      c.name,
      undefined,
      `Against a closed discharge the set runs at shut-off (${limits.say.head(setShutoff)}) and heats the liquid it churns: provide a minimum-flow bypass, a low-flow trip or interlocked valves.`,
      { shutoffHead: setShutoff },
      COMMON,
    ),
  );
  if (limits.designPressure !== undefined) {
    for (const s of family) {
      const def = s.curve.definition;
      const rhoG = def.fluid.density * (def.g ?? STANDARD_GRAVITY);
      const pumpElevation = input.pumpLocation?.elevation ?? def.suction.elevation;
      const maxPressure =
        def.suction.pressure + rhoG * (def.suction.elevation - pumpElevation) + rhoG * setShutoff;
      if (maxPressure > limits.designPressure) {
        checks.push(
          check(
            'shutoff-pressure',
            'error',
            c.name,
            s.name,
            `At shut-off the discharge pressure reaches ${limits.say.pressure(maxPressure)} (absolute), above the piping's design pressure ${limits.say.pressure(limits.designPressure)} (absolute): use a lower-head pump, a relief valve or a higher pressure rating.`,
            { maxPressure, designPressure: limits.designPressure },
            'ASME B31.1/B31.3 and local pressure-equipment codes (design pressure covers the highest pressure the pump can make)',
          ),
        );
      }
    }
  }
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
    checks,
    passed: !checks.some((k) => k.severity === 'error'),
  };
}

function sample(
  name: string,
  from: number,
  to: number,
  f: (q: number) => number,
  group?: string,
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
  return group === undefined ? { name, flows, values } : { name, group, flows, values };
}

function curvesOf(
  input: DesignInput,
  candidates: readonly Candidate[],
  reports: readonly Omit<CandidateReport, 'rank'>[],
  family: readonly ScenarioCurve[],
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
    const { min, max } = full.flowRange;
    pumps.push(
      sample(
        label,
        c.setFlow(min),
        c.setFlow(max),
        (q) => c.setHead(full.head(c.pumpFlow(q) as Flow)),
        label,
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
            `${label} at ${fmt((r.speed * 60) / (2 * Math.PI), 4)} rpm`,
            c.setFlow(at.flowRange.min),
            c.setFlow(at.flowRange.max),
            (q) => c.setHead(at.head(c.pumpFlow(q) as Flow)),
            label,
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
      .map((k) => ({ name: `${r.name} / ${k.case}`, flow: k.flow ?? 0, head: k.head ?? 0 })),
  );
  return {
    systems,
    pumps,
    efficiency,
    npshRequired,
    npshAvailable: npshAvailableCurves,
    preferredRegions,
    points,
  };
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
export function evaluateDesign(input: DesignInput): DesignReport {
  checkDesignShape(input);
  checkPositive('dutyFlow', input.dutyFlow, 'm3/s');
  const limits = resolveLimits(input);
  checkLocation(input);
  const family = systemScenarios(
    { ...input.system, name: input.system.name ?? 'design case' },
    input.cases ?? [],
  );
  const candidateInputs = input.candidates ?? [];
  const names = new Set<string>();
  const candidates = candidateInputs.map((c, i) => {
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
  const profile = input.profile ?? [{ flow: input.dutyFlow, hours: DESIGN_DEFAULTS.hoursPerYear }];
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
  const systemChecks: Check[] = [];
  const duty = family.map((s) => dutyInCase(input, s, limits, systemChecks));
  if (
    input.pumpLocation !== undefined &&
    family.some((s) => s.curve.definition.fluid.vaporPressure === undefined)
  ) {
    systemChecks.push(
      check(
        'npsh-data',
        'warning',
        undefined,
        undefined,
        'The fluid has no vapour pressure: NPSH available cannot be computed and cavitation is not checked.',
        {},
        COMMON,
      ),
    );
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
  const curves = curvesOf(input, candidates, evaluated, family);
  // Passed: no check anywhere is an error (a failing candidate fails the report; the
  // ranking still puts the passing candidates first).
  const passed = !systemChecks.some((k) => k.severity === 'error') && ranked.every((r) => r.passed);
  return {
    name: input.name,
    units: input.units ?? 'si',
    dutyFlow: input.dutyFlow,
    fluid: `${input.fluidName ?? 'liquid'} at ${fmt(input.system.fluid.temperature - 273.15, 4)} degC, ${fmt(input.system.fluid.density, 5)} kg/m3`,
    duty,
    candidates: ranked,
    checks: systemChecks,
    cautions: CAUTIONS,
    passed,
    curves,
  };
}

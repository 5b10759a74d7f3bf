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
import {
  guardArray,
  guardBoolean,
  guardNumber,
  guardOneOf,
  guardRecord,
  guardString,
  kindOf,
} from '../guards';

const MAX_ITEMS = 100_000;

// ---------------------------------------------------------------- the report's schema

/** How one field of a report is checked. */
type Shape =
  | { readonly t: 'string'; readonly optional?: boolean }
  | { readonly t: 'number'; readonly optional?: boolean; readonly finite?: boolean }
  | { readonly t: 'boolean'; readonly optional?: boolean }
  | { readonly t: 'oneOf'; readonly values: readonly string[]; readonly optional?: boolean }
  | { readonly t: 'record'; readonly fields: Fields; readonly optional?: boolean }
  | { readonly t: 'map'; readonly of: Shape; readonly optional?: boolean }
  | { readonly t: 'list'; readonly of: Shape; readonly optional?: boolean };
type Fields = Readonly<Record<string, Shape>>;

const str: Shape = { t: 'string' };
const optStr: Shape = { t: 'string', optional: true };
// A missing or non-finite number is printed as a dash; another type is refused.
const num: Shape = { t: 'number', optional: true };
const count: Shape = { t: 'number', finite: true };
// A number the renderer computes with (rounds, sums): present, finite or not.
const reqNum: Shape = { t: 'number' };
const bool: Shape = { t: 'boolean', optional: true };
const oneOf = (values: readonly string[], optional = false): Shape => ({
  t: 'oneOf',
  values,
  optional,
});
const rec = (fields: Fields, optional = false): Shape => ({ t: 'record', fields, optional });
const list = (of: Shape, optional = false): Shape => ({ t: 'list', of, optional });

const CHECK = rec({
  id: str,
  severity: oneOf(['error', 'warning', 'info']),
  candidate: optStr,
  case: optStr,
  message: str,
  source: str,
  values: { t: 'map', of: num },
  words: { t: 'map', of: str, optional: true },
});

const FLUID_FIELDS: Fields = {
  name: str,
  temperature: num,
  density: num,
  kinematicViscosity: num,
  vaporPressure: num,
};

const RUN_DETAILS = rec({
  name: str,
  group: optStr,
  flow: num,
  insideDiameter: num,
  velocity: num,
  reynolds: num,
  regime: oneOf(['none', 'laminar', 'transition', 'turbulent'], true),
  frictionFactor: num,
  law: oneOf(['darcy-weisbach', 'constant-factor', 'hazen-williams'], true),
  lawValue: num,
  pipeLoss: num,
  fittingsLoss: num,
  componentLoss: num,
  totalLoss: num,
  pressureDrop: num,
  elevationChange: num,
});

/** The node and link tables of a network at one solution. */
const NETWORK_TABLES = (optional: boolean): Shape =>
  rec(
    {
      pumpLink: str,
      duty: oneOf(['flow', 'service']),
      nodes: list(
        rec({
          id: str,
          kind: oneOf(['junction', 'surface', 'outlet']),
          elevation: num,
          head: num,
          pressure: num,
          outflow: num,
          minPressure: num,
          shortfall: num,
          isolated: bool,
        }),
      ),
      links: list(
        rec({
          id: str,
          kind: oneOf(['run', 'pump', 'valve']),
          from: str,
          to: str,
          flow: num,
          velocity: num,
          headLoss: num,
          reynolds: num,
          frictionFactor: num,
          state: oneOf(['open', 'closed', 'shut', 'active', 'pinned']),
        }),
      ),
      iterations: num,
      headResidual: num,
      flowResidual: num,
      searchSolves: num,
    },
    optional,
  );

/** A network's layout as a report restates it. */
const NETWORK_LAYOUT = rec(
  {
    pumpLink: str,
    nodes: list(
      rec({
        id: str,
        kind: oneOf(['junction', 'surface', 'outlet']),
        elevation: num,
        x: num,
        y: num,
      }),
    ),
    links: list(rec({ id: str, kind: oneOf(['run', 'pump', 'valve']), from: str, to: str })),
    service: list(rec({ node: str, minPressure: num })),
  },
  true,
);

const DUTY = rec({
  case: str,
  fluid: rec(FLUID_FIELDS),
  aged: bool,
  suctionElevation: num,
  dischargeElevation: num,
  npshTerms: rec(
    {
      surfacePressureHead: num,
      vaporPressureHead: num,
      staticHeight: num,
      suctionLoss: num,
      velocityHead: num,
      total: num,
    },
    true,
  ),
  pumpDischargePressure: num,
  head: num,
  staticHead: num,
  lossHead: num,
  npshAvailable: num,
  suctionPressure: num,
  dischargePressure: num,
  runs: list(RUN_DETAILS),
  network: rec({ dutyFlow: num, tables: NETWORK_TABLES(false) }, true),
});

const CASE_RESULT = rec({
  case: str,
  failure: optStr,
  speed: num,
  flow: num,
  head: num,
  efficiency: num,
  shaftPower: num,
  percentOfBep: num,
  region: oneOf(['preferred', 'allowable', 'outside'], true),
  npshAvailable: num,
  npshRequired: num,
  npshRatio: num,
  velocities: list(rec({ run: str, velocity: num })),
  inputPower: num,
  specificEnergy: num,
  iterations: num,
  network: NETWORK_TABLES(true),
});

const MOTOR = (optional: boolean): Shape =>
  rec(
    {
      series: oneOf(['nema', 'iec']),
      rating: num,
      nameplate: num,
      unit: oneOf(['hp', 'kW']),
      loadFraction: num,
      serviceFactor: num,
    },
    optional,
  );

const FIT = (optional: boolean): Shape =>
  rec(
    {
      method: oneOf(['polynomial', 'monotone']),
      degree: num,
      selection: oneOf(['default', 'given'], true),
      points: num,
      rms: num,
      maxResidual: num,
      maxRelativeResidual: num,
      withinTolerance: bool,
      rSquared: num,
    },
    optional,
  );

const CANDIDATE = rec({
  name: str,
  count,
  arrangement: oneOf(['single', 'parallel', 'series']),
  control: oneOf(['fixed', 'speed']),
  cases: list(CASE_RESULT),
  maxShaftPower: num,
  motor: MOTOR(true),
  dutyOnlyMotor: MOTOR(true),
  energy: rec(
    {
      kWh: num,
      cost: rec({ amount: num, currency: str }, true),
      control: oneOf(['throttle', 'speed'], true),
      hours: num,
    },
    true,
  ),
  pump: rec({
    points: list(
      rec({ flow: num, head: num, efficiency: num, npshRequired: num, shaftPower: num }),
    ),
    ratedSpeed: num,
    speed: num,
    maxSpeed: num,
    motorEfficiency: num,
    driveEfficiency: num,
    motorSeries: oneOf(['nema', 'iec'], true),
    bep: rec({ flow: num, head: num, efficiency: num }, true),
  }),
  curveFit: rec({ head: FIT(false), efficiency: FIT(true) }),
  checks: list(CHECK),
  passed: bool,
  rank: num,
});

const RUN_INPUT = rec({
  name: str,
  group: optStr,
  size: optStr,
  insideDiameter: num,
  length: num,
  material: optStr,
  roughness: num,
  agedRoughness: num,
  fittings: list(rec({ id: str, description: str, count: num, k: num, source: str })),
  valves: list(rec({ name: str, given: oneOf(['cv', 'kv', 'k']), coefficient: num, k: num })),
  equipment: list(rec({ name: str, loss: num })),
  elevationChange: num,
});

const SAMPLED = list(
  rec({
    name: str,
    group: optStr,
    speed: num,
    maxSpeed: bool,
    flows: list(num),
    values: list(num),
  }),
);

const CURVES = rec(
  {
    systems: SAMPLED,
    pumps: SAMPLED,
    efficiency: SAMPLED,
    npshRequired: SAMPLED,
    npshAvailable: SAMPLED,
    preferredRegions: list(rec({ name: str, group: optStr, minFlow: num, maxFlow: num })),
    points: list(rec({ name: str, candidate: optStr, case: optStr, flow: num, head: num })),
    dutyPoints: list(rec({ case: str, flow: num, head: num }), true),
  },
  true,
);

const REPORT: Fields = {
  name: str,
  units: oneOf(['si', 'us'], true),
  dutyFlow: num,
  fluid: rec(FLUID_FIELDS),
  verdict: rec({ candidates: num, passing: num, recommended: optStr, passed: bool }),
  inputs: rec({
    runs: list(RUN_INPUT),
    pumpLocation: rec({ elevation: num, suctionRuns: num }, true),
    profile: list(rec({ flow: num, hours: num })),
    energyPrice: rec({ perKWh: num, currency: str }, true),
  }),
  atmosphere: num,
  duty: list(DUTY),
  candidates: list(CANDIDATE),
  checks: list(CHECK),
  cautions: list({ t: 'string' }),
  passed: bool,
  curves: CURVES,
  network: NETWORK_LAYOUT,
};

/** Checks `value` at `path` against `shape`, throwing `INVALID_ARGUMENT` naming the field. */
function checkShape(path: string, value: unknown, shape: Shape): void {
  // Absent is `undefined` (a report's own form); `null` is refused where the renderer reads on.
  if (value === undefined && shape.optional) return;
  switch (shape.t) {
    case 'string':
      guardString(path, value, 100_000);
      return;
    case 'number':
      if (shape.finite) guardNumber(path, value);
      else if (typeof value !== 'number') {
        throw new HeadflowError('INVALID_ARGUMENT', `${path} is ${kindOf(value)}, not a number.`, {
          parameter: path,
          allowed: 'a number',
        });
      }
      return;
    case 'boolean':
      guardBoolean(path, value);
      return;
    case 'oneOf':
      guardOneOf(path, value, shape.values);
      return;
    case 'record': {
      const r = guardRecord(path, value);
      for (const [k, s] of Object.entries(shape.fields)) {
        checkShape(`${path}.${k}`, Object.hasOwn(r, k) ? r[k] : undefined, s);
      }
      return;
    }
    case 'map': {
      const r = guardRecord(path, value);
      for (const [k, v] of Object.entries(r)) checkShape(`${path}.${k}`, v, shape.of);
      return;
    }
    case 'list': {
      const a = guardArray(path, value, { max: MAX_ITEMS });
      for (let i = 0; i < a.length; i++) checkShape(`${path}[${i}]`, a[i], shape.of);
      return;
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

/** Throws `INVALID_ARGUMENT` naming the first part of `report` that has the wrong shape. */
export function checkReportShape(report: DesignReport): void {
  const r = guardRecord('report', report);
  checkPlainData(r);
  checkShape('report', r, rec(REPORT));
}

// ---------------------------------------------------------------- a pump selection

const COST = rec({ amount: num, currency: str }, true);

const SELECTION_CASE = rec({
  case: str,
  failure: optStr,
  speed: num,
  flow: num,
  head: num,
  efficiency: num,
  percentOfBep: num,
  npshMargin: num,
  npshRatio: num,
  throttleHead: num,
  throttlePower: num,
  inputPower: num,
  energy: rec({ kWh: reqNum, cost: COST }, true),
});

const SELECTION_ENTRY = rec({
  rank: reqNum,
  name: str,
  method: oneOf(['throttle', 'trim', 'speed']),
  label: str,
  trimDiameter: num,
  trimRatio: num,
  trimIterations: num,
  trimBasis: oneOf(['trim law', 'interpolated', 'catalogue curve'], true),
  speed: num,
  passed: bool,
  checks: list(CHECK),
  cases: list(SELECTION_CASE),
  motor: MOTOR(true),
  energy: rec({ kWh: reqNum, cost: COST }, true),
  lifeCycleCost: rec(
    {
      total: reqNum,
      initial: num,
      installation: num,
      energy: num,
      operation: num,
      maintenance: num,
      downtime: num,
      environmental: num,
      decommissioning: num,
    },
    true,
  ),
});

const SELECTION: Fields = {
  name: str,
  catalogue: optStr,
  dutyFlow: num,
  duty: list(DUTY),
  cautions: list(str),
  costs: { t: 'map', of: num, optional: true },
  ranked: list(SELECTION_ENTRY),
  rankedBy: oneOf(['life-cycle cost', 'energy']),
  currency: optStr,
  systemChecks: list(CHECK, true),
  notes: list(str, true),
};

/**
 * Throws `INVALID_ARGUMENT` naming the first part of a pump selection (from `selectPumps`)
 * that has the wrong shape for its renderer. Its ways' curves, candidates and reports are not
 * printed and not checked.
 */
export function checkSelectionShape(selection: unknown): void {
  checkShape('selection', selection, rec(SELECTION));
}

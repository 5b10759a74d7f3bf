/**
 * The whole job on a network: the duty in each case (a flow through the pump link, or the
 * least pump head that meets every service pressure), each candidate solved in the whole
 * network, NPSH available from the solved suction pressure, the node pressure checks, the
 * motor, the energy and the system curve seen by the pump link.
 *
 * The duty search puts a source of nearly fixed head in the pump link, `H (1 - Q/Qcap)` with
 * `Qcap` a hundred times the largest flow of interest, and brackets the head `H`: the flow
 * through the link and every node pressure rise with it (never fall), so the least head that
 * meets a flow or a set of minimum pressures is a root of a monotone function of one variable,
 * found by the Illinois variant of regula falsi (Dowell and Jarratt 1971) inside a bracket
 * that is widened by doubling. Each solve returns an exact point of the system curve: the
 * flow through the link and the head the source adds at that flow.
 *
 * @module
 */
import { argumentError, checkPositive, type HeadflowError } from '../errors';
import type { FluidState } from '../fluids/index';
import {
  guardArray,
  guardBoolean,
  guardNumber,
  guardOptions,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import {
  type HeadRiseCurve,
  type NetworkCase,
  type NetworkDefinition,
  type NetworkLink,
  type NetworkNode,
  type NetworkSolution,
  type PreparedNetwork,
  prepareNetwork,
} from '../network/index';
import { type PumpCurve, type SystemCurveLike, speedForFlow } from '../pumps/index';
import {
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
  type Candidate,
  COMMON,
  check,
  curveFitChecks,
  dutyFlowCheck,
  type Limits,
  SHUTOFF_SOURCE,
} from './checks/index';
import { serviceChecks } from './checks/service-pressure';
import {
  emptyCase,
  finishCandidate,
  message,
  pointAt,
  resolveCandidates,
  resolveLimits,
  resolveProfile,
  sampleCandidate,
} from './evaluate';
import { checkSharedShape } from './input-shape';
import type {
  CandidateReport,
  CaseDuty,
  CaseResult,
  Check,
  DesignReport,
  EvaluateOptions,
  LinkRow,
  NetworkDesignInput,
  NetworkLayout,
  NetworkTables,
  NodeRow,
  ReportCurves,
  ReportFluid,
  SampledCurve,
  ServicePressure,
} from './types';

/** Largest number of solves of one duty search (bracket and refinement). */
export const MAX_SEARCH_SOLVES = 200;

/** Head tolerance of the duty search (m): the bracket closes to this width. */
const HEAD_TOLERANCE = 1e-10;

const SAMPLES = 61;

/** True when a design's system is a network. */
export function isNetworkDesign(input: unknown): input is NetworkDesignInput {
  return (
    typeof input === 'object' &&
    input !== null &&
    (input as { network?: unknown }).network !== undefined
  );
}

/** One operating case of the network, with what every search in it needs. */
interface CaseContext {
  readonly name: string;
  readonly operatingCase: NetworkCase;
  readonly fluid: FluidState;
  readonly g: number;
  readonly rhoG: number;
  /** The network's atmosphere (absolute). */
  readonly atmosphere: number;
  /** Head the pump link must add before any flow passes through it. */
  readonly staticHead: number;
  /** The network with the pump link shut (no head). */
  readonly closed: NetworkSolution;
}

/** The duty search of one case: the duty point and the network solved there. */
interface DutyPoint {
  readonly flow: number;
  readonly head: number;
  readonly solution: NetworkSolution;
  readonly solves: number;
}

/** A source of nearly fixed head `h` in the pump link. */
function source(h: number, cap: number): HeadRiseCurve {
  return {
    head: (q: Flow) => (h * (1 - q / cap)) as Length,
    headSlope: () => -h / cap,
    flowRange: { min: 0 as Flow, max: cap as Flow },
  };
}

/** A candidate set as one head-rise curve: n in parallel share the flow, m in series the head. */
function setCurve(c: Candidate, pump: PumpCurve): HeadRiseCurve {
  const n = c.setFlow(1);
  const m = c.setHead(1);
  return {
    head: (q: Flow) => (m * pump.head((q / n) as Flow)) as Length,
    flowRange: { min: (n * pump.flowRange.min) as Flow, max: (n * pump.flowRange.max) as Flow },
    speed: pump.speed,
  };
}

/**
 * The least `x` in `[lo, ...)` at which `f(x) >= 0`, for `f` nondecreasing: the bracket is
 * widened by doubling, then closed by the Illinois method. Returns the end that meets it.
 */
function leastMeeting<T>(
  f: (x: number) => { readonly value: number; readonly at: T },
  lo: number,
  span: number,
  valueTolerance: number,
  what: () => HeadflowError,
): { x: number; at: T; lo: { x: number; value: number; at: T }; solves: number } {
  let solves = 1;
  let a = lo;
  let fa = f(a);
  if (fa.value >= 0) return { x: a, at: fa.at, lo: { x: a, value: fa.value, at: fa.at }, solves };
  let step = span;
  let b = a + step;
  let fb = f(b);
  solves++;
  while (fb.value < 0) {
    if (solves >= 60) throw what();
    a = b;
    fa = fb;
    step *= 2;
    b = a + step;
    fb = f(b);
    solves++;
  }
  let va = fa.value;
  let vb = fb.value;
  let side = 0;
  while (b - a > HEAD_TOLERANCE * (1 + Math.abs(b)) && vb > valueTolerance) {
    if (solves >= MAX_SEARCH_SOLVES) break;
    let x = b - (vb * (b - a)) / (vb - va);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const fx = f(x);
    solves++;
    if (fx.value >= 0) {
      b = x;
      fb = fx;
      vb = fx.value;
      if (side === 1) va /= 2;
      side = 1;
    } else {
      a = x;
      fa = fx;
      va = fx.value;
      if (side === -1) vb /= 2;
      side = -1;
    }
  }
  return { x: b, at: fb.at, lo: { x: a, value: fa.value, at: fa.at }, solves };
}

/** The checked parts of a network design. */
interface Parts {
  readonly pumpLink: string;
  readonly from: string;
  readonly to: string;
  readonly nodes: ReadonlyMap<string, NetworkNode>;
  readonly prepared: PreparedNetwork;
  readonly service: readonly ServicePressure[];
  readonly dutyFlow: number | undefined;
  readonly atmosphere: number;
  readonly pumpElevation: number;
  /** Flow scale of the fixed-head source. */
  readonly cap: number;
}

function nodeKind(n: NetworkNode): NodeRow['kind'] {
  if ('surface' in n) return 'surface';
  if ('outlet' in n) return 'outlet';
  return 'junction';
}

function linkKind(l: NetworkLink): LinkRow['kind'] {
  if ('pump' in l) return 'pump';
  if ('valve' in l) return 'valve';
  return 'run';
}

function checkParts(input: NetworkDesignInput, candidates: readonly Candidate[]): Parts {
  const def = guardRecord('network', input.network) as unknown as NetworkDefinition;
  const pumpLink = guardString('pumpLink', input.pumpLink);
  // Every node and link is an object: the solver's own checks come later, after this code
  // has read them (a Symbol or a number in the list must not reach an `in` test).
  const links = guardArray('network.links', def.links).map((l, i) =>
    guardRecord(`network.links[${i}]`, l),
  ) as unknown as readonly NetworkLink[];
  const nodeList = guardArray('network.nodes', def.nodes).map((n, i) =>
    guardRecord(`network.nodes[${i}]`, n),
  ) as unknown as readonly NetworkNode[];
  const nodes = new Map<string, NetworkNode>();
  for (const n of nodeList) {
    if (typeof n === 'object' && n !== null && typeof n.id === 'string') nodes.set(n.id, n);
  }
  const link = links.find((l) => typeof l === 'object' && l !== null && l.id === pumpLink);
  if (link === undefined) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'pumpLink',
      pumpLink,
      undefined,
      'the id of a link of the network',
    );
  }
  if (input.dutyFlow === undefined && input.service === undefined) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'dutyFlow',
      undefined,
      undefined,
      'a duty flow through the pump link, or service pressures (service)',
    );
  }
  if (input.dutyFlow !== undefined && input.service !== undefined) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'service',
      'both dutyFlow and service',
      undefined,
      'one duty: a flow through the pump link or service pressures, not both',
    );
  }
  if (input.dutyFlow !== undefined) checkPositive('dutyFlow', input.dutyFlow, 'm3/s');
  const service = (
    input.service === undefined ? [] : guardArray('service', input.service, { min: 1 })
  ).map((r, i) => {
    const row = guardRecord(`service[${i}]`, r);
    const node = guardString(`service[${i}].node`, row['node']);
    const n = nodes.get(node);
    if (n === undefined || 'surface' in n) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `service[${i}].node`,
        node,
        undefined,
        'the id of a junction or outlet of the network',
      );
    }
    const minPressure = guardRange(`service[${i}].minPressure`, row['minPressure'], {
      min: 0,
      minOpen: true,
      unit: 'Pa',
    });
    return { node, minPressure: minPressure as Pressure };
  });
  const atmosphere =
    input.atmosphere === undefined
      ? (def.atmosphere ?? STANDARD_ATMOSPHERE)
      : guardRange('atmosphere', input.atmosphere, { min: 0, minOpen: true, unit: 'Pa' });
  const suction = nodes.get(link.from);
  const pumpElevation =
    input.pumpElevation === undefined
      ? (suction?.elevation ?? 0)
      : guardNumber('pumpElevation', input.pumpElevation);
  let cap = input.dutyFlow ?? 0;
  for (const c of candidates) cap = Math.max(cap, c.setFlow(c.fullSpeed.flowRange.max));
  for (const n of nodeList) {
    if ('demand' in n && n.demand !== undefined) cap += Math.abs(n.demand);
  }
  cap = 100 * (cap > 0 ? cap : 1);
  const placeholder = source(1, cap);
  const defined: NetworkDefinition = {
    ...def,
    links: links.map((l) =>
      l.id === pumpLink
        ? {
            id: l.id,
            from: l.from,
            to: l.to,
            pump: placeholder,
            ...(l.status === undefined ? {} : { status: l.status }),
          }
        : l,
    ),
  };
  return {
    pumpLink,
    from: link.from,
    to: link.to,
    nodes,
    prepared: prepareNetwork(defined),
    service,
    dutyFlow: input.dutyFlow,
    atmosphere,
    pumpElevation,
    cap,
  };
}

/** Solves a case with a head-rise curve in the pump link. */
function solveWith(
  parts: Parts,
  ctx: Pick<CaseContext, 'operatingCase'>,
  curve: HeadRiseCurve,
): NetworkSolution {
  const k = ctx.operatingCase;
  return parts.prepared.solve({ ...k, pumps: { ...k.pumps, [parts.pumpLink]: curve } });
}

function caseContext(parts: Parts, k: NetworkCase, name: string): CaseContext {
  const def = parts.prepared.definition;
  const fluid = k.fluid ?? def.fluid;
  const g = def.g ?? STANDARD_GRAVITY;
  // The pump link with a source of almost no head: shut (no flow through it) unless the
  // network drives flow through it by itself.
  const closed = parts.prepared.solve({
    ...k,
    pumps: { ...k.pumps, [parts.pumpLink]: source(1e-9, parts.cap) },
  });
  const from = closed.nodes[parts.from];
  const to = closed.nodes[parts.to];
  let staticHead = (to?.head ?? 0) - (from?.head ?? 0);
  if (from?.isolated === true || to?.isolated === true) {
    // A check valve or dead end beyond the pump leaves its outlet without a head: the head
    // before any flow passes is where the flow through the link starts (to 1e-12 of its scale).
    const start = 1e-14 * parts.cap;
    staticHead = leastMeeting(
      (h) => {
        const sol = solveWith(parts, { operatingCase: k }, source(h, parts.cap));
        return { value: (sol.links[parts.pumpLink]?.flow ?? 0) - start, at: sol };
      },
      1e-6,
      Math.max(1, Math.abs(staticHead)),
      0,
      () =>
        argumentError(
          'INVALID_ARGUMENT',
          'pumpLink',
          parts.pumpLink,
          undefined,
          'a link flow can pass',
        ),
    ).x;
  }
  return {
    name,
    operatingCase: k,
    fluid,
    g,
    rhoG: fluid.density * g,
    atmosphere: def.atmosphere ?? STANDARD_ATMOSPHERE,
    staticHead,
    closed,
  };
}

/** The smallest margin of the service pressures in a solution (Pa; >= 0 when all are met). */
function serviceMargin(parts: Parts, sol: NetworkSolution): number {
  let m = Number.POSITIVE_INFINITY;
  for (const r of parts.service) {
    const p = sol.nodes[r.node]?.pressure ?? 0;
    m = Math.min(m, p - r.minPressure);
  }
  return m;
}

/** The duty point of a case: the least head that meets the flow or the service pressures. */
function dutyPoint(parts: Parts, ctx: CaseContext): DutyPoint {
  const lo = Math.max(ctx.staticHead, 1e-6);
  const span = Math.max(1, Math.abs(ctx.staticHead));
  const solveAt = (h: number) => {
    const sol = solveWith(parts, ctx, source(h, parts.cap));
    return sol;
  };
  const linkOf = (sol: NetworkSolution) => sol.links[parts.pumpLink];
  if (parts.dutyFlow !== undefined) {
    const q = parts.dutyFlow;
    const r = leastMeeting(
      (h) => {
        const sol = solveAt(h);
        return { value: (linkOf(sol)?.flow ?? 0) - q, at: sol };
      },
      lo,
      span,
      1e-13 * q,
      () =>
        argumentError(
          'INVALID_ARGUMENT',
          'dutyFlow',
          q,
          'm3/s',
          `a flow the pump link can carry in case '${ctx.name}'`,
        ),
    );
    const hi = linkOf(r.at);
    const low = linkOf(r.lo.at);
    const qh = hi?.flow ?? 0;
    const hh = hi?.pumpHead ?? r.x;
    if (r.solves === 1) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'dutyFlow',
        q,
        'm3/s',
        `a flow that needs the pump: in case '${ctx.name}' the network passes ${qh} m3/s through the pump link without it`,
      );
    }
    const ql = low?.flow ?? 0;
    const hl = low?.pumpHead ?? r.lo.x;
    // The duty head at exactly q, between the bracket's two exact points.
    const head = qh > ql ? hl + ((hh - hl) * (q - ql)) / (qh - ql) : hh;
    return { flow: q, head, solution: r.at, solves: r.solves };
  }
  const r = leastMeeting(
    (h) => {
      const sol = solveAt(h);
      return { value: serviceMargin(parts, sol), at: sol };
    },
    lo,
    span,
    1e-6,
    () =>
      argumentError(
        'INVALID_ARGUMENT',
        'service',
        parts.service.map((s) => s.node).join(', '),
        undefined,
        `service pressures a pump can meet in case '${ctx.name}' (no head up to 1e18 m meets them)`,
      ),
  );
  if (r.solves === 1) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'service',
      parts.service.map((s) => s.node).join(', '),
      undefined,
      `service pressures that need the pump: in case '${ctx.name}' they are met with the pump link shut`,
    );
  }
  const link = linkOf(r.at);
  return { flow: link?.flow ?? 0, head: link?.pumpHead ?? r.x, solution: r.at, solves: r.solves };
}

/** The head the pump link must add at a flow through it in a case (for energy and speed control). */
function neededHead(parts: Parts, ctx: CaseContext, q: number): number {
  if (q <= 0) return ctx.staticHead;
  const r = leastMeeting(
    (h) => {
      const sol = solveWith(parts, ctx, source(h, parts.cap));
      return { value: (sol.links[parts.pumpLink]?.flow ?? 0) - q, at: sol };
    },
    Math.max(ctx.staticHead, 1e-6),
    Math.max(1, Math.abs(ctx.staticHead)),
    1e-13 * q,
    () => argumentError('INVALID_ARGUMENT', 'flow', q, 'm3/s', 'a flow the pump link can carry'),
  );
  const hi = r.at.links[parts.pumpLink];
  const lo = r.lo.at.links[parts.pumpLink];
  const qh = hi?.flow ?? 0;
  const ql = lo?.flow ?? 0;
  const hh = hi?.pumpHead ?? r.x;
  const hl = lo?.pumpHead ?? r.lo.x;
  return qh > ql ? hl + ((hh - hl) * (q - ql)) / (qh - ql) : hh;
}

/** The system seen by the pump link in a case, as a curve the pumps module can use. */
function systemOf(parts: Parts, ctx: CaseContext): SystemCurveLike {
  const cache = new Map<number, number>();
  return {
    staticHead: ctx.staticHead as Length,
    head: (q: Flow) => {
      let h = cache.get(q);
      if (h === undefined) {
        h = neededHead(parts, ctx, q);
        cache.set(q, h);
      }
      return h as Length;
    },
  };
}

/** The node and link tables of a solution. */
function tables(
  parts: Parts,
  sol: NetworkSolution,
  duty: NetworkTables['duty'],
  solves: number,
): NetworkTables {
  const min = new Map(parts.service.map((s) => [s.node, s.minPressure]));
  const def = parts.prepared.definition;
  const nodes: NodeRow[] = def.nodes.map((n) => {
    const s = sol.nodes[n.id];
    const pressure = (s?.pressure ?? 0) as Pressure;
    const m = min.get(n.id);
    return {
      id: n.id,
      kind: nodeKind(n),
      elevation: n.elevation,
      head: (s?.head ?? n.elevation) as Length,
      pressure,
      outflow: (s?.outflow ?? 0) as Flow,
      minPressure: m,
      shortfall: m !== undefined && pressure < m ? ((m - pressure) as Pressure) : undefined,
      isolated: s?.isolated ?? false,
    };
  });
  const links: LinkRow[] = def.links.map((l) => {
    const s = sol.links[l.id];
    return {
      id: l.id,
      kind: linkKind(l),
      from: l.from,
      to: l.to,
      flow: (s?.flow ?? 0) as Flow,
      velocity: s?.velocity,
      headLoss: (s?.headLoss ?? 0) as Length,
      reynolds: s?.reynolds,
      frictionFactor: s?.frictionFactor,
      state: s?.state ?? 'closed',
    };
  });
  return {
    pumpLink: parts.pumpLink,
    duty,
    nodes,
    links,
    iterations: sol.iterations,
    headResidual: sol.headResidual,
    flowResidual: sol.flowResidual,
    searchSolves: solves,
  };
}

/** The node pressure checks of a solution: below the vapour pressure, below the atmosphere. */
function pressureChecks(
  nodes: ReadonlyMap<string, NetworkNode>,
  sol: NetworkSolution,
  ctx: CaseContext,
  candidate: string | undefined,
  checks: Check[],
): void {
  const pv = ctx.fluid.vaporPressure;
  for (const id of sol.belowVaporPressure) {
    checks.push(
      check(
        'node-vapour-pressure',
        'error',
        candidate,
        ctx.name,
        { pressure: sol.nodes[id]?.pressure ?? Number.NaN, vaporPressure: pv ?? Number.NaN },
        COMMON,
        { node: id },
      ),
    );
  }
  for (const id of sol.belowAtmosphere) {
    if (sol.belowVaporPressure.includes(id)) continue;
    // A surface holds its own pressure; below the atmosphere by round-off is not a finding.
    const node = nodes.get(id);
    const p = sol.nodes[id]?.pressure ?? Number.NaN;
    if ((node !== undefined && 'surface' in node) || p >= ctx.atmosphere * (1 - 1e-9)) continue;
    checks.push(
      check(
        'node-below-atmosphere',
        'warning',
        candidate,
        ctx.name,
        { pressure: sol.nodes[id]?.pressure ?? Number.NaN, atmosphere: ctx.atmosphere },
        COMMON,
        { node: id },
      ),
    );
  }
}

/** NPSH available at the pump from the solved suction-node pressure (velocity head not counted). */
function npshFrom(parts: Parts, ctx: CaseContext, sol: NetworkSolution): Length | undefined {
  const pv = ctx.fluid.vaporPressure;
  const s = sol.nodes[parts.from];
  const node = parts.nodes.get(parts.from);
  if (pv === undefined || s === undefined || node === undefined) return undefined;
  return ((s.pressure - pv) / ctx.rhoG + (node.elevation - parts.pumpElevation)) as Length;
}

function fluidOf(input: NetworkDesignInput, f: FluidState): ReportFluid {
  return {
    name: input.fluidName ?? 'liquid',
    temperature: f.temperature,
    density: f.density,
    kinematicViscosity: f.kinematicViscosity,
    vaporPressure: f.vaporPressure,
  };
}

function dutyInCase(
  input: NetworkDesignInput,
  parts: Parts,
  ctx: CaseContext,
  d: DutyPoint,
  checks: Check[],
): CaseDuty {
  const sol = d.solution;
  pressureChecks(parts.nodes, sol, ctx, undefined, checks);
  const from = sol.nodes[parts.from];
  const to = sol.nodes[parts.to];
  const fromNode = parts.nodes.get(parts.from);
  const toNode = parts.nodes.get(parts.to);
  const npsha = npshFrom(parts, ctx, sol);
  const pv = ctx.fluid.vaporPressure;
  const suctionPressure = (from?.pressure ?? 0) as Pressure;
  return {
    case: ctx.name,
    fluid: fluidOf(input, ctx.fluid),
    aged: ctx.operatingCase.aged ?? parts.prepared.definition.aged ?? false,
    suctionElevation: (fromNode?.elevation ?? 0) as Length,
    dischargeElevation: (toNode?.elevation ?? 0) as Length,
    npshTerms:
      npsha === undefined || pv === undefined
        ? undefined
        : {
            surfacePressureHead: (suctionPressure / ctx.rhoG) as Length,
            vaporPressureHead: (pv / ctx.rhoG) as Length,
            staticHeight: ((fromNode?.elevation ?? 0) - parts.pumpElevation) as Length,
            suctionLoss: 0 as Length,
            velocityHead: 0 as Length,
            total: npsha,
          },
    pumpDischargePressure: (((to?.pressure ?? 0) as number) +
      ctx.rhoG * ((toNode?.elevation ?? 0) - parts.pumpElevation)) as Pressure,
    head: d.head as Length,
    staticHead: ctx.staticHead as Length,
    lossHead: (d.head - ctx.staticHead) as Length,
    npshAvailable: npsha,
    suctionPressure,
    dischargePressure: (to?.pressure ?? 0) as Pressure,
    runs: [],
    network: {
      dutyFlow: d.flow as Flow,
      tables: tables(parts, sol, parts.dutyFlow === undefined ? 'service' : 'flow', d.solves),
    },
  };
}

/** One candidate in one case, solved in the whole network. */
function runCase(
  parts: Parts,
  c: Candidate,
  ctx: CaseContext,
  duty: DutyPoint,
  limits: Limits,
  checks: Check[],
): CaseResult {
  const empty = emptyCase(ctx.name);
  const noPoint = (values: Record<string, number>, words: Record<string, string>): CaseResult => {
    const k = check('no-operating-point', 'error', c.name, ctx.name, values, COMMON, words);
    checks.push(k);
    return { ...empty, failure: checkMessage(k, limits.units) };
  };
  let pump: PumpCurve = c.fullSpeed;
  let sol: NetworkSolution;
  let iterations = 0;
  try {
    if (c.control === 'speed') {
      const system = systemOf(parts, ctx);
      const m = c.setHead(1);
      const perPump: SystemCurveLike = {
        staticHead: (ctx.staticHead / m) as Length,
        head: (q: Flow) => (system.head(c.setFlow(q) as Flow) / m) as Length,
      };
      const sp = speedForFlow(c.pump, perPump, c.pumpFlow(duty.flow) as Flow, {
        maxSpeed: c.maxSpeed,
      });
      pump = sp.pump;
      iterations = sp.iterations;
    }
    sol = solveWith(parts, ctx, setCurve(c, pump));
  } catch (e) {
    const detail = message(e);
    const shutoff = c.setHead(
      c.fullSpeed.shutoffHead ?? c.fullSpeed.head(c.fullSpeed.flowRange.min),
    );
    return noPoint(
      { dutyFlow: duty.flow, pumpHead: shutoff, systemHead: duty.head },
      {
        detail: `the network has no steady state with this set in link '${parts.pumpLink}' (${detail})`,
      },
    );
  }
  iterations += sol.iterations;
  const link = sol.links[parts.pumpLink];
  if (link === undefined || link.state === 'shut' || link.flow <= 0) {
    const shutoff = c.setHead(pump.shutoffHead ?? pump.head(pump.flowRange.min));
    return noPoint(
      { dutyFlow: duty.flow, pumpHead: shutoff, systemHead: ctx.staticHead },
      { reason: 'cannot-reach' },
    );
  }
  const flow = link.flow;
  const q = c.pumpFlow(flow);
  if (c.control === 'fixed') dutyFlowCheck(duty.flow, flow, c.name, ctx.name, limits, checks);
  const npsha = npshFrom(parts, ctx, sol);
  const at = pointAt(c, pump, q, npsha, {
    caseName: ctx.name,
    density: ctx.fluid.density,
    g: parts.prepared.definition.g,
    limits,
    checks,
    npshExpected: true,
  });
  serviceChecks(parts.service, sol, parts.atmosphere, c.name, ctx.name, checks);
  pressureChecks(parts.nodes, sol, ctx, c.name, checks);
  const drive = c.input.driveEfficiency ?? 1;
  const inputPower = at.shaftPower / (c.input.motorEfficiency * drive);
  const velocities: { run: string; velocity: Velocity }[] = [];
  for (const l of parts.prepared.definition.links) {
    const v = sol.links[l.id]?.velocity;
    if ('run' in l && v !== undefined) velocities.push({ run: l.id, velocity: v });
  }
  return {
    case: ctx.name,
    failure: undefined,
    inputPower: inputPower as Power,
    specificEnergy: flow > 0 ? inputPower / flow : undefined,
    speed: pump.speed,
    flow: flow as Flow,
    head: (link.pumpHead ?? at.head) as Length,
    efficiency: at.efficiency,
    shaftPower: at.shaftPower as Power,
    percentOfBep: at.percentOfBep,
    region: at.region,
    npshAvailable: npsha,
    npshRequired: at.npshr,
    npshRatio: at.npshRatio,
    velocities,
    iterations,
    network: tables(parts, sol, parts.dutyFlow === undefined ? 'service' : 'flow', 0),
  };
}

/**
 * The nodes on the discharge side of the pump: reached from its outlet without passing the
 * pump link or through a fixed-level surface.
 */
function dischargeSide(parts: Parts): string[] {
  const def = parts.prepared.definition;
  const next = new Map<string, string[]>();
  for (const l of def.links) {
    if (l.id === parts.pumpLink) continue;
    next.set(l.from, [...(next.get(l.from) ?? []), l.to]);
    next.set(l.to, [...(next.get(l.to) ?? []), l.from]);
  }
  const seen = new Set<string>([parts.to]);
  const stack = [parts.to];
  while (stack.length > 0) {
    const id = stack.pop() as string;
    const n = parts.nodes.get(id);
    if (n !== undefined && 'surface' in n) continue;
    for (const m of next.get(id) ?? []) {
      if (!seen.has(m)) {
        seen.add(m);
        stack.push(m);
      }
    }
  }
  return [...seen].filter((id) => {
    const n = parts.nodes.get(id);
    return n !== undefined && !('surface' in n);
  });
}

function evaluateCandidate(
  input: NetworkDesignInput,
  parts: Parts,
  c: Candidate,
  contexts: readonly CaseContext[],
  duties: readonly DutyPoint[],
  limits: Limits,
  profile: ReturnType<typeof resolveProfile>,
): Omit<CandidateReport, 'rank'> {
  const checks: Check[] = [];
  curveFitChecks(c, checks);
  const cases = contexts.map((ctx, i) =>
    runCase(parts, c, ctx, duties[i] as DutyPoint, limits, checks),
  );
  const design = contexts[0] as CaseContext;
  const discharge = limits.designPressure === undefined ? [] : dischargeSide(parts);
  return finishCandidate(c, cases, checks, {
    system: systemOf(parts, design),
    caseName: design.name,
    density: design.fluid.density,
    g: parts.prepared.definition.g,
    profile,
    energyPrice: input.energyPrice,
    limits,
    shutoffChecks: (setShutoff) => {
      const designPressure = limits.designPressure;
      if (designPressure === undefined) return;
      // With the pump at shut-off and everything downstream closed, the discharge side stands
      // at the pump's outlet head: the suction head with the pump link closed plus the
      // shut-off head, less each node's elevation.
      for (const ctx of contexts) {
        const suctionHead = ctx.closed.nodes[parts.from]?.head ?? 0;
        for (const id of discharge) {
          const z = parts.nodes.get(id)?.elevation ?? 0;
          const maxPressure = ctx.rhoG * (suctionHead + setShutoff - z);
          if (maxPressure > designPressure) {
            checks.push(
              check(
                'shutoff-pressure',
                'error',
                c.name,
                ctx.name,
                { maxPressure, designPressure },
                SHUTOFF_SOURCE,
                { node: id },
              ),
            );
          }
        }
      }
    },
  });
}

/** The system curve seen by the pump link in a case, sampled by the source's head. */
function systemSample(parts: Parts, ctx: CaseContext, qMax: number): SampledCurve {
  const flows: number[] = [0];
  const values: number[] = [ctx.staticHead];
  const lo = Math.max(ctx.staticHead, 1e-6);
  const top = neededHead(parts, ctx, qMax);
  for (let i = 1; i < SAMPLES; i++) {
    const h = lo + ((top - lo) * i) / (SAMPLES - 1);
    try {
      const sol = solveWith(parts, ctx, source(h, parts.cap));
      const l = sol.links[parts.pumpLink];
      if (l !== undefined && l.flow > 0 && l.pumpHead !== undefined) {
        flows.push(l.flow);
        values.push(l.pumpHead);
      }
    } catch {
      // a head with no steady state is left out of the chart
    }
  }
  return { name: ctx.name, flows, values };
}

function curvesOf(
  parts: Parts,
  candidates: readonly Candidate[],
  reports: readonly Omit<CandidateReport, 'rank'>[],
  contexts: readonly CaseContext[],
  duties: readonly DutyPoint[],
): ReportCurves {
  let qMax = 1.5 * Math.max(...duties.map((d) => d.flow));
  for (const c of candidates) qMax = Math.max(qMax, c.setFlow(c.fullSpeed.flowRange.max));
  const pumps: SampledCurve[] = [];
  const efficiency: SampledCurve[] = [];
  const npshRequired: SampledCurve[] = [];
  const preferredRegions: { name: string; group: string; minFlow: number; maxFlow: number }[] = [];
  for (const c of candidates) {
    sampleCandidate(c, { pumps, efficiency, npshRequired, preferredRegions });
  }
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
  return {
    systems: contexts.map((ctx) => systemSample(parts, ctx, qMax)),
    pumps,
    efficiency,
    npshRequired,
    npshAvailable: [],
    preferredRegions,
    points,
    dutyPoints: contexts.map((ctx, i) => ({
      case: ctx.name,
      flow: duties[i]?.flow ?? 0,
      head: duties[i]?.head ?? 0,
    })),
  };
}

function layoutOf(input: NetworkDesignInput, parts: Parts): NetworkLayout {
  const def = parts.prepared.definition;
  const at = input.coordinates ?? {};
  return {
    pumpLink: parts.pumpLink,
    nodes: def.nodes.map((n) => {
      const xy = at[n.id];
      return {
        id: n.id,
        kind: nodeKind(n),
        elevation: n.elevation,
        ...(xy === undefined ? {} : { x: xy.x, y: xy.y }),
      };
    }),
    links: def.links.map((l) => ({ id: l.id, kind: linkKind(l), from: l.from, to: l.to })),
    service: parts.service,
  };
}

/**
 * Evaluates a design on a network (see {@link NetworkDesignInput}); called by `evaluateDesign`
 * for an input with a `network`.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a pump link the network does not hold, neither
 *   or both of `dutyFlow` and `service`, a service node that is not a junction or outlet, a
 *   duty the network meets without the pump or that no head meets; and whatever
 *   `prepareNetwork` and the solve throw for the network itself.
 */
export function evaluateNetworkDesign(
  input: NetworkDesignInput,
  options: EvaluateOptions | null = {},
): DesignReport {
  const o = guardOptions<EvaluateOptions>('options', options);
  const wantCurves = o.curves === undefined ? false : guardBoolean('options.curves', o.curves);
  checkSharedShape(input);
  const units = input.units ?? 'si';
  if (units !== 'si' && units !== 'us') {
    throw argumentError('INVALID_ARGUMENT', 'units', units, undefined, "'si' or 'us'");
  }
  const limits = resolveLimits(input);
  const candidates = resolveCandidates(input.candidates ?? []);
  const parts = checkParts(input, candidates);
  const given = input.cases === undefined ? [] : guardArray('cases', input.cases);
  const seen = new Set<string>();
  const contexts =
    given.length === 0
      ? [caseContext(parts, {}, parts.prepared.definition.name ?? 'design case')]
      : given.map((k, i) => {
          const name = guardString(`cases[${i}].name`, (k as NetworkCase).name);
          if (seen.has(name)) {
            throw argumentError(
              'INVALID_ARGUMENT',
              `cases[${i}].name`,
              name,
              undefined,
              'a unique name',
            );
          }
          seen.add(name);
          return caseContext(parts, k as NetworkCase, name);
        });
  const duties = contexts.map((ctx) => dutyPoint(parts, ctx));
  const designDuty = duties[0] as DutyPoint;
  const profile = resolveProfile(input.profile, designDuty.flow);
  const systemChecks: Check[] = [];
  const duty = contexts.map((ctx, i) =>
    dutyInCase(input, parts, ctx, duties[i] as DutyPoint, systemChecks),
  );
  if (contexts.some((ctx) => ctx.fluid.vaporPressure === undefined)) {
    systemChecks.push(check('npsh-data', 'warning', undefined, undefined, {}, COMMON));
  }
  const evaluated = candidates.map((c) =>
    evaluateCandidate(input, parts, c, contexts, duties, limits, profile),
  );
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
  const systemOk = !systemChecks.some((k) => k.severity === 'error');
  const first = ranked[0];
  const passed = systemOk && (first === undefined || first.passed);
  const design = contexts[0] as CaseContext;
  return {
    name: input.name,
    units,
    dutyFlow: designDuty.flow as Flow,
    fluid: fluidOf(input, design.fluid),
    verdict: {
      candidates: ranked.length,
      passing: ranked.filter((r) => r.passed).length,
      recommended: first?.name,
      passed,
    },
    inputs: {
      runs: [],
      pumpLocation: undefined,
      profile,
      energyPrice: input.energyPrice,
    },
    atmosphere: parts.atmosphere as Pressure,
    duty,
    candidates: ranked,
    checks: systemChecks.map((k) => ({ ...k, message: checkMessage(k, units) })),
    cautions: CAUTIONS,
    passed,
    curves: wantCurves ? curvesOf(parts, candidates, evaluated, contexts, duties) : undefined,
    network: layoutOf(input, parts),
  };
}

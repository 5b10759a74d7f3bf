/**
 * The network solver: the global gradient method on node heads and link flows.
 *
 * @module
 */
import { argumentError, HeadflowError } from '../errors';
import type { FluidState } from '../fluids/index';
import {
  guardArray,
  guardBoolean,
  guardInteger,
  guardOneOf,
  guardOptions,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import {
  type Flow,
  type Length,
  type Pressure,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';
import {
  checkRunRoughness,
  type LossSlope,
  pipeRun,
  type RunContext,
  type RunEvaluator,
  type RunLossBreakdown,
  runContext,
  runEvaluator,
  runLossSlope,
} from './run';
import { type SparseCholesky, sparseCholesky } from './sparse-cholesky';
import type {
  ControlValve,
  HeadRiseCurve,
  LinkSolution,
  LinkState,
  NetworkCase,
  NetworkDefinition,
  NetworkLink,
  NetworkSolution,
  NetworkSolveOptions,
  NodeSolution,
  PumpLink,
  RunLink,
  ValveLink,
} from './types';

const JUNCTION = 0;
const SURFACE = 1;
const OUTLET = 2;

const RUN = 0;
const PUMP = 1;
const PRV = 2;
const PSV = 3;
const FCV = 4;
const EMITTER = 5;

const OPEN = 0;
const CLOSED = 1;
const SHUT = 2;
const ACTIVE = 3;
const PINNED = 4;
const STATE_NAMES: readonly LinkState[] = ['open', 'closed', 'shut', 'active', 'pinned'];

/** Reynolds number of the friction jump of the `'conservative'` transition rule. */
const JUMP_RE = 2300;
/**
 * Half-width, relative to the flow, of the steep ramp that stands for the friction jump while
 * a run is pinned on it (its flow is then Re 2300's to this fraction).
 */
const RAMP = 1e-9;
/** Times a run may be pinned on the friction jump in one solve. */
const MAX_PINS = 8;

/** Most state changes one link may make in a solve; then its state is held. */
export const MAX_STATE_CHANGES = 8;

/** Largest flow change, relative to the largest flow, at which link states are revised. */
const SETTLED = 0.01;

/** Ulps of a head equation's terms that rounding alone can leave in a node's flow balance. */
const ROUNDING = 32 * Number.EPSILON;

/** Mean velocity at which open control valves leave their square law for the low-flow cubic. */
const VALVE_LOW_VELOCITY = 1e-3;
/** Head (m) of the flow at which outlets leave their power law for the low-flow cubic. */
const OUTLET_LOW_HEAD = 1e-3;

/** The topology of a network, validated, with its ordering and symbolic factorization. */
interface Topology {
  readonly nodeIds: readonly string[];
  readonly nodeIndex: ReadonlyMap<string, number>;
  readonly nodeKind: Int8Array;
  readonly linkIds: readonly string[];
  readonly linkIndex: ReadonlyMap<string, number>;
  /** User links then one emitter per outlet; `to` of an emitter is its virtual node. */
  readonly from: Int32Array;
  readonly to: Int32Array;
  readonly kind: Int8Array;
  /** Number of nodes including one virtual atmosphere node per outlet. */
  readonly nodeCount: number;
  /** Matrix row of each node (-1 for surfaces and virtual nodes). */
  readonly row: Int32Array;
  readonly chol: SparseCholesky;
  /** Position of each link's off-diagonal entry (-1 when an end has no row). */
  readonly offPos: Int32Array;
  readonly diagPos: Int32Array;
  /** Outlet node of each emitter link (by emitter number). */
  readonly outletNodes: Int32Array;
}

/** A network prepared for repeated solves: topology checked, ordering and symbolic work done. */
export interface PreparedNetwork {
  readonly definition: NetworkDefinition;
  /** Number of links (user links) and nodes. */
  readonly linkCount: number;
  readonly nodeCount: number;
  /** Nonzeros of the Cholesky factor (a measure of the linear solve's cost). */
  readonly factorEntries: number;
  /**
   * Solves the network in an operating case (the definition itself when omitted), reusing
   * the ordering and symbolic factorization.
   * @throws HeadflowError as {@link solveNetwork}.
   */
  solve(operatingCase?: NetworkCase, options?: NetworkSolveOptions): NetworkSolution;
}

function nodeKindOf(node: Readonly<Record<string, unknown>>, name: string): number {
  const hasSurface = node['surface'] !== undefined;
  const hasOutlet = node['outlet'] !== undefined;
  if (hasSurface && hasOutlet) {
    throw argumentError(
      'INVALID_ARGUMENT',
      name,
      'surface and outlet',
      undefined,
      'a junction, a surface or an outlet',
    );
  }
  return hasSurface ? SURFACE : hasOutlet ? OUTLET : JUNCTION;
}

function linkKindOf(link: Readonly<Record<string, unknown>>, name: string): number {
  const given = ['run', 'pump', 'valve'].filter((k) => link[k] !== undefined);
  if (given.length !== 1) {
    throw argumentError(
      'INVALID_ARGUMENT',
      name,
      given.length,
      'parts',
      'exactly one of run, pump or valve',
    );
  }
  if (given[0] === 'run') return RUN;
  if (given[0] === 'pump') return PUMP;
  const valve = guardRecord(`${name}.valve`, link['valve']);
  const kind = guardOneOf(`${name}.valve.kind`, valve['kind'], [
    'pressure-reducing',
    'pressure-sustaining',
    'flow-limiting',
  ]);
  return kind === 'pressure-reducing' ? PRV : kind === 'pressure-sustaining' ? PSV : FCV;
}

/** Checks the topology and prepares ordering and symbolic factorization. */
function buildTopology(def: NetworkDefinition): Topology {
  const nodes = guardArray('nodes', def.nodes, { min: 1 });
  const links = guardArray('links', def.links, { min: 1 });
  const nodeIds: string[] = [];
  const nodeIndex = new Map<string, number>();
  const kinds: number[] = [];
  for (let i = 0; i < nodes.length; i++) {
    const node = guardRecord(`nodes[${i}]`, nodes[i]);
    const id = guardString(`nodes[${i}].id`, node['id']);
    if (id === '')
      throw argumentError('INVALID_ARGUMENT', `nodes[${i}].id`, id, undefined, 'a non-empty id');
    if (nodeIndex.has(id)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `nodes[${i}].id`,
        id,
        undefined,
        'an id used by one node only',
        `Node id '${id}' is used twice.`,
      );
    }
    nodeIndex.set(id, i);
    nodeIds.push(id);
    kinds.push(nodeKindOf(node, `nodes[${i}]`));
  }
  const outletList: number[] = [];
  for (let i = 0; i < kinds.length; i++) if (kinds[i] === OUTLET) outletList.push(i);
  const n = nodes.length;
  const nodeCount = n + outletList.length;
  const m = links.length;
  const total = m + outletList.length;
  const from = new Int32Array(total);
  const to = new Int32Array(total);
  const kind = new Int8Array(total);
  const linkIds: string[] = [];
  const linkIndex = new Map<string, number>();
  for (let k = 0; k < m; k++) {
    const link = guardRecord(`links[${k}]`, links[k]);
    const id = guardString(`links[${k}].id`, link['id']);
    if (id === '')
      throw argumentError('INVALID_ARGUMENT', `links[${k}].id`, id, undefined, 'a non-empty id');
    if (linkIndex.has(id)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].id`,
        id,
        undefined,
        'an id used by one link only',
        `Link id '${id}' is used twice.`,
      );
    }
    linkIndex.set(id, k);
    linkIds.push(id);
    const ends: number[] = [];
    for (const end of ['from', 'to'] as const) {
      const nodeId = guardString(`links[${k}].${end}`, link[end]);
      const idx = nodeIndex.get(nodeId);
      if (idx === undefined) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `links[${k}].${end}`,
          nodeId,
          undefined,
          'the id of a node of the network',
          `Link '${id}' names an unknown node '${nodeId}'.`,
        );
      }
      ends.push(idx);
    }
    if (ends[0] === ends[1]) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].to`,
        link['to'],
        undefined,
        'a node other than from',
        `Link '${id}' starts and ends at the same node.`,
      );
    }
    from[k] = ends[0] as number;
    to[k] = ends[1] as number;
    kind[k] = linkKindOf(link, `links[${k}]`);
    if (kind[k] === PRV && kinds[to[k] as number] === SURFACE) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].to`,
        link['to'],
        undefined,
        'a junction or outlet',
        `Pressure-reducing valve '${id}' must not discharge straight into a fixed-level surface.`,
      );
    }
    if (kind[k] === PSV && kinds[from[k] as number] === SURFACE) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].from`,
        link['from'],
        undefined,
        'a junction or outlet',
        `Pressure-sustaining valve '${id}' must not draw straight from a fixed-level surface.`,
      );
    }
  }
  const outletNodes = new Int32Array(outletList);
  outletList.forEach((node, j) => {
    from[m + j] = node;
    to[m + j] = n + j;
    kind[m + j] = EMITTER;
  });
  const nodeKind = new Int8Array(nodeCount).fill(SURFACE);
  for (let i = 0; i < n; i++) nodeKind[i] = kinds[i] as number;

  // Every connected part needs a fixed-level surface.
  const adjacency = buildAdjacency(n, from, to, m);
  const seen = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  for (let s = 0; s < n; s++) {
    if (seen[s] !== -1) continue;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    seen[s] = s;
    let hasSurface = false;
    while (head < tail) {
      const v = queue[head++] as number;
      if (nodeKind[v] === SURFACE) hasSurface = true;
      for (let p = adjacency.ptr[v] as number; p < (adjacency.ptr[v + 1] as number); p++) {
        const w = adjacency.adj[p] as number;
        if (seen[w] === -1) {
          seen[w] = s;
          queue[tail++] = w;
        }
      }
    }
    if (!hasSurface) {
      const ids = Array.from(queue.slice(0, Math.min(tail, 10)), (v) => nodeIds[v] as string);
      throw new HeadflowError(
        'NO_SOLUTION',
        `a part of the network has no fixed-level surface, so its heads are not defined: nodes ${ids
          .map((x) => `'${x}'`)
          .join(
            ', ',
          )}${tail > 10 ? ` and ${tail - 10} more` : ''}. Connect it to a tank or reservoir.`,
        { parameter: 'nodes', allowed: 'a fixed-level surface in every connected part' },
      );
    }
  }

  // Matrix rows: junctions and outlets.
  const row = new Int32Array(nodeCount).fill(-1);
  let rows = 0;
  for (let i = 0; i < n; i++) if (nodeKind[i] !== SURFACE) row[i] = rows++;
  const rowFrom = new Int32Array(m);
  const rowTo = new Int32Array(m);
  let e = 0;
  for (let k = 0; k < m; k++) {
    const a = row[from[k] as number] as number;
    const b = row[to[k] as number] as number;
    if (a >= 0 && b >= 0) {
      rowFrom[e] = a;
      rowTo[e] = b;
      e++;
    }
  }
  const graph = buildAdjacency(rows, rowFrom, rowTo, e);
  const chol = sparseCholesky(graph);
  const offPos = new Int32Array(total).fill(-1);
  for (let k = 0; k < m; k++) {
    const a = row[from[k] as number] as number;
    const b = row[to[k] as number] as number;
    if (a >= 0 && b >= 0) offPos[k] = chol.entry(a, b);
  }
  const diagPos = new Int32Array(rows);
  for (let r = 0; r < rows; r++) diagPos[r] = chol.diagonal(r);
  return {
    nodeIds,
    nodeIndex,
    nodeKind,
    linkIds,
    linkIndex,
    from,
    to,
    kind,
    nodeCount,
    row,
    chol,
    offPos,
    diagPos,
    outletNodes,
  };
}

/** Adjacency (without repeated edges) of nodes 0..n-1 joined by edges (a[e], b[e]), e < count. */
function buildAdjacency(n: number, a: Int32Array, b: Int32Array, count: number) {
  const deg = new Int32Array(n + 1);
  for (let e = 0; e < count; e++) {
    deg[(a[e] as number) + 1] = (deg[(a[e] as number) + 1] as number) + 1;
    deg[(b[e] as number) + 1] = (deg[(b[e] as number) + 1] as number) + 1;
  }
  const start = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) start[i + 1] = (start[i] as number) + (deg[i + 1] as number);
  const raw = new Int32Array(start[n] as number);
  const fill = start.slice(0, n);
  for (let e = 0; e < count; e++) {
    const x = a[e] as number;
    const y = b[e] as number;
    raw[fill[x] as number] = y;
    fill[x] = (fill[x] as number) + 1;
    raw[fill[y] as number] = x;
    fill[y] = (fill[y] as number) + 1;
  }
  // Remove repeated neighbours (parallel links) with a marker.
  const mark = new Int32Array(n).fill(-1);
  const ptr = new Int32Array(n + 1);
  const adj = new Int32Array(raw.length);
  let w = 0;
  for (let i = 0; i < n; i++) {
    ptr[i] = w;
    for (let p = start[i] as number; p < (start[i + 1] as number); p++) {
      const j = raw[p] as number;
      if (mark[j] !== i) {
        mark[j] = i;
        adj[w++] = j;
      }
    }
  }
  ptr[n] = w;
  return { n, ptr, adj: adj.slice(0, w) };
}

/** A pump link's curve, resolved for a solve. */
interface PumpModel {
  readonly curve: HeadRiseCurve;
  /** Speed ratio n / n_curve. */
  readonly s: number;
  readonly parallel: number;
  readonly series: number;
  readonly min: number;
  readonly max: number;
  readonly slopeFloor: number;
}

/** The numbers of one solve: a definition (with its case applied) on a topology. */
interface Model {
  readonly name: string;
  readonly rho: number;
  readonly g: number;
  readonly atmosphere: number;
  readonly fluid: FluidState;
  readonly ctx: RunContext;
  readonly demand: Float64Array;
  /** Fixed head of surfaces and of outlets' virtual nodes (m). */
  readonly fixedHead: Float64Array;
  readonly elevation: Float64Array;
  readonly status: Int8Array;
  readonly runs: (RunEvaluator | undefined)[];
  readonly checkValve: Uint8Array;
  readonly pumps: (PumpModel | undefined)[];
  /** Control valves: open-loss coefficient r (h = r Q^2), low-flow threshold, setting. */
  readonly valveR: Float64Array;
  readonly valveQ0: Float64Array;
  readonly valveArea: Float64Array;
  /** PRV/PSV: setting as a head (m) at the held node; FCV: the flow (m3/s). */
  readonly setting: Float64Array;
  /** Outlets (by emitter number): k, exponent, low-flow threshold. */
  readonly outletK: Float64Array;
  readonly outletN: Float64Array;
  readonly outletQ0: Float64Array;
  /**
   * Heads inside the solve are measured from this head (the first surface's), so that their
   * rounding is relative to head differences, not to elevations and the atmosphere (m).
   */
  readonly headReference: number;
}

function guardFluid(fluid: FluidState): void {
  const f = guardRecord('fluid', fluid);
  guardRange('fluid.density', f['density'], { min: 0, minOpen: true, unit: 'kg/m3' });
  guardRange('fluid.kinematicViscosity', f['kinematicViscosity'], {
    min: 0,
    minOpen: true,
    unit: 'm2/s',
  });
}

function buildModel(topo: Topology, def: NetworkDefinition): Model {
  guardFluid(def.fluid);
  const fluid = def.fluid;
  const g =
    def.g === undefined
      ? STANDARD_GRAVITY
      : guardRange('g', def.g, { min: 0, minOpen: true, unit: 'm/s2' });
  const atmosphere =
    def.atmosphere === undefined
      ? STANDARD_ATMOSPHERE
      : guardRange('atmosphere', def.atmosphere, { min: 0, minOpen: true, unit: 'Pa' });
  const aged = def.aged === undefined ? false : guardBoolean('aged', def.aged);
  const rho = fluid.density;
  const rhoG = rho * g;
  const ctx = runContext(rho, fluid.kinematicViscosity, g, def.friction, 'interpolate');
  const n = def.nodes.length;
  const demand = new Float64Array(topo.nodeCount);
  const fixedHead = new Float64Array(topo.nodeCount);
  const elevation = new Float64Array(topo.nodeCount);
  const outletCount = topo.outletNodes.length;
  const outletK = new Float64Array(outletCount);
  const outletN = new Float64Array(outletCount);
  const outletQ0 = new Float64Array(outletCount);
  let outlet = 0;
  for (let i = 0; i < n; i++) {
    const node = def.nodes[i] as unknown as Readonly<Record<string, unknown>>;
    const name = `nodes[${i}]`;
    const z = guardRange(`${name}.elevation`, node['elevation'], { unit: 'm' });
    elevation[i] = z;
    const kind = topo.nodeKind[i];
    if (kind === JUNCTION) {
      demand[i] =
        node['demand'] === undefined
          ? 0
          : guardRange(`${name}.demand`, node['demand'], { unit: 'm3/s' });
    } else if (kind === SURFACE) {
      const surface = guardRecord(`${name}.surface`, node['surface']);
      const p =
        surface['pressure'] === undefined
          ? atmosphere
          : guardRange(`${name}.surface.pressure`, surface['pressure'], { min: 0, unit: 'Pa' });
      fixedHead[i] = z + p / rhoG;
    } else {
      const o = guardRecord(`${name}.outlet`, node['outlet']);
      const k = guardRange(`${name}.outlet.coefficient`, o['coefficient'], {
        min: 0,
        minOpen: true,
        unit: 'm3/s/Pa^n',
      });
      const e =
        o['exponent'] === undefined
          ? 0.5
          : guardRange(`${name}.outlet.exponent`, o['exponent'], { min: 0.3, max: 3 });
      outletK[outlet] = k;
      outletN[outlet] = e;
      outletQ0[outlet] = k * (rhoG * OUTLET_LOW_HEAD) ** e;
      const virtual = n + outlet;
      fixedHead[virtual] = z + atmosphere / rhoG;
      elevation[virtual] = z;
      outlet++;
    }
  }
  const m = def.links.length;
  const total = topo.from.length;
  const status = new Int8Array(total);
  const runs: (RunEvaluator | undefined)[] = new Array(total).fill(undefined);
  const checkValve = new Uint8Array(total);
  const pumps: (PumpModel | undefined)[] = new Array(total).fill(undefined);
  const valveR = new Float64Array(total);
  const valveQ0 = new Float64Array(total);
  const valveArea = new Float64Array(total);
  const setting = new Float64Array(total);
  for (let k = 0; k < m; k++) {
    const link = def.links[k] as NetworkLink;
    const name = `links[${k}]`;
    const st =
      link.status === undefined
        ? 'open'
        : guardOneOf(`${name}.status`, link.status, ['open', 'closed']);
    status[k] = st === 'closed' ? CLOSED : OPEN;
    const kind = topo.kind[k];
    if (kind === RUN) {
      const r = link as RunLink;
      const run = pipeRun({ name: link.id, ...r.run }, k + 1, aged);
      checkRunRoughness(run, def.friction);
      const ev = runEvaluator(run);
      runs[k] = ev;
      const probe: LossSlope = { slope: 0 };
      const hProbe = runLossSlope(ev, run.area, ctx, probe);
      if (!(hProbe > 0)) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `${name}.run`,
          0,
          'm',
          'a run with some loss (a length, fittings, valves or equipment)',
          `Run '${link.id}' has no loss at all; join its two nodes into one instead.`,
        );
      }
      checkValve[k] =
        r.checkValve === undefined ? 0 : guardBoolean(`${name}.checkValve`, r.checkValve) ? 1 : 0;
    } else if (kind === PUMP) {
      pumps[k] = pumpModel(link as PumpLink, name);
    } else {
      const v = guardRecord(`${name}.valve`, (link as ValveLink).valve) as unknown as ControlValve;
      const d = guardRange(`${name}.valve.diameter`, v.diameter, {
        min: 0,
        minOpen: true,
        unit: 'm',
      });
      const kOpen = guardRange(`${name}.valve.openK`, v.openK, { min: 0, minOpen: true });
      const area = (Math.PI * d * d) / 4;
      valveArea[k] = area;
      valveR[k] = kOpen / (2 * g * area * area);
      valveQ0[k] = VALVE_LOW_VELOCITY * area;
      if (kind === FCV) {
        setting[k] = guardRange(`${name}.valve.setting`, v.setting, {
          min: 0,
          minOpen: true,
          unit: 'm3/s',
        });
      } else {
        const p = guardRange(`${name}.valve.setting`, v.setting, { min: 0, unit: 'Pa' });
        const held = kind === PRV ? (topo.to[k] as number) : (topo.from[k] as number);
        setting[k] = (elevation[held] as number) + p / rhoG;
      }
    }
  }
  let headReference = 0;
  for (let i = 0; i < n; i++) {
    if (topo.nodeKind[i] === SURFACE) {
      headReference = fixedHead[i] as number;
      break;
    }
  }
  for (let i = 0; i < topo.nodeCount; i++) {
    if (topo.nodeKind[i] === SURFACE) fixedHead[i] = (fixedHead[i] as number) - headReference;
  }
  for (let k = 0; k < m; k++) {
    if (topo.kind[k] === PRV || topo.kind[k] === PSV)
      setting[k] = (setting[k] as number) - headReference;
  }
  return {
    headReference,
    name: def.name === undefined ? 'network' : guardString('name', def.name),
    rho,
    g,
    atmosphere,
    fluid,
    ctx,
    demand,
    fixedHead,
    elevation,
    status,
    runs,
    checkValve,
    pumps,
    valveR,
    valveQ0,
    valveArea,
    setting,
    outletK,
    outletN,
    outletQ0,
  };
}

function pumpModel(link: PumpLink, name: string): PumpModel {
  const curve = guardRecord(`${name}.pump`, link.pump) as unknown as HeadRiseCurve;
  if (typeof curve.head !== 'function') {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.pump.head`,
      undefined,
      undefined,
      'a function',
    );
  }
  const range = guardRecord(`${name}.pump.flowRange`, curve.flowRange);
  const min = guardRange(`${name}.pump.flowRange.min`, range['min'], { min: 0, unit: 'm3/s' });
  const max = guardRange(`${name}.pump.flowRange.max`, range['max'], {
    min,
    minOpen: true,
    unit: 'm3/s',
  });
  let s = 1;
  if (link.speed !== undefined) {
    const speed = guardRange(`${name}.speed`, link.speed, { min: 0, minOpen: true, unit: 'rad/s' });
    const rated = guardRange(`${name}.pump.speed`, curve.speed, {
      min: 0,
      minOpen: true,
      unit: 'rad/s',
    });
    s = speed / rated;
  }
  const count = link.count === undefined ? 1 : guardInteger(`${name}.count`, link.count, 1, 20);
  const arrangement =
    link.arrangement === undefined
      ? 'parallel'
      : guardOneOf(`${name}.arrangement`, link.arrangement, ['parallel', 'series']);
  const parallel = arrangement === 'parallel' ? count : 1;
  const series = arrangement === 'series' ? count : 1;
  const hMin = curve.head(min as Flow);
  const hMax = curve.head(max as Flow);
  const secant = Math.abs(hMin - hMax) / (max - min);
  // Slope floor for a flat or rising stretch: a thousandth of the curve's mean slope (or of
  // its shut-off head over its flow range), scaled like the curve.
  const ref = Math.max(secant, Math.abs(hMin) / max) * 1e-3;
  return { curve, s, parallel, series, min, max, slopeFloor: (ref * series * s) / parallel };
}

/** Pump head rise at a link flow and its derivative, written to res.slope (dgain/dQ). */
function pumpGain(p: PumpModel, flow: number, res: LossSlope): number {
  const x = flow / (p.s * p.parallel);
  const c = p.curve;
  let h: number;
  let d: number;
  const at = (v: number): number => c.head(v as Flow);
  const slopeAt = (v: number): number => {
    if (c.headSlope !== undefined) return c.headSlope(v as Flow);
    const step = (p.max - p.min) * 1e-6;
    const a = Math.max(p.min, v - step);
    const b = Math.min(p.max, v + step);
    return (at(b) - at(a)) / (b - a);
  };
  if (x < p.min) {
    d = slopeAt(p.min);
    h = at(p.min) + d * (x - p.min);
  } else if (x > p.max) {
    d = slopeAt(p.max);
    h = at(p.max) + d * (x - p.max);
  } else {
    h = at(x);
    d = slopeAt(x);
  }
  const k = p.series * p.s * p.s;
  res.slope = (p.series * p.s * d) / p.parallel;
  return k * h;
}

/** Loss r Q|Q|^(e-1) with the low-flow cubic below q0; slope to res. */
function powerLoss(r: number, e: number, q0: number, flow: number, res: LossSlope): number {
  const q = Math.abs(flow);
  let h: number;
  if (q < q0) {
    const h0 = r * q0 ** e;
    const m = h0 / q0;
    const c = (e * m - m) / (q0 * q0);
    const b = -c * q0;
    h = q * (m + q * (b + q * c));
    res.slope = m + q * (2 * b + 3 * c * q);
  } else {
    h = r * q ** e;
    res.slope = (e * h) / q;
  }
  return flow < 0 ? -h : h;
}

function guardSolveOptions(options: NetworkSolveOptions | undefined) {
  const o = guardOptions('options', options);
  return {
    maxIterations:
      o.maxIterations === undefined
        ? 50
        : guardInteger('options.maxIterations', o.maxIterations, 1, 1000),
    headTolerance:
      o.headTolerance === undefined
        ? 1e-9
        : guardRange('options.headTolerance', o.headTolerance, {
            min: 0,
            minOpen: true,
            max: 1,
            unit: 'm',
          }),
    flowTolerance:
      o.flowTolerance === undefined
        ? 1e-12
        : guardRange('options.flowTolerance', o.flowTolerance, { min: 0, minOpen: true, max: 0.1 }),
  };
}

/**
 * Prepares a network for repeated solves: checks its topology and builds the ordering and
 * symbolic factorization of its node matrix once; {@link PreparedNetwork.solve} then solves
 * any operating case (demands, levels, statuses, settings, speeds, another pump on a pump
 * link, aged pipe, another fluid) on the same layout.
 *
 * @throws HeadflowError as {@link solveNetwork} for the layout (duplicate ids, unknown nodes,
 *   a part without a fixed-level surface, malformed nodes or links).
 * @example
 * ```ts
 * const prepared = prepareNetwork(definition);
 * const high = prepared.solve({ levels: { tank: q(12, 'm') } });
 * const low = prepared.solve({ levels: { tank: q(8, 'm') } });
 * ```
 */
export function prepareNetwork(definition: NetworkDefinition): PreparedNetwork {
  const def = guardRecord('definition', definition) as unknown as NetworkDefinition;
  const topo = buildTopology(def);
  // Validate the numbers once now, so that a bad definition fails here.
  buildModel(topo, def);
  return Object.freeze({
    definition: def,
    linkCount: def.links.length,
    nodeCount: def.nodes.length,
    factorEntries: topo.chol.factorEntries,
    solve: (operatingCase?: NetworkCase, options?: NetworkSolveOptions): NetworkSolution => {
      const o = guardSolveOptions(options);
      const d =
        operatingCase === undefined || operatingCase === null
          ? def
          : applyNetworkCase(def, operatingCase);
      return solveModel(topo, buildModel(topo, d), o);
    },
  });
}

/**
 * Solves a network: the steady flow in every link and the head at every node, by the global
 * gradient method of Todini and Pilati (1988).
 *
 * Method. Unknowns are the link flows Q and the heads H of junctions and outlets (surfaces
 * hold their heads). Each link's head loss h(Q) is linearized at the current flows with its
 * exact slope p = dh/dQ; eliminating the flow corrections leaves one symmetric
 * positive-definite system in the heads, `A21 P^-1 A12 H = F` (a weighted graph Laplacian
 * with weights 1/p), solved by a sparse Cholesky factorization in nested-dissection order
 * (ordering and symbolic work done once per layout); the flows then follow link by link.
 * Newton's method converges quadratically near the solution, so the strict default
 * tolerances (1e-9 m on every link's head balance, 1e-12 of the largest flow at every node)
 * cost one or two iterations more than loose ones.
 *
 * Laws. Runs use their own law (Darcy-Weisbach with the friction policy, a stated factor, or
 * Hazen-Williams) with exact derivatives. The transition rule defaults to `'interpolate'` in
 * a network: the loss is then continuous in flow, which Newton's method needs; with the
 * `'conservative'` jump at Re 2300 a run may need a loss inside the jump, which no flow gives,
 * and the plain iteration cycles around it. With `'conservative'` asked for: a run whose step
 * first crosses its jump flow stops just past it (the next step linearizes the law on that
 * side); a run that then crosses back is pinned at the jump (state `'pinned'`: the jump
 * stands in the head equations as a ramp of relative width 2e-9 about the Re 2300 flow) and
 * released, on the side the heads ask for, when the iteration carries it off the ramp; at
 * most 8 pins per run, and never the last run at a node that follows its law. A network with
 * hundreds of runs sitting at the jump may still cycle; the solve then says so. Laws with no slope at zero flow
 * (a square law, Hazen-Williams, outlets) follow a monotone cubic through zero below a small
 * flow (1 mm/s in a run or valve, 1 mm of head at an outlet), so that every slope stays
 * finite and positive.
 *
 * Pumps add `count^series s^2 H(Q / (s count^parallel))` (affinity laws with the speed ratio
 * s); outside the curve's flow range during the iteration the curve is extended along its end
 * slope, and a solution outside the range is refused. Outlets discharge `k p^n` to the
 * atmosphere.
 *
 * States (the stated rule). Link states are revised after a step whose largest flow change is
 * at most 1 % of the largest flow (far from the solution a linearization shows reverse flows
 * and heads the solution does not have), and the solve ends only after a revision that
 * changes nothing. Each link may change state at most {@link MAX_STATE_CHANGES} times in a
 * solve, after which its state is held, so the iteration cannot cycle forever:
 * - check valve, pump, outlet: shut when their flow turns negative; reopen when the head
 *   difference would drive forward flow (for a pump: when its head at zero flow exceeds the
 *   rise the network asks);
 * - pressure-reducing valve: active (its outlet head held at the setting; its flow the flow
 *   its outlet side draws, taken into its inlet's balance at the next step) while the inlet
 *   head exceeds the setting plus the wide-open loss; open when it does not; shut on reverse
 *   flow, or while the outlet head stays above the setting;
 * - pressure-sustaining valve: the mirror image on its inlet;
 * - flow-limiting valve: active (flow held at the setting) when the open valve would pass
 *   more; open again when the head across it is less than the wide-open loss at the setting.
 *
 * Convergence and its limit. Flows come from head differences, so a link whose loss is tiny
 * against the heads (a metre of large pipe at a trickle) has its flow fixed only to the
 * heads' rounding: a node's flow balance is accepted at 1e-12 of the largest flow or at 32
 * ulps of the terms its head equation sums, whichever is larger. Heads inside the solve are
 * measured from the first surface's head to keep that rounding small.
 *
 * Sources: E. Todini and S. Pilati, 1988, "A gradient algorithm for the analysis of pipe
 * networks", in B. Coulbeck and C. H. Orr (eds.), "Computer Applications in Water Supply",
 * vol. 1, Research Studies Press, pp. 1-20; sparse Cholesky and ordering as cited in the
 * module's sparse-cholesky and ordering files (Liu 1990; Davis 2006; George 1973; George and
 * Liu 1981). Steady state only: no tank levels over time, no water hammer.
 *
 * @param definition - nodes, links, fluid, gravity, friction policy, aged pipe, atmosphere
 * @param options - `maxIterations` (50), `headTolerance` (1e-9 m), `flowTolerance` (1e-12)
 * @returns heads and pressures of every node, flows and losses of every link, valve and pump
 *   states, iterations and the final residuals
 * @throws HeadflowError `INVALID_ARGUMENT` for a malformed node or link, a duplicate id, a
 *   link to an unknown node, a run with no loss; `NO_SOLUTION` for a part of the network
 *   without a fixed-level surface, a demand no open path can supply, or no convergence within
 *   `maxIterations` (the message gives the last residuals and the links involved);
 *   `OUT_OF_RANGE` for a pump whose flow at the solution lies outside its curve's range.
 * @example
 * ```ts
 * const result = solveNetwork({
 *   fluid: water().at(q(15, 'degC')),
 *   nodes: [
 *     { id: 'tank', elevation: q(30, 'm'), surface: {} },
 *     { id: 'tap', elevation: q(0, 'm'), demand: q(5, 'L/s') },
 *   ],
 *   links: [{ id: 'main', from: 'tank', to: 'tap', run: { length: q(500, 'm'), insideDiameter: q(100, 'mm'), roughness: q(0.05, 'mm') } }],
 * });
 * result.links.main?.flow; // 0.005 (m3/s)
 * ```
 */
export function solveNetwork(
  definition: NetworkDefinition,
  options?: NetworkSolveOptions,
): NetworkSolution {
  const o = guardSolveOptions(options);
  const def = guardRecord('definition', definition) as unknown as NetworkDefinition;
  const topo = buildTopology(def);
  return solveModel(topo, buildModel(topo, def), o);
}

function solveModel(
  topo: Topology,
  model: Model,
  o: { maxIterations: number; headTolerance: number; flowTolerance: number },
): NetworkSolution {
  const { from, to, kind, row, chol, offPos, diagPos } = topo;
  const total = from.length;
  const nodes = topo.nodeCount;
  const rows = chol.n;
  const Q = new Float64Array(total);
  const H = new Float64Array(nodes);
  const loss = new Float64Array(total);
  const slope = new Float64Array(total);
  const state = new Int8Array(total);
  const changes = new Int32Array(total);
  const pins = new Int32Array(total);
  const pinLow = new Float64Array(total);
  const pinHigh = new Float64Array(total);
  const pinFlow = new Float64Array(total);
  const free = new Int32Array(nodes);
  const lastCross = new Int8Array(total);
  const jumps = !model.ctx.policy.interpolate;
  const fixedNow = new Uint8Array(nodes);
  const reached = new Uint8Array(nodes);
  const inMatrix = new Uint8Array(total);
  const net = new Float64Array(nodes);
  const floor = new Float64Array(nodes);
  const rhs = new Float64Array(rows);
  const queue = new Int32Array(nodes);
  const res: LossSlope = { slope: 0 };
  const values = chol.values;
  const rhoG = model.rho * model.g;

  // Adjacency of nodes by links (both directions) for reachability.
  const deg = new Int32Array(nodes + 1);
  for (let k = 0; k < total; k++) {
    const fa = (from[k] as number) + 1;
    const tb = (to[k] as number) + 1;
    deg[fa] = (deg[fa] as number) + 1;
    deg[tb] = (deg[tb] as number) + 1;
  }
  for (let i = 0; i < nodes; i++) deg[i + 1] = (deg[i + 1] as number) + (deg[i] as number);
  const incident = new Int32Array(deg[nodes] as number);
  {
    const fill = deg.slice(0, nodes);
    for (let k = 0; k < total; k++) {
      const a = from[k] as number;
      const b = to[k] as number;
      incident[fill[a] as number] = k;
      fill[a] = (fill[a] as number) + 1;
      incident[fill[b] as number] = k;
      fill[b] = (fill[b] as number) + 1;
    }
  }

  // Initial state and flows: 0.3 m/s in runs and valves, mid-range in pumps, outlets at
  // 1 m of head; heads at the surfaces' mean for junctions (only read by state rules).
  let meanFixed = 0;
  let fixedCount = 0;
  for (let i = 0; i < nodes; i++) {
    if (topo.nodeKind[i] === SURFACE && i < topo.nodeIds.length) {
      meanFixed += model.fixedHead[i] as number;
      fixedCount++;
    }
  }
  meanFixed /= Math.max(1, fixedCount);
  for (let i = 0; i < nodes; i++) {
    H[i] = topo.nodeKind[i] === SURFACE ? (model.fixedHead[i] as number) : meanFixed;
  }
  for (let k = 0; k < total; k++) {
    state[k] = model.status[k] === CLOSED ? CLOSED : OPEN;
    const kd = kind[k];
    if (kd === RUN) Q[k] = 0.3 * (model.runs[k] as RunEvaluator).run.area;
    else if (kd === PUMP) {
      const p = model.pumps[k] as PumpModel;
      Q[k] = 0.5 * (p.min + p.max) * p.s * p.parallel;
    } else if (kd === EMITTER) {
      const j = k - (total - topo.outletNodes.length);
      Q[k] = (model.outletK[j] as number) * (rhoG * 1) ** (model.outletN[j] as number);
    } else Q[k] = 0.3 * (model.valveArea[k] as number);
    if (state[k] === CLOSED) Q[k] = 0;
  }

  let iterations = 0;
  let headResidual = Number.POSITIVE_INFINITY;
  let flowResidual = Number.POSITIVE_INFINITY;
  let changed = true;
  // Whether the last step revised the link states (the flows had settled).
  let revised = false;
  let worstLink = -1;
  let worstNode = -1;
  for (let iter = 0; ; iter++) {
    // 1. Which nodes hold their head this step, which links enter the matrix.
    fixedNow.fill(0);
    for (let i = 0; i < nodes; i++) if (topo.nodeKind[i] === SURFACE) fixedNow[i] = 1;
    for (let k = 0; k < total; k++) {
      if (state[k] !== ACTIVE) continue;
      if (kind[k] === PRV) {
        fixedNow[to[k] as number] = 1;
        H[to[k] as number] = model.setting[k] as number;
      } else if (kind[k] === PSV) {
        fixedNow[from[k] as number] = 1;
        H[from[k] as number] = model.setting[k] as number;
      }
    }
    for (let k = 0; k < total; k++) {
      inMatrix[k] = state[k] === OPEN || state[k] === PINNED ? 1 : 0;
    }
    // Reachability from held heads through matrix links.
    reached.fill(0);
    let tail = 0;
    for (let i = 0; i < nodes; i++) {
      if (fixedNow[i] === 1) {
        reached[i] = 1;
        queue[tail++] = i;
      }
    }
    for (let head = 0; head < tail; head++) {
      const v = queue[head] as number;
      for (let p = deg[v] as number; p < (deg[v + 1] as number); p++) {
        const k = incident[p] as number;
        if (inMatrix[k] === 0) continue;
        const w = (from[k] === v ? to[k] : from[k]) as number;
        if (reached[w] === 0) {
          reached[w] = 1;
          queue[tail++] = w;
        }
      }
    }
    for (let k = 0; k < total; k++) {
      if (inMatrix[k] === 1 && reached[from[k] as number] === 0) {
        inMatrix[k] = 0;
        Q[k] = 0;
      }
    }

    // 2. Loss and slope of every link at the current flows.
    for (let k = 0; k < total; k++) {
      if (inMatrix[k] === 0) continue;
      const kd = kind[k];
      let h: number;
      if (state[k] === PINNED) {
        // The jump as a steep ramp of relative width 2 RAMP about the Re 2300 flow.
        const q0 = pinFlow[k] as number;
        const ramp = ((pinHigh[k] as number) - (pinLow[k] as number)) / (2 * RAMP * Math.abs(q0));
        h = 0.5 * ((pinLow[k] as number) + (pinHigh[k] as number)) + ramp * ((Q[k] as number) - q0);
        res.slope = ramp;
      } else if (kd === RUN) {
        h = runLossSlope(model.runs[k] as RunEvaluator, Q[k] as number, model.ctx, res);
      } else if (kd === PUMP) {
        const p = model.pumps[k] as PumpModel;
        h = -pumpGain(p, Q[k] as number, res);
        res.slope = Math.max(-res.slope, p.slopeFloor);
      } else if (kd === EMITTER) {
        const j = k - (total - topo.outletNodes.length);
        const e = 1 / (model.outletN[j] as number);
        const r = 1 / ((model.outletK[j] as number) ** e * rhoG);
        h = powerLoss(r, e, model.outletQ0[j] as number, Q[k] as number, res);
      } else {
        h = powerLoss(
          model.valveR[k] as number,
          2,
          model.valveQ0[k] as number,
          Q[k] as number,
          res,
        );
      }
      loss[k] = h;
      slope[k] = res.slope;
    }

    // 3. Residuals at the current point (after the first solve).
    net.fill(0);
    for (let i = 0; i < nodes; i++) net[i] = -(model.demand[i] as number);
    let maxQ = 0;
    for (let k = 0; k < total; k++) {
      const qk = Q[k] as number;
      net[from[k] as number] = (net[from[k] as number] as number) - qk;
      net[to[k] as number] = (net[to[k] as number] as number) + qk;
      if (Math.abs(qk) > maxQ) maxQ = Math.abs(qk);
    }
    if (iter > 0) {
      headResidual = 0;
      worstLink = -1;
      for (let k = 0; k < total; k++) {
        if (inMatrix[k] === 0) continue;
        const r = Math.abs(
          (loss[k] as number) - ((H[from[k] as number] as number) - (H[to[k] as number] as number)),
        );
        if (r > headResidual) {
          headResidual = r;
          worstLink = k;
        }
      }
      // Rounding floor of each node's balance: the terms its head equation sums,
      // w (|H_from| + |H_to|), times a few ulps (heads carry their rounding into flows).
      floor.fill(0);
      for (let k = 0; k < total; k++) {
        if (inMatrix[k] === 0) continue;
        const a = from[k] as number;
        const b = to[k] as number;
        const t = (Math.abs(H[a] as number) + Math.abs(H[b] as number)) / (slope[k] as number);
        floor[a] = (floor[a] as number) + t;
        floor[b] = (floor[b] as number) + t;
      }
      let worst = 0;
      let flowOk = true;
      worstNode = -1;
      for (let i = 0; i < nodes; i++) {
        if (topo.nodeKind[i] === SURFACE) continue;
        const r = Math.abs(net[i] as number);
        if (r > o.flowTolerance * maxQ + ROUNDING * (floor[i] as number)) flowOk = false;
        if (r > worst) {
          worst = r;
          worstNode = i;
        }
      }
      flowResidual = maxQ > 0 ? worst / maxQ : worst;
      if (revised && !changed && headResidual <= o.headTolerance && flowOk) break;
    }
    if (iterations >= o.maxIterations) {
      throw noConvergence(
        topo,
        iterations,
        headResidual,
        flowResidual,
        worstLink,
        worstNode,
        changes,
      );
    }

    // 4. Assemble A H = F and solve.
    values.fill(0);
    rhs.fill(0);
    for (let i = 0; i < nodes; i++) {
      const r = row[i] as number;
      if (r >= 0 && fixedNow[i] === 0 && reached[i] === 1) rhs[r] = -(model.demand[i] as number);
    }
    const variable = (i: number): boolean =>
      (row[i] as number) >= 0 && fixedNow[i] === 0 && reached[i] === 1;
    for (let k = 0; k < total; k++) {
      const a = from[k] as number;
      const b = to[k] as number;
      const va = variable(a);
      const vb = variable(b);
      if (inMatrix[k] === 1) {
        const w = 1 / (slope[k] as number);
        const y = (Q[k] as number) - (loss[k] as number) * w;
        if (va) {
          const r = row[a] as number;
          values[diagPos[r] as number] = (values[diagPos[r] as number] as number) + w;
          rhs[r] = (rhs[r] as number) - y;
          if (vb) {
            const pos = offPos[k] as number;
            values[pos] = (values[pos] as number) - w;
          } else rhs[r] = (rhs[r] as number) + w * (H[b] as number);
        }
        if (vb) {
          const r = row[b] as number;
          values[diagPos[r] as number] = (values[diagPos[r] as number] as number) + w;
          rhs[r] = (rhs[r] as number) + y;
          if (!va) rhs[r] = (rhs[r] as number) + w * (H[a] as number);
        }
      } else if (state[k] === ACTIVE) {
        // Fixed flows: a flow-limiting valve's setting, a pressure valve's last flow.
        const qk = Q[k] as number;
        if (va) rhs[row[a] as number] = (rhs[row[a] as number] as number) - qk;
        if (vb) rhs[row[b] as number] = (rhs[row[b] as number] as number) + qk;
      }
    }
    for (let i = 0; i < nodes; i++) {
      const r = row[i] as number;
      if (r >= 0 && !variable(i)) {
        values[diagPos[r] as number] = 1;
        rhs[r] = H[i] as number;
      }
    }
    const bad = chol.factor();
    if (bad >= 0) {
      // Cannot happen for positive slopes and a reached node; report rather than carry NaN.
      throw new HeadflowError(
        'NO_SOLUTION',
        `the network's head equations lost positive definiteness at a node (row ${bad}); the link laws gave a zero or negative slope.`,
      );
    }
    chol.solve(rhs);
    iterations++;
    for (let i = 0; i < nodes; i++) {
      const r = row[i] as number;
      if (r >= 0 && variable(i)) H[i] = rhs[r] as number;
    }

    // 5. New flows.
    let change = 0;
    let largest = 0;
    let pinned = false;
    if (jumps) {
      // Links at each node that follow their law (a node must keep one, or its head would
      // rest on pinned flows alone).
      free.fill(0);
      for (let k = 0; k < total; k++) {
        if (inMatrix[k] === 1 && state[k] === OPEN) {
          free[from[k] as number] = (free[from[k] as number] as number) + 1;
          free[to[k] as number] = (free[to[k] as number] as number) + 1;
        }
      }
    }
    for (let k = 0; k < total; k++) {
      if (inMatrix[k] === 1) {
        const w = 1 / (slope[k] as number);
        const old = Q[k] as number;
        let qk =
          old -
          (loss[k] as number) * w +
          w * ((H[from[k] as number] as number) - (H[to[k] as number] as number));
        if (state[k] === PINNED) {
          // Off the ramp: the head across the run left the jump; its law applies again.
          const q0 = pinFlow[k] as number;
          if (Math.abs(qk - q0) > RAMP * Math.abs(q0)) {
            state[k] = OPEN;
            pinned = true;
            // Released on the side the head asks for; crossing back pins it again.
            lastCross[k] = Math.abs(qk) > Math.abs(q0) ? 1 : -1;
          }
        } else if (jumps && kind[k] === RUN && iterations >= 2 && (pins[k] as number) < MAX_PINS) {
          // A step across the friction jump of the 'conservative' rule: hold the run there.
          const ev = model.runs[k] as RunEvaluator;
          const jump = jumpFlow(ev, model.ctx);
          const a0 = from[k] as number;
          const b0 = to[k] as number;
          const keeps =
            (fixedNow[a0] === 1 || (free[a0] as number) > 1) &&
            (fixedNow[b0] === 1 || (free[b0] as number) > 1);
          const crossing =
            jump > 0 && old * qk > 0 && (Math.abs(old) - jump) * (Math.abs(qk) - jump) < 0;
          const up = Math.abs(qk) > jump ? 1 : -1;
          if (crossing && lastCross[k] !== -up) {
            // A first crossing: stop the step just past the jump, so that the next step
            // linearizes the law on the side it moved to.
            lastCross[k] = up;
            qk = (qk > 0 ? jump : -jump) * (1 + up * 1e-9);
            pinned = true;
          } else if (crossing && keeps) {
            // Back across the jump it crossed before: the balance lies inside the jump.
            lastCross[k] = 0;
            free[a0] = (free[a0] as number) - 1;
            free[b0] = (free[b0] as number) - 1;
            const signed = qk > 0 ? jump : -jump;
            const a = runLossSlope(ev, signed * (1 - 1e-12), model.ctx, res);
            const b = runLossSlope(ev, signed * (1 + 1e-12), model.ctx, res);
            pinLow[k] = Math.min(a, b);
            pinHigh[k] = Math.max(a, b);
            pinFlow[k] = signed;
            pins[k] = (pins[k] as number) + 1;
            state[k] = PINNED;
            qk = signed;
            pinned = true;
          }
        }
        Q[k] = qk;
        change = Math.max(change, Math.abs(qk - old));
        largest = Math.max(largest, Math.abs(qk));
      } else if (state[k] === ACTIVE && kind[k] === FCV) {
        Q[k] = model.setting[k] as number;
      } else if (state[k] !== ACTIVE) {
        Q[k] = 0;
      }
    }
    // Pressure valves that hold a head: their flow closes the held node's balance.
    net.fill(0);
    for (let i = 0; i < nodes; i++) net[i] = -(model.demand[i] as number);
    for (let k = 0; k < total; k++) {
      if (state[k] === ACTIVE && (kind[k] === PRV || kind[k] === PSV)) continue;
      const qk = Q[k] as number;
      net[from[k] as number] = (net[from[k] as number] as number) - qk;
      net[to[k] as number] = (net[to[k] as number] as number) + qk;
    }
    for (let k = 0; k < total; k++) {
      if (state[k] !== ACTIVE) continue;
      if (kind[k] === PRV) Q[k] = -(net[to[k] as number] as number);
      else if (kind[k] === PSV) Q[k] = net[from[k] as number] as number;
    }

    // 6. State changes by the stated rules, once the flows have settled (no flow moved by more
    // than SETTLED of the largest flow in this step): far from the solution a linearization
    // can show reverse flows or heads that the solution does not have.
    changed = pinned;
    const tol = o.headTolerance;
    const settled = change <= SETTLED * largest;
    revised = settled;
    for (let k = 0; k < total; k++) {
      if (!settled) break;
      const s = state[k] as number;
      if (s === CLOSED || (changes[k] as number) >= MAX_STATE_CHANGES) continue;
      const kd = kind[k];
      const qk = Q[k] as number;
      const hf = H[from[k] as number] as number;
      const ht = H[to[k] as number] as number;
      let next = s;
      if (s === PINNED) continue;
      if ((kd === RUN && model.checkValve[k] === 1) || kd === EMITTER) {
        if (s === OPEN && qk < 0) next = SHUT;
        else if (s === SHUT && hf - ht > tol) next = OPEN;
      } else if (kd === PUMP) {
        if (s === OPEN && qk < 0) next = SHUT;
        else if (s === SHUT) {
          const p = model.pumps[k] as PumpModel;
          if (pumpGain(p, 0, res) > ht - hf + tol) next = OPEN;
        }
      } else if (kd === PRV || kd === PSV || kd === FCV) {
        next = valveState(kd, s, qk, hf, ht, model, k, tol);
      }
      if (next !== s) {
        if (next === SHUT) Q[k] = 0;
        if (next === ACTIVE && kd === FCV) Q[k] = model.setting[k] as number;
        if (next === OPEN && s === SHUT) Q[k] = 0;
        state[k] = next;
        changes[k] = (changes[k] as number) + 1;
        changed = true;
      }
    }
  }
  return result(topo, model, Q, H, state, iterations, headResidual, flowResidual, reached);
}

/** Flow (m3/s) at which a Darcy-Weisbach run reaches Re 2300, or 0 for other laws. */
function jumpFlow(ev: RunEvaluator, ctx: RunContext): number {
  const run = ev.run;
  if (run.law !== 'darcy-weisbach' || run.length === 0) return 0;
  return (JUMP_RE * ctx.kinematicViscosity * run.area) / run.insideDiameter;
}

function valveState(
  kd: number,
  s: number,
  qk: number,
  hf: number,
  ht: number,
  model: Model,
  k: number,
  tol: number,
): number {
  const set = model.setting[k] as number;
  const openLoss = (flow: number): number => (model.valveR[k] as number) * flow * Math.abs(flow);
  if (kd === FCV) {
    if (s === OPEN) return qk > set ? ACTIVE : qk < 0 ? SHUT : OPEN;
    if (s === ACTIVE) return hf - ht < openLoss(set) - tol ? OPEN : ACTIVE;
    return hf - ht > tol ? OPEN : SHUT;
  }
  if (kd === PRV) {
    if (s === OPEN) return qk < 0 ? SHUT : ht > set + tol ? ACTIVE : OPEN;
    if (s === ACTIVE) return qk < 0 ? SHUT : hf - set < openLoss(qk) - tol ? OPEN : ACTIVE;
    if (hf > ht + tol && ht < set - tol) return hf - set > tol ? ACTIVE : OPEN;
    return SHUT;
  }
  // PSV: holds the inlet.
  if (s === OPEN) return qk < 0 ? SHUT : hf < set - tol ? ACTIVE : OPEN;
  if (s === ACTIVE) return qk < 0 ? SHUT : set - ht < openLoss(qk) - tol ? OPEN : ACTIVE;
  if (hf > set + tol && hf > ht + tol) return OPEN;
  return SHUT;
}

function noConvergence(
  topo: Topology,
  iterations: number,
  headResidual: number,
  flowResidual: number,
  worstLink: number,
  worstNode: number,
  changes: Int32Array,
): HeadflowError {
  const linkName = (k: number): string =>
    k < topo.linkIds.length
      ? `'${topo.linkIds[k]}'`
      : `the outlet at '${topo.nodeIds[topo.outletNodes[k - topo.linkIds.length] as number]}'`;
  const cycling: string[] = [];
  for (let k = 0; k < changes.length && cycling.length < 5; k++) {
    if ((changes[k] as number) >= MAX_STATE_CHANGES) cycling.push(linkName(k));
  }
  return new HeadflowError(
    'NO_SOLUTION',
    `the network did not converge in ${iterations} iterations: last head imbalance ` +
      `${headResidual.toPrecision(3)} m${worstLink >= 0 ? ` (link ${linkName(worstLink)})` : ''}, ` +
      `last flow imbalance ${flowResidual.toPrecision(3)} of the largest flow` +
      `${worstNode >= 0 ? ` (node '${topo.nodeIds[worstNode]}')` : ''}` +
      `${cycling.length > 0 ? `; links that kept changing state: ${cycling.join(', ')}` : ''}. ` +
      'Raise options.maxIterations, or check pumps, valves and settings that may have no steady state.',
    { parameter: 'options.maxIterations', value: iterations },
  );
}

function result(
  topo: Topology,
  model: Model,
  Q: Float64Array,
  H: Float64Array,
  state: Int8Array,
  iterations: number,
  headResidual: number,
  flowResidual: number,
  reached: Uint8Array,
): NetworkSolution {
  const { from, to, kind } = topo;
  const rhoG = model.rho * model.g;
  const n = topo.nodeIds.length;
  const m = topo.linkIds.length;
  // Demands that no open path can supply.
  for (let i = 0; i < n; i++) {
    if (reached[i] === 0 && (model.demand[i] as number) !== 0) {
      throw new HeadflowError(
        'NO_SOLUTION',
        `the demand at node '${topo.nodeIds[i]}' cannot be supplied: no open path joins it to a fixed-level surface in this case.`,
        { parameter: 'demand', value: model.demand[i], unit: 'm3/s' },
      );
    }
  }
  const outflow = new Float64Array(n);
  for (let i = 0; i < n; i++) outflow[i] = model.demand[i] as number;
  for (let k = 0; k < m; k++) {
    const qk = Q[k] as number;
    const a = from[k] as number;
    const b = to[k] as number;
    if (topo.nodeKind[a] === SURFACE) outflow[a] = (outflow[a] as number) - qk;
    if (topo.nodeKind[b] === SURFACE) outflow[b] = (outflow[b] as number) + qk;
  }
  topo.outletNodes.forEach((node, j) => {
    outflow[node] = Q[m + j] as number;
  });
  const nodeResults: [string, NodeSolution][] = [];
  const belowVapor: string[] = [];
  const belowAtm: string[] = [];
  const pv = model.fluid.vaporPressure;
  for (let i = 0; i < n; i++) {
    const isolated = reached[i] === 0;
    const z = model.elevation[i] as number;
    const head = isolated ? z + model.atmosphere / rhoG : (H[i] as number) + model.headReference;
    const pressure = (head - z) * rhoG;
    const id = topo.nodeIds[i] as string;
    if (!isolated) {
      if (pv !== undefined && pressure < pv) belowVapor.push(id);
      if (pressure < model.atmosphere) belowAtm.push(id);
    }
    nodeResults.push([
      id,
      Object.freeze({
        head: head as Length,
        pressure: pressure as Pressure,
        outflow: outflow[i] as Flow,
        isolated,
      }),
    ]);
  }
  const linkResults: [string, LinkSolution][] = [];
  const b: RunLossBreakdown = {
    velocity: 0,
    reynolds: 0,
    frictionFactor: 0,
    pipeLoss: 0,
    fittingsLoss: 0,
    componentLoss: 0,
  };
  const res: LossSlope = { slope: 0 };
  for (let k = 0; k < m; k++) {
    const qk = Q[k] as number;
    const kd = kind[k];
    const headLoss = (H[from[k] as number] as number) - (H[to[k] as number] as number);
    let velocity: number | undefined;
    let reynolds: number | undefined;
    let frictionFactor: number | undefined;
    let pumpHead: number | undefined;
    if (kd === RUN) {
      runLossSlope(model.runs[k] as RunEvaluator, qk, model.ctx, res, b);
      velocity = qk < 0 ? -b.velocity : b.velocity;
      reynolds = b.reynolds;
      frictionFactor = qk === 0 ? undefined : b.frictionFactor;
    } else if (kd === PUMP) {
      const p = model.pumps[k] as PumpModel;
      if (state[k] === OPEN) {
        const x = qk / (p.s * p.parallel);
        if (x < p.min || x > p.max) {
          throw new HeadflowError(
            'OUT_OF_RANGE',
            `pump link '${topo.linkIds[k]}' runs at ${(x * 1000).toPrecision(4)} L/s per pump at the curve's speed, outside its curve's flow range ` +
              `${(p.min * 1000).toPrecision(4)} to ${(p.max * 1000).toPrecision(4)} L/s: no extrapolation past the catalogue.`,
            { parameter: `links[${k}].pump`, value: x, unit: 'm3/s' },
          );
        }
        pumpHead = pumpGain(p, qk, res);
      } else pumpHead = 0;
    } else {
      velocity = qk / (model.valveArea[k] as number);
    }
    linkResults.push([
      topo.linkIds[k] as string,
      Object.freeze({
        flow: qk as Flow,
        headLoss: headLoss as Length,
        state: STATE_NAMES[state[k] as number] as LinkState,
        velocity: velocity as Velocity | undefined,
        reynolds,
        frictionFactor,
        pumpHead: pumpHead as Length | undefined,
      }),
    ]);
  }
  return Object.freeze({
    name: model.name,
    iterations,
    headResidual,
    flowResidual,
    nodes: Object.freeze(Object.fromEntries(nodeResults)),
    links: Object.freeze(Object.fromEntries(linkResults)),
    belowVaporPressure: Object.freeze(belowVapor),
    belowAtmosphere: Object.freeze(belowAtm),
  });
}

/**
 * The definition of one operating case: the network with the case's demands, surface levels
 * and pressures, link statuses, valve settings, pump speeds, pumps, aged pipe and fluid.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for an id the network does not hold or that names
 *   a node or link of another kind (a level for a junction, a setting for a run).
 * @example
 * ```ts
 * const low = applyNetworkCase(definition, { name: 'low tank', levels: { tank: q(8, 'm') } });
 * ```
 */
export function applyNetworkCase(
  definition: NetworkDefinition,
  operatingCase: NetworkCase,
): NetworkDefinition {
  const def = guardRecord('definition', definition) as unknown as NetworkDefinition;
  const c = guardRecord('operatingCase', operatingCase) as unknown as NetworkCase;
  const nodes = guardArray('nodes', def.nodes);
  const links = guardArray('links', def.links);
  const nodeById = new Map<string, number>();
  nodes.forEach((n, i) => {
    const id = (n as { id?: unknown } | null)?.id;
    if (typeof id === 'string') nodeById.set(id, i);
  });
  const linkById = new Map<string, number>();
  links.forEach((l, i) => {
    const id = (l as { id?: unknown } | null)?.id;
    if (typeof id === 'string') linkById.set(id, i);
  });
  const newNodes = nodes.slice() as Record<string, unknown>[];
  const newLinks = links.slice() as Record<string, unknown>[];
  const each = (
    field: string,
    value: unknown,
    byId: Map<string, number>,
    target: Record<string, unknown>[],
    change: (item: Record<string, unknown>, v: unknown, name: string) => Record<string, unknown>,
  ): void => {
    if (value === undefined) return;
    const record = guardRecord(`operatingCase.${field}`, value);
    for (const [id, v] of Object.entries(record)) {
      const i = byId.get(id);
      const name = `operatingCase.${field}.${id}`;
      if (i === undefined) {
        throw argumentError(
          'INVALID_ARGUMENT',
          name,
          id,
          undefined,
          `an id of the network's ${byId === nodeById ? 'nodes' : 'links'}`,
        );
      }
      target[i] = change(guardRecord(name, target[i]), v, name);
    }
  };
  const need = (ok: boolean, name: string, what: string): void => {
    if (!ok) throw argumentError('INVALID_ARGUMENT', name, undefined, undefined, what);
  };
  each('demands', c.demands, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] === undefined && n['outlet'] === undefined, name, 'the id of a junction');
    return { ...n, demand: guardRange(name, v, { unit: 'm3/s' }) };
  });
  each('levels', c.levels, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] !== undefined, name, 'the id of a fixed-level surface');
    return { ...n, elevation: guardRange(name, v, { unit: 'm' }) };
  });
  each('pressures', c.pressures, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] !== undefined, name, 'the id of a fixed-level surface');
    return {
      ...n,
      surface: {
        ...(n['surface'] as object),
        pressure: guardRange(name, v, { min: 0, unit: 'Pa' }),
      },
    };
  });
  each('status', c.status, linkById, newLinks, (l, v, name) => ({
    ...l,
    status: guardOneOf(name, v, ['open', 'closed']),
  }));
  each('settings', c.settings, linkById, newLinks, (l, v, name) => {
    need(l['valve'] !== undefined, name, 'the id of a control valve');
    return { ...l, valve: { ...(l['valve'] as object), setting: guardRange(name, v, { min: 0 }) } };
  });
  each('speeds', c.speeds, linkById, newLinks, (l, v, name) => {
    need(l['pump'] !== undefined, name, 'the id of a pump link');
    return { ...l, speed: guardRange(name, v, { min: 0, minOpen: true, unit: 'rad/s' }) };
  });
  each('pumps', c.pumps, linkById, newLinks, (l, v, name) => {
    need(l['pump'] !== undefined, name, 'the id of a pump link');
    return { ...l, pump: guardRecord(name, v) };
  });
  return {
    ...def,
    ...(c.name !== undefined ? { name: guardString('operatingCase.name', c.name) } : {}),
    ...(c.fluid !== undefined ? { fluid: c.fluid } : {}),
    ...(c.aged !== undefined ? { aged: guardBoolean('operatingCase.aged', c.aged) } : {}),
    nodes: newNodes as unknown as NetworkDefinition['nodes'],
    links: newLinks as unknown as NetworkDefinition['links'],
  };
}

/**
 * The coefficient k of an outlet `Q = k p^n` from one rated point: `k = Q / p^n` (SI: m3/s
 * and Pa gauge), as nozzles, sprinklers and emitters are rated (a K-factor).
 *
 * @param flow - rated flow (m3/s), > 0
 * @param gaugePressure - the pressure above the atmosphere at that flow (Pa), > 0
 * @param exponent - n, 0.3 to 3 (default 0.5, an orifice)
 * @throws HeadflowError `INVALID_ARGUMENT` for values outside those ranges.
 * @example
 * ```ts
 * outletCoefficient(q(80, 'L/min'), q(1, 'bar')); // 4.216e-6 (m3/s per Pa^0.5)
 * ```
 */
export function outletCoefficient(flow: Flow, gaugePressure: Pressure, exponent = 0.5): number {
  const qv = guardRange('flow', flow, { min: 0, minOpen: true, unit: 'm3/s' });
  const p = guardRange('gaugePressure', gaugePressure, { min: 0, minOpen: true, unit: 'Pa' });
  const e = guardRange('exponent', exponent, { min: 0.3, max: 3 });
  return qv / p ** e;
}

/**
 * The numbers of one solve: a definition (with its case applied) checked and resolved on a
 * layout, with the laws of pumps, valves and outlets.
 *
 * @module
 * @internal
 */
import { argumentError } from '../errors';
import type { FluidState } from '../fluids/index';
import {
  guardBoolean,
  guardInteger,
  guardOneOf,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import { type Flow, STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from '../units/index';
import { CLOSED, FCV, JUNCTION, OPEN, PRV, PSV, PUMP, RUN, SURFACE } from './codes';
import { pipeRun, type RunContext, type RunEvaluator, runEvaluator } from './run';
import { checkRunRoughness, type LossSlope, runContext, runLossSlope } from './run-law';
import type { Topology } from './topology';
import type {
  ControlValve,
  HeadRiseCurve,
  NetworkDefinition,
  NetworkLink,
  PumpLink,
  RunLink,
  ValveLink,
} from './types';

/** Mean velocity at which open control valves leave their square law for the low-flow cubic. */
const VALVE_LOW_VELOCITY = 1e-3;
/** Head (m) of the flow at which outlets leave their power law for the low-flow cubic. */
const OUTLET_LOW_HEAD = 1e-3;

/** A pump link's curve, resolved for a solve. */
export interface PumpModel {
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
export interface Model {
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
  // The vapour pressure is compared with every node's pressure in the solution.
  if (f['vaporPressure'] !== undefined) {
    guardRange('fluid.vaporPressure', f['vaporPressure'], { min: 0, unit: 'Pa' });
  }
}

export function buildModel(topo: Topology, def: NetworkDefinition): Model {
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
export function pumpGain(p: PumpModel, flow: number, res: LossSlope): number {
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
export function powerLoss(r: number, e: number, q0: number, flow: number, res: LossSlope): number {
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

/**
 * The shapes of a network: its nodes, its links, an operating case, solver options and the
 * solution.
 *
 * @module
 */
import type { FluidState } from '../fluids/index';
import type { FrictionFactorOptions } from '../friction/index';
import type {
  Acceleration,
  Flow,
  Length,
  Pressure,
  RotationalSpeed,
  Velocity,
} from '../units/index';
import type { PipeRunInput } from './run';

/** A junction: where links meet; `demand` is a flow drawn off there (negative: fed in). */
export interface JunctionNode {
  readonly id: string;
  /** Elevation above a common datum (m). */
  readonly elevation: Length;
  /** Flow drawn off (m3/s); negative for a flow fed in. Default 0. */
  readonly demand?: Flow;
}

/** A fixed-level surface: a tank, reservoir, canal or vessel whose level and pressure hold. */
export interface SurfaceNode {
  readonly id: string;
  /** Elevation of the liquid surface above the datum (m). */
  readonly elevation: Length;
  /** The surface's absolute pressure; the network's atmosphere when absent. */
  readonly surface: { readonly pressure?: Pressure };
}

/**
 * An outlet whose flow depends on its pressure, as sprinkler heads, nozzles and emitters are
 * rated: `Q = coefficient * p_gauge^exponent` (Q in m3/s, p_gauge in Pa above the network's
 * atmosphere; no flow when the pressure is at or below the atmosphere). Use
 * {@link outletCoefficient} to get the coefficient from a rated flow and pressure.
 */
export interface OutletNode {
  readonly id: string;
  /** Elevation of the outlet (m). */
  readonly elevation: Length;
  readonly outlet: {
    /** k in Q = k p^n, SI (m3/s per Pa^n), > 0. */
    readonly coefficient: number;
    /** n in Q = k p^n, 0.1 to 3; default 0.5 (an orifice). */
    readonly exponent?: number;
  };
}

/** A node of a network. */
export type NetworkNode = JunctionNode | SurfaceNode | OutletNode;

/** Whether a link may carry flow in a case. */
export type LinkStatus = 'open' | 'closed';

interface LinkBase {
  readonly id: string;
  /** Node id at the link's start; a positive flow runs from `from` to `to`. */
  readonly from: string;
  readonly to: string;
  /** `'closed'` carries no flow in this case (default `'open'`). */
  readonly status?: LinkStatus;
}

/** A pipe run between two nodes, optionally with a check valve (no flow from `to` to `from`). */
export interface RunLink extends LinkBase {
  readonly run: PipeRunInput;
  readonly checkValve?: boolean;
}

/**
 * What a pump link needs of a pump: its head rise at a flow within its flow range (a
 * `PumpCurve` from the pumps module fits). `headSlope` (dH/dQ, s/m^2) is used when present,
 * else a central difference of `head`. `speed` is the speed the curve holds at (needed when
 * the link sets a `speed`).
 */
export interface HeadRiseCurve {
  head(flow: Flow): Length;
  readonly flowRange: { readonly min: Flow; readonly max: Flow };
  readonly speed?: RotationalSpeed;
  headSlope?(flow: Flow): number;
}

/**
 * A pump (or identical pumps in parallel or series) that adds head from `from` to `to`.
 * It never runs backwards: when the network needs more head than it makes at zero flow it is
 * shut off (reported as `'shut'`).
 */
export interface PumpLink extends LinkBase {
  readonly pump: HeadRiseCurve;
  /** Running speed; the curve is scaled by the affinity laws from `pump.speed`. */
  readonly speed?: RotationalSpeed;
  /** Number of identical pumps, 1 to 20 (default 1). */
  readonly count?: number;
  /** How `count` pumps are combined (default `'parallel'`). */
  readonly arrangement?: 'parallel' | 'series';
}

/**
 * A control valve in the trade's sense, with its loss when wide open, `openK V^2/(2g)` at
 * `diameter`:
 * - `'pressure-reducing'`: holds the absolute pressure `setting` at its outlet (`to`) while
 *   the inlet is higher; never passes flow backwards.
 * - `'pressure-sustaining'`: holds the absolute pressure `setting` at its inlet (`from`) while
 *   the outlet is lower; never passes flow backwards.
 * - `'flow-limiting'`: holds the flow `setting` (m3/s) when the network would push more;
 *   never passes flow backwards.
 */
export type ControlValve =
  | {
      readonly kind: 'pressure-reducing' | 'pressure-sustaining';
      readonly setting: Pressure;
      readonly diameter: Length;
      readonly openK: number;
    }
  | {
      readonly kind: 'flow-limiting';
      readonly setting: Flow;
      readonly diameter: Length;
      readonly openK: number;
    };

/** A control valve between two nodes. */
export interface ValveLink extends LinkBase {
  readonly valve: ControlValve;
}

/** A link of a network. */
export type NetworkLink = RunLink | PumpLink | ValveLink;

/** A network: nodes and links with the fluid, gravity and friction policy of systems. */
export interface NetworkDefinition {
  readonly name?: string;
  readonly fluid: FluidState;
  readonly nodes: readonly NetworkNode[];
  readonly links: readonly NetworkLink[];
  /** Gravity (m/s^2), default 9.80665. */
  readonly g?: Acceleration;
  /**
   * Friction-factor policy of runs. In a network the transition rule defaults to
   * `'interpolate'` (continuous in flow, which Newton's method needs); see `solveNetwork`.
   */
  readonly friction?: FrictionFactorOptions;
  /** Aged roughness for every run (default false). */
  readonly aged?: boolean;
  /** Atmospheric pressure for surfaces without a pressure and for outlets (default 101325 Pa). */
  readonly atmosphere?: Pressure;
}

/** What an operating case changes in a network; anything it omits stays as defined. */
export interface NetworkCase {
  readonly name?: string;
  readonly fluid?: FluidState;
  /** Junction demands by node id (m3/s). */
  readonly demands?: Readonly<Record<string, Flow>>;
  /** Surface levels (elevations of the liquid surface) by node id. */
  readonly levels?: Readonly<Record<string, Length>>;
  /** Surface pressures (absolute) by node id. */
  readonly pressures?: Readonly<Record<string, Pressure>>;
  /** Link status by link id. */
  readonly status?: Readonly<Record<string, LinkStatus>>;
  /** Control valve settings by link id (a pressure or a flow, as the valve's kind). */
  readonly settings?: Readonly<Record<string, number>>;
  /** Pump speeds by link id. */
  readonly speeds?: Readonly<Record<string, RotationalSpeed>>;
  /** Another pump on a pump link (a candidate), by link id. */
  readonly pumps?: Readonly<Record<string, HeadRiseCurve>>;
  /** Aged roughness for every run. */
  readonly aged?: boolean;
}

/** Options of `solveNetwork`. */
export interface NetworkSolveOptions {
  /** Largest number of linear solves (default 50, at most 1000). */
  readonly maxIterations?: number;
  /** Largest head-loss imbalance on any link at the solution (m), default 1e-9. */
  readonly headTolerance?: number;
  /** Largest flow imbalance at any node, relative to the largest link flow, default 1e-12. */
  readonly flowTolerance?: number;
}

/** State of a link at the solution. */
export type LinkState =
  /** Carries flow by its law (a run, an open valve, a running pump). */
  | 'open'
  /** Closed by the case. */
  | 'closed'
  /** A check valve or control valve closed against reverse flow, or a pump shut off. */
  | 'shut'
  /** A control valve throttling to hold its setting. */
  | 'active'
  /**
   * A run held at Re 2300 on the friction jump of the `'conservative'` transition rule: the
   * head across it lies inside the jump, which no flow balances (see `solveNetwork`).
   */
  | 'pinned';

/** A node at the solution. */
export interface NodeSolution {
  /** Elevation plus pressure/(rho g), on the absolute-pressure basis (m). */
  readonly head: Length;
  /** Absolute pressure (Pa). */
  readonly pressure: Pressure;
  /**
   * Flow leaving the network at the node (m3/s): the demand at a junction, the outlet's
   * discharge, and at a surface the flow into it (negative when it supplies the network).
   */
  readonly outflow: Flow;
  /** True when no open path joins the node to a surface (its head is then not defined and
   * is reported as its elevation at the atmosphere). */
  readonly isolated: boolean;
}

/** A link at the solution. */
export interface LinkSolution {
  /** Flow, positive from `from` to `to` (m3/s). */
  readonly flow: Flow;
  /** Head at `from` minus head at `to` (m); negative across a running pump. */
  readonly headLoss: Length;
  readonly state: LinkState;
  /** Mean velocity (runs and valves). */
  readonly velocity: Velocity | undefined;
  /** Reynolds number (runs). */
  readonly reynolds: number | undefined;
  /** Darcy friction factor in use (runs; for Hazen-Williams the equivalent factor). */
  readonly frictionFactor: number | undefined;
  /** Head added by the pump link (m), 0 when shut. */
  readonly pumpHead: Length | undefined;
}

/** A solved network. */
export interface NetworkSolution {
  readonly name: string;
  /** Linear solves made. */
  readonly iterations: number;
  /** Largest |loss law - head difference| over flowing links at the solution (m). */
  readonly headResidual: number;
  /** Largest flow imbalance at a node, relative to the largest link flow. */
  readonly flowResidual: number;
  readonly nodes: Readonly<Record<string, NodeSolution>>;
  readonly links: Readonly<Record<string, LinkSolution>>;
  /** Nodes whose pressure is below the liquid's vapour pressure: the result is not physical. */
  readonly belowVaporPressure: readonly string[];
  /** Nodes below the atmosphere: air is drawn in at leaks and air valves there. */
  readonly belowAtmosphere: readonly string[];
}

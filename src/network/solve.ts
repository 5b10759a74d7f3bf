/**
 * The network solver: the global gradient method on node heads and link flows.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { guardInteger, guardOptions, guardRange, guardRecord } from '../guards';
import type { Flow, Length, Pressure, Velocity } from '../units/index';
import { caseDefinition } from './cases';
import {
  ACTIVE,
  CLOSED,
  EMITTER,
  FCV,
  OPEN,
  PINNED,
  PRV,
  PSV,
  PUMP,
  RUN,
  SHUT,
  STATE_NAMES,
  SURFACE,
} from './codes';
import { buildModel, type Model, type PumpModel, powerLoss, pumpGain } from './model';
import type { RunContext, RunEvaluator, RunLossBreakdown } from './run';
import { type LossSlope, runLossSlope } from './run-law';
import { buildTopology, type Topology } from './topology';
import type {
  LinkSolution,
  LinkState,
  NetworkCase,
  NetworkDefinition,
  NetworkSolution,
  NetworkSolveOptions,
  NodeSolution,
} from './types';

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

/**
 * Flows below this (m3/s, 3.6 uL/h) are the rounding of the heads of a network at rest: states
 * are revised when every flow is below it.
 */
const REST_FLOW = 1e-12;

/** Ulps of a head equation's terms that rounding alone can leave in a node's flow balance. */
const ROUNDING = 32 * Number.EPSILON;

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
          : caseDefinition(def, operatingCase);
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
 * ulps of the terms its head equation sums, whichever is larger; likewise a link's head
 * balance at the head tolerance or at 32 ulps of its loss and end heads. Heads inside the
 * solve are measured from the first surface's head to keep that rounding small.
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
  const isVar = new Uint8Array(nodes);
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
  let headOk = false;
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
      headOk = true;
      for (let k = 0; k < total; k++) {
        if (inMatrix[k] === 0) continue;
        const hf = H[from[k] as number] as number;
        const ht = H[to[k] as number] as number;
        const lk = loss[k] as number;
        const r = Math.abs(lk - (hf - ht));
        // The tolerance, or the rounding of the numbers the balance subtracts (a loss of
        // 1e5 m cannot balance to 1e-10 m), whichever is larger.
        if (r > o.headTolerance + ROUNDING * (Math.abs(lk) + Math.abs(hf) + Math.abs(ht))) {
          headOk = false;
        }
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
      if (revised && !changed && headOk && flowOk) break;
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
    // A node whose head this step solves for: a row, not held, joined to a held head.
    for (let i = 0; i < nodes; i++) {
      const r = row[i] as number;
      const v = r >= 0 && fixedNow[i] === 0 && reached[i] === 1;
      isVar[i] = v ? 1 : 0;
      if (v) rhs[r] = -(model.demand[i] as number);
    }
    for (let k = 0; k < total; k++) {
      const a = from[k] as number;
      const b = to[k] as number;
      const va = isVar[a] === 1;
      const vb = isVar[b] === 1;
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
      if (r >= 0 && isVar[i] === 0) {
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
      if (r >= 0 && isVar[i] === 1) H[i] = rhs[r] as number;
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
    // A network at rest (every flow below REST_FLOW, the rounding of its heads) has settled
    // too: relative to a largest flow of rounding size no change would ever count as settled.
    const settled = change <= SETTLED * largest || largest <= REST_FLOW;
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

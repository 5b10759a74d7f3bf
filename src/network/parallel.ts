/**
 * Branches in parallel between two nodes: the smallest network, solved by the same global
 * gradient step as `solveNetwork` (one unknown head difference), for systems' parallel groups.
 *
 * @module
 * @internal
 */
import { type RunContext, type RunEvaluator, runLoss } from './run';
import { type LossSlope, runLossSlope } from './run-law';

/** @internal A parallel group prepared for repeated splits (with its warm-start state). */
export interface ParallelGroup {
  readonly branches: readonly (readonly RunEvaluator[])[];
  /** Each branch's share of the total flow at the last split (the next split starts there). */
  readonly shares: Float64Array;
  /** Scratch: each branch's loss and slope. */
  readonly loss: Float64Array;
  readonly slope: Float64Array;
  /** Pinned flow of a branch held on a friction jump (NaN when free), and its loss interval. */
  readonly pin: Float64Array;
  readonly pinLow: Float64Array;
  readonly pinHigh: Float64Array;
  readonly pins: Int32Array;
  /** Count of branches without resistance (length 0, no fittings, valves or equipment). */
  readonly bare: number;
  /** 1 for a branch without resistance, else 0. */
  readonly isBare: Uint8Array;
  /** Iterations of the last split (for benchmarks and tests). */
  lastIterations: number;
}

/** True when a run has no resistance at all: no length, fittings, valves or equipment. */
function resistanceFree(ev: RunEvaluator): boolean {
  const r = ev.run;
  return (
    r.length === 0 && ev.fittings === undefined && r.valveK === 0 && ev.components.length === 0
  );
}

/** Most global gradient steps one split makes. */
const MAX_STEPS = 60;
/** Times a branch may be pinned on a jump in one split (the rule cannot cycle). */
const MAX_PINS = 3;
/** A split is done when the branches' losses agree to this fraction of the loss (or 1e-15 m). */
const SPREAD = 1e-13;
/** Reynolds number of the friction jump of the `'conservative'` rule. */
const JUMP_RE = 2300;
/** Relative spread of losses below which the next step is taken as the last (see below). */
const NEAR = 1e-7;
/** Reynolds numbers where the friction law has a kink (the transition band's ends). */
const KINKS = [2300, 4000] as const;

/** True when a run of the branch passes Re 2300 or 4000 between flows a and b. */
function crossesKink(
  branch: readonly RunEvaluator[],
  a: number,
  b: number,
  ctx: RunContext,
): boolean {
  const lo = Math.min(Math.abs(a), Math.abs(b));
  const hi = Math.max(Math.abs(a), Math.abs(b));
  if (a * b <= 0) return true;
  for (const ev of branch) {
    const run = ev.run;
    if (run.law !== 'darcy-weisbach') continue;
    for (const re of KINKS) {
      const q = (re * ctx.kinematicViscosity * run.area) / run.insideDiameter;
      if (q >= lo && q <= hi) return true;
    }
  }
  return false;
}

/** @internal Prepares a group for {@link parallelSplit}. */
export function parallelGroup(branches: readonly (readonly RunEvaluator[])[]): ParallelGroup {
  const n = branches.length;
  const isBare = Uint8Array.from(branches, (b) => (b.every(resistanceFree) ? 1 : 0));
  return {
    branches,
    bare: isBare.reduce((a, b) => a + b, 0),
    isBare,
    shares: new Float64Array(n).fill(Number.NaN),
    loss: new Float64Array(n),
    slope: new Float64Array(n),
    pin: new Float64Array(n),
    pinLow: new Float64Array(n),
    pinHigh: new Float64Array(n),
    pins: new Int32Array(n),
    lastIterations: 0,
  };
}

const RES: LossSlope = { slope: 0 };

function branchLoss(branch: readonly RunEvaluator[], flow: number, ctx: RunContext): number {
  let h = 0;
  for (const ev of branch) h += runLoss(ev, flow, ctx);
  return h;
}

/** A jump flow of the branch strictly between a and b (Re 2300 in one of its runs), or NaN. */
function jumpBetween(
  branch: readonly RunEvaluator[],
  a: number,
  b: number,
  ctx: RunContext,
): number {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  for (const ev of branch) {
    const run = ev.run;
    if (run.law !== 'darcy-weisbach' || run.length === 0) continue;
    // Q at Re 2300: Re nu A / D.
    const q = (JUMP_RE * ctx.kinematicViscosity * run.area) / run.insideDiameter;
    if (q > lo && q < hi) return q;
  }
  return Number.NaN;
}

/**
 * @internal Splits `total` (m3/s, >= 0) among the branches so that every branch loses the
 * same head; writes the branch flows into `flows` and returns that head loss (m).
 *
 * Method: the global gradient step of Todini and Pilati (1988) on the two-node network: with
 * each branch's loss h_i and slope p_i at its current flow, `y_i = q_i - h_i/p_i`, the common
 * loss `dH = (Q - sum y_i) / sum(1/p_i)` and the new flows `q_i = y_i + dH/p_i` (which sum to
 * Q). It starts from the shares of the last split (a curve is evaluated along nearby flows),
 * or the first time from shares proportional to `1/sqrt(h_i(Q))` (exact for square laws).
 * Stops when the branches' losses agree to 1e-13 of the loss.
 *
 * Friction jump. With the `'conservative'` transition rule the loss jumps up at Re 2300, and a
 * branch may need a loss inside the jump, which no flow gives. When a step carries a branch
 * across its jump flow, the branch is pinned there (its flow held at Re 2300, as a fixed
 * flow in the step); it is freed when the common loss leaves the branch's jump interval
 * (at most 3 pins per branch per split, so the rule cannot cycle). A pinned branch's loss is
 * reported as the common loss, which lies inside its jump.
 */
export function parallelSplit(
  g: ParallelGroup,
  total: number,
  ctx: RunContext,
  flows: Float64Array,
): number {
  const n = g.branches.length;
  if (total === 0) {
    flows.fill(0, 0, n);
    g.lastIterations = 0;
    return 0;
  }
  // A branch without resistance (a run of length 0 with no fittings) takes the whole flow at
  // no loss; several such branches share it equally. (The gradient step needs a slope > 0.)
  if (g.bare > 0) {
    for (let i = 0; i < n; i++) flows[i] = g.isBare[i] === 1 ? total / g.bare : 0;
    g.lastIterations = 0;
    return 0;
  }
  const jumps = !ctx.policy.interpolate;
  g.pin.fill(Number.NaN);
  g.pins.fill(0);
  if (!((g.shares[0] as number) >= 0)) {
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const w = 1 / Math.sqrt(branchLoss(g.branches[i] as readonly RunEvaluator[], total, ctx));
      g.shares[i] = w;
      sum += w;
    }
    for (let i = 0; i < n; i++) g.shares[i] = (g.shares[i] as number) / sum;
  }
  for (let i = 0; i < n; i++) flows[i] = (g.shares[i] as number) * total;
  let steps = 0;
  let common = 0;
  // A pin or release moves a flow off the step's balance: the next step restores it.
  let moved = false;
  let kinked = false;
  for (;;) {
    // Losses and slopes of free branches; the spread of their losses and the pinned ones'
    // intervals decide convergence.
    let lo = Number.POSITIVE_INFINITY;
    let hi = Number.NEGATIVE_INFINITY;
    let mean = 0;
    let free = 0;
    for (let i = 0; i < n; i++) {
      if (!Number.isNaN(g.pin[i] as number)) continue;
      let h = 0;
      let p = 0;
      const q = flows[i] as number;
      for (const ev of g.branches[i] as readonly RunEvaluator[]) {
        h += runLossSlope(ev, q, ctx, RES);
        p += RES.slope;
      }
      g.loss[i] = h;
      g.slope[i] = p;
      if (h < lo) lo = h;
      if (h > hi) hi = h;
      mean += h;
      free++;
    }
    if (free === 0) {
      // Every branch on its jump: only right if the jump flows make up the total (then the
      // common loss is any value in all intervals); otherwise free them all and go on.
      let sum = 0;
      let a = Number.NEGATIVE_INFINITY;
      let b = Number.POSITIVE_INFINITY;
      for (let i = 0; i < n; i++) {
        sum += g.pin[i] as number;
        a = Math.max(a, g.pinLow[i] as number);
        b = Math.min(b, g.pinHigh[i] as number);
      }
      if (Math.abs(sum - total) <= 1e-12 * total || steps >= MAX_STEPS) {
        common = 0.5 * (a + b);
        break;
      }
      g.pin.fill(Number.NaN);
      moved = true;
      steps++;
      continue;
    }
    mean /= free;
    const tol = SPREAD * Math.abs(mean) + 1e-15;
    let done = !moved && hi - lo <= tol;
    for (let i = 0; i < n && done; i++) {
      if (Number.isNaN(g.pin[i] as number)) continue;
      if (mean < (g.pinLow[i] as number) - tol || mean > (g.pinHigh[i] as number) + tol)
        done = false;
    }
    if (done || steps >= MAX_STEPS) {
      common = mean;
      break;
    }
    let sumY = 0;
    let sumW = 0;
    for (let i = 0; i < n; i++) {
      const pinned = g.pin[i] as number;
      if (!Number.isNaN(pinned)) {
        sumY += pinned;
        continue;
      }
      const w = 1 / (g.slope[i] as number);
      sumY += (flows[i] as number) - (g.loss[i] as number) * w;
      sumW += w;
    }
    const dh = (total - sumY) / sumW;
    // Near the split (losses within 1e-7 of each other) one more step leaves an error of
    // order (1e-7)^2 (Newton's quadratic convergence), well inside SPREAD: take it without a
    // confirming evaluation, unless a pin moved or a flow crosses a kink of its law.
    const near = !moved && free === n && hi - lo <= NEAR * Math.abs(mean);
    moved = false;
    for (let i = 0; i < n; i++) {
      const branch = g.branches[i] as readonly RunEvaluator[];
      const pinned = g.pin[i] as number;
      if (!Number.isNaN(pinned)) {
        // Free the branch when the common loss leaves its jump interval.
        if (dh > (g.pinHigh[i] as number)) {
          g.pin[i] = Number.NaN;
          flows[i] = pinned * (1 + 1e-9);
          moved = true;
        } else if (dh < (g.pinLow[i] as number)) {
          g.pin[i] = Number.NaN;
          flows[i] = pinned * (1 - 1e-9);
          moved = true;
        }
        continue;
      }
      const w = 1 / (g.slope[i] as number);
      const old = flows[i] as number;
      const next = old - (g.loss[i] as number) * w + dh * w;
      const jump =
        jumps && (g.pins[i] as number) < MAX_PINS
          ? jumpBetween(branch, old, next, ctx)
          : Number.NaN;
      if (!Number.isNaN(jump)) {
        g.pin[i] = jump;
        g.pins[i] = (g.pins[i] as number) + 1;
        g.pinLow[i] = branchLoss(branch, jump * (1 - 1e-12), ctx);
        g.pinHigh[i] = branchLoss(branch, jump * (1 + 1e-12), ctx);
        flows[i] = jump;
        moved = true;
      } else {
        if (near && crossesKink(branch, old, next, ctx)) kinked = true;
        flows[i] = next;
      }
    }
    steps++;
    if (near && !moved && !kinked) {
      common = dh;
      break;
    }
    kinked = false;
  }
  for (let i = 0; i < n; i++) g.shares[i] = (flows[i] as number) / total;
  g.lastIterations = steps;
  return common;
}

import { argumentError, checkPositive, HeadflowError } from '../errors';
import { guardArray } from '../guards';
import { brent } from '../numeric/brent';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Length,
  type Power,
  STANDARD_GRAVITY,
} from '../units/index';
import { fmt, guardPump, inRange, maximize } from './internal';
import { shareOf } from './pump-curve';
import type { BestEfficiencyPoint, FlowRange, Pump, PumpShare } from './types';

function checkPumps(pumps: readonly Pump[]): void {
  if (!Array.isArray(pumps) || pumps.length < 1) {
    throw argumentError('INVALID_ARGUMENT', 'pumps', 0, 'pumps', 'at least 1 pump');
  }
  guardArray('pumps', pumps, { max: 100 });
  for (const [i, p] of pumps.entries()) guardPump(`pumps[${i}]`, p);
}

/** Efficiency of a combination from its head and the members' powers (unit density). */
function combinedEfficiency(flow: number, head: number, powerAtUnitDensity: number): number {
  return flow === 0 ? 0 : (STANDARD_GRAVITY * flow * head) / powerAtUnitDensity;
}

abstract class Combination implements Pump {
  abstract readonly flowRange: FlowRange;
  abstract readonly shutoffHead: Length | undefined;
  readonly hasEfficiency: boolean;
  readonly preferredRegion = undefined;
  readonly allowableRegion = undefined;
  private bep: BestEfficiencyPoint | undefined | null = null;

  constructor(protected readonly pumps: readonly Pump[]) {
    this.hasEfficiency = pumps.every((p) => p.hasEfficiency);
  }

  abstract head(flow: Flow): Length;
  abstract shares(flow: Flow): readonly PumpShare[];
  abstract readonly npshRange: FlowRange | undefined;
  abstract npshRequired(flow: Flow): Length;

  /** Best efficiency point of the whole (searched once, on first use). */
  get bestEfficiencyPoint(): BestEfficiencyPoint | undefined {
    if (this.bep === null) {
      if (!this.hasEfficiency) this.bep = undefined;
      else {
        const { min, max } = this.flowRange;
        const m = maximize((x) => this.efficiency(x as Flow), min, max, 64);
        this.bep = { flow: m.x as Flow, head: this.head(m.x as Flow), efficiency: m.value };
      }
    }
    return this.bep;
  }

  efficiency(flow: Flow): number {
    const shares = this.shares(flow);
    let power = 0;
    for (const [i, s] of shares.entries()) {
      power += (this.pumps[i] as Pump).shaftPower(s.flow, 1 as Density);
    }
    return combinedEfficiency(flow, this.head(flow), power);
  }

  shaftPower(flow: Flow, density: Density, g: Acceleration = STANDARD_GRAVITY): Power {
    checkPositive('density', density, 'kg/m3');
    const shares = this.shares(flow);
    let power = 0;
    for (const [i, s] of shares.entries()) {
      power += (this.pumps[i] as Pump).shaftPower(s.flow, density, g);
    }
    return power as Power;
  }
}

/**
 * Pumps in parallel: at a common head each pump gives its own flow and the flows add,
 * `Q(H) = sum Q_i(H)` (pumps may differ). A pump whose shut-off head is below the common
 * head gives no flow (its check valve stays shut; it runs dead-headed, which the shares
 * show). The combined curve covers the heads where every pump's catalogue data apply: from
 * the highest end-of-curve head of the members up to the highest shut-off head (or the lowest
 * first-point head of a member whose data start above zero flow).
 *
 * `head(flow)` inverts the sum by Brent's method over that head range (each member's flow at
 * a head is itself a bracketed solve), so it costs a few dozen member evaluations per call.
 * The combination's efficiency is `rho g Q H / sum P_i`; its NPSH required is the largest
 * of the running members' at their own flows. Operating regions apply per pump: see each
 * share's `percentOfBep` and `inPreferredRegion`.
 *
 * Source: the parallel rule is common practice (e.g. any pump-system text: flows add at equal
 * head).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty list; `NO_SOLUTION` when the members'
 *   catalogue data share no head range.
 * @example
 * ```ts
 * const two = pumpsInParallel([pump, pump]);
 * to(two.head(q(200, 'm3/h')), 'm'); // = pump.head(q(100, 'm3/h'))
 * ```
 */
export function pumpsInParallel(pumps: readonly Pump[]): Pump {
  checkPumps(pumps);
  return new Parallel(pumps);
}

class Parallel extends Combination {
  readonly flowRange: FlowRange;
  readonly shutoffHead: Length | undefined;
  readonly npshRange: FlowRange | undefined;
  private readonly hLow: number;
  private readonly hHigh: number;

  constructor(pumps: readonly Pump[]) {
    super(pumps);
    let hLow = Number.NEGATIVE_INFINITY;
    let hTopShutoff = Number.NEGATIVE_INFINITY;
    let hTopLimit = Number.POSITIVE_INFINITY;
    for (const p of pumps) {
      hLow = Math.max(hLow, p.head(p.flowRange.max));
      const h0 = p.head(p.flowRange.min);
      hTopShutoff = Math.max(hTopShutoff, h0);
      if (p.flowRange.min > 0) hTopLimit = Math.min(hTopLimit, h0);
    }
    const hHigh = Math.min(hTopShutoff, hTopLimit);
    if (!(hHigh > hLow)) {
      throw new HeadflowError(
        'NO_SOLUTION',
        `these pumps share no head range in their catalogue data (one runs out at ${fmt(hLow)} m ` +
          `while another's data start at ${fmt(hHigh)} m); they cannot be combined in parallel.`,
        { parameter: 'pumps' },
      );
    }
    this.hLow = hLow;
    this.hHigh = hHigh;
    this.flowRange = {
      min: this.totalFlow(hHigh) as Flow,
      max: this.totalFlow(hLow) as Flow,
    };
    if (!(this.flowRange.max > this.flowRange.min)) {
      throw new HeadflowError(
        'NO_SOLUTION',
        `these pumps share only the head ${fmt(hHigh)} m in their catalogue data, no range of ` +
          'flows; they cannot be combined in parallel.',
        { parameter: 'pumps' },
      );
    }
    this.shutoffHead = this.flowRange.min === 0 ? (hHigh as Length) : undefined;
    this.npshRange = this.npshFlows();
  }

  /**
   * The total flows at which every member that runs lies inside its own NPSH data: a member
   * whose NPSH data start above its first catalogue flow bounds the common head from above
   * (below that head its flow is too small for its data), and each member's last NPSH flow
   * bounds it from below. Undefined when a member has no NPSH data or the bounds leave no range.
   */
  private npshFlows(): FlowRange | undefined {
    let hTop = this.hHigh;
    let hBottom = this.hLow;
    for (const p of this.pumps) {
      const r = p.npshRange;
      if (r === undefined) return undefined;
      if (r.min > p.flowRange.min) hTop = Math.min(hTop, p.head(r.min));
      if (r.max < p.flowRange.max) hBottom = Math.max(hBottom, p.head(r.max));
    }
    if (!(hTop > hBottom)) return undefined;
    return { min: this.totalFlow(hTop) as Flow, max: this.totalFlow(hBottom) as Flow };
  }

  /** Flow of one member at head h (0 above its shut-off head). */
  private memberFlow(p: Pump, h: number): number {
    // A parallel group inside this one: its flow at h is the sum of its own members' flows,
    // found directly rather than by inverting its head curve (a root search inside each step
    // of another made the best efficiency point of nested groups take hundreds of ms).
    if (p instanceof Parallel) return p.totalFlow(Math.min(p.hHigh, Math.max(p.hLow, h)));
    const { min, max } = p.flowRange;
    const hMin = p.head(min);
    if (h >= hMin) return min;
    const hMax = p.head(max);
    if (h <= hMax) return max;
    return brent((x) => p.head(x as Flow) - h, min, max, { xTolerance: 1e-14 * max }).root;
  }

  private totalFlow(h: number): number {
    let s = 0;
    for (const p of this.pumps) s += this.memberFlow(p, h);
    return s;
  }

  private headAt(flow: number): number {
    const x = inRange(
      'combined catalogue',
      flow,
      this.flowRange.min,
      this.flowRange.max,
      1,
      'm3/s',
    );
    if (x <= this.flowRange.min) return this.hHigh;
    if (x >= this.flowRange.max) return this.hLow;
    return brent((h) => this.totalFlow(h) - x, this.hLow, this.hHigh, {
      xTolerance: 1e-14 * Math.max(Math.abs(this.hHigh), Math.abs(this.hLow)),
    }).root;
  }

  head(flow: Flow): Length {
    return this.headAt(flow) as Length;
  }

  shares(flow: Flow): readonly PumpShare[] {
    const h = this.headAt(flow);
    return this.pumps.map((p) => {
      const qi = this.memberFlow(p, h) as Flow;
      const s = shareOf(p, qi);
      return { ...s, head: h as Length };
    });
  }

  npshRequired(flow: Flow): Length {
    const range = this.npshRange;
    if (range === undefined) {
      throw new HeadflowError('OUT_OF_RANGE', 'these pumps have no common NPSH data.', {
        parameter: 'flow',
      });
    }
    inRange('combined NPSH data', flow, range.min, range.max, 1, 'm3/s');
    let worst = 0;
    for (const [i, s] of this.shares(flow).entries()) {
      const p = this.pumps[i] as Pump;
      const r = p.npshRange as FlowRange;
      // Within the combined NPSH range each member's flow lies in its own data, up to the
      // rounding of the root searches at the ends: keep it there.
      if (s.flow > 0)
        worst = Math.max(worst, p.npshRequired(Math.min(r.max, Math.max(r.min, s.flow)) as Flow));
    }
    return worst as Length;
  }
}

/**
 * Pumps in series: the same flow passes each pump and the heads add,
 * `H(Q) = sum H_i(Q)` (pumps may differ), over the flows every member's catalogue covers.
 * The combination's efficiency is `rho g Q H / sum P_i`. Its NPSH required is the first
 * pump's (the one that takes suction); the later pumps see the earlier pumps' head at their
 * suction, which the caller checks with their own suction pressure.
 *
 * Source: common practice (heads add at equal flow).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for an empty list; `NO_SOLUTION` when the members'
 *   flow ranges do not overlap.
 * @example
 * ```ts
 * const two = pumpsInSeries([pump, pump]);
 * to(two.head(q(100, 'm3/h')), 'm'); // 60 = 2 x 30
 * ```
 */
export function pumpsInSeries(pumps: readonly Pump[]): Pump {
  checkPumps(pumps);
  return new Series(pumps);
}

class Series extends Combination {
  readonly flowRange: FlowRange;
  readonly shutoffHead: Length | undefined;
  readonly npshRange: FlowRange | undefined;

  constructor(pumps: readonly Pump[]) {
    super(pumps);
    const min = Math.max(...pumps.map((p) => p.flowRange.min));
    const max = Math.min(...pumps.map((p) => p.flowRange.max));
    if (!(max > min)) {
      throw new HeadflowError(
        'NO_SOLUTION',
        `these pumps share no flow range in their catalogue data (${fmt(min)} to ${fmt(max)} m3/s); ` +
          'they cannot be combined in series.',
        { parameter: 'pumps' },
      );
    }
    this.flowRange = { min: min as Flow, max: max as Flow };
    let shutoff: number | undefined = 0;
    for (const p of pumps) {
      shutoff =
        p.shutoffHead === undefined || shutoff === undefined ? undefined : shutoff + p.shutoffHead;
    }
    this.shutoffHead = min === 0 ? (shutoff as Length | undefined) : undefined;
    const first = pumps[0] as Pump;
    const nr = first.npshRange;
    this.npshRange =
      nr === undefined || nr.max < min || nr.min > max
        ? undefined
        : { min: Math.max(nr.min, min) as Flow, max: Math.min(nr.max, max) as Flow };
  }

  head(flow: Flow): Length {
    const x = inRange(
      'combined catalogue',
      flow,
      this.flowRange.min,
      this.flowRange.max,
      1,
      'm3/s',
    );
    let h = 0;
    for (const p of this.pumps) h += p.head(x as Flow);
    return h as Length;
  }

  shares(flow: Flow): readonly PumpShare[] {
    const x = inRange(
      'combined catalogue',
      flow,
      this.flowRange.min,
      this.flowRange.max,
      1,
      'm3/s',
    );
    return this.pumps.map((p) => shareOf(p, x as Flow));
  }

  npshRequired(flow: Flow): Length {
    return (this.pumps[0] as Pump).npshRequired(flow);
  }
}

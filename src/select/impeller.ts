/**
 * A catalogue pump's curves over its impeller range: the head at any diameter (by the trim
 * law below the smallest catalogue curve, by interpolation between catalogue curves above
 * it), the whole curve at a diameter, and the smallest diameter that meets a set of duties.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { brent } from '../numeric/brent';
import { type CataloguePoint, type PumpCurve, pumpCurve } from '../pumps/index';
import type { Flow, Length, RotationalSpeed } from '../units/index';
import type { CataloguePump } from './types';

/** One catalogue curve of a family, with its flow range at the catalogue speed. */
interface Member {
  readonly diameter: number;
  readonly curve: PumpCurve;
  readonly min: number;
  readonly max: number;
}

/** A pump's curves at several diameters (at the catalogue speed), smallest first. */
export interface ImpellerFamily {
  readonly speed: number;
  readonly full: number;
  readonly members: readonly Member[];
}

/** How a curve at a diameter was found. */
export type TrimBasis = 'trim law' | 'interpolated' | 'catalogue curve';

/** Relative tolerance under which a diameter is taken as a catalogue curve's own. */
const SAME_DIAMETER = 1e-9;

/** Points sampled along each bounding curve to build an interpolated curve. */
const INTERPOLATION_POINTS = 11;

/**
 * Builds a pump's family of curves from its catalogue entry (checked by the caller).
 * @throws HeadflowError what `pumpCurve` throws for a bad curve; `INVALID_ARGUMENT` for a
 *   curve larger than the full impeller or two curves at one diameter.
 */
export function impellerFamily(pump: CataloguePump, where: string): ImpellerFamily {
  const full = pump.impellerDiameter as number;
  const make = (diameter: Length, points: readonly CataloguePoint[], at: string): Member => {
    let curve: PumpCurve;
    try {
      curve = pumpCurve({ speed: pump.speed, impellerDiameter: diameter, points });
    } catch (e) {
      if (e instanceof HeadflowError) {
        throw new HeadflowError(e.code, `${at}: ${e.message}`, {
          parameter: `${at}.${e.parameter ?? 'points'}`,
          ...(e.allowed === undefined ? {} : { allowed: e.allowed }),
        });
      }
      throw e;
    }
    return { diameter, curve, min: curve.flowRange.min, max: curve.flowRange.max };
  };
  const members: Member[] = [make(pump.impellerDiameter, pump.points, where)];
  (pump.curves ?? []).forEach((c, i) => {
    const at = `${where}.curves[${i}]`;
    const d = c.impellerDiameter as number;
    if (d >= full * (1 - SAME_DIAMETER)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${at}.impellerDiameter = ${d} m is not allowed (allowed: < ${full} m, the full impeller of the pump's points).`,
        { parameter: `${at}.impellerDiameter`, value: d, unit: 'm', allowed: `< ${full} m` },
      );
    }
    if (members.some((m) => Math.abs(m.diameter - d) <= SAME_DIAMETER * full)) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `${at}.impellerDiameter = ${d} m is given twice (allowed: one curve per diameter).`,
        {
          parameter: `${at}.impellerDiameter`,
          value: d,
          unit: 'm',
          allowed: 'one curve per diameter',
        },
      );
    }
    members.push(make(c.impellerDiameter, c.points, at));
  });
  members.sort((a, b) => a.diameter - b.diameter);
  return { speed: pump.speed, full, members };
}

/** The members around `d`: [lower, upper, t] for interpolation, or undefined below the smallest. */
function bracketOf(f: ImpellerFamily, d: number): [Member, Member, number] | undefined {
  const m = f.members;
  for (let k = 0; k + 1 < m.length; k++) {
    const lo = m[k] as Member;
    const hi = m[k + 1] as Member;
    if (d >= lo.diameter && d <= hi.diameter) {
      return [lo, hi, (d - lo.diameter) / (hi.diameter - lo.diameter)];
    }
  }
  return undefined;
}

/**
 * Head (m) at `flow` (m3/s) with an impeller of diameter `d` at the catalogue speed, or
 * `undefined` where the flow lies beyond the data.
 *
 * - Between two catalogue curves D_k < d < D_k+1: linear interpolation in d between points at
 *   the same fraction s of each curve's flow range, `Q = lerp(Q_k(s), Q_k+1(s), t)`,
 *   `H = lerp(H_k(Q_k(s)), H_k+1(Q_k+1(s)), t)`, `t = (d - D_k) / (D_k+1 - D_k)`; s follows from
 *   Q in closed form (both flows are linear in s).
 * - Below the smallest curve D_0: the trim law from it, `H = r^2 H_0(Q / r)`, r = d / D_0.
 */
export function headAt(f: ImpellerFamily, d: number, flow: number): number | undefined {
  const bracket = bracketOf(f, d);
  if (bracket === undefined) {
    const base = f.members[0] as Member;
    const r = d / base.diameter;
    const x = flow / r;
    if (x < base.min || x > base.max) return undefined;
    return r * r * base.curve.head(x as Flow);
  }
  const [lo, hi, t] = bracket;
  const a = lo.min + t * (hi.min - lo.min);
  const b = lo.max - lo.min + t * (hi.max - hi.min - (lo.max - lo.min));
  const s = (flow - a) / b;
  if (!(s >= 0 && s <= 1)) return undefined;
  const hLo = lo.curve.head(Math.min(lo.max, lo.min + s * (lo.max - lo.min)) as Flow);
  const hHi = hi.curve.head(Math.min(hi.max, hi.min + s * (hi.max - hi.min)) as Flow);
  return hLo + t * (hHi - hLo);
}

/**
 * The whole curve at diameter `d` (catalogue speed): a catalogue curve itself, the trim law
 * from the smallest curve, or a curve through {@link INTERPOLATION_POINTS} points interpolated
 * as {@link headAt} does (efficiency and NPSH required alike; NPSH only where both curves
 * give it).
 */
export function curveAt(
  f: ImpellerFamily,
  d: number,
): { readonly curve: PumpCurve; readonly basis: TrimBasis } {
  for (const m of f.members) {
    if (Math.abs(m.diameter - d) <= SAME_DIAMETER * f.full) {
      return { curve: m.curve, basis: 'catalogue curve' };
    }
  }
  const bracket = bracketOf(f, d);
  if (bracket === undefined) {
    return { curve: (f.members[0] as Member).curve.trimmedTo(d as Length), basis: 'trim law' };
  }
  const [lo, hi, t] = bracket;
  const points: CataloguePoint[] = [];
  const lerp = (x: number, y: number): number => x + t * (y - x);
  for (let j = 0; j < INTERPOLATION_POINTS; j++) {
    const s = j / (INTERPOLATION_POINTS - 1);
    const qLo = j === INTERPOLATION_POINTS - 1 ? lo.max : lo.min + s * (lo.max - lo.min);
    const qHi = j === INTERPOLATION_POINTS - 1 ? hi.max : hi.min + s * (hi.max - hi.min);
    const flow = lerp(qLo, qHi);
    const npshLo = npshAt(lo.curve, qLo);
    const npshHi = npshAt(hi.curve, qHi);
    points.push({
      flow: flow as Flow,
      head: lerp(lo.curve.head(qLo as Flow), hi.curve.head(qHi as Flow)) as Length,
      efficiency: lerp(lo.curve.efficiency(qLo as Flow), hi.curve.efficiency(qHi as Flow)),
      ...(npshLo === undefined || npshHi === undefined
        ? {}
        : { npshRequired: lerp(npshLo, npshHi) as Length }),
    });
  }
  const curve = pumpCurve({
    speed: f.speed as RotationalSpeed,
    impellerDiameter: d as Length,
    points,
  });
  return { curve, basis: 'interpolated' };
}

function npshAt(curve: PumpCurve, flow: number): number | undefined {
  const r = curve.npshRange;
  if (r === undefined || flow < r.min || flow > r.max) return undefined;
  return curve.npshRequired(flow as Flow);
}

/** A flow and the head it needs, for one pump (one operating case). */
export interface DutyNeed {
  readonly flow: number;
  readonly head: number;
}

/**
 * The smallest impeller diameter in `[lowest, full]` whose curve, at speed ratio `rs` to the
 * catalogue speed (affinity laws: `H = rs^2 H_d(Q / rs)`), gives at least the needed head at
 * every duty; undefined when even the full impeller falls short. Each duty's diameter is the
 * root of `rs^2 H_d(Q / rs) - H_need` by Brent's method (head rises with diameter); the
 * answer is the largest of them.
 */
export function trimForDuties(
  f: ImpellerFamily,
  rs: number,
  needs: readonly DutyNeed[],
  lowest: number,
): { readonly diameter: number; readonly iterations: number } | undefined {
  let diameter = lowest;
  let iterations = 0;
  for (const need of needs) {
    const g = (d: number): number => {
      const h = headAt(f, d, need.flow / rs);
      return h === undefined ? -need.head - 1 : rs * rs * h - need.head;
    };
    if (!(g(f.full) >= 0)) return undefined;
    if (g(diameter) >= 0) continue;
    const r = brent(g, diameter, f.full, { xTolerance: 1e-13 * f.full });
    iterations += r.iterations;
    // Brent returns a point of the bracket; take the side that meets the duty.
    diameter = g(r.root) >= 0 ? r.root : Math.min(f.full, r.root + 1e-13 * f.full);
  }
  return { diameter, iterations };
}

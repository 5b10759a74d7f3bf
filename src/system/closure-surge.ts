/**
 * The surge head of a closure, sudden or slow: Joukowsky within the wave's round trip,
 * Michaud's relation for a slower closure.
 *
 * @module
 */
import { guardRange, guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Length,
  STANDARD_GRAVITY,
  type Time,
  type Velocity,
} from '../units/index';

/** Input of {@link closureSurgeHead}. */
export interface ClosureSurgeInput {
  /** Wave speed a (m/s), > 0 (see `waveSpeed`). */
  readonly waveSpeed: Velocity;
  /** Length L of the line from the closure to the reflecting boundary (a tank) (m), > 0. */
  readonly length: Length;
  /** Reduction of velocity dV (m/s), >= 0: the velocity before closure for a full stop. */
  readonly velocityChange: Velocity;
  /**
   * Effective closure time t_c (s), >= 0: the time over which the flow actually stops (for a
   * valve, usually the last part of its stroke; for a pump trip, the run-down to zero flow).
   * 0 means instantaneous.
   */
  readonly closureTime: Time;
  /** Gravity (m/s^2), > 0, default 9.80665. */
  readonly g?: Acceleration;
}

/** Result of {@link closureSurgeHead}. */
export interface ClosureSurge {
  /** Surge head dH (m of the liquid), >= 0. */
  readonly head: Length;
  /** The wave's round-trip time 2L/a (s). */
  readonly roundTripTime: Time;
  /** `'joukowsky'` when t_c <= 2L/a (a sudden closure), `'michaud'` when slower. */
  readonly method: 'joukowsky' | 'michaud';
}

/**
 * Screening estimate of the head rise at a closing valve or a tripping pump, sudden or slow.
 *
 * - Round trip of the pressure wave between the closure and the reflecting boundary:
 *   `T_r = 2L/a`.
 * - Sudden closure, `t_c <= T_r`: the full Joukowsky rise `dH = a dV / g` (see
 *   `joukowskyHead`); the reflected wave comes back too late to relieve it.
 * - Slow closure, `t_c > T_r`: Michaud's relation `dH = 2 L dV / (g t_c)`, that is the
 *   Joukowsky rise times `T_r / t_c`: with the velocity falling linearly in time, only the
 *   share of dV completed within one round trip builds up before the relief arrives. The two
 *   forms meet at `t_c = T_r`. (The rigid-column solution for the same linear closure, which
 *   ignores compressibility altogether, gives half of Michaud's value, `L dV / (g t_c)`; the
 *   screening uses Michaud's, the higher.)
 *
 * Validity: a single line of uniform wave speed between the closure and a constant-head
 * boundary, friction neglected, velocity falling linearly over the effective closure time.
 * Real valves close non-linearly (most of the flow is cut in the last part of the stroke),
 * pump trips depend on the rotating inertia, and column separation at the low-pressure side
 * can make the later rise exceed Joukowsky's. This is a screening estimate: a transient
 * analysis is needed for design, and the usual remedies are a slower closure, a surge vessel,
 * air valves, a flywheel or a bypass (common practice).
 *
 * Source: J. Michaud, "Coups de bélier dans les conduites. Étude des moyens employés pour en
 * atténuer les effets", Bulletin de la Société Vaudoise des Ingénieurs et des Architectes 4
 * (1878) (from memory); discussed in M. S. Ghidaoui et al., "A review of water hammer theory
 * and practice", Applied Mechanics Reviews 58 (2005) 49-76 (from memory). Joukowsky: see
 * `joukowskyHead`.
 *
 * @returns the head rise (m), the round-trip time (s) and the relation used
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-positive or non-finite wave speed, length
 *   or g, or a negative or non-finite velocity change or closure time; `OUT_OF_RANGE` where
 *   the head or round-trip time would overflow.
 * @example
 * ```ts
 * const s = closureSurgeHead({ waveSpeed: q(1000, 'm/s'), length: q(2000, 'm'),
 *   velocityChange: q(1.5, 'm/s'), closureTime: q(10, 's') });
 * to(s.roundTripTime, 's'); // 4
 * to(s.head, 'm'); // 61.18... (Michaud: 2 x 2000 x 1.5 / (9.80665 x 10))
 * s.method; // 'michaud'
 * ```
 */
export function closureSurgeHead(input: ClosureSurgeInput): ClosureSurge {
  const o = guardRecord('input', input) as Partial<Record<keyof ClosureSurgeInput, unknown>>;
  const a = guardRange('input.waveSpeed', o.waveSpeed, { min: 0, minOpen: true, unit: 'm/s' });
  const length = guardRange('input.length', o.length, { min: 0, minOpen: true, unit: 'm' });
  const dv = guardRange('input.velocityChange', o.velocityChange, { min: 0, unit: 'm/s' });
  const tc = guardRange('input.closureTime', o.closureTime, { min: 0, unit: 's' });
  const g =
    o.g === undefined
      ? STANDARD_GRAVITY
      : guardRange('input.g', o.g, { min: 0, minOpen: true, unit: 'm/s2' });
  // Finite inputs whose ratio overflows (a length of 1e300 m at a wave speed of 1e-300 m/s)
  // are refused rather than reported as Infinity.
  const roundTrip = guardResult('roundTripTime', (2 * length) / a, 'OUT_OF_RANGE');
  const sudden = tc <= roundTrip;
  const head = guardResult(
    'head',
    sudden ? (a * dv) / g : (2 * length * dv) / (g * tc),
    'OUT_OF_RANGE',
  );
  return {
    head: head as Length,
    roundTripTime: roundTrip as Time,
    method: sudden ? 'joukowsky' : 'michaud',
  };
}

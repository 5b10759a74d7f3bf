/**
 * Minimum submergence of a pump's suction inlet below a free surface (ANSI/HI 9.8).
 *
 * @module
 */
import { guardRange, guardRecord, guardResult } from '../guards';
import {
  type Acceleration,
  type Flow,
  type Length,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';

/** Input of {@link minimumSubmergence}. */
export interface SubmergenceInput {
  /** Flow through the inlet (m^3/s), > 0. */
  readonly flow: Flow;
  /** Inlet diameter D (m), > 0: the outside diameter of the bell, or the inside of a pipe inlet. */
  readonly inletDiameter: Length;
  /** Gravity (m/s^2), > 0, default 9.80665. */
  readonly g?: Acceleration;
}

/** Result of {@link minimumSubmergence}. */
export interface Submergence {
  /** Minimum submergence S (m): depth of the inlet face below the lowest free surface. */
  readonly submergence: Length;
  /** Velocity at the inlet face, Q / (pi D^2 / 4) (m/s). */
  readonly inletVelocity: Velocity;
  /** Froude number at the inlet, F_D = V / sqrt(g D). */
  readonly froudeNumber: number;
}

/**
 * The minimum submergence of a suction inlet below the lowest free-surface level, to keep
 * strong air-entraining surface vortices from forming, by the relation of ANSI/HI 9.8:
 *
 * `S = D (1 + 2.3 F_D)`, `F_D = V / sqrt(g D)`, `V = Q / (pi D^2 / 4)`
 *
 * with D the inlet (bell) diameter and V the velocity at the inlet face.
 *
 * Validity: intakes laid out to the standard's geometry (approach flow, clearances, walls);
 * the relation does not cover poor approach flow, which can draw vortices at any submergence,
 * and is a minimum, not a design target. Where a model study or the standard's other rules ask
 * for more, they govern.
 *
 * Source: Hydraulic Institute, ANSI/HI 9.8-1998 "Pump Intake Design", the minimum-submergence
 * equation (from memory; also reproduced as S = D(1 + 2.3 Fr) in trade notes on the standard,
 * for example industrialmonitordirect.com, "Rectangular nozzle hydraulic diameter for pump
 * intake submergence").
 *
 * @returns the minimum submergence (m), the inlet velocity (m/s) and the Froude number
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-positive or non-finite flow, diameter or g;
 *   `OUT_OF_RANGE` where the velocity, Froude number or submergence would overflow.
 * @example
 * ```ts
 * const s = minimumSubmergence({ flow: q(0.5, 'm3/s'), inletDiameter: q(0.6, 'm') });
 * to(s.inletVelocity, 'm/s'); // 1.768...
 * s.froudeNumber; // 0.7290...
 * to(s.submergence, 'm'); // 1.606... (0.6 x (1 + 2.3 x 0.7290))
 * ```
 */
export function minimumSubmergence(input: SubmergenceInput): Submergence {
  const o = guardRecord('input', input) as Partial<Record<keyof SubmergenceInput, unknown>>;
  const q = guardRange('input.flow', o.flow, { min: 0, minOpen: true, unit: 'm3/s' });
  const d = guardRange('input.inletDiameter', o.inletDiameter, {
    min: 0,
    minOpen: true,
    unit: 'm',
  });
  const g =
    o.g === undefined
      ? STANDARD_GRAVITY
      : guardRange('input.g', o.g, { min: 0, minOpen: true, unit: 'm/s2' });
  // A flow through a diameter of 1e-300 m would overflow: refused, not reported as Infinity.
  const v = guardResult('inletVelocity', q / ((Math.PI * d * d) / 4), 'OUT_OF_RANGE');
  const fr = guardResult('froudeNumber', v / Math.sqrt(g * d), 'OUT_OF_RANGE');
  guardResult('submergence', d * (1 + 2.3 * fr), 'OUT_OF_RANGE');
  return {
    submergence: (d * (1 + 2.3 * fr)) as Length,
    inletVelocity: v as Velocity,
    froudeNumber: fr,
  };
}

/**
 * The resolved views the checks work on: the limits with their defaults filled in, and a
 * candidate pump set with its per-pump view of the system.
 *
 * @module
 */
import type { PumpCurve } from '../../pumps/index';
import type { RotationalSpeed } from '../../units/index';
import type { Arrangement, CandidateInput, SpeedControl, UnitSystem } from '../types';

/** The limits of the checks with their defaults filled in. */
export interface Limits {
  readonly units: UnitSystem;
  readonly npshMarginRatio: number;
  readonly npshMinimumMargin: number;
  readonly suction: { readonly min: number; readonly max: number };
  readonly discharge: { readonly min: number; readonly max: number };
  readonly nearBoilingRatio: number;
  readonly designPressure: number | undefined;
  readonly dutyFlowTolerance: number;
}

/** A candidate with its defaults filled in and its per-pump view of each system. */
export interface Candidate {
  readonly input: CandidateInput;
  readonly name: string;
  readonly pump: PumpCurve;
  readonly count: number;
  readonly arrangement: Arrangement;
  readonly control: SpeedControl;
  readonly maxSpeed: RotationalSpeed;
  /** The pump at its highest speed (the curve itself unless `maxSpeed` differs). */
  readonly fullSpeed: PumpCurve;
  /** Name of the set for charts: `"A (2 in parallel)"`, or the candidate's name. */
  readonly label: string;
  /** Set flow from one pump's flow. */
  readonly setFlow: (q: number) => number;
  /** One pump's flow from the set's flow. */
  readonly pumpFlow: (q: number) => number;
  /** Set head from one pump's head. */
  readonly setHead: (h: number) => number;
}

/**
 * The restraint factor c1 of the pressure-wave speed: how the pipe's axial anchoring and its
 * wall thickness change the wall's radial stretch under a pressure rise.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { guardOneOf, guardRange, guardRecord, guardResult } from '../guards';
import type { Length } from '../units/index';

/** How a pipe is held against axial movement, for {@link restraintFactor}. */
export type PipeAnchoring =
  /** Anchored at its upstream end only; free to move axially elsewhere. */
  | 'anchored-upstream'
  /** Anchored throughout against axial movement (buried or rigidly supported welded lines). */
  | 'anchored-throughout'
  /** Expansion joints throughout: no axial stress in the wall. */
  | 'expansion-joints';

/** The anchoring cases {@link restraintFactor} knows. */
export const PIPE_ANCHORINGS: readonly PipeAnchoring[] = [
  'anchored-upstream',
  'anchored-throughout',
  'expansion-joints',
];

/** Input of {@link restraintFactor}. */
export interface RestraintFactorInput {
  /** How the pipe is held axially. */
  readonly anchoring: PipeAnchoring;
  /** Poisson's ratio of the wall, 0 to 0.5 (see `material(name).poissonRatio`). */
  readonly poissonRatio: number;
  /** `'thin'` (default) or `'thick'`; the thick form needs the diameter and the wall. */
  readonly wall?: 'thin' | 'thick';
  /** Inside diameter D (m), > 0; needed for `wall: 'thick'`. */
  readonly insideDiameter?: Length;
  /** Wall thickness e (m), > 0; needed for `wall: 'thick'`. */
  readonly wallThickness?: Length;
}

/**
 * The restraint factor c1 in the wave-speed equation
 * `a = sqrt((K/rho) / (1 + c1 K D / (E e)))` (see `waveSpeed`), with mu Poisson's ratio of the
 * wall, D the inside diameter and e the wall thickness.
 *
 * Thin-walled pipe (D/e > about 25):
 * - anchored at the upstream end only: `c1 = 1 - mu/2`
 * - anchored throughout against axial movement: `c1 = 1 - mu^2`
 * - expansion joints throughout: `c1 = 1`
 *
 * Thick-walled pipe (any D/e; tends to the thin forms as e/D -> 0):
 * - anchored at the upstream end only: `c1 = (2e/D)(1 + mu) + D(1 - mu/2)/(D + e)`
 * - anchored throughout: `c1 = (2e/D)(1 + mu) + D(1 - mu^2)/(D + e)`
 * - expansion joints throughout: `c1 = (2e/D)(1 + mu) + D/(D + e)`
 *
 * Source: E. B. Wylie and V. L. Streeter, "Fluid Transients in Systems", Prentice Hall 1993,
 * the section on wave speed in thin- and thick-walled elastic conduits (the forms go back to
 * A. R. Halliwell, "Velocity of a water-hammer wave in an elastic pipe", J. Hydraulics Div.
 * ASCE 89 (HY4), 1963); the same forms are in M. H. Chaudhry, "Applied Hydraulic Transients".
 * Recalled from memory, not read from a copy in hand; the thick forms reduce to the thin ones
 * as e/D -> 0, which the tests check.
 *
 * @returns c1 (dimensionless, > 0)
 * @throws HeadflowError `INVALID_ARGUMENT` for an unknown anchoring, a Poisson's ratio outside
 *   [0, 0.5], an unknown wall form, or a thick wall without a positive diameter and thickness;
 *   `OUT_OF_RANGE` for a thick wall whose e/D would overflow.
 * @example
 * ```ts
 * restraintFactor({ anchoring: 'anchored-throughout', poissonRatio: 0.3 }); // 0.91
 * restraintFactor({ anchoring: 'expansion-joints', poissonRatio: 0.3, wall: 'thick',
 *   insideDiameter: q(100, 'mm'), wallThickness: q(10, 'mm') }); // 1.16909... (0.26 + 100/110)
 * ```
 */
export function restraintFactor(input: RestraintFactorInput): number {
  const o = guardRecord('input', input) as Partial<Record<keyof RestraintFactorInput, unknown>>;
  const anchoring = guardOneOf('input.anchoring', o.anchoring, PIPE_ANCHORINGS);
  const mu = guardRange('input.poissonRatio', o.poissonRatio, { min: 0, max: 0.5 });
  const wall = o.wall === undefined ? 'thin' : guardOneOf('input.wall', o.wall, ['thin', 'thick']);
  const axial =
    anchoring === 'anchored-upstream'
      ? 1 - mu / 2
      : anchoring === 'anchored-throughout'
        ? 1 - mu * mu
        : 1;
  if (wall === 'thin') return axial;
  if (o.insideDiameter === undefined || o.wallThickness === undefined) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      "The thick-wall restraint factor needs insideDiameter and wallThickness (wall: 'thick').",
      { parameter: 'input.insideDiameter', allowed: 'a length > 0 m with wall: thick' },
    );
  }
  const d = guardRange('input.insideDiameter', o.insideDiameter, {
    min: 0,
    minOpen: true,
    unit: 'm',
  });
  const e = guardRange('input.wallThickness', o.wallThickness, {
    min: 0,
    minOpen: true,
    unit: 'm',
  });
  return guardResult('restraint factor', thickRestraint(axial, mu, d, e), 'OUT_OF_RANGE');
}

/** Thick-wall c1 from the thin-wall axial term: `(2e/D)(1 + mu) + D axial/(D + e)`. @internal */
export function thickRestraint(axial: number, mu: number, d: number, e: number): number {
  return ((2 * e) / d) * (1 + mu) + (d * axial) / (d + e);
}

/**
 * The speed of a pressure wave in a liquid-filled pipe (Korteweg, with the wall's restraint).
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { guardOneOf, guardRange, guardRecord, guardResult } from '../guards';
import type { Density, Length, Pressure, Velocity } from '../units/index';
import { PIPE_ANCHORINGS, type PipeAnchoring, restraintFactor } from './restraint-factor';

/** Input of {@link waveSpeed}. */
export interface WaveSpeedInput {
  /** Bulk modulus of the liquid K (Pa), > 0 (`FluidState.bulkModulus`). */
  readonly bulkModulus: Pressure;
  /** Density of the liquid rho (kg/m^3), > 0. */
  readonly density: Density;
  /** Inside diameter D (m), > 0. Give D, e and E together, or none (rigid pipe). */
  readonly insideDiameter?: Length;
  /** Wall thickness e (m), > 0. */
  readonly wallThickness?: Length;
  /** Young's modulus of the wall E (Pa), > 0 (`material(name).elasticModulus`). */
  readonly elasticModulus?: Pressure;
  /**
   * The restraint factor c1 itself, > 0, when known. Otherwise it comes from `anchoring` and
   * `poissonRatio` by {@link restraintFactor}.
   */
  readonly restraintFactor?: number;
  /** How the pipe is held axially; default `'expansion-joints'` (c1 = 1 for a thin wall). */
  readonly anchoring?: PipeAnchoring;
  /** Poisson's ratio of the wall, 0 to 0.5; needed unless c1 is given or is 1 by anchoring. */
  readonly poissonRatio?: number;
  /** `'thin'` (default, Korteweg) or `'thick'` (the thick-wall restraint factor). */
  readonly wall?: 'thin' | 'thick';
}

/**
 * Speed of a pressure (water-hammer) wave in a liquid-filled elastic pipe:
 *
 * `a = sqrt((K/rho) / (1 + c1 K D / (E e)))`
 *
 * with K the liquid's bulk modulus, rho its density, D the inside diameter, e the wall
 * thickness, E the wall's Young's modulus and c1 the restraint factor. With `wall: 'thin'`
 * (default) this is Korteweg's formula with the thin-wall c1 of the anchoring; with
 * `wall: 'thick'` the same equation takes the thick-wall c1 (see {@link restraintFactor}).
 * Without the pipe's data it is the rigid-pipe limit, the speed of sound in the liquid,
 * `a = sqrt(K/rho)`, an upper bound of the wave speed in any pipe.
 *
 * Validity: a linearly elastic, homogeneous wall and a liquid without free gas. The thin form
 * is meant for D/e > about 25; use `wall: 'thick'` below that. Not covered: viscoelastic
 * plastics (PE, PVC: the effective E falls with the load's duration), lined or composite walls,
 * pipes in rock or concrete, and free air or gas in the liquid, of which a fraction of a percent
 * lowers a by a large factor. A lower wave speed than the true one understates the surge head;
 * for screening keep the wave speed on the high side.
 *
 * Source: D. J. Korteweg, "Ueber die Fortpflanzungsgeschwindigkeit des Schalles in
 * elastischen Röhren", Annalen der Physik 241 (1878) 525-542 (thin wall, c1 = 1); the restraint
 * factors and the thick-wall form from E. B. Wylie and V. L. Streeter, "Fluid Transients in
 * Systems", Prentice Hall 1993 (from memory; see {@link restraintFactor}).
 *
 * @param input - bulk modulus (Pa), density (kg/m^3), and optionally the pipe: inside
 *   diameter (m), wall thickness (m), Young's modulus (Pa), restraint factor or anchoring and
 *   Poisson's ratio, wall form
 * @returns wave speed (m/s)
 * @throws HeadflowError `INVALID_ARGUMENT` for a non-positive or non-finite modulus, density,
 *   diameter, thickness or restraint factor; for part of the pipe's data without the rest; for
 *   restraint options without the pipe's data; for a Poisson's ratio outside [0, 0.5] or a
 *   missing one where the anchoring needs it; for an unknown anchoring or wall form;
 *   `OUT_OF_RANGE` where K / rho would overflow.
 * @example
 * ```ts
 * // water at 20 degC, rigid pipe: the speed of sound
 * to(waveSpeed({ bulkModulus: q(2196.6, 'MPa'), density: q(998.2, 'kg/m3') }), 'm/s'); // 1483.4...
 * // the same water in 6 in schedule 40 steel (D = 154.05 mm, e = 7.112 mm), anchored throughout
 * to(waveSpeed({ bulkModulus: q(2196.6, 'MPa'), density: q(998.2, 'kg/m3'),
 *   insideDiameter: q(154.05, 'mm'), wallThickness: q(7.112, 'mm'), elasticModulus: q(207000, 'MPa'),
 *   anchoring: 'anchored-throughout', poissonRatio: 0.3 }), 'm/s'); // 1349.0...
 * ```
 */
export function waveSpeed(input: WaveSpeedInput): Velocity {
  const o = guardRecord('input', input) as Partial<Record<keyof WaveSpeedInput, unknown>>;
  const k = guardRange('input.bulkModulus', o.bulkModulus, { min: 0, minOpen: true, unit: 'Pa' });
  const rho = guardRange('input.density', o.density, { min: 0, minOpen: true, unit: 'kg/m3' });
  // A modulus over a density of 1e-300 would overflow: refused, not reported as Infinity.
  const rigid = guardResult('bulkModulus / density', k / rho, 'OUT_OF_RANGE');
  const pipeKeys = ['insideDiameter', 'wallThickness', 'elasticModulus'] as const;
  const given = pipeKeys.filter((key) => o[key] !== undefined);
  if (given.length === 0) {
    for (const key of ['restraintFactor', 'anchoring', 'poissonRatio', 'wall'] as const) {
      if (o[key] !== undefined) {
        throw new HeadflowError(
          'INVALID_ARGUMENT',
          `input.${key} applies only with the pipe's insideDiameter, wallThickness and ` +
            'elasticModulus; without them the wave speed is the rigid-pipe limit sqrt(K/rho).',
          { parameter: `input.${key}`, allowed: 'absent, or given with the pipe data' },
        );
      }
    }
    return Math.sqrt(rigid) as Velocity;
  }
  if (given.length < pipeKeys.length) {
    const missing = pipeKeys.filter((key) => o[key] === undefined);
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      `The pipe's ${missing.map((m) => `input.${m}`).join(' and ')} ${missing.length > 1 ? 'are' : 'is'} missing: ` +
        'give insideDiameter, wallThickness and elasticModulus together, or none for a rigid pipe.',
      { parameter: `input.${missing[0] ?? ''}`, allowed: 'present' },
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
  const young = guardRange('input.elasticModulus', o.elasticModulus, {
    min: 0,
    minOpen: true,
    unit: 'Pa',
  });
  const wall = o.wall === undefined ? 'thin' : guardOneOf('input.wall', o.wall, ['thin', 'thick']);
  let c1: number;
  if (o.restraintFactor !== undefined) {
    c1 = guardRange('input.restraintFactor', o.restraintFactor, { min: 0, minOpen: true });
  } else {
    const anchoring =
      o.anchoring === undefined
        ? 'expansion-joints'
        : guardOneOf('input.anchoring', o.anchoring, PIPE_ANCHORINGS);
    if (o.poissonRatio === undefined && (wall === 'thick' || anchoring !== 'expansion-joints')) {
      throw new HeadflowError(
        'INVALID_ARGUMENT',
        `input.poissonRatio is missing: the restraint factor for ${anchoring} (${wall} wall) ` +
          "needs the wall material's Poisson ratio (or give input.restraintFactor).",
        { parameter: 'input.poissonRatio', allowed: '0 to 0.5' },
      );
    }
    c1 = restraintFactor({
      anchoring,
      poissonRatio: (o.poissonRatio ?? 0) as number,
      wall,
      insideDiameter: d as Length,
      wallThickness: e as Length,
    });
  }
  return guardResult(
    'wave speed',
    Math.sqrt(rigid / (1 + (c1 * k * d) / (young * e))),
    'OUT_OF_RANGE',
  ) as Velocity;
}

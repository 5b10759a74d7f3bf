/**
 * Pipe wall materials: roughness for Darcy-Weisbach (Colebrook) and Hazen-Williams C.
 *
 * @module
 */
import { argumentError } from '../errors';
import { type Length, UNITS } from '../units/index';
import { MATERIALS, type MaterialName, type MaterialRow } from './data/materials';

/** Feet in metres, exact (NIST SP 811, B.8). */
const METRES_PER_FOOT = UNITS.ft.factor;

/** A length range, metres. */
export interface LengthRange {
  readonly min: Length;
  readonly max: Length;
}

/** A pipe wall material. */
export interface PipeMaterial {
  /** Identifier, for example `'commercial-steel'`. */
  readonly name: MaterialName;
  /** What the row covers, in words. */
  readonly description: string;
  /** Equivalent sand-grain roughness of new, clean pipe. */
  readonly roughness: Length;
  /** Range for new pipe where the source prints a range (concrete). */
  readonly roughnessRange?: LengthRange;
  /** Range for aged pipe, where a source gives one. */
  readonly agedRoughness?: LengthRange;
  /** Hazen-Williams C of new pipe (dimensionless in the customary form of the equation). */
  readonly hazenWilliamsC: number;
  /** Hazen-Williams C for pipe of uncertain age, where a source gives one. */
  readonly agedHazenWilliamsC?: number;
  /** Where each figure comes from. */
  readonly sources: readonly string[];
}

/** The names {@link material} accepts, in table order. */
export const MATERIAL_NAMES: readonly MaterialName[] = MATERIALS.map((m) => m.name);

function build(row: MaterialRow): PipeMaterial {
  const k = row.unit === 'ft' ? METRES_PER_FOOT : 1e-3;
  const out: {
    -readonly [K in keyof PipeMaterial]: PipeMaterial[K];
  } = {
    name: row.name,
    description: row.description,
    roughness: (row.roughness * k) as Length,
    hazenWilliamsC: row.hazenWilliamsC,
    sources: Object.freeze([...row.sources]),
  };
  if (row.roughnessRange) {
    out.roughnessRange = Object.freeze({
      min: (row.roughnessRange[0] * k) as Length,
      max: (row.roughnessRange[1] * k) as Length,
    });
  }
  if (row.agedRoughnessMm) {
    out.agedRoughness = Object.freeze({
      min: (row.agedRoughnessMm[0] * 1e-3) as Length,
      max: (row.agedRoughnessMm[1] * 1e-3) as Length,
    });
  }
  if (row.agedHazenWilliamsC !== undefined) out.agedHazenWilliamsC = row.agedHazenWilliamsC;
  return Object.freeze(out);
}

const BY_NAME = new Map<string, PipeMaterial>(MATERIALS.map((m) => [m.name, build(m)]));

/**
 * Roughness and Hazen-Williams C of a pipe wall material. Each row cites its sources in
 * `sources`: roughness of new pipe from Moody (1944, Fig. 1) except cement-lined ductile
 * iron; aged roughness ranges from the Colebrook-White roughness table (Normal to Poor
 * columns, 40 to 100 years of use); C from Fair, Geyer and Okun (Table 5.1) or the
 * reference tables named in the row.
 *
 * These are typical values for design. Real pipe varies with manufacture, water quality and
 * age; measured values from the system in hand, and local codes, take precedence.
 *
 * @param name - one of {@link MATERIAL_NAMES}
 * @returns the material, lengths in metres
 * @throws HeadflowError `UNKNOWN_NAME` for a name not in the table (the message lists the names).
 * @example
 * ```ts
 * const s = material('commercial-steel');
 * to(s.roughness, 'mm'); // 0.04572 (0.00015 ft)
 * s.hazenWilliamsC; // 140
 * ```
 */
export function material(name: MaterialName): PipeMaterial {
  const m = typeof name === 'string' ? BY_NAME.get(name) : undefined;
  if (m === undefined) {
    throw argumentError(
      'UNKNOWN_NAME',
      'name',
      name,
      undefined,
      MATERIAL_NAMES.map((n) => `'${n}'`).join(', '),
    );
  }
  return m;
}

/**
 * Pipe wall materials: roughness for Darcy-Weisbach (Colebrook) and Hazen-Williams C.
 *
 * @module
 */
import { argumentError } from '../errors';
import { type Length, type Pressure, UNITS } from '../units/index';
import { MATERIALS, type MaterialName, type MaterialRow } from './data/materials';

/** Feet in metres, exact (NIST SP 811, B.8). */
const METRES_PER_FOOT = UNITS.ft.factor;

/** A length range, metres. */
export interface LengthRange {
  readonly min: Length;
  readonly max: Length;
}

/** A pressure (stress) range, pascals. */
export interface PressureRange {
  readonly min: Pressure;
  readonly max: Pressure;
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
  /** Young's modulus of elasticity of the wall (Pa), a typical value (see `waveSpeed`). */
  readonly elasticModulus: Pressure;
  /** Range of the modulus where the source prints one (Pa). */
  readonly elasticModulusRange?: PressureRange;
  /** Poisson's ratio of the wall (see `restraintFactor`). */
  readonly poissonRatio: number;
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
    elasticModulus: (row.elasticModulusGPa * 1e9) as Pressure,
    poissonRatio: row.poissonRatio,
    sources: Object.freeze([...row.sources]),
  };
  if (row.elasticModulusRangeGPa) {
    out.elasticModulusRange = Object.freeze({
      min: (row.elasticModulusRangeGPa[0] * 1e9) as Pressure,
      max: (row.elasticModulusRangeGPa[1] * 1e9) as Pressure,
    });
  }
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
 * Roughness, Hazen-Williams C, elastic modulus and Poisson's ratio of a pipe wall material
 * (the last two for the pressure-wave speed, `waveSpeed`). Each row cites its sources in
 * `sources`: roughness of new pipe from Moody (1944, Fig. 1) except cement-lined ductile
 * iron; aged roughness ranges from the Colebrook-White roughness table (Normal to Poor
 * columns, 40 to 100 years of use); C from Fair, Geyer and Okun (Table 5.1) or the
 * reference tables named in the row; elastic modulus and Poisson's ratio from Wylie and
 * Streeter (1993, Table 2.1) or AWWA M41, recalled from memory (each row says so).
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
 * s.elasticModulus; // 207000000000 (Pa)
 * s.poissonRatio; // 0.3
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

/**
 * The correction factors of ANSI/HI 9.6.7-2010 for a rotodynamic pump on a viscous liquid.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import { guardInteger, guardOptions, guardRange, guardRecord } from '../guards';
import type { Flow, KinematicViscosity, Length, RotationalSpeed } from '../units/index';

/** Largest parameter B the method covers (ANSI/HI 9.6.7-2010; from memory). */
export const VISCOSITY_B_MAX = 40;
/** Largest kinematic viscosity in the method's test data, 3000 cSt (m^2/s; from memory). */
export const VISCOSITY_NU_MAX = 3000e-6;
/** Kinematic viscosity at or below which a liquid is taken as water-like, 1 cSt (m^2/s). */
export const VISCOSITY_NU_WATER_LIKE = 1e-6;

/** Input of {@link viscosityCorrectionFactors}: the pump's water BEP and the liquid. */
export interface ViscosityFactorsInput {
  /** Flow at the best efficiency point on water, Q_BEP-W (m^3/s), > 0. */
  readonly flowAtBep: Flow;
  /** Head at the best efficiency point on water, H_BEP-W, of the whole pump (m), > 0. */
  readonly headAtBep: Length;
  /** Pump speed N (rad/s), > 0. */
  readonly speed: RotationalSpeed;
  /** Kinematic viscosity of the liquid (m^2/s), > 0. */
  readonly kinematicViscosity: KinematicViscosity;
}

/** Options of {@link viscosityCorrectionFactors}. */
export interface ViscosityFactorsOptions {
  /** Number of stages (the method uses the head per stage); default 1. */
  readonly stages?: number;
}

/** The factors of ANSI/HI 9.6.7-2010 for one pump and liquid. */
export interface ViscosityFactors {
  /** Parameter B (dimensionless). */
  readonly b: number;
  /** True when the liquid calls for a correction (B > 1 and more viscous than 1 cSt). */
  readonly applies: boolean;
  /** Flow factor C_Q = Q_vis / Q_W (the same at every flow). */
  readonly flow: number;
  /** Head factor at the BEP flow, C_BEP-H = C_Q. */
  readonly headAtBep: number;
  /** Efficiency factor C_eta = eta_vis / eta_W (the same at every flow). */
  readonly efficiency: number;
  /**
   * Head factor at a water flow Q_W: `C_H = 1 - (1 - C_BEP-H) (Q_W / Q_BEP-W)^0.75`; 1 at
   * shut-off, C_BEP-H at the BEP flow.
   */
  headAt(flowOnWater: Flow): number;
  /** Where the pump lies outside the method's test data (flow or head per stage), in words. */
  readonly notes: readonly string[];
}

/** m^3/s to m^3/h. */
const M3H = 3600;
/** rad/s to rpm. */
const RPM = 60 / (2 * Math.PI);

/**
 * The correction factors for flow, head and efficiency of a rotodynamic pump on a viscous
 * (Newtonian) liquid, from its water performance at the best efficiency point, by the method of
 * ANSI/HI 9.6.7-2010.
 *
 * Equations (SI form; Q in m^3/h, H in m per stage, N in rpm, nu in cSt = mm^2/s):
 * - `B = 16.5 nu^0.50 H_BEP-W^0.0625 / (Q_BEP-W^0.375 N^0.25)` (US form
 *   `B = 26.6 nu^0.5 H^0.0625 / (Q^0.375 N^0.25)` with Q in gal/min and H in ft; the two
 *   constants agree within 0.4 %)
 * - `C_Q = 2.71^(-0.165 (log10 B)^3.15)`, `C_BEP-H = C_Q`
 * - `C_H = 1 - (1 - C_BEP-H) (Q_W / Q_BEP-W)^0.75`
 * - `C_eta = B^(-0.0547 B^0.69)`
 * - `Q_vis = C_Q Q_W`, `H_vis = C_H H_W`, `eta_vis = C_eta eta_W`.
 *
 * For B <= 1, or a liquid no more viscous than 1 cSt (the lower end of the method's data; such a
 * liquid is taken as water-like), every factor is 1 (`applies: false`).
 *
 * Validity: B < 40 and nu <= 3000 cSt; outside, the method gives no answer and this function
 * throws `OUT_OF_RANGE`. The method's test data covered about 3 to 260 m^3/h at BEP and 6 to
 * 130 m of head per stage; outside those, the factors are extrapolated and `notes` says so.
 * Conventional single- and multistage centrifugal pumps with radial impellers, Newtonian
 * liquids. Pumps outside this (mixed and axial flow, very low specific speed) and
 * non-Newtonian liquids need the manufacturer's data.
 *
 * Source: Hydraulic Institute, ANSI/HI 9.6.7-2010, "Rotodynamic Pumps - Guideline for Effects
 * of Liquid Viscosity on Performance". The equations, limits and data ranges here are recalled
 * from memory (no copy in hand, no published worked example found to check against); they are
 * checked by their own properties (factors 1 for water-like liquids, falling with viscosity).
 *
 * @param input - water BEP flow (m^3/s) and head (m), speed (rad/s), kinematic viscosity (m^2/s)
 * @param options - number of stages (default 1)
 * @returns the factors, B, and notes on the data range
 * @throws HeadflowError `INVALID_ARGUMENT` for non-positive or non-finite input or a stage
 *   count that is not a whole number 1 to 100; `OUT_OF_RANGE` for B >= 40 or a viscosity above
 *   3000 cSt.
 * @example
 * ```ts
 * const f = viscosityCorrectionFactors({ flowAtBep: q(100, 'm3/h'), headAtBep: q(40, 'm'),
 *   speed: q(1450, 'rpm'), kinematicViscosity: q(200, 'cSt') });
 * f.b; // 8.468...
 * f.flow; // 0.8781... (C_Q)
 * f.efficiency; // 0.6003... (C_eta)
 * f.headAt(q(120, 'm3/h')); // 0.8603... (C_H at 120 % of BEP flow)
 * ```
 */
export function viscosityCorrectionFactors(
  input: ViscosityFactorsInput,
  options?: ViscosityFactorsOptions | null,
): ViscosityFactors {
  const o = guardRecord('input', input) as Partial<Record<keyof ViscosityFactorsInput, unknown>>;
  const qBep = guardRange('input.flowAtBep', o.flowAtBep, { min: 0, minOpen: true, unit: 'm3/s' });
  const hBep = guardRange('input.headAtBep', o.headAtBep, { min: 0, minOpen: true, unit: 'm' });
  const speed = guardRange('input.speed', o.speed, { min: 0, minOpen: true, unit: 'rad/s' });
  const nu = guardRange('input.kinematicViscosity', o.kinematicViscosity, {
    min: 0,
    minOpen: true,
    unit: 'm2/s',
  });
  const opts = guardOptions('options', options);
  const stages =
    opts.stages === undefined ? 1 : guardInteger('options.stages', opts.stages, 1, 100);
  if (nu > VISCOSITY_NU_MAX) {
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `kinematicViscosity = ${fmt(nu * 1e6)} cSt is above 3000 cSt, the end of the data of the ` +
        'ANSI/HI 9.6.7 viscosity correction: the method cannot predict this pump on this ' +
        "liquid. Ask the manufacturer for the pump's performance on it.",
      {
        parameter: 'kinematicViscosity',
        value: nu,
        unit: 'm2/s',
        allowed: 'at most 3000 cSt (3e-3 m2/s)',
      },
    );
  }
  const qh = qBep * M3H;
  const hs = hBep / stages;
  const b = (16.5 * Math.sqrt(nu * 1e6) * hs ** 0.0625) / (qh ** 0.375 * (speed * RPM) ** 0.25);
  if (!(b < VISCOSITY_B_MAX)) {
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `The ANSI/HI 9.6.7 parameter B = ${fmt(b)} is 40 or more (kinematic viscosity ` +
        `${fmt(nu * 1e6)} cSt, BEP ${fmt(qh)} m3/h at ${fmt(hs)} m per stage, ${fmt(speed * RPM)} rpm): ` +
        "the viscosity correction does not cover it. Ask the manufacturer for the pump's " +
        'performance on this liquid, or choose a larger or slower pump.',
      { parameter: 'kinematicViscosity', value: nu, unit: 'm2/s', allowed: 'B < 40' },
    );
  }
  const notes: string[] = [];
  if (qh < 3 || qh > 260) {
    notes.push(
      `BEP flow ${fmt(qh)} m3/h lies outside the method's test data (about 3 to 260 m3/h): the factors are extrapolated.`,
    );
  }
  if (hs < 6 || hs > 130) {
    notes.push(
      `BEP head ${fmt(hs)} m per stage lies outside the method's test data (about 6 to 130 m): the factors are extrapolated.`,
    );
  }
  const applies = b > 1 && nu > VISCOSITY_NU_WATER_LIKE;
  const cq = applies ? 2.71 ** (-0.165 * Math.log10(b) ** 3.15) : 1;
  const ceta = applies ? b ** -(0.0547 * b ** 0.69) : 1;
  return {
    b,
    applies,
    flow: cq,
    headAtBep: cq,
    efficiency: ceta,
    headAt(flowOnWater: Flow): number {
      const q = guardRange('flowOnWater', flowOnWater, { min: 0, unit: 'm3/s' });
      return headFactor(cq, q / qBep);
    },
    notes,
  };
}

/** `C_H = 1 - (1 - C_BEP-H) r^0.75` at r = Q_W / Q_BEP-W. @internal */
export function headFactor(cBepH: number, ratio: number): number {
  return 1 - (1 - cBepH) * ratio ** 0.75;
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(4)));
}

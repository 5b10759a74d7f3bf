/**
 * A pump's water curve corrected for a viscous liquid by ANSI/HI 9.6.7-2010.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import type { FluidState } from '../fluids/index';
import { guardFunction, guardInteger, guardOptions, guardRange, guardRecord } from '../guards';
import type { Flow, Length } from '../units/index';
import { pumpCurve } from './pump-curve';
import type { CataloguePoint, PumpCurve } from './types';
import { type ViscosityFactors, viscosityCorrectionFactors } from './viscosity-factors';

/** Options of {@link correctForViscosity}. */
export interface ViscosityCorrectionOptions {
  /** Number of stages (the method uses the head per stage); default 1. */
  readonly stages?: number;
  /** Number of points sampled along the water curve, 5 to 201; default 25. */
  readonly points?: number;
}

/** Result of {@link correctForViscosity}. */
export interface ViscosityCorrection {
  /** The corrected curve; the same object as the input when no correction applies. */
  readonly curve: PumpCurve;
  /** True when the correction was applied (B > 1 and the liquid thicker than 1 cSt). */
  readonly applied: boolean;
  /** The factors of ANSI/HI 9.6.7 (B, C_Q, C_BEP-H, C_eta, C_H by flow, notes). */
  readonly factors: ViscosityFactors;
}

/**
 * A pump's water performance corrected for a viscous (Newtonian) liquid by ANSI/HI
 * 9.6.7-2010: flow times C_Q, head times C_H (1 at shut-off, C_BEP-H at the BEP flow) and
 * efficiency times C_eta at every point of the water curve, with the factors from the water
 * BEP, the speed and the liquid's kinematic viscosity (see {@link viscosityCorrectionFactors}
 * for the equations, limits and source). Shaft power then follows from the corrected curve
 * and the liquid's density: `P = rho g Q_vis H_vis / eta_vis`, so the motor is sized on the
 * corrected power.
 *
 * The corrected curve is built by `pumpCurve` from points sampled evenly along the water curve,
 * and at its BEP (each mapped to `(C_Q Q_W, C_H H_W, C_eta eta_W)`, so the corrected BEP is at
 * `C_Q Q_BEP-W`), with monotone piecewise cubic fits, at the
 * water curve's speed and impeller diameter. The operating regions keep their fractions of BEP
 * flow. NPSH required is carried over at the corresponding points unchanged (the standard's
 * separate NPSH estimate is not applied). When the liquid is water-like (B <= 1, or no more
 * viscous than 1 cSt) the input curve itself is returned.
 *
 * @param pump - a pump curve with efficiency data (a BEP)
 * @param fluidState - the liquid at the pumping temperature (its kinematic viscosity is used)
 * @param options - number of stages (default 1), points sampled (default 25)
 * @returns the corrected curve, whether it was corrected, and the factors
 * @throws HeadflowError `INVALID_ARGUMENT` for a pump without efficiency data, a state without
 *   a positive kinematic viscosity, or bad options; `OUT_OF_RANGE` outside the method's range
 *   (B >= 40 or above 3000 cSt: the message says so and what to do).
 * @example
 * ```ts
 * const oil = constantFluid({ name: 'demo oil', density: q(880, 'kg/m3'), dynamicViscosity: q(176, 'cP') });
 * const c = correctForViscosity(pump, oil.at(q(40, 'degC'))); // 200 cSt
 * c.applied; // true
 * c.factors.flow; // C_Q
 * c.curve.shaftPower(q(80, 'm3/h'), q(880, 'kg/m3')); // more than on water at the same duty
 * ```
 */
export function correctForViscosity(
  pump: PumpCurve,
  fluidState: FluidState,
  options?: ViscosityCorrectionOptions | null,
): ViscosityCorrection {
  const p = guardRecord('pump', pump) as Partial<Record<keyof PumpCurve, unknown>>;
  guardFunction('pump.head', p.head);
  guardFunction('pump.efficiency', p.efficiency);
  const state = guardRecord('fluidState', fluidState) as Partial<Record<keyof FluidState, unknown>>;
  const opts = guardOptions('options', options);
  const stages =
    opts.stages === undefined ? 1 : guardInteger('options.stages', opts.stages, 1, 100);
  const count =
    opts.points === undefined ? 25 : guardInteger('options.points', opts.points, 5, 201);
  const bep = pump.bestEfficiencyPoint;
  if (bep === undefined) {
    throw new HeadflowError(
      'INVALID_ARGUMENT',
      'pump has no efficiency data: the viscosity correction (ANSI/HI 9.6.7) needs the best ' +
        'efficiency point on water. Give the catalogue efficiency or shaft power.',
      { parameter: 'pump', allowed: 'a pump curve with efficiency data' },
    );
  }
  const nu = guardRange('fluidState.kinematicViscosity', state.kinematicViscosity, {
    min: 0,
    minOpen: true,
    unit: 'm2/s',
  });
  const factors = viscosityCorrectionFactors(
    {
      flowAtBep: bep.flow,
      headAtBep: bep.head,
      speed: pump.speed,
      kinematicViscosity: nu as FluidState['kinematicViscosity'],
    },
    { stages },
  );
  if (!factors.applies) return { curve: pump, applied: false, factors };

  const lo = pump.flowRange.min;
  const hi = pump.flowRange.max;
  const npsh = pump.npshRange;
  // Evenly spaced water flows plus the BEP flow itself: the monotone fits peak at a point, so
  // the corrected BEP lands exactly on C_Q Q_BEP-W.
  const flows: number[] = [];
  for (let k = 0; k < count; k++)
    flows.push(k === count - 1 ? hi : lo + ((hi - lo) * k) / (count - 1));
  const spacing = (hi - lo) / (count - 1);
  const near = flows.findIndex((f) => Math.abs(f - bep.flow) < 0.05 * spacing);
  if (near >= 0) flows[near] = bep.flow;
  else {
    flows.push(bep.flow);
    flows.sort((x, y) => x - y);
  }
  const points: CataloguePoint[] = [];
  for (const f of flows) {
    const qw = f as Flow;
    const eta = pump.efficiency(qw);
    const point: {
      -readonly [K in keyof CataloguePoint]: CataloguePoint[K];
    } = {
      flow: (factors.flow * qw) as Flow,
      head: (factors.headAt(qw) * pump.head(qw)) as Length,
      efficiency: qw === 0 ? 0 : factors.efficiency * eta,
    };
    if (npsh !== undefined && qw >= npsh.min && qw <= npsh.max) {
      point.npshRequired = pump.npshRequired(qw);
    }
    points.push(point);
  }
  // The NPSH fit needs two points at least; with fewer inside the NPSH data, carry none.
  if (points.filter((pt) => pt.npshRequired !== undefined).length < 2) {
    for (let k = 0; k < points.length; k++) {
      const { npshRequired: _dropped, ...rest } = points[k] as CataloguePoint;
      points[k] = rest;
    }
  }
  const regions: { preferred?: readonly [number, number]; allowable?: readonly [number, number] } =
    {};
  if (pump.preferredRegion) {
    regions.preferred = [pump.preferredRegion.min / bep.flow, pump.preferredRegion.max / bep.flow];
  }
  if (pump.allowableRegion) {
    regions.allowable = [pump.allowableRegion.min / bep.flow, pump.allowableRegion.max / bep.flow];
  }
  const curve = pumpCurve({
    points,
    speed: pump.speed,
    ...(pump.impellerDiameter === undefined ? {} : { impellerDiameter: pump.impellerDiameter }),
    fit: {
      head: { method: 'monotone' },
      efficiency: { method: 'monotone' },
      npshRequired: { method: 'monotone' },
    },
    regions,
  });
  return { curve, applied: true, factors };
}

/**
 * A pipe run (segment): a length of one inside diameter with its wall roughness, fittings,
 * valves and equipment. Validated once; evaluating its loss at a flow allocates nothing.
 *
 * @module
 */
import { argumentError, checkFinite, checkNonNegative, checkPositive } from '../errors';
import { type FrictionFactorOptions, frictionFactor, HAZEN_WILLIAMS_SI } from '../friction/index';
import {
  type FrictionPolicy,
  type FrictionSlope,
  frictionPolicy,
  frictionWithSlope,
} from '../friction/internal';
import { type FittingCount, type FittingSet, fittingSet, kFromCv, kFromKv } from '../losses/index';
import { type MaterialName, material, type PipeDimensions } from '../pipes/index';
import type { Acceleration, Density, Flow, Length } from '../units/index';

/**
 * A valve or restriction given by its flow coefficient, referred to the run's inside
 * diameter: exactly one of `cv` (US gal/min at 1 psi), `kv` (m3/h at 1 bar) or `k`.
 */
export interface ValveCoefficient {
  readonly name?: string;
  readonly cv?: number;
  readonly kv?: number;
  readonly k?: number;
}

/**
 * Equipment with its own loss (a heat exchanger, a filter, a meter), for example from
 * `ratedLoss` or `curveLoss` in the losses module: anything that gives a head loss at a flow.
 */
export interface LossComponent {
  readonly name?: string;
  /** Head loss (m of the fluid) at `flow` for a fluid of `density`. */
  headLoss(flow: Flow, density: Density, g?: Acceleration): Length;
}

/**
 * The friction law of one run when it is not the system's Colebrook policy:
 * - `{ factor }`: a stated Darcy friction factor f, constant in flow (as textbook and contract
 *   calculations often state it), `h = f (L/D) V^2/(2g)`; `agedFactor` for aged-pipe cases;
 * - `{ hazenWilliamsC }`: the Hazen-Williams formula with coefficient C (fire-protection and
 *   water-supply practice; water near room temperature only), `h = 10.67 L Q^1.852 /
 *   (C^1.852 D^4.8704)`; `agedHazenWilliamsC` for aged-pipe cases.
 * A case with aged pipe uses the aged value when given, else the stated one (a stated law
 * has no roughness to age).
 */
export type RunFrictionLaw =
  | { readonly factor: number; readonly agedFactor?: number }
  | { readonly hazenWilliamsC: number; readonly agedHazenWilliamsC?: number };

/** What a pipe run is made of. Give `insideDiameter` or `pipe` (one of them). */
export interface PipeRunInput {
  /** Name for reports (default `run 1`, `run 2` ... by position). */
  readonly name?: string;
  /** Length of straight pipe (m), >= 0. */
  readonly length: Length;
  /** Inside diameter (m), > 0; or give `pipe`. */
  readonly insideDiameter?: Length;
  /** A size from the pipes module (`pipeSize('4', '40')`); its inside diameter is used. */
  readonly pipe?: PipeDimensions;
  /** Absolute roughness of new pipe (m); or give `material`. */
  readonly roughness?: Length;
  /** Absolute roughness of aged pipe (m), for aged-pipe scenarios. */
  readonly agedRoughness?: Length;
  /** Wall material from the pipes module; gives the new and (where listed) aged roughness. */
  readonly material?: MaterialName;
  /** Fittings in the run, from the losses catalogue. */
  readonly fittings?: readonly FittingCount[];
  /** Valves or restrictions given by Cv, Kv or K (referred to this run's diameter). */
  readonly valves?: readonly ValveCoefficient[];
  /** Equipment with its own loss curve or rating. */
  readonly components?: readonly LossComponent[];
  /** Rise of the run from inlet to outlet (m); informative, reported in details. */
  readonly elevationChange?: Length;
  /**
   * The run's friction law: a constant Darcy factor or a Hazen-Williams C instead of the
   * system's Colebrook policy (default: the policy). Roughness is then not needed.
   */
  readonly friction?: RunFrictionLaw;
}

/** Loss breakdown of one run at one flow, filled by {@link PipeRun.lossInto}. */
export interface RunLossBreakdown {
  velocity: number;
  reynolds: number;
  frictionFactor: number;
  pipeLoss: number;
  fittingsLoss: number;
  componentLoss: number;
}

/** A validated pipe run, ready to evaluate. */
export interface PipeRun {
  readonly kind: 'run';
  readonly name: string;
  readonly length: Length;
  readonly insideDiameter: Length;
  /** Roughness used (new or aged, as chosen when the run was built). */
  readonly roughness: Length;
  readonly relativeRoughness: number;
  /** Flow area (m^2). */
  readonly area: number;
  /** Sum of constant K from valves given by Cv/Kv/K (referred to this diameter). */
  readonly valveK: number;
  readonly elevationChange: Length | undefined;
  /** The friction law: the system's Darcy-Weisbach policy, a constant f, or Hazen-Williams. */
  readonly law: 'darcy-weisbach' | 'constant-factor' | 'hazen-williams';
  /** The constant friction factor or Hazen-Williams C in use (undefined for the policy). */
  readonly lawValue: number | undefined;
  readonly input: PipeRunInput;
}

/** @internal Evaluation context shared by the runs of a system (fluid and friction policy). */
export interface RunContext {
  readonly density: number;
  readonly kinematicViscosity: number;
  readonly g: number;
  readonly friction: FrictionFactorOptions | undefined;
  /** The policy resolved once. */
  readonly policy: FrictionPolicy;
}

/**
 * @internal Builds a run context; `defaultTransition` is the transition rule used when the
 * options leave it out (systems: `'conservative'`; networks: `'interpolate'`).
 * @throws HeadflowError `UNKNOWN_NAME` for an unknown method or transition rule.
 */
export function runContext(
  density: number,
  kinematicViscosity: number,
  g: number,
  friction: FrictionFactorOptions | undefined,
  defaultTransition: 'conservative' | 'interpolate' = 'conservative',
): RunContext {
  return {
    density,
    kinematicViscosity,
    g,
    friction,
    policy: frictionPolicy(friction, defaultTransition),
  };
}

/** @internal A run with its precomputed loss evaluator. */
export interface RunEvaluator {
  readonly run: PipeRun;
  readonly fittings: FittingSet | undefined;
  readonly components: readonly LossComponent[];
}

function roughnessOf(input: PipeRunInput, name: string, aged: boolean): number {
  const mat = input.material === undefined ? undefined : material(input.material);
  if (aged) {
    if (input.agedRoughness !== undefined) {
      checkNonNegative(`${name}.agedRoughness`, input.agedRoughness, 'm');
      return input.agedRoughness;
    }
    if (mat?.agedRoughness !== undefined) return mat.agedRoughness.max;
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.agedRoughness`,
      undefined,
      'm',
      'an absolute roughness >= 0',
      'An aged-pipe case needs the aged roughness of every run: give agedRoughness, or a material whose table row lists an aged range.',
    );
  }
  if (input.roughness !== undefined) {
    checkNonNegative(`${name}.roughness`, input.roughness, 'm');
    return input.roughness;
  }
  if (mat !== undefined) return mat.roughness;
  throw argumentError(
    'INVALID_ARGUMENT',
    `${name}.roughness`,
    undefined,
    'm',
    'an absolute roughness >= 0',
    'Give roughness or material.',
  );
}

function valveK(valve: ValveCoefficient, diameter: Length, name: string): number {
  const given = [valve.cv, valve.kv, valve.k].filter((v) => v !== undefined).length;
  if (given !== 1) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}`,
      given,
      'coefficients',
      'exactly one of cv, kv or k',
    );
  }
  if (valve.cv !== undefined) return kFromCv(valve.cv, diameter);
  if (valve.kv !== undefined) return kFromKv(valve.kv, diameter);
  checkNonNegative(`${name}.k`, valve.k as number);
  return valve.k as number;
}

/**
 * Validates a pipe run and fixes its roughness (new, or aged when `aged` is true).
 *
 * @param input - the run's length, diameter (or pipe size), roughness (or material),
 *   fittings, valves, components
 * @param position - 1-based position, for the default name
 * @param aged - use the aged roughness (default false)
 * @throws HeadflowError `INVALID_ARGUMENT` for a negative length, a zero or missing diameter,
 *   a missing roughness, a valve with other than one coefficient; `UNKNOWN_NAME` for an
 *   unknown fitting or material.
 * @example
 * ```ts
 * const suction = pipeRun({ length: q(6, 'm'), pipe: pipeSize('6', '40'), material: 'commercial-steel' });
 * ```
 */
export function pipeRun(input: PipeRunInput, position = 1, aged = false): PipeRun {
  const name = input.name ?? `run ${position}`;
  checkNonNegative(`${name}.length`, input.length, 'm');
  let diameter: number;
  if (input.insideDiameter !== undefined) {
    checkPositive(`${name}.insideDiameter`, input.insideDiameter, 'm');
    diameter = input.insideDiameter;
  } else if (input.pipe !== undefined) {
    diameter = input.pipe.insideDiameter;
  } else {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.insideDiameter`,
      undefined,
      'm',
      '> 0',
      'Give insideDiameter or pipe.',
    );
  }
  const { law, lawValue } = lawOf(input, name, aged);
  const roughness =
    law === 'darcy-weisbach' || input.roughness !== undefined || input.material !== undefined
      ? roughnessOfLaw(input, name, aged, law)
      : 0;
  const relativeRoughness = roughness / diameter;
  let kSum = 0;
  for (const [i, v] of (input.valves ?? []).entries()) {
    kSum += valveK(v, diameter as Length, `${name}.valves[${i}]`);
  }
  if (input.elevationChange !== undefined)
    checkFinite(`${name}.elevationChange`, input.elevationChange, 'm');
  return Object.freeze({
    kind: 'run',
    name,
    length: input.length,
    insideDiameter: diameter as Length,
    roughness: roughness as Length,
    relativeRoughness,
    area: (Math.PI * diameter * diameter) / 4,
    valveK: kSum,
    elevationChange: input.elevationChange,
    law,
    lawValue,
    input,
  });
}

function roughnessOfLaw(
  input: PipeRunInput,
  name: string,
  aged: boolean,
  law: PipeRun['law'],
): number {
  // A stated law needs no roughness: an aged case without an aged roughness keeps the new one.
  if (law !== 'darcy-weisbach' && aged && input.agedRoughness === undefined) {
    return roughnessOf(input, name, false);
  }
  return roughnessOf(input, name, aged);
}

function lawOf(
  input: PipeRunInput,
  name: string,
  aged: boolean,
): { law: PipeRun['law']; lawValue: number | undefined } {
  const f = input.friction;
  if (f === undefined) return { law: 'darcy-weisbach', lawValue: undefined };
  if (typeof f !== 'object' || f === null) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.friction`,
      f,
      undefined,
      '{ factor } or { hazenWilliamsC }',
    );
  }
  const hasF = 'factor' in f && f.factor !== undefined;
  const hasC = 'hazenWilliamsC' in f && f.hazenWilliamsC !== undefined;
  if (hasF === hasC) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.friction`,
      hasF ? 2 : 0,
      'laws',
      'exactly one of factor or hazenWilliamsC',
    );
  }
  if ('factor' in f && hasF) {
    checkPositive(`${name}.friction.factor`, f.factor);
    if (f.agedFactor !== undefined) checkPositive(`${name}.friction.agedFactor`, f.agedFactor);
    return {
      law: 'constant-factor',
      lawValue: aged && f.agedFactor !== undefined ? f.agedFactor : f.factor,
    };
  }
  const hw = f as { readonly hazenWilliamsC: number; readonly agedHazenWilliamsC?: number };
  checkPositive(`${name}.friction.hazenWilliamsC`, hw.hazenWilliamsC);
  if (hw.agedHazenWilliamsC !== undefined) {
    checkPositive(`${name}.friction.agedHazenWilliamsC`, hw.agedHazenWilliamsC);
  }
  return {
    law: 'hazen-williams',
    lawValue:
      aged && hw.agedHazenWilliamsC !== undefined ? hw.agedHazenWilliamsC : hw.hazenWilliamsC,
  };
}

/**
 * @internal Checks a run's relative roughness against the friction options (eps/D above 0.1
 * needs `allowLargeRoughness`) once, so that evaluations need not.
 * @throws HeadflowError `OUT_OF_RANGE` or `INVALID_ARGUMENT` as `frictionFactor` does.
 */
export function checkRunRoughness(run: PipeRun, friction: FrictionFactorOptions | undefined): void {
  if (run.law === 'darcy-weisbach') frictionFactor(1e5, run.relativeRoughness, friction);
}

/** @internal Precomputes a run's fittings for evaluation. */
export function runEvaluator(run: PipeRun): RunEvaluator {
  const list = run.input.fittings ?? [];
  return {
    run,
    fittings: list.length === 0 ? undefined : fittingSet(list, run.insideDiameter),
    components: run.input.components ?? [],
  };
}

/**
 * @internal Head loss of a run at a flow (m); fills `out` with the breakdown when given.
 * Zero flow has zero loss. Allocates nothing. The same law as {@link runLossSlope}.
 */
export function runLoss(
  ev: RunEvaluator,
  flow: number,
  ctx: RunContext,
  out?: RunLossBreakdown,
): number {
  return runLossSlope(ev, flow, ctx, SCRATCH, out);
}

/** @internal A head loss and its derivative in flow, filled by {@link runLossSlope}. */
export interface LossSlope {
  /** dh/dQ (s/m^2), > 0. */
  slope: number;
}

const SCRATCH: LossSlope = { slope: 0 };
const FRICTION: FrictionSlope = { f: 0, dfdRe: 0 };
/** Hazen-Williams exponent of flow (1/0.54, printed as 1.852). */
const HW_Q = 1.852;
/** Hazen-Williams exponent of diameter (2.63/0.54, printed as 4.8704). */
const HW_D = 4.8704;
/** Relative step of the central difference for equipment losses (no analytic slope). */
const COMPONENT_STEP = 1e-6;

/**
 * Mean velocity (m/s) below which a run whose loss has no term linear in flow (a stated
 * factor, Hazen-Williams, a run of fittings or equipment only) follows a cubic through zero
 * instead of its law, so that its slope stays finite and positive at zero flow (a solver
 * needs that). The cubic `h = m Q + b Q^2 + c Q^3` matches the law's loss and slope at the
 * threshold flow Q0 (m = h(Q0)/Q0, b = -c Q0, c = (h'(Q0) - m)/Q0^2); it rises monotonically
 * for any law steeper than linear and flatter than Q^4. Below 1 mm/s the loss of such a run
 * is at most its law's loss at 1 mm/s, a millionth of its loss at 1 m/s for a square law.
 * Runs whose Darcy-Weisbach policy gives laminar flow there (any run with a length) are exact.
 */
export const LOW_FLOW_VELOCITY = 1e-3;

/**
 * @internal Head loss of a run at a flow (m, signed like the flow) and its exact derivative
 * dh/dQ, written to `res.slope`; fills `out` with the breakdown when given. Allocates nothing.
 *
 * Darcy-Weisbach with the context's policy: laminar `h = 32 nu L V/(g D^2)` (Hagen-Poiseuille,
 * linear, finite slope at zero flow), otherwise `h = f(Re) (L/D) V^2/(2g)` with
 * `dh/dQ = (L/D)/(2 g A^2) (2 f Q + Q^2 f'(Re) D/(nu A))`. A stated factor: `f` constant.
 * Hazen-Williams: `h = r Q^1.852`, `dh/dQ = 1.852 r Q^0.852`. Fittings: `K1 nu V/(2 g D) +
 * K V^2/(2g)`. Equipment: its own loss, slope by central difference. A run with no linear
 * term follows the cubic of {@link LOW_FLOW_VELOCITY} below that velocity.
 */
export function runLossSlope(
  ev: RunEvaluator,
  flow: number,
  ctx: RunContext,
  res: LossSlope,
  out?: RunLossBreakdown,
): number {
  const run = ev.run;
  const q = Math.abs(flow);
  const fs = ev.fittings;
  const nu = ctx.kinematicViscosity;
  const d = run.insideDiameter;
  const a = run.area;
  // Coefficient of the term linear in flow at low flow: laminar pipe and fittings' K1.
  const linear =
    (run.law === 'darcy-weisbach' ? (32 * nu * run.length) / (ctx.g * d * d * a) : 0) +
    (fs === undefined ? 0 : (fs.laminar * nu) / (2 * ctx.g * d * a));
  const q0 = LOW_FLOW_VELOCITY * a;
  if (linear === 0 && q < q0) {
    // Cubic through zero matching the law at q0 (see LOW_FLOW_VELOCITY).
    const h0 = lossAbove(ev, q0, ctx, res, undefined);
    const s0 = res.slope;
    const m = h0 / q0;
    const c = (s0 - m) / (q0 * q0);
    const b = -c * q0;
    const h = q * (m + q * (b + q * c));
    res.slope = m + q * (2 * b + 3 * c * q);
    if (out) {
      const scale = q0 > 0 && h0 > 0 ? h / h0 : 0;
      lossAbove(ev, q0, ctx, SCRATCH_2, out);
      const v = q / a;
      out.velocity = v;
      out.reynolds = (v * d) / nu;
      out.pipeLoss *= scale;
      out.fittingsLoss *= scale;
      out.componentLoss *= scale;
      if (q === 0) out.frictionFactor = Number.POSITIVE_INFINITY;
    }
    return flow < 0 ? -h : h;
  }
  if (q === 0) {
    res.slope = linear;
    if (out) {
      out.velocity = 0;
      out.reynolds = 0;
      out.frictionFactor = Number.POSITIVE_INFINITY;
      out.pipeLoss = 0;
      out.fittingsLoss = 0;
      out.componentLoss = 0;
    }
    return 0;
  }
  const total = lossAbove(ev, q, ctx, res, out);
  return flow < 0 ? -total : total;
}

const SCRATCH_2: LossSlope = { slope: 0 };

/** Loss and slope of a run at a flow q > 0 by its law (no low-flow cubic). */
function lossAbove(
  ev: RunEvaluator,
  q: number,
  ctx: RunContext,
  res: LossSlope,
  out: RunLossBreakdown | undefined,
): number {
  const run = ev.run;
  const d = run.insideDiameter;
  const a = run.area;
  const v = q / a;
  const nu = ctx.kinematicViscosity;
  const re = (v * d) / nu;
  const twoG = 2 * ctx.g;
  const velocityHead = (v * v) / twoG;
  let f: number;
  let pipeLoss: number;
  let pipeSlope: number;
  if (run.law === 'hazen-williams') {
    const r = (HAZEN_WILLIAMS_SI * run.length) / ((run.lawValue as number) ** HW_Q * d ** HW_D);
    pipeLoss = r * q ** HW_Q;
    pipeSlope = (HW_Q * pipeLoss) / q;
    f = velocityHead > 0 && run.length > 0 ? (pipeLoss * d) / (run.length * velocityHead) : 0;
  } else if (run.law === 'constant-factor') {
    f = run.lawValue as number;
    pipeLoss = ((f * run.length) / d) * velocityHead;
    pipeSlope = (2 * pipeLoss) / q;
  } else if (re <= LAMINAR_LIMIT_RE) {
    // Laminar (Re <= 2300, every friction policy gives 64/Re there): Hagen-Poiseuille,
    // 32 nu L V / (g D^2), which stays finite as the flow tends to zero.
    f = 64 / re;
    pipeLoss = (32 * nu * run.length * v) / (ctx.g * d * d);
    pipeSlope = pipeLoss / q;
  } else {
    frictionWithSlope(ctx.policy, re, run.relativeRoughness, FRICTION);
    f = FRICTION.f;
    const k = run.length / d / (twoG * a * a);
    pipeLoss = k * f * q * q;
    pipeSlope = k * (2 * f * q + q * q * FRICTION.dfdRe * (d / (nu * a)));
  }
  // Fittings: K = K1/Re + K_turbulent, so K V^2/(2g) = K1 nu V / (2 g D) + K_turbulent V^2/(2g).
  const fs = ev.fittings;
  const k1 = fs === undefined ? 0 : (fs.laminar * nu) / (twoG * d * a);
  const kt = (run.valveK + (fs === undefined ? 0 : fs.turbulent)) / (twoG * a * a);
  const fittingsLoss = k1 * q + kt * q * q;
  const fittingsSlope = k1 + 2 * kt * q;
  let componentLoss = 0;
  let componentSlope = 0;
  const comps = ev.components;
  if (comps.length > 0) {
    const rho = ctx.density as Density;
    const g = ctx.g as Acceleration;
    const dq = q * COMPONENT_STEP;
    for (const c of comps) {
      componentLoss += c.headLoss(q as Flow, rho, g);
      componentSlope +=
        (c.headLoss((q + dq) as Flow, rho, g) - c.headLoss((q - dq) as Flow, rho, g)) / (2 * dq);
    }
  }
  if (out) {
    out.velocity = v;
    out.reynolds = re;
    out.frictionFactor = f;
    out.pipeLoss = pipeLoss;
    out.fittingsLoss = fittingsLoss;
    out.componentLoss = componentLoss;
  }
  res.slope = pipeSlope + fittingsSlope + componentSlope;
  return pipeLoss + fittingsLoss + componentLoss;
}

/** Upper Reynolds number of the laminar regime (2300, as the friction policy). */
const LAMINAR_LIMIT_RE = 2300;

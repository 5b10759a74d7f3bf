/**
 * A run's friction law (the system's Darcy-Weisbach policy, a stated factor, Hazen-Williams):
 * its loss at a flow with the exact derivative dh/dQ, the run context, and the checks of a
 * stated law.
 *
 * @module
 */
import { argumentError, checkPositive } from '../errors';
import { type FrictionFactorOptions, frictionFactor, HAZEN_WILLIAMS_SI } from '../friction/index';
import { type FrictionSlope, frictionPolicy, frictionWithSlope } from '../friction/internal';
import type { Acceleration, Density, Flow } from '../units/index';
import type {
  LossComponent,
  PipeRun,
  PipeRunInput,
  RunContext,
  RunEvaluator,
  RunLossBreakdown,
} from './run';

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

/** @internal The friction law of a run's input, checked (the aged value in an aged case). */
export function lawOf(
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

/** @internal A head loss and its derivative in flow, filled by {@link runLossSlope}. */
export interface LossSlope {
  /** dh/dQ (s/m^2), > 0. */
  slope: number;
}

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
      if (q === 0) out.frictionFactor = undefined;
    }
    return flow < 0 ? -h : h;
  }
  if (q === 0) {
    res.slope = linear;
    if (out) {
      out.velocity = 0;
      out.reynolds = 0;
      out.frictionFactor = undefined;
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
      const h = c.headLoss(q as Flow, rho, g);
      const up = c.headLoss((q + dq) as Flow, rho, g);
      const down = c.headLoss((q - dq) as Flow, rho, g);
      if (typeof h !== 'number' || !Number.isFinite(h)) badComponent(c, h, q);
      if (!Number.isFinite(up)) badComponent(c, up, q + dq);
      if (!Number.isFinite(down)) badComponent(c, down, q - dq);
      componentLoss += h;
      componentSlope += (up - down) / (2 * dq);
    }
  }
  if (out) {
    out.velocity = v;
    out.reynolds = re;
    // At a flow so small that 64/Re overflows, f has no finite value: reported as absent.
    out.frictionFactor = f < Number.POSITIVE_INFINITY ? f : undefined;
    out.pipeLoss = pipeLoss;
    out.fittingsLoss = fittingsLoss;
    out.componentLoss = componentLoss;
  }
  res.slope = pipeSlope + fittingsSlope + componentSlope;
  return pipeLoss + fittingsLoss + componentLoss;
}

/** Upper Reynolds number of the laminar regime (2300, as the friction policy). */
const LAMINAR_LIMIT_RE = 2300;

/** Refuses a loss component that gave no finite head loss. */
function badComponent(c: LossComponent, h: unknown, flow: number): never {
  const name = typeof c.name === 'string' ? c.name : 'a component';
  throw argumentError(
    'INVALID_ARGUMENT',
    `${name}.headLoss(${flow})`,
    h,
    'm',
    'a finite head loss',
    'A loss component must return a finite head loss (m) for every flow.',
  );
}

/**
 * A pipe run (segment): a length of one inside diameter with its wall roughness, fittings,
 * valves and equipment. Validated once; evaluating its loss at a flow allocates nothing.
 *
 * @module
 */
import { argumentError, checkFinite, checkNonNegative, checkPositive } from '../errors';
import type { FrictionFactorOptions } from '../friction/index';
import type { FrictionPolicy } from '../friction/internal';
import {
  guardArray,
  guardBoolean,
  guardFunction,
  guardInteger,
  guardNumber,
  guardRecord,
  guardResult,
  guardString,
} from '../guards';
import { type FittingCount, type FittingSet, fittingSet, kFromCv, kFromKv } from '../losses/index';
import { type MaterialName, material, type PipeDimensions } from '../pipes/index';
import type { Acceleration, Density, Flow, Length } from '../units/index';
import { type LossSlope, lawOf, type RunFrictionLaw, runLossSlope } from './run-law';

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
  frictionFactor: number | undefined;
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

/** The words of a catalogue size (nominal size, schedule, DN) that reports print. */
function checkPipeNames(path: string, pipe: unknown): void {
  const p = guardRecord(path, pipe);
  guardString(`${path}.nps`, p['nps']);
  guardString(`${path}.schedule`, p['schedule']);
  if (p['dn'] !== undefined) guardNumber(`${path}.dn`, p['dn']);
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
  guardInteger('position', position, 1, 1_000_000);
  guardBoolean('aged', aged);
  guardRecord(`runs[${position - 1}]`, input);
  const name = input.name === undefined ? `run ${position}` : guardString('name', input.name);
  checkNonNegative(`${name}.length`, input.length, 'm');
  let diameter: number;
  // A catalogue size is restated in reports by its name: its words are checked here too.
  if (input.pipe !== undefined) checkPipeNames(`${name}.pipe`, input.pipe);
  if (input.insideDiameter !== undefined) {
    checkPositive(`${name}.insideDiameter`, input.insideDiameter, 'm');
    diameter = input.insideDiameter;
  } else if (input.pipe !== undefined) {
    const pipe = guardRecord(`${name}.pipe`, input.pipe);
    checkPositive(`${name}.pipe.insideDiameter`, pipe['insideDiameter'] as number, 'm');
    diameter = pipe['insideDiameter'] as number;
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
  const relativeRoughness = guardResult(
    `${name}.relativeRoughness`,
    roughness / diameter,
    'OUT_OF_RANGE',
  );
  let kSum = 0;
  const valves = guardArray(`${name}.valves`, input.valves ?? [], { max: 10_000 });
  for (const [i, v] of valves.entries()) {
    const at = `${name}.valves[${i}]`;
    const valve = guardRecord(at, v);
    // Names are restated in reports: each must be a string.
    if (valve['name'] !== undefined) guardString(`${at}.name`, valve['name']);
    kSum += valveK(valve as ValveCoefficient, diameter as Length, at);
  }
  if (input.fittings !== undefined) guardArray(`${name}.fittings`, input.fittings, { max: 10_000 });
  const components = guardArray(`${name}.components`, input.components ?? [], { max: 10_000 });
  for (const [i, c] of components.entries()) {
    const component = guardRecord(`${name}.components[${i}]`, c);
    guardFunction(`${name}.components[${i}].headLoss`, component['headLoss']);
    if (component['name'] !== undefined) {
      guardString(`${name}.components[${i}].name`, component['name']);
    }
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
    area: guardResult(`${name}.area`, (Math.PI * diameter * diameter) / 4, 'OUT_OF_RANGE'),
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

/** @internal Precomputes a run's fittings for evaluation. */
/** The error for a component whose headLoss gave no finite number. */

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

const SCRATCH: LossSlope = { slope: 0 };

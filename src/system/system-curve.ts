/**
 * The system curve: the head a pump must add to move a flow from one liquid surface (or
 * point) to another, by the steady-flow energy equation between the two points.
 *
 * @module
 */
import { argumentError, checkFinite, checkPositive, HeadflowError } from '../errors';
import type { FluidState } from '../fluids/index';
import { type FrictionFactorOptions, frictionFactor } from '../friction/index';
import {
  guardArray,
  guardBoolean,
  guardBuffer,
  guardRange,
  guardRecord,
  guardResult,
  guardString,
} from '../guards';
import { type PipeRun, type PipeRunInput, pipeRun } from '../network/index';
import {
  checkRunRoughness,
  type ParallelGroup,
  parallelGroup,
  parallelSplit,
  type RunContext,
  type RunEvaluator,
  type RunLossBreakdown,
  runContext,
  runEvaluator,
  runLoss,
} from '../network/internal';
import {
  type Acceleration,
  type Flow,
  type Length,
  type Pressure,
  STANDARD_GRAVITY,
  type Velocity,
} from '../units/index';

/**
 * One end of the system: a liquid surface or a point in the line.
 * The velocity there is zero (a large tank's surface) unless `velocityDiameter` is given: then
 * it is the mean velocity of the flow through that diameter (a free jet, a nozzle, a point in
 * a pipe), and its velocity head enters the balance.
 */
export interface Endpoint {
  /** Elevation of the surface or point above a common datum (m). */
  readonly elevation: Length;
  /** Absolute pressure on the surface or at the point (Pa); an open tank: the atmosphere. */
  readonly pressure: Pressure;
  /** Diameter whose mean velocity is the endpoint's velocity (m); omit for a still surface. */
  readonly velocityDiameter?: Length;
}

/** Branches in parallel between the same two nodes; each branch is runs in series. */
export interface ParallelInput {
  readonly kind: 'parallel';
  readonly name?: string;
  readonly branches: readonly (readonly PipeRunInput[])[];
}

/** An element of the line: a run, or a parallel group. */
export type LineElement = PipeRunInput | ParallelInput;

/**
 * A system between two points: what the pump must overcome.
 * The pump sits somewhere in `runs` (the order is the flow's path from `suction` to
 * `discharge`); where exactly does not change the system curve, only the suction-side NPSH.
 */
export interface SystemDefinition {
  /** Name for reports. */
  readonly name?: string;
  /** The fluid's state (density, viscosity, vapour pressure) at the operating temperature. */
  readonly fluid: FluidState;
  /** Where the liquid comes from (a tank surface, a main). */
  readonly suction: Endpoint;
  /** Where it goes. */
  readonly discharge: Endpoint;
  /** Runs and parallel groups in series, in flow order. */
  readonly runs: readonly LineElement[];
  /** Friction-factor policy (method and transition rule) for every run. */
  readonly friction?: FrictionFactorOptions;
  /** Gravity (m/s^2), default 9.80665. */
  readonly g?: Acceleration;
  /** Use aged roughness for every run (default false: new pipe). */
  readonly aged?: boolean;
}

/** One run's figures at a flow, from {@link SystemCurve.details}. */
export interface RunDetails {
  readonly name: string;
  /** Branch path for runs in a parallel group, for example `"loop A / branch 2"`. */
  readonly group: string | undefined;
  readonly flow: Flow;
  readonly insideDiameter: Length;
  readonly velocity: Velocity;
  readonly reynolds: number;
  readonly regime: 'none' | 'laminar' | 'transition' | 'turbulent';
  /** Darcy friction factor; `undefined` at zero flow, where it has no value. */
  readonly frictionFactor: number | undefined;
  /** The run's friction law: the friction policy, a stated factor, or Hazen-Williams. */
  readonly law: PipeRun['law'];
  /** The stated friction factor or Hazen-Williams C (undefined for the policy). */
  readonly lawValue: number | undefined;
  /** Straight-pipe loss (m). */
  readonly pipeLoss: Length;
  /** Fittings and valves loss (m). */
  readonly fittingsLoss: Length;
  /** Equipment loss (m). */
  readonly componentLoss: Length;
  /** Total loss of the run (m). */
  readonly totalLoss: Length;
  /** The total loss as a pressure drop (Pa). */
  readonly pressureDrop: Pressure;
  readonly elevationChange: Length | undefined;
}

/** Everything about the system at one flow. */
export interface SystemPoint {
  readonly flow: Flow;
  /** Head the pump must add (m). */
  readonly head: Length;
  /** Elevation plus pressure-head difference (m). */
  readonly staticHead: Length;
  /** Change of velocity head between the endpoints (m). */
  readonly velocityHead: Length;
  /** All losses (m). */
  readonly lossHead: Length;
  readonly runs: readonly RunDetails[];
}

/** A system curve: head the pump must add as a function of flow. */
export interface SystemCurve {
  readonly name: string;
  /** The definition it was built from. */
  readonly definition: SystemDefinition;
  /** Elevation rise plus pressure-head rise between the endpoints (m); head at zero flow. */
  readonly staticHead: Length;
  /** Head the pump must add at a flow (m). */
  head(flow: Flow): Length;
  /** Fills `out[i]` with the head at `flows[i]` (m3/s), returns `out`. */
  headInto(flows: ArrayLike<number>, out: Float64Array): Float64Array;
  /** Per-run velocity, Re, regime, friction factor and losses at a flow. */
  details(flow: Flow): SystemPoint;
}

interface Group {
  readonly name: string;
  readonly branches: readonly (readonly RunEvaluator[])[];
  /** The group as the network core splits it (with its warm start). */
  readonly split: ParallelGroup;
}

type Element =
  | { readonly kind: 'run'; readonly ev: RunEvaluator }
  | { readonly kind: 'parallel'; readonly group: Group };

function regimeOf(re: number): RunDetails['regime'] {
  if (re === 0) return 'none';
  if (re <= 2300) return 'laminar';
  if (re < 4000) return 'transition';
  return 'turbulent';
}

function endpointVelocity(e: Endpoint, flow: number): number {
  if (e.velocityDiameter === undefined) return 0;
  const d = e.velocityDiameter;
  return flow / ((Math.PI * d * d) / 4);
}

function checkEndpoint(e: Endpoint, name: string): void {
  guardRecord(name, e);
  checkFinite(`${name}.elevation`, e.elevation, 'm');
  if (!Number.isFinite(e.pressure) || e.pressure < 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      `${name}.pressure`,
      e.pressure,
      'Pa',
      'an absolute pressure >= 0',
    );
  }
  if (e.velocityDiameter !== undefined)
    checkPositive(`${name}.velocityDiameter`, e.velocityDiameter, 'm');
}

/**
 * Largest liquid density a system takes (kg/m3): the physical range of a density in scenario
 * files (`PHYSICAL_RANGE`); mercury, the densest common liquid, is 13 534 kg/m3 at 20 degC
 * (common practice).
 */
const MAX_LIQUID_DENSITY = 1e5;

function checkFluid(fluid: FluidState, suction: Endpoint): void {
  checkPositive('fluid.density', fluid.density, 'kg/m3');
  if (fluid.density > MAX_LIQUID_DENSITY) {
    // Powers and pressures of the design (rho g Q H) would overflow for no liquid there is.
    throw argumentError(
      'OUT_OF_RANGE',
      'fluid.density',
      fluid.density,
      'kg/m3',
      `<= ${MAX_LIQUID_DENSITY} (the physical range of a density)`,
    );
  }
  checkPositive('fluid.kinematicViscosity', fluid.kinematicViscosity, 'm2/s');
  if (fluid.vaporPressure !== undefined) {
    guardRange('fluid.vaporPressure', fluid.vaporPressure, { min: 0, unit: 'Pa' });
  }
  if (fluid.vaporPressure !== undefined && fluid.vaporPressure >= suction.pressure) {
    throw new HeadflowError(
      'OUT_OF_RANGE',
      `the liquid boils at the suction: its vapour pressure ${(fluid.vaporPressure / 1000).toPrecision(4)} kPa ` +
        `is at or above the suction pressure ${(suction.pressure / 1000).toPrecision(4)} kPa (absolute). ` +
        'Raise the suction pressure or lower the temperature.',
      {
        parameter: 'suction.pressure',
        value: suction.pressure,
        unit: 'Pa',
        allowed: `> ${fluid.vaporPressure} Pa`,
      },
    );
  }
}

/**
 * Builds the system curve of a definition: for a flow Q, the head the pump must add,
 *
 * `H(Q) = (z2 - z1) + (p2 - p1)/(rho g) + (V2^2 - V1^2)/(2 g) + sum of losses(Q)`,
 *
 * the steady-flow energy equation between the suction point 1 and the discharge point 2
 * (incompressible, isothermal liquid). Each run loses `f (L/D) V^2/(2g)` (Darcy-Weisbach, f
 * from `frictionFactor` with the definition's policy) plus `K V^2/(2g)` for its fittings and
 * valves plus its equipment's losses. Parallel groups split the flow so that every branch
 * has the same loss, solved by the network core's global gradient step (Todini and Pilati
 * 1988) on the group's two nodes, to 1e-13 of the loss; each evaluation starts from the last
 * split, so a curve evaluated along nearby flows needs two to five steps per group.
 *
 * With the default `'conservative'` transition rule the friction factor jumps up at Re 2300
 * (laminar to the larger turbulent value), so a loss is discontinuous there; a parallel branch
 * whose split lands on that jump runs at Re 2300 and its loss can differ from the other
 * branches' by up to the jump. `friction: { transition: 'interpolate' }` is continuous and
 * gives an exact split at every flow.
 *
 * Source: the energy equation with head loss, as in F. M. White, "Fluid Mechanics", 7th ed.
 * (2011), eq. 3.73 and section 6.9 (multiple-pipe systems).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for impossible runs, endpoints or fluid;
 *   `OUT_OF_RANGE` when the fluid boils at the suction pressure or is denser than 1e5 kg/m3
 *   (no liquid is; rho g Q H would overflow); `UNKNOWN_NAME` for an unknown
 *   fitting or material.
 * @example
 * ```ts
 * const curve = systemCurve({
 *   fluid: water().at(q(20, 'degC')),
 *   suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
 *   discharge: { elevation: q(30, 'm'), pressure: STANDARD_ATMOSPHERE },
 *   runs: [{ length: q(200, 'm'), insideDiameter: q(102.3, 'mm'), material: 'commercial-steel' }],
 * });
 * curve.staticHead; // 30 (m)
 * ```
 */
export function systemCurve(definition: SystemDefinition): SystemCurve {
  checkDefinition(definition);
  const { fluid, suction, discharge } = definition;
  checkEndpoint(suction, 'suction');
  checkEndpoint(discharge, 'discharge');
  checkFluid(guardRecord('fluid', fluid) as unknown as FluidState, suction);
  const g = definition.g ?? STANDARD_GRAVITY;
  checkPositive('g', g, 'm/s2');
  // The friction policy is checked once here rather than at the first evaluation.
  if (definition.friction !== undefined) frictionFactor(1e5, 0, definition.friction);
  if (definition.runs.length === 0) {
    throw argumentError('INVALID_ARGUMENT', 'runs', 0, 'runs', 'at least one run');
  }
  const aged = definition.aged === true;
  const ctx: RunContext = runContext(
    fluid.density,
    fluid.kinematicViscosity,
    g,
    definition.friction,
  );
  const elements = buildLine(definition.runs, aged);
  for (const el of elements) {
    if (el.kind === 'run') checkRunRoughness(el.ev.run, definition.friction);
    else
      for (const b of el.group.branches)
        for (const ev of b) checkRunRoughness(ev.run, definition.friction);
  }
  const rhoG = guardResult('fluid.density x g', fluid.density * g, 'OUT_OF_RANGE');
  const staticHead =
    discharge.elevation - suction.elevation + (discharge.pressure - suction.pressure) / rhoG;
  const maxBranches = Math.max(
    2,
    ...elements.map((e) => (e.kind === 'parallel' ? e.group.branches.length : 0)),
  );
  const scratch = new Float64Array(maxBranches);

  const lossAt = (flow: number): number => {
    let h = 0;
    for (const el of elements) {
      h +=
        el.kind === 'run'
          ? runLoss(el.ev, flow, ctx)
          : parallelSplit(el.group.split, flow, ctx, scratch);
    }
    return h;
  };
  const velocityHeadAt = (flow: number): number => {
    const v2 = endpointVelocity(discharge, flow);
    const v1 = endpointVelocity(suction, flow);
    return (v2 * v2 - v1 * v1) / (2 * g);
  };
  const checkFlow = (flow: number, parameter = 'flow'): void => {
    if (!Number.isFinite(flow) || flow < 0) {
      throw argumentError('INVALID_ARGUMENT', parameter, flow, 'm3/s', 'a finite flow >= 0');
    }
  };

  const head = (flow: Flow): Length => {
    checkFlow(flow);
    return guardResult(
      'head',
      staticHead + velocityHeadAt(flow) + lossAt(flow),
      'OUT_OF_RANGE',
    ) as Length;
  };

  const details = (flow: Flow): SystemPoint => {
    checkFlow(flow);
    const runs: RunDetails[] = [];
    const b: RunLossBreakdown = {
      velocity: 0,
      reynolds: 0,
      frictionFactor: 0,
      pipeLoss: 0,
      fittingsLoss: 0,
      componentLoss: 0,
    };
    const push = (ev: RunEvaluator, q: number, group: string | undefined): number => {
      const total = runLoss(ev, q, ctx, b);
      runs.push({
        name: ev.run.name,
        group,
        flow: q as Flow,
        insideDiameter: ev.run.insideDiameter,
        velocity: b.velocity as Velocity,
        reynolds: b.reynolds,
        regime: regimeOf(b.reynolds),
        frictionFactor: b.frictionFactor,
        law: ev.run.law,
        lawValue: ev.run.lawValue,
        pipeLoss: b.pipeLoss as Length,
        fittingsLoss: b.fittingsLoss as Length,
        componentLoss: b.componentLoss as Length,
        totalLoss: total as Length,
        pressureDrop: guardResult(
          `${ev.run.name} pressure drop`,
          total * rhoG,
          'OUT_OF_RANGE',
        ) as Pressure,
        elevationChange: ev.run.elevationChange,
      });
      return total;
    };
    let loss = 0;
    for (const el of elements) {
      if (el.kind === 'run') {
        loss += push(el.ev, flow, undefined);
      } else {
        const flows = new Float64Array(el.group.branches.length);
        loss += parallelSplit(el.group.split, flow, ctx, flows);
        el.group.branches.forEach((branch, j) => {
          for (const ev of branch) push(ev, flows[j] ?? 0, `${el.group.name} / branch ${j + 1}`);
        });
      }
    }
    const vh = velocityHeadAt(flow);
    return {
      flow,
      head: guardResult('head', staticHead + vh + loss, 'OUT_OF_RANGE') as Length,
      staticHead: staticHead as Length,
      velocityHead: vh as Length,
      lossHead: loss as Length,
      runs,
    };
  };

  const headInto = (flows: ArrayLike<number>, out: Float64Array): Float64Array => {
    if (!(flows instanceof Float64Array)) guardArray('flows', flows);
    guardBuffer('out', out, 0);
    if (out.length !== flows.length) {
      throw argumentError(
        'INVALID_ARGUMENT',
        'out.length',
        out.length,
        undefined,
        `${flows.length} (as many as flows)`,
      );
    }
    for (let i = 0; i < flows.length; i++) {
      const q = flows[i] as number;
      checkFlow(q, `flows[${i}]`);
      out[i] = guardResult(
        `head at flows[${i}]`,
        staticHead + velocityHeadAt(q) + lossAt(q),
        'OUT_OF_RANGE',
      );
    }
    return out;
  };

  return Object.freeze({
    name: definition.name ?? 'system',
    definition,
    staticHead: staticHead as Length,
    head,
    headInto,
    details,
  });
}

/** Every run of a definition, validated (for reports that list the line). */
export function runsOf(definition: SystemDefinition): readonly PipeRun[] {
  checkDefinition(definition);
  return buildLine(definition.runs, definition.aged === true).flatMap((el) =>
    el.kind === 'run' ? [el.ev.run] : el.group.branches.flat().map((ev) => ev.run),
  );
}

/** Validates the line and builds each run's evaluator, numbering runs in flow order. */
/** The shape checks shared by {@link systemCurve} and {@link runsOf}. */
function checkDefinition(definition: SystemDefinition): void {
  guardRecord('definition', definition);
  if (definition.name !== undefined) guardString('name', definition.name);
  if (definition.aged !== undefined) guardBoolean('aged', definition.aged);
  guardArray('runs', definition.runs, { max: 10_000 });
}

function buildLine(runs: readonly LineElement[], aged: boolean): Element[] {
  let position = 0;
  return runs.map((el, i): Element => {
    guardRecord(`runs[${i}]`, el);
    if ('kind' in el && el.kind === 'parallel') {
      const groupName =
        el.name === undefined ? `parallel ${i + 1}` : guardString(`runs[${i}].name`, el.name);
      guardArray(`${groupName}.branches`, el.branches, { max: 1000 });
      if (el.branches.length < 2) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `${groupName}.branches`,
          el.branches.length,
          'branches',
          'at least 2',
        );
      }
      const branches = el.branches.map((b, j) => {
        guardArray(`${groupName}.branches[${j}]`, b, { max: 10_000 });
        if (b.length === 0) {
          throw argumentError(
            'INVALID_ARGUMENT',
            `${groupName}.branches[${j}]`,
            0,
            'runs',
            'at least one run',
          );
        }
        return b.map((r) => runEvaluator(pipeRun(r, ++position, aged)));
      });
      return {
        kind: 'parallel',
        group: { name: groupName, branches, split: parallelGroup(branches) },
      };
    }
    return { kind: 'run', ev: runEvaluator(pipeRun(el as PipeRunInput, ++position, aged)) };
  });
}

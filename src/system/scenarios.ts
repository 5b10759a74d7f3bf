/**
 * Operating cases: one system definition evaluated with different tank levels, surface
 * pressures, pipe age, fluid state or friction policy, giving a family of system curves.
 *
 * @module
 */
import { argumentError } from '../errors';
import type { FluidState } from '../fluids/index';
import type { FrictionFactorOptions } from '../friction/index';
import type { Flow } from '../units/index';
import {
  type Endpoint,
  type SystemCurve,
  type SystemDefinition,
  type SystemPoint,
  systemCurve,
} from './system-curve';

/** What an operating case changes; everything it omits is taken from the base definition. */
export interface OperatingCase {
  /** Name for reports, for example `"low suction level, aged pipe"`. Unique in a family. */
  readonly name: string;
  readonly fluid?: FluidState;
  readonly suction?: Partial<Endpoint>;
  readonly discharge?: Partial<Endpoint>;
  /** Aged roughness for every run. */
  readonly aged?: boolean;
  readonly friction?: FrictionFactorOptions;
}

/** One operating case's system curve. */
export interface ScenarioCurve {
  readonly name: string;
  readonly operatingCase: OperatingCase;
  readonly curve: SystemCurve;
}

/**
 * The definition of one operating case: the base with the case's changes applied.
 * @throws HeadflowError as {@link systemCurve} does for the resulting definition.
 */
export function applyCase(base: SystemDefinition, operatingCase: OperatingCase): SystemDefinition {
  return {
    ...base,
    name: operatingCase.name,
    fluid: operatingCase.fluid ?? base.fluid,
    suction: { ...base.suction, ...operatingCase.suction },
    discharge: { ...base.discharge, ...operatingCase.discharge },
    aged: operatingCase.aged ?? base.aged ?? false,
    ...(operatingCase.friction !== undefined || base.friction !== undefined
      ? { friction: operatingCase.friction ?? base.friction }
      : {}),
  } as SystemDefinition;
}

/**
 * System curves for several operating cases of one system (for example high and low tank
 * levels, new and aged pipe, cold and hot water). With no cases, the base alone.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for duplicate or empty case names, and whatever
 *   {@link systemCurve} throws for a case (the message names the case).
 * @example
 * ```ts
 * const family = systemScenarios(base, [
 *   { name: 'high suction level', suction: { elevation: q(4, 'm') } },
 *   { name: 'low suction level, aged pipe', suction: { elevation: q(0.5, 'm') }, aged: true },
 * ]);
 * family.map((s) => s.curve.head(q(40, 'L/s')));
 * ```
 */
export function systemScenarios(
  base: SystemDefinition,
  cases: readonly OperatingCase[],
): readonly ScenarioCurve[] {
  if (cases.length === 0) {
    const name = base.name ?? 'design';
    return [{ name, operatingCase: { name }, curve: systemCurve(base) }];
  }
  const seen = new Set<string>();
  return cases.map((c, i) => {
    if (typeof c.name !== 'string' || c.name.trim() === '' || seen.has(c.name)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `cases[${i}].name`,
        c.name,
        undefined,
        'a unique, non-empty name',
      );
    }
    seen.add(c.name);
    return { name: c.name, operatingCase: c, curve: systemCurve(applyCase(base, c)) };
  });
}

/**
 * The duty a pump must meet at a required flow: the head of the system at that flow, with
 * its static, velocity and loss parts and each run's figures.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a negative or non-finite flow.
 * @example
 * ```ts
 * dutyFor(curve, q(40, 'L/s')).head; // head the pump must add (m)
 * ```
 */
export function dutyFor(system: SystemCurve, flow: Flow): SystemPoint {
  return system.details(flow);
}

/**
 * Operating cases: one system definition evaluated with different tank levels, surface
 * pressures, pipe age, fluid state or friction policy, giving a family of system curves.
 *
 * @module
 */
import { argumentError } from '../errors';
import type { FluidState } from '../fluids/index';
import type { FrictionFactorOptions } from '../friction/index';
import {
  guardArray,
  guardBoolean,
  guardFunction,
  guardNumber,
  guardRecord,
  guardString,
} from '../guards';
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
/** An end of the line with a case's changes over the base, known fields only. */
function endpoint(
  base: Endpoint,
  change: Partial<Endpoint> | undefined,
  parameter: string,
): Endpoint {
  const b = guardRecord(parameter, base) as Partial<Endpoint>;
  const c = change ?? {};
  const velocityDiameter = c.velocityDiameter ?? b.velocityDiameter;
  return {
    elevation: (c.elevation ?? b.elevation) as Endpoint['elevation'],
    pressure: (c.pressure ?? b.pressure) as Endpoint['pressure'],
    ...(velocityDiameter === undefined ? {} : { velocityDiameter }),
  };
}

export function applyCase(base: SystemDefinition, operatingCase: OperatingCase): SystemDefinition {
  guardRecord('base', base);
  guardRecord('operatingCase', operatingCase);
  guardString('operatingCase.name', operatingCase.name);
  if (operatingCase.suction !== undefined)
    guardRecord('operatingCase.suction', operatingCase.suction);
  if (operatingCase.discharge !== undefined) {
    guardRecord('operatingCase.discharge', operatingCase.discharge);
  }
  if (operatingCase.aged !== undefined) guardBoolean('operatingCase.aged', operatingCase.aged);
  const merged = {
    // Only the fields a definition has are copied: unknown keys of the caller's objects
    // (`__proto__` in parsed JSON, say) are left behind.
    runs: base.runs,
    ...(base.g === undefined ? {} : { g: base.g }),
    name: operatingCase.name,
    fluid: operatingCase.fluid ?? base.fluid,
    suction: endpoint(base.suction, operatingCase.suction, 'base.suction'),
    discharge: endpoint(base.discharge, operatingCase.discharge, 'base.discharge'),
    aged: operatingCase.aged ?? base.aged ?? false,
    ...(operatingCase.friction !== undefined || base.friction !== undefined
      ? { friction: operatingCase.friction ?? base.friction }
      : {}),
  } as SystemDefinition;
  // The merged definition is checked as a system would check it, so that no case hands on
  // a definition that cannot make a curve.
  systemCurve(merged);
  return merged;
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
  guardRecord('base', base);
  guardArray('cases', cases, { max: 1000 });
  if (cases.length === 0) {
    const name = base.name ?? 'design';
    return [{ name, operatingCase: { name }, curve: systemCurve(base) }];
  }
  const seen = new Set<string>();
  return cases.map((c, i) => {
    guardRecord(`cases[${i}]`, c);
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
  const details = guardFunction<SystemCurve['details']>(
    'system.details',
    guardRecord('system', system)['details'],
  );
  const point = details.call(system, flow);
  // A system made elsewhere (any object with a details method) must answer with a point.
  guardNumber('system.details(flow).head', guardRecord('system.details(flow)', point)['head'], 'm');
  return point;
}

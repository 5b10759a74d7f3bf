/**
 * Assembles the checked parts of a scenario file into a {@link DesignInput}: pressures made
 * absolute with the site's atmosphere, the fluid's state in each case, the operating cases,
 * and the checks that need more than one part (unique names, the suction line, the system
 * as a whole).
 *
 * @module
 */
import type { FluidState } from '../fluids/index';
import type { FrictionFactorOptions } from '../friction/index';
import {
  applyCase,
  type Endpoint,
  type OperatingCase,
  type SystemDefinition,
  systemCurve,
} from '../system/index';
import {
  gaugeToAbsolute,
  type Pressure,
  STANDARD_ATMOSPHERE,
  type Temperature,
} from '../units/index';
import { type IssueSink, report, reportError } from './scenario-issues';
import type { FileFluid, ScenarioParts } from './scenario-schema';
import type { DesignInput, DesignLimits } from './types';

type Path = readonly (string | number)[];

/** An end of the system as the file gives it. */
type FileEndpoint = ScenarioParts['suction'];
type PartialEndpoint = NonNullable<NonNullable<ScenarioParts['cases']>[number]['suction']>;

/** Largest number of hours in a year (a leap year). */
const HOURS_IN_A_LEAP_YEAR = 8784;

/** Runs `make`, reporting a HeadflowError at `at` (following its parameter when asked). */
function attempt<T>(
  sink: IssueSink,
  at: Path,
  make: () => T,
  followParameter = false,
): T | undefined {
  try {
    return make();
  } catch (e) {
    reportError(sink, e, at, followParameter);
    return undefined;
  }
}

/** The absolute pressure of an end, or undefined when it gives none. */
function absolute(
  sink: IssueSink,
  e: { readonly pressure?: Pressure; readonly gaugePressure?: Pressure },
  atmosphere: Pressure,
  at: Path,
): Pressure | undefined {
  if (e.pressure !== undefined) return e.pressure;
  if (e.gaugePressure === undefined) return undefined;
  const gauge = e.gaugePressure;
  return attempt(sink, [...at, 'gaugePressure'], () => gaugeToAbsolute(gauge, atmosphere));
}

function endpoint(sink: IssueSink, e: FileEndpoint, atmosphere: Pressure, at: Path): Endpoint {
  const pressure = absolute(sink, e, atmosphere, at) ?? atmosphere;
  return {
    elevation: e.elevation,
    pressure,
    ...(e.velocityDiameter === undefined ? {} : { velocityDiameter: e.velocityDiameter }),
  };
}

function partialEndpoint(
  sink: IssueSink,
  e: PartialEndpoint,
  atmosphere: Pressure,
  at: Path,
): Partial<Endpoint> {
  const pressure = absolute(sink, e, atmosphere, at);
  return {
    ...(e.elevation === undefined ? {} : { elevation: e.elevation }),
    ...(pressure === undefined ? {} : { pressure }),
    ...(e.velocityDiameter === undefined ? {} : { velocityDiameter: e.velocityDiameter }),
  };
}

/** The fluid's state at a temperature and the suction pressure; issues at `at`. */
function state(
  sink: IssueSink,
  fluid: FileFluid,
  temperature: Temperature,
  pressure: Pressure,
  at: Path,
): FluidState | undefined {
  return attempt(sink, at, () => fluid.fluid.at(temperature, pressure));
}

function friction(f: NonNullable<ScenarioParts['friction']>): FrictionFactorOptions {
  return {
    ...(f.method === undefined ? {} : { method: f.method }),
    ...(f.transition === undefined ? {} : { transition: f.transition }),
    ...(f.allowLargeRoughness === undefined ? {} : { allowLargeRoughness: f.allowLargeRoughness }),
  };
}

function uniqueNames(
  sink: IssueSink,
  items: readonly { readonly name: string }[] | undefined,
  field: string,
): void {
  const seen = new Set<string>();
  items?.forEach((item, i) => {
    if (seen.has(item.name)) {
      report(sink, 'INVALID_ARGUMENT', `the name ${JSON.stringify(item.name)} is used twice`, [
        field,
        i,
        'name',
      ]);
    }
    seen.add(item.name);
  });
}

function limits(
  sink: IssueSink,
  l: NonNullable<ScenarioParts['limits']>,
  atmosphere: Pressure,
): DesignLimits {
  const designPressure =
    l.designPressure ??
    (l.designGaugePressure === undefined
      ? undefined
      : attempt(sink, ['limits', 'designGaugePressure'], () =>
          gaugeToAbsolute(l.designGaugePressure as Pressure, atmosphere),
        ));
  for (const key of ['suctionVelocity', 'dischargeVelocity'] as const) {
    const range = l[key];
    if (range !== undefined && range.min > range.max) {
      report(sink, 'INVALID_ARGUMENT', 'expected min <= max', ['limits', key]);
    }
  }
  return {
    ...(l.npshMarginRatio === undefined ? {} : { npshMarginRatio: l.npshMarginRatio }),
    ...(l.npshMinimumMargin === undefined ? {} : { npshMinimumMargin: l.npshMinimumMargin }),
    ...(designPressure === undefined ? {} : { designPressure }),
    ...(l.suctionVelocity === undefined ? {} : { suctionVelocity: l.suctionVelocity }),
    ...(l.dischargeVelocity === undefined ? {} : { dischargeVelocity: l.dischargeVelocity }),
    ...(l.nearBoilingRatio === undefined ? {} : { nearBoilingRatio: l.nearBoilingRatio }),
    ...(l.dutyFlowTolerance === undefined ? {} : { dutyFlowTolerance: l.dutyFlowTolerance }),
  };
}

/** Validates the system of the design case and of each case; issues at their paths. */
function checkSystem(
  sink: IssueSink,
  system: SystemDefinition,
  cases: readonly OperatingCase[],
): void {
  attempt(sink, [], () => systemCurve(system), true);
  cases.forEach((c, i) => {
    attempt(sink, ['cases', i], () => systemCurve(applyCase(system, c)));
  });
}

/** The suction line must be the first runs of the line, none of them a parallel group. */
function checkSuctionLine(sink: IssueSink, parts: ScenarioParts): void {
  const n = parts.pumpLocation?.suctionRuns;
  if (n === undefined) return;
  const at = ['pumpLocation', 'suctionRuns'];
  if (n > parts.line.length) {
    report(
      sink,
      'INVALID_ARGUMENT',
      `expected at most ${parts.line.length} (the number of line elements), found ${n}`,
      at,
    );
    return;
  }
  const group = parts.line.slice(0, n).findIndex((e) => 'kind' in e && e.kind === 'parallel');
  if (group !== -1) {
    report(
      sink,
      'INVALID_ARGUMENT',
      `the suction line is the first ${n} line elements, and line[${group}] is a parallel group; the suction line must be runs`,
      at,
    );
  }
}

function checkProfile(sink: IssueSink, parts: ScenarioParts): void {
  const total = (parts.profile ?? []).reduce((sum, row) => sum + row.hours, 0);
  if (total > HOURS_IN_A_LEAP_YEAR) {
    report(
      sink,
      'INVALID_ARGUMENT',
      `expected at most ${HOURS_IN_A_LEAP_YEAR} hours in all (a year), found ${total}`,
      ['profile'],
    );
  }
}

/**
 * Puts the checked parts together into a design; reports every problem it finds through
 * `sink` and returns undefined when there was one.
 */
export function assembleDesign(sink: IssueSink, parts: ScenarioParts): DesignInput | undefined {
  let problems = 0;
  const counting: IssueSink = {
    dataset: sink.dataset,
    addIssue(info) {
      problems++;
      sink.addIssue(info);
    },
  };
  const atmosphere = parts.atmosphere ?? STANDARD_ATMOSPHERE;
  const suction = endpoint(counting, parts.suction, atmosphere, ['suction']);
  const discharge = endpoint(counting, parts.discharge, atmosphere, ['discharge']);
  const fluid = parts.fluid;
  const fluidAt = ['fluid', fluid.kind, 'temperature'];
  const baseState = state(counting, fluid, fluid.temperature, suction.pressure, fluidAt);

  const cases: OperatingCase[] = [];
  (parts.cases ?? []).forEach((c, i) => {
    const caseSuction =
      c.suction === undefined
        ? undefined
        : partialEndpoint(counting, c.suction, atmosphere, ['cases', i, 'suction']);
    const caseDischarge =
      c.discharge === undefined
        ? undefined
        : partialEndpoint(counting, c.discharge, atmosphere, ['cases', i, 'discharge']);
    let caseFluid: FluidState | undefined;
    if (c.temperature !== undefined) {
      if (!fluid.variesWithTemperature) {
        report(
          counting,
          'INVALID_ARGUMENT',
          'a case temperature needs a fluid whose properties depend on temperature (water or a table); the constant fluid has one state',
          ['cases', i, 'temperature'],
        );
      } else {
        caseFluid = state(
          counting,
          fluid,
          c.temperature,
          caseSuction?.pressure ?? suction.pressure,
          ['cases', i, 'temperature'],
        );
      }
    }
    cases.push({
      name: c.name,
      ...(caseFluid === undefined ? {} : { fluid: caseFluid }),
      ...(caseSuction === undefined ? {} : { suction: caseSuction }),
      ...(caseDischarge === undefined ? {} : { discharge: caseDischarge }),
      ...(c.aged === undefined ? {} : { aged: c.aged }),
      ...(c.friction === undefined ? {} : { friction: friction(c.friction) }),
    });
  });
  uniqueNames(counting, parts.cases, 'cases');
  uniqueNames(counting, parts.candidates, 'candidates');
  checkSuctionLine(counting, parts);
  checkProfile(counting, parts);
  const designLimits =
    parts.limits === undefined ? undefined : limits(counting, parts.limits, atmosphere);

  if (baseState === undefined) return undefined;
  const system: SystemDefinition = {
    name: parts.name,
    fluid: baseState,
    suction,
    discharge,
    runs: parts.line,
    ...(parts.friction === undefined ? {} : { friction: friction(parts.friction) }),
    ...(parts.gravity === undefined ? {} : { g: parts.gravity }),
    ...(parts.aged === undefined ? {} : { aged: parts.aged }),
  };
  if (problems === 0) checkSystem(counting, system, cases);
  if (problems > 0) return undefined;
  return {
    name: parts.name,
    system,
    fluidName: fluid.name,
    dutyFlow: parts.duty.flow,
    ...(cases.length === 0 ? {} : { cases }),
    ...(parts.pumpLocation === undefined ? {} : { pumpLocation: parts.pumpLocation }),
    ...(parts.candidates === undefined ? {} : { candidates: parts.candidates }),
    ...(parts.profile === undefined ? {} : { profile: parts.profile }),
    ...(parts.energyPrice === undefined ? {} : { energyPrice: parts.energyPrice }),
    ...(designLimits === undefined ? {} : { limits: designLimits }),
    ...(parts.units === undefined ? {} : { units: parts.units }),
  };
}

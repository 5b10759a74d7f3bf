/**
 * Assembles the checked parts of a scenario file into a {@link DesignInput}: pressures made
 * absolute with the site's atmosphere (given, or the standard atmosphere at the site's
 * elevation), the fluid's state in each case, the operating cases,
 * and the checks that need more than one part (unique names, the suction line, the system
 * as a whole).
 *
 * @module
 */

import { HeadflowError } from '../errors';
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
  atmosphereAt,
  formatQuantity,
  gaugeToAbsolute,
  type Pressure,
  STANDARD_ATMOSPHERE,
  type Temperature,
} from '../units/index';
import { fileMessage, found, type IssueSink, report, reportError } from './scenario-issues';
import { assembleNetwork } from './scenario-network';
import type { FileFluid, ScenarioParts } from './scenario-schema';
import type { FilePressure } from './scenario-values';
import type { DesignInput, DesignLimits, NetworkDesignInput } from './types';

type Path = readonly (string | number)[];

/** An end of the system as the file gives it. */
type FileEndpoint = NonNullable<ScenarioParts['suction']>;
type PartialEndpoint = NonNullable<NonNullable<ScenarioParts['cases']>[number]['suction']>;

/** Largest number of hours in a year (a leap year). */
const HOURS_IN_A_LEAP_YEAR = 8784;

/** Runs `make`, reporting a HeadflowError at `at` (following its parameter when asked). */
export function attempt<T>(
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

/** kPa for messages (the file's own unit is in its text). */
function kPa(p: number): string {
  return formatQuantity(p as Pressure, 'kPa', 5);
}

/** How a pressure of the file was read: `read as absolute` / `read as gauge, 103.4 kPa absolute`. */
function readAs(given: FilePressure, absolute: number | undefined): string {
  if (given.reference === 'absolute') {
    return given.marked
      ? 'is absolute'
      : 'is read as absolute (a unit without a mark is absolute here)';
  }
  const abs =
    absolute === undefined ? '' : `, ${kPa(absolute)} absolute with the site's atmosphere`;
  return `is read as gauge${abs}`;
}

/** What to write for a gauge reading: `"0 psig"` for `"0 psi"`. */
function gaugeHint(given: FilePressure): string {
  if (given.marked || given.reference === 'gauge') return '';
  const m = /^(.*?)\s*(psi|bar|mbar|kPa|MPa)\s*$/.exec(given.text.trim());
  const example = m === null ? '"0 psig", "0 barg" or "0 kPa(g)"' : `"${m[1]} ${m[2]}g"`;
  return ` If it is a gauge reading, write it with a gauge unit (${example}) or give it as gaugePressure.`;
}

/** A pressure of an end as the file gives it: which field, what was written, and its value. */
interface GivenPressure {
  readonly field: 'pressure' | 'gaugePressure';
  readonly given: FilePressure;
  readonly absolute: Pressure;
}

/**
 * The absolute pressure of an end, or undefined when it gives none (or gives one that cannot
 * be: below a perfect vacuum, or zero, reported at its field).
 */
export function absolute(
  sink: IssueSink,
  e: { readonly pressure?: FilePressure; readonly gaugePressure?: FilePressure },
  atmosphere: Pressure,
  at: Path,
): GivenPressure | undefined {
  const field = e.pressure !== undefined ? 'pressure' : 'gaugePressure';
  const given = e[field];
  if (given === undefined) return undefined;
  const value =
    given.reference === 'absolute'
      ? (given.value as Pressure)
      : attempt(sink, [...at, field], () => gaugeToAbsolute(given.value as Pressure, atmosphere));
  if (value === undefined) return undefined;
  if (value <= 0) {
    report(
      sink,
      'INVALID_ARGUMENT',
      `expected an absolute pressure above 0, found ${found(given.text)}, which ${readAs(given, value)}: a perfect vacuum, where no liquid stays liquid.${gaugeHint(given)}`,
      [...at, field],
    );
    return undefined;
  }
  return { field, given, absolute: value };
}

function endpoint(
  sink: IssueSink,
  e: FileEndpoint,
  atmosphere: Pressure,
  at: Path,
): { readonly end: Endpoint; readonly given: GivenPressure | undefined } {
  const given = absolute(sink, e, atmosphere, at);
  return {
    end: {
      elevation: e.elevation,
      pressure: given?.absolute ?? atmosphere,
      ...(e.velocityDiameter === undefined ? {} : { velocityDiameter: e.velocityDiameter }),
    },
    given,
  };
}

function partialEndpoint(
  sink: IssueSink,
  e: PartialEndpoint,
  atmosphere: Pressure,
  at: Path,
): { readonly end: Partial<Endpoint>; readonly given: GivenPressure | undefined } {
  const given = absolute(sink, e, atmosphere, at);
  return {
    end: {
      ...(e.elevation === undefined ? {} : { elevation: e.elevation }),
      ...(given === undefined ? {} : { pressure: given.absolute }),
      ...(e.velocityDiameter === undefined ? {} : { velocityDiameter: e.velocityDiameter }),
    },
    given,
  };
}

/** The sentence of a fluid's message that speaks to code, not to a file's author. */
const CODE_ADVICE =
  /\s*Pressures are absolute: convert a gauge reading with gaugeToAbsolute\(\)\.?/;

/**
 * The fluid's state at a temperature and the suction pressure. A problem is reported at the
 * suction pressure's field when the file gave one there (the likeliest mistake is a gauge
 * reading written as absolute), else at the temperature `at`.
 */
export function state(
  sink: IssueSink,
  fluid: FileFluid,
  temperature: Temperature,
  pressure: Pressure,
  at: Path,
  suction: { readonly given: GivenPressure | undefined; readonly at: Path },
): FluidState | undefined {
  try {
    return fluid.fluid.at(temperature, pressure);
  } catch (e) {
    if (!(e instanceof HeadflowError)) throw e;
    const said = fileMessage(e).replace(CODE_ADVICE, '');
    const g = suction.given;
    if (g === undefined) {
      report(sink, e.code, said, at);
    } else {
      report(
        sink,
        e.code,
        `${said} This end's pressure ${found(g.given.text)} ${readAs(g.given, g.absolute)}.${gaugeHint(g.given)}`,
        [...suction.at, g.field],
      );
    }
    return undefined;
  }
}

export function friction(f: NonNullable<ScenarioParts['friction']>): FrictionFactorOptions {
  return {
    ...(f.method === undefined ? {} : { method: f.method }),
    ...(f.transition === undefined ? {} : { transition: f.transition }),
    ...(f.allowLargeRoughness === undefined ? {} : { allowLargeRoughness: f.allowLargeRoughness }),
  };
}

export function uniqueNames(
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

export function limits(
  sink: IssueSink,
  l: NonNullable<ScenarioParts['limits']>,
  atmosphere: Pressure,
): DesignLimits {
  const designPressure = absolute(
    sink,
    {
      ...(l.designPressure === undefined ? {} : { pressure: l.designPressure }),
      ...(l.designGaugePressure === undefined ? {} : { gaugePressure: l.designGaugePressure }),
    },
    atmosphere,
    ['limits'],
  )?.absolute;
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
function checkSuctionLine(sink: IssueSink, parts: LineParts): void {
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

export function checkProfile(sink: IssueSink, parts: ScenarioParts): void {
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
export function assembleDesign(
  sink: IssueSink,
  parts: ScenarioParts,
): DesignInput | NetworkDesignInput | undefined {
  if (parts.nodes !== undefined || parts.links !== undefined) return assembleNetwork(sink, parts);
  const form = lineForm(sink, parts);
  if (form === undefined) return undefined;
  return assembleLine(sink, form);
}

/** A line-form file: the ends, the line and a duty flow, each required. */
type LineParts = ScenarioParts & {
  readonly suction: NonNullable<ScenarioParts['suction']>;
  readonly discharge: NonNullable<ScenarioParts['discharge']>;
  readonly line: NonNullable<ScenarioParts['line']>;
  readonly duty: { readonly flow: NonNullable<ScenarioParts['duty']['flow']> };
};

/** The line form's required parts, each reported at its path when missing. */
function lineForm(sink: IssueSink, parts: ScenarioParts): LineParts | undefined {
  let ok = true;
  for (const key of ['suction', 'discharge', 'line'] as const) {
    if (parts[key] === undefined) {
      report(
        sink,
        'INVALID_ARGUMENT',
        'this field is required (or describe a network with nodes and links)',
        [key],
      );
      ok = false;
    }
  }
  if (parts.duty.service !== undefined) {
    report(
      sink,
      'INVALID_ARGUMENT',
      'service pressures are a duty of the network form (nodes and links); a line takes a duty flow',
      ['duty', 'service'],
    );
    ok = false;
  }
  for (const key of ['pumpElevation'] as const) {
    if (parts[key] !== undefined) {
      report(sink, 'INVALID_ARGUMENT', 'a field of the network form (nodes and links)', [key]);
      ok = false;
    }
  }
  return ok ? (parts as LineParts) : undefined;
}

function assembleLine(sink: IssueSink, parts: LineParts): DesignInput | undefined {
  let problems = 0;
  const counting: IssueSink = {
    dataset: sink.dataset,
    addIssue(info) {
      problems++;
      sink.addIssue(info);
    },
  };
  const atmosphere = siteAtmosphere(counting, parts);
  const { end: suction, given: suctionGiven } = endpoint(counting, parts.suction, atmosphere, [
    'suction',
  ]);
  const { end: discharge } = endpoint(counting, parts.discharge, atmosphere, ['discharge']);
  const fluid = parts.fluid;
  const fluidAt = ['fluid', fluid.kind, 'temperature'];
  const baseState = state(counting, fluid, fluid.temperature, suction.pressure, fluidAt, {
    given: suctionGiven,
    at: ['suction'],
  });

  const cases: OperatingCase[] = [];
  (parts.cases ?? []).forEach((c, i) => {
    const suctionRead =
      c.suction === undefined
        ? undefined
        : partialEndpoint(counting, c.suction, atmosphere, ['cases', i, 'suction']);
    const caseSuction = suctionRead?.end;
    const caseDischarge =
      c.discharge === undefined
        ? undefined
        : partialEndpoint(counting, c.discharge, atmosphere, ['cases', i, 'discharge']).end;
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
          suctionRead?.given === undefined
            ? { given: undefined, at: [] }
            : { given: suctionRead.given, at: ['cases', i, 'suction'] },
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
    ...(parts.atmosphere === undefined && parts.site === undefined ? {} : { atmosphere }),
    liquid: fluid.fluid,
    ...(parts.surge === undefined ? {} : { surge: parts.surge }),
    ...(parts.lowFlow === undefined ? {} : { lowFlow: parts.lowFlow }),
    ...(parts.intake === undefined ? {} : { intake: parts.intake }),
  };
}

/**
 * The site's atmosphere: `atmosphere` as given, the standard atmosphere at `site.elevation`,
 * or the standard atmosphere at sea level; both given is a problem at `site`.
 */
export function siteAtmosphere(sink: IssueSink, parts: ScenarioParts): Pressure {
  if (parts.atmosphere !== undefined && parts.site !== undefined) {
    report(
      sink,
      'INVALID_ARGUMENT',
      'give atmosphere (the pressure) or site (its elevation, for the standard atmosphere there), not both',
      ['site'],
    );
  }
  if (parts.atmosphere !== undefined) return parts.atmosphere;
  const site = parts.site;
  if (site === undefined) return STANDARD_ATMOSPHERE;
  return (
    attempt(sink, ['site', 'elevation'], () => atmosphereAt(site.elevation)) ?? STANDARD_ATMOSPHERE
  );
}

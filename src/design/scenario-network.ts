/**
 * Assembles the network form of a scenario file (`nodes` and `links`) into a
 * {@link NetworkDesignInput}: gauge pressures made absolute with the site's atmosphere,
 * outlets' coefficients from their rated flow and pressure, the fluid's state, the cases, and
 * the checks that need more than one part (unique ids, one pump link, known nodes, the network
 * as a whole), each reported at its path in the file.
 *
 * @module
 */
import { HeadflowError } from '../errors';
import type { FluidState } from '../fluids/index';
import {
  applyNetworkCase,
  type ControlValve,
  type HeadRiseCurve,
  type NetworkCase,
  type NetworkDefinition,
  type NetworkLink,
  type NetworkNode,
  outletCoefficient,
  prepareNetwork,
} from '../network/index';
import type { Flow, Length, Pressure } from '../units/index';
import {
  absolute,
  attempt,
  checkProfile,
  friction,
  limits,
  siteAtmosphere,
  state,
  uniqueNames,
} from './scenario-build';
import { fileMessage, type IssueSink, report } from './scenario-issues';
import type { ScenarioParts } from './scenario-schema';
import type { FilePressure } from './scenario-values';
import type { NetworkDesignInput, ServicePressure } from './types';

/** A head rise that holds the pump link's place until each candidate takes it (1 m at no flow). */
const PLACEHOLDER_PUMP: HeadRiseCurve = {
  head: (q: Flow) => (1 - q) as Length,
  flowRange: { min: 0 as Flow, max: 1 as Flow },
};

/** A pressure of the file as absolute (a gauge reading plus the atmosphere). */
function absoluteOf(p: FilePressure, atmosphere: number): number {
  return p.reference === 'absolute' ? p.value : p.value + atmosphere;
}

/** A pressure of the file as gauge (an absolute reading less the atmosphere). */
function gaugeOf(p: FilePressure, atmosphere: number): number {
  return p.reference === 'absolute' ? p.value - atmosphere : p.value;
}

/** Ids used twice, reported at their second use. */
function uniqueIds(
  sink: IssueSink,
  items: readonly { readonly id: string }[],
  field: string,
): Set<string> {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) {
      report(sink, 'INVALID_ARGUMENT', `the id ${JSON.stringify(item.id)} is used twice`, [
        field,
        i,
        'id',
      ]);
    }
    seen.add(item.id);
  });
  return seen;
}

/**
 * Puts a network-form file together; reports every problem through `sink` and returns
 * undefined when there was one.
 */
export function assembleNetwork(
  sink: IssueSink,
  parts: ScenarioParts,
): NetworkDesignInput | undefined {
  let problems = 0;
  const counting: IssueSink = {
    dataset: sink.dataset,
    addIssue(info) {
      problems++;
      sink.addIssue(info);
    },
  };
  for (const key of ['suction', 'discharge', 'line', 'pumpLocation'] as const) {
    if (parts[key] !== undefined) {
      report(
        counting,
        'INVALID_ARGUMENT',
        'a field of the line form; a network gives its ends and runs as nodes and links',
        [key],
      );
    }
  }
  for (const key of ['nodes', 'links'] as const) {
    if (parts[key] === undefined) {
      report(counting, 'INVALID_ARGUMENT', 'this field is required in the network form', [key]);
    }
  }
  const fileNodes = parts.nodes ?? [];
  const fileLinks = parts.links ?? [];
  const atmosphere = siteAtmosphere(counting, parts);
  const nodeIds = uniqueIds(counting, fileNodes, 'nodes');
  uniqueIds(counting, fileLinks, 'links');

  const coordinates: Record<string, { x: number; y: number }> = {};
  const nodes: NetworkNode[] = [];
  fileNodes.forEach((n, i) => {
    if ((n.x === undefined) !== (n.y === undefined)) {
      report(counting, 'INVALID_ARGUMENT', 'give both x and y, or neither', [
        'nodes',
        i,
        n.x === undefined ? 'x' : 'y',
      ]);
    } else if (n.x !== undefined && n.y !== undefined) {
      coordinates[n.id] = { x: n.x, y: n.y };
    }
    if (n.surface !== undefined) {
      const p = absolute(counting, n.surface, atmosphere as Pressure, ['nodes', i, 'surface']);
      nodes.push({
        id: n.id,
        elevation: n.elevation,
        surface: p === undefined ? {} : { pressure: p.absolute },
      });
    } else if (n.outlet !== undefined) {
      const o = n.outlet;
      const gauge = gaugeOf(o.ratedPressure, atmosphere);
      const k = attempt(counting, ['nodes', i, 'outlet', 'ratedPressure'], () =>
        outletCoefficient(o.ratedFlow, gauge as Pressure, o.exponent ?? 0.5),
      );
      nodes.push({
        id: n.id,
        elevation: n.elevation,
        outlet: {
          coefficient: k ?? 1,
          ...(o.exponent === undefined ? {} : { exponent: o.exponent }),
        },
      });
    } else {
      nodes.push({
        id: n.id,
        elevation: n.elevation,
        ...(n.demand === undefined ? {} : { demand: n.demand }),
      });
    }
  });

  let pumpLink: string | undefined;
  const links: NetworkLink[] = [];
  fileLinks.forEach((l, i) => {
    for (const end of ['from', 'to'] as const) {
      if (!nodeIds.has(l[end])) {
        report(
          counting,
          'INVALID_ARGUMENT',
          `expected the id of a node, found ${JSON.stringify(l[end])}, which no node has`,
          ['links', i, end],
        );
      }
    }
    const base = {
      id: l.id,
      from: l.from,
      to: l.to,
      ...(l.status === undefined ? {} : { status: l.status }),
    };
    if (l.pump !== undefined) {
      if (pumpLink !== undefined) {
        report(
          counting,
          'INVALID_ARGUMENT',
          `one link takes the candidate pumps; link ${JSON.stringify(pumpLink)} does already`,
          ['links', i, 'pump'],
        );
      }
      pumpLink = l.id;
      // The candidates replace this placeholder.
      links.push({ ...base, pump: PLACEHOLDER_PUMP });
    } else if (l.valve !== undefined) {
      const v = l.valve;
      const setting =
        typeof v.setting === 'object'
          ? absoluteOf(v.setting as FilePressure, atmosphere)
          : (v.setting as number);
      if ((v.kind === 'flow-limiting') !== (typeof v.setting !== 'object')) {
        report(
          counting,
          'INVALID_ARGUMENT',
          v.kind === 'flow-limiting'
            ? 'a flow-limiting valve holds a flow: give its setting as a flow'
            : `a ${v.kind} valve holds a pressure: give its setting as a pressure`,
          ['links', i, 'valve', 'setting'],
        );
      }
      const valve = {
        kind: v.kind,
        setting,
        diameter: v.diameter,
        openK: v.openK,
      } as ControlValve;
      links.push({ ...base, valve });
    } else if (l.run !== undefined) {
      links.push({
        ...base,
        run: l.run,
        ...(l.checkValve === undefined ? {} : { checkValve: l.checkValve }),
      });
    }
  });
  if (pumpLink === undefined && parts.links !== undefined) {
    report(
      counting,
      'INVALID_ARGUMENT',
      'give the link where the candidate pumps go: "pump": "candidates" on one link',
      ['links'],
    );
  }

  const service: ServicePressure[] = [];
  (parts.duty.service ?? []).forEach((r, i) => {
    if (!nodeIds.has(r.node)) {
      report(
        counting,
        'INVALID_ARGUMENT',
        `expected the id of a node, found ${JSON.stringify(r.node)}, which no node has`,
        ['duty', 'service', i, 'node'],
      );
    }
    service.push({
      node: r.node,
      minPressure: absoluteOf(r.minPressure, atmosphere) as Pressure,
    });
  });

  const fluid = parts.fluid;
  const fluidAt = ['fluid', fluid.kind, 'temperature'];
  const noEnd = { given: undefined, at: [] };
  const baseState = state(
    counting,
    fluid,
    fluid.temperature,
    atmosphere as Pressure,
    fluidAt,
    noEnd,
  );
  const cases: NetworkCase[] = [];
  (parts.cases ?? []).forEach((c, i) => {
    for (const key of ['suction', 'discharge', 'friction'] as const) {
      if (c[key] !== undefined) {
        report(
          counting,
          'INVALID_ARGUMENT',
          'a field of the line form; a network case changes levels, demands and status',
          ['cases', i, key],
        );
      }
    }
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
          atmosphere as Pressure,
          ['cases', i, 'temperature'],
          noEnd,
        );
      }
    }
    cases.push({
      name: c.name,
      ...(caseFluid === undefined ? {} : { fluid: caseFluid }),
      ...(c.aged === undefined ? {} : { aged: c.aged }),
      ...(c.levels === undefined ? {} : { levels: c.levels }),
      ...(c.demands === undefined ? {} : { demands: c.demands as Record<string, Flow> }),
      ...(c.status === undefined ? {} : { status: c.status }),
    });
  });
  uniqueNames(counting, parts.cases, 'cases');
  uniqueNames(counting, parts.candidates, 'candidates');
  checkProfile(counting, parts);
  const designLimits =
    parts.limits === undefined ? undefined : limits(counting, parts.limits, atmosphere);
  if (baseState === undefined || problems > 0 || pumpLink === undefined) return undefined;
  const network: NetworkDefinition = {
    name: parts.name,
    fluid: baseState,
    nodes,
    links,
    atmosphere: atmosphere as Pressure,
    ...(parts.friction === undefined ? {} : { friction: friction(parts.friction) }),
    ...(parts.gravity === undefined ? {} : { g: parts.gravity }),
    ...(parts.aged === undefined ? {} : { aged: parts.aged }),
  };
  attempt(counting, [], () => prepareNetwork(network), true);
  cases.forEach((c, i) => {
    try {
      applyNetworkCase(network, c);
    } catch (e) {
      if (!(e instanceof HeadflowError)) throw e;
      // `operatingCase.demands.attic` is the file's `cases[i].demands.attic`.
      const tail = (e.parameter ?? '').split('.').slice(1);
      report(counting, e.code, fileMessage(e), ['cases', i, ...tail]);
    }
  });
  if (problems > 0) return undefined;
  return {
    name: parts.name,
    network,
    pumpLink,
    fluidName: fluid.name,
    ...(parts.duty.flow === undefined ? {} : { dutyFlow: parts.duty.flow }),
    ...(service.length === 0 ? {} : { service }),
    ...(parts.pumpElevation === undefined ? {} : { pumpElevation: parts.pumpElevation }),
    ...(cases.length === 0 ? {} : { cases }),
    ...(parts.candidates === undefined ? {} : { candidates: parts.candidates }),
    ...(parts.profile === undefined ? {} : { profile: parts.profile }),
    ...(parts.energyPrice === undefined ? {} : { energyPrice: parts.energyPrice }),
    ...(designLimits === undefined ? {} : { limits: designLimits }),
    ...(parts.units === undefined ? {} : { units: parts.units }),
    ...(Object.keys(coordinates).length === 0 ? {} : { coordinates }),
    atmosphere: atmosphere as Pressure,
  };
}

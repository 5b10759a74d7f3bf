/**
 * Operating cases of a network.
 *
 * @module
 */
import { argumentError } from '../errors';
import {
  guardArray,
  guardBoolean,
  guardOneOf,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import { buildModel } from './model';
import { buildTopology } from './topology';
import type { NetworkCase, NetworkDefinition } from './types';

/**
 * The definition of one operating case: the network with the case's demands, surface levels
 * and pressures, link statuses, valve settings, pump speeds, pumps, aged pipe and fluid.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for an id the network does not hold or that names
 *   a node or link of another kind (a level for a junction, a setting for a run), and what
 *   `prepareNetwork` throws for the case's network.
 * @example
 * ```ts
 * const low = applyNetworkCase(definition, { name: 'low tank', levels: { tank: q(8, 'm') } });
 * ```
 */
export function applyNetworkCase(
  definition: NetworkDefinition,
  operatingCase: NetworkCase,
): NetworkDefinition {
  const result = caseDefinition(definition, operatingCase);
  // The case's network is checked as prepareNetwork checks one (links, ends, numbers), so
  // that what is handed back is a network that can be solved or refused here.
  buildModel(buildTopology(result), result);
  return result;
}

/** The fields of a node and of a link: a changed node or link is copied with these only. */
const NODE_KEYS = ['id', 'elevation', 'demand', 'surface', 'outlet'] as const;
const LINK_KEYS = [
  'id',
  'from',
  'to',
  'status',
  'run',
  'checkValve',
  'pump',
  'speed',
  'count',
  'arrangement',
  'valve',
] as const;

/** A copy of `item` with the given fields only (not an extra key, not an own `__proto__`). */
function known(
  item: Readonly<Record<string, unknown>>,
  keys: readonly string[],
): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const k of keys) if (Object.hasOwn(item, k)) out[k] = item[k];
  return out;
}

/**
 * {@link applyNetworkCase} without the final check of the network, for a prepared network
 * whose solve builds (and so checks) the case's model itself.
 * @internal
 */
export function caseDefinition(
  definition: NetworkDefinition,
  operatingCase: NetworkCase,
): NetworkDefinition {
  const def = guardRecord('definition', definition) as unknown as NetworkDefinition;
  const c = guardRecord('operatingCase', operatingCase) as unknown as NetworkCase;
  const nodes = guardArray('nodes', def.nodes);
  const links = guardArray('links', def.links);
  const nodeById = new Map<string, number>();
  // Nodes and links are copied into the case's definition: each must be an object.
  nodes.forEach((n, i) => {
    const id = guardRecord(`definition.nodes[${i}]`, n)['id'];
    if (typeof id === 'string') nodeById.set(id, i);
  });
  const linkById = new Map<string, number>();
  links.forEach((l, i) => {
    const id = guardRecord(`definition.links[${i}]`, l)['id'];
    if (typeof id === 'string') linkById.set(id, i);
  });
  const newNodes = nodes.slice() as Record<string, unknown>[];
  const newLinks = links.slice() as Record<string, unknown>[];
  const each = (
    field: string,
    value: unknown,
    byId: Map<string, number>,
    target: Record<string, unknown>[],
    change: (item: Record<string, unknown>, v: unknown, name: string) => Record<string, unknown>,
  ): void => {
    const keys = target === newNodes ? NODE_KEYS : LINK_KEYS;
    if (value === undefined) return;
    const record = guardRecord(`operatingCase.${field}`, value);
    for (const [id, v] of Object.entries(record)) {
      const i = byId.get(id);
      const name = `operatingCase.${field}.${id}`;
      if (i === undefined) {
        throw argumentError(
          'INVALID_ARGUMENT',
          name,
          id,
          undefined,
          `an id of the network's ${byId === nodeById ? 'nodes' : 'links'}`,
        );
      }
      target[i] = change(known(guardRecord(name, target[i]), keys), v, name);
    }
  };
  const need = (ok: boolean, name: string, what: string): void => {
    if (!ok) throw argumentError('INVALID_ARGUMENT', name, undefined, undefined, what);
  };
  each('demands', c.demands, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] === undefined && n['outlet'] === undefined, name, 'the id of a junction');
    return { ...n, demand: guardRange(name, v, { unit: 'm3/s' }) };
  });
  each('levels', c.levels, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] !== undefined, name, 'the id of a fixed-level surface');
    return { ...n, elevation: guardRange(name, v, { unit: 'm' }) };
  });
  each('pressures', c.pressures, nodeById, newNodes, (n, v, name) => {
    need(n['surface'] !== undefined, name, 'the id of a fixed-level surface');
    return {
      ...n,
      surface: {
        ...(n['surface'] as object),
        pressure: guardRange(name, v, { min: 0, unit: 'Pa' }),
      },
    };
  });
  each('status', c.status, linkById, newLinks, (l, v, name) => ({
    ...l,
    status: guardOneOf(name, v, ['open', 'closed']),
  }));
  each('settings', c.settings, linkById, newLinks, (l, v, name) => {
    need(l['valve'] !== undefined, name, 'the id of a control valve');
    return { ...l, valve: { ...(l['valve'] as object), setting: guardRange(name, v, { min: 0 }) } };
  });
  each('speeds', c.speeds, linkById, newLinks, (l, v, name) => {
    need(l['pump'] !== undefined, name, 'the id of a pump link');
    return { ...l, speed: guardRange(name, v, { min: 0, minOpen: true, unit: 'rad/s' }) };
  });
  each('pumps', c.pumps, linkById, newLinks, (l, v, name) => {
    need(l['pump'] !== undefined, name, 'the id of a pump link');
    return { ...l, pump: guardRecord(name, v) };
  });
  // The definition's own fields only (not an extra key of the caller's, an own `__proto__`).
  const own = (k: keyof NetworkDefinition) => (def[k] === undefined ? {} : { [k]: def[k] });
  return {
    ...own('name'),
    fluid: def.fluid,
    ...own('g'),
    ...own('friction'),
    ...own('aged'),
    ...own('atmosphere'),
    ...(c.name !== undefined ? { name: guardString('operatingCase.name', c.name) } : {}),
    ...(c.fluid !== undefined ? { fluid: c.fluid } : {}),
    ...(c.aged !== undefined ? { aged: guardBoolean('operatingCase.aged', c.aged) } : {}),
    nodes: newNodes as unknown as NetworkDefinition['nodes'],
    links: newLinks as unknown as NetworkDefinition['links'],
  };
}

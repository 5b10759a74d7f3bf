/**
 * A network's layout: ids, kinds and ends checked, every part joined to a fixed-level surface,
 * and the node matrix ordered and factorized symbolically once.
 *
 * @module
 * @internal
 */
import { argumentError, HeadflowError } from '../errors';
import { guardArray, guardOneOf, guardRecord, guardString } from '../guards';
import { EMITTER, FCV, JUNCTION, OUTLET, PRV, PSV, PUMP, RUN, SURFACE } from './codes';
import { type SparseCholesky, sparseCholesky } from './sparse-cholesky';
import type { NetworkDefinition } from './types';

/** The topology of a network, validated, with its ordering and symbolic factorization. */
export interface Topology {
  readonly nodeIds: readonly string[];
  readonly nodeIndex: ReadonlyMap<string, number>;
  readonly nodeKind: Int8Array;
  readonly linkIds: readonly string[];
  readonly linkIndex: ReadonlyMap<string, number>;
  /** User links then one emitter per outlet; `to` of an emitter is its virtual node. */
  readonly from: Int32Array;
  readonly to: Int32Array;
  readonly kind: Int8Array;
  /** Number of nodes including one virtual atmosphere node per outlet. */
  readonly nodeCount: number;
  /** Matrix row of each node (-1 for surfaces and virtual nodes). */
  readonly row: Int32Array;
  readonly chol: SparseCholesky;
  /** Position of each link's off-diagonal entry (-1 when an end has no row). */
  readonly offPos: Int32Array;
  readonly diagPos: Int32Array;
  /** Outlet node of each emitter link (by emitter number). */
  readonly outletNodes: Int32Array;
}

function nodeKindOf(node: Readonly<Record<string, unknown>>, name: string): number {
  const hasSurface = node['surface'] !== undefined;
  const hasOutlet = node['outlet'] !== undefined;
  if (hasSurface && hasOutlet) {
    throw argumentError(
      'INVALID_ARGUMENT',
      name,
      'surface and outlet',
      undefined,
      'a junction, a surface or an outlet',
    );
  }
  return hasSurface ? SURFACE : hasOutlet ? OUTLET : JUNCTION;
}

function linkKindOf(link: Readonly<Record<string, unknown>>, name: string): number {
  const given = ['run', 'pump', 'valve'].filter((k) => link[k] !== undefined);
  if (given.length !== 1) {
    throw argumentError(
      'INVALID_ARGUMENT',
      name,
      given.length,
      'parts',
      'exactly one of run, pump or valve',
    );
  }
  if (given[0] === 'run') return RUN;
  if (given[0] === 'pump') return PUMP;
  const valve = guardRecord(`${name}.valve`, link['valve']);
  const kind = guardOneOf(`${name}.valve.kind`, valve['kind'], [
    'pressure-reducing',
    'pressure-sustaining',
    'flow-limiting',
  ]);
  return kind === 'pressure-reducing' ? PRV : kind === 'pressure-sustaining' ? PSV : FCV;
}

/** Checks the topology and prepares ordering and symbolic factorization. */
export function buildTopology(def: NetworkDefinition): Topology {
  const nodes = guardArray('nodes', def.nodes, { min: 1 });
  const links = guardArray('links', def.links, { min: 1 });
  const nodeIds: string[] = [];
  const nodeIndex = new Map<string, number>();
  const kinds: number[] = [];
  for (let i = 0; i < nodes.length; i++) {
    const node = guardRecord(`nodes[${i}]`, nodes[i]);
    const id = guardString(`nodes[${i}].id`, node['id']);
    if (id === '')
      throw argumentError('INVALID_ARGUMENT', `nodes[${i}].id`, id, undefined, 'a non-empty id');
    if (nodeIndex.has(id)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `nodes[${i}].id`,
        id,
        undefined,
        'an id used by one node only',
        `Node id '${id}' is used twice.`,
      );
    }
    nodeIndex.set(id, i);
    nodeIds.push(id);
    kinds.push(nodeKindOf(node, `nodes[${i}]`));
  }
  const outletList: number[] = [];
  for (let i = 0; i < kinds.length; i++) if (kinds[i] === OUTLET) outletList.push(i);
  const n = nodes.length;
  const nodeCount = n + outletList.length;
  const m = links.length;
  const total = m + outletList.length;
  const from = new Int32Array(total);
  const to = new Int32Array(total);
  const kind = new Int8Array(total);
  const linkIds: string[] = [];
  const linkIndex = new Map<string, number>();
  for (let k = 0; k < m; k++) {
    const link = guardRecord(`links[${k}]`, links[k]);
    const id = guardString(`links[${k}].id`, link['id']);
    if (id === '')
      throw argumentError('INVALID_ARGUMENT', `links[${k}].id`, id, undefined, 'a non-empty id');
    if (linkIndex.has(id)) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].id`,
        id,
        undefined,
        'an id used by one link only',
        `Link id '${id}' is used twice.`,
      );
    }
    linkIndex.set(id, k);
    linkIds.push(id);
    const ends: number[] = [];
    for (const end of ['from', 'to'] as const) {
      const nodeId = guardString(`links[${k}].${end}`, link[end]);
      const idx = nodeIndex.get(nodeId);
      if (idx === undefined) {
        throw argumentError(
          'INVALID_ARGUMENT',
          `links[${k}].${end}`,
          nodeId,
          undefined,
          'the id of a node of the network',
          `Link '${id}' names an unknown node '${nodeId}'.`,
        );
      }
      ends.push(idx);
    }
    if (ends[0] === ends[1]) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].to`,
        link['to'],
        undefined,
        'a node other than from',
        `Link '${id}' starts and ends at the same node.`,
      );
    }
    from[k] = ends[0] as number;
    to[k] = ends[1] as number;
    kind[k] = linkKindOf(link, `links[${k}]`);
    if (kind[k] === PRV && kinds[to[k] as number] === SURFACE) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].to`,
        link['to'],
        undefined,
        'a junction or outlet',
        `Pressure-reducing valve '${id}' must not discharge straight into a fixed-level surface.`,
      );
    }
    if (kind[k] === PSV && kinds[from[k] as number] === SURFACE) {
      throw argumentError(
        'INVALID_ARGUMENT',
        `links[${k}].from`,
        link['from'],
        undefined,
        'a junction or outlet',
        `Pressure-sustaining valve '${id}' must not draw straight from a fixed-level surface.`,
      );
    }
  }
  const outletNodes = new Int32Array(outletList);
  outletList.forEach((node, j) => {
    from[m + j] = node;
    to[m + j] = n + j;
    kind[m + j] = EMITTER;
  });
  const nodeKind = new Int8Array(nodeCount).fill(SURFACE);
  for (let i = 0; i < n; i++) nodeKind[i] = kinds[i] as number;

  // Every connected part needs a fixed-level surface.
  const adjacency = buildAdjacency(n, from, to, m);
  const seen = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  for (let s = 0; s < n; s++) {
    if (seen[s] !== -1) continue;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    seen[s] = s;
    let hasSurface = false;
    while (head < tail) {
      const v = queue[head++] as number;
      if (nodeKind[v] === SURFACE) hasSurface = true;
      for (let p = adjacency.ptr[v] as number; p < (adjacency.ptr[v + 1] as number); p++) {
        const w = adjacency.adj[p] as number;
        if (seen[w] === -1) {
          seen[w] = s;
          queue[tail++] = w;
        }
      }
    }
    if (!hasSurface) {
      const ids = Array.from(queue.slice(0, Math.min(tail, 10)), (v) => nodeIds[v] as string);
      throw new HeadflowError(
        'NO_SOLUTION',
        `a part of the network has no fixed-level surface, so its heads are not defined: nodes ${ids
          .map((x) => `'${x}'`)
          .join(
            ', ',
          )}${tail > 10 ? ` and ${tail - 10} more` : ''}. Connect it to a tank or reservoir.`,
        { parameter: 'nodes', allowed: 'a fixed-level surface in every connected part' },
      );
    }
  }

  // Matrix rows: junctions and outlets.
  const row = new Int32Array(nodeCount).fill(-1);
  let rows = 0;
  for (let i = 0; i < n; i++) if (nodeKind[i] !== SURFACE) row[i] = rows++;
  const rowFrom = new Int32Array(m);
  const rowTo = new Int32Array(m);
  let e = 0;
  for (let k = 0; k < m; k++) {
    const a = row[from[k] as number] as number;
    const b = row[to[k] as number] as number;
    if (a >= 0 && b >= 0) {
      rowFrom[e] = a;
      rowTo[e] = b;
      e++;
    }
  }
  const graph = buildAdjacency(rows, rowFrom, rowTo, e);
  const chol = sparseCholesky(graph);
  const offPos = new Int32Array(total).fill(-1);
  for (let k = 0; k < m; k++) {
    const a = row[from[k] as number] as number;
    const b = row[to[k] as number] as number;
    if (a >= 0 && b >= 0) offPos[k] = chol.entry(a, b);
  }
  const diagPos = new Int32Array(rows);
  for (let r = 0; r < rows; r++) diagPos[r] = chol.diagonal(r);
  return {
    nodeIds,
    nodeIndex,
    nodeKind,
    linkIds,
    linkIndex,
    from,
    to,
    kind,
    nodeCount,
    row,
    chol,
    offPos,
    diagPos,
    outletNodes,
  };
}

/** Adjacency (without repeated edges) of nodes 0..n-1 joined by edges (a[e], b[e]), e < count. */
function buildAdjacency(n: number, a: Int32Array, b: Int32Array, count: number) {
  const deg = new Int32Array(n + 1);
  for (let e = 0; e < count; e++) {
    deg[(a[e] as number) + 1] = (deg[(a[e] as number) + 1] as number) + 1;
    deg[(b[e] as number) + 1] = (deg[(b[e] as number) + 1] as number) + 1;
  }
  const start = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) start[i + 1] = (start[i] as number) + (deg[i + 1] as number);
  const raw = new Int32Array(start[n] as number);
  const fill = start.slice(0, n);
  for (let e = 0; e < count; e++) {
    const x = a[e] as number;
    const y = b[e] as number;
    raw[fill[x] as number] = y;
    fill[x] = (fill[x] as number) + 1;
    raw[fill[y] as number] = x;
    fill[y] = (fill[y] as number) + 1;
  }
  // Remove repeated neighbours (parallel links) with a marker.
  const mark = new Int32Array(n).fill(-1);
  const ptr = new Int32Array(n + 1);
  const adj = new Int32Array(raw.length);
  let w = 0;
  for (let i = 0; i < n; i++) {
    ptr[i] = w;
    for (let p = start[i] as number; p < (start[i + 1] as number); p++) {
      const j = raw[p] as number;
      if (mark[j] !== i) {
        mark[j] = i;
        adj[w++] = j;
      }
    }
  }
  ptr[n] = w;
  return { n, ptr, adj: adj.slice(0, w) };
}

/**
 * The network's linear algebra: the nested-dissection order is a permutation, and the sparse
 * Cholesky solve of random weighted graph Laplacians (plus a positive diagonal) matches a dense
 * Gaussian elimination written here.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nestedDissection } from '../../src/network/ordering';
import { sparseCholesky } from '../../src/network/sparse-cholesky';
import { expectAbsolute } from '../helpers/expect';

interface Graph {
  readonly n: number;
  readonly edges: readonly (readonly [number, number, number])[];
}

/** A random graph on n nodes (not necessarily connected), edges with weights in (0.1, 10). */
const arbGraph = fc
  .integer({ min: 1, max: 60 })
  .chain((n) =>
    fc.record({
      n: fc.constant(n),
      edges: fc.array(
        fc.tuple(
          fc.integer({ min: 0, max: n - 1 }),
          fc.integer({ min: 0, max: n - 1 }),
          fc.double({ min: 0.1, max: 10, noNaN: true }),
        ),
        { maxLength: 4 * n },
      ),
    }),
  )
  .map((g): Graph => ({ n: g.n, edges: g.edges.filter(([a, b]) => a !== b) }));

function adjacency(g: Graph) {
  const sets = Array.from({ length: g.n }, () => new Set<number>());
  for (const [a, b] of g.edges) {
    sets[a]?.add(b);
    sets[b]?.add(a);
  }
  const ptr = new Int32Array(g.n + 1);
  const adj: number[] = [];
  sets.forEach((s, i) => {
    ptr[i] = adj.length;
    adj.push(...s);
  });
  ptr[g.n] = adj.length;
  return { n: g.n, ptr, adj: new Int32Array(adj) };
}

/** Dense Gaussian elimination with partial pivoting, written here as the reference. */
function denseSolve(a: number[][], b: number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i] ?? 0]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r]?.[c] ?? 0) > Math.abs(m[p]?.[c] ?? 0)) p = r;
    [m[c], m[p]] = [m[p] as number[], m[c] as number[]];
    const pivot = m[c] as number[];
    for (let r = c + 1; r < n; r++) {
      const row = m[r] as number[];
      const f = (row[c] ?? 0) / (pivot[c] ?? 1);
      for (let k = c; k <= n; k++) row[k] = (row[k] ?? 0) - f * (pivot[k] ?? 0);
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    const row = m[r] as number[];
    let s = row[n] ?? 0;
    for (let k = r + 1; k < n; k++) s -= (row[k] ?? 0) * (x[k] ?? 0);
    x[r] = s / (row[r] ?? 1);
  }
  return x;
}

describe('nested dissection and sparse Cholesky', () => {
  it('the order is a permutation of the nodes', () => {
    fc.assert(
      fc.property(arbGraph, (g) => {
        const order = nestedDissection(adjacency(g));
        expect([...order].sort((x, y) => x - y)).toEqual(Array.from({ length: g.n }, (_, i) => i));
      }),
    );
  });

  it('solves weighted Laplacians plus a positive diagonal like dense elimination (1e-10)', () => {
    fc.assert(
      fc.property(
        arbGraph,
        fc.array(fc.double({ min: 0.01, max: 5, noNaN: true }), { minLength: 60, maxLength: 60 }),
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 60, maxLength: 60 }),
        (g, diag, rhs) => {
          const chol = sparseCholesky(adjacency(g));
          const dense = Array.from({ length: g.n }, () => new Array<number>(g.n).fill(0));
          chol.values.fill(0);
          for (let i = 0; i < g.n; i++) {
            const d = diag[i] ?? 1;
            (dense[i] as number[])[i] = d;
            chol.values[chol.diagonal(i)] = (chol.values[chol.diagonal(i)] ?? 0) + d;
          }
          for (const [a, b, w] of g.edges) {
            const da = dense[a] as number[];
            const db = dense[b] as number[];
            da[a] = (da[a] ?? 0) + w;
            db[b] = (db[b] ?? 0) + w;
            da[b] = (da[b] ?? 0) - w;
            db[a] = (db[a] ?? 0) - w;
            chol.values[chol.diagonal(a)] = (chol.values[chol.diagonal(a)] ?? 0) + w;
            chol.values[chol.diagonal(b)] = (chol.values[chol.diagonal(b)] ?? 0) + w;
            const p = chol.entry(a, b);
            chol.values[p] = (chol.values[p] ?? 0) - w;
          }
          expect(chol.factor()).toBe(-1);
          const b = rhs.slice(0, g.n);
          const x = Float64Array.from(b);
          chol.solve(x);
          const ref = denseSolve(dense, b);
          // Condition numbers stay below about 1e4 here (weights 0.1-10, diagonal >= 0.01):
          // both solves agree to 1e-10 of the solution's size.
          const scale = Math.max(1, ...ref.map(Math.abs));
          ref.forEach((r, i) => {
            expectAbsolute(x[i] ?? 0, r, 1e-10 * scale, `x[${i}]`);
          });
        },
      ),
      { numRuns: 150 },
    );
  });
});

/**
 * Sparse Cholesky factorization `P A P^T = L L^T` of a symmetric positive-definite matrix
 * whose pattern is fixed (the network's node matrix): the ordering and the symbolic work are
 * done once, the numeric factorization and solve many times without allocating.
 *
 * @module
 * @internal
 */
import { HeadflowError } from '../errors';
import { type AdjacencyGraph, nestedDissection } from './ordering';

/**
 * A sparse Cholesky factorization prepared for one pattern.
 *
 * Method: the up-looking (row-by-row) Cholesky factorization. Row k of L is the solution of
 * `L[0:k,0:k] x = A[0:k,k]`; its nonzero pattern is the set of nodes reached in the
 * elimination tree from the nonzeros of `A[0:k,k]` (Liu's row-subtree characterization), so
 * the patterns of every row and the column counts of L are computed once from the
 * elimination tree. The elimination tree comes from the pattern of A with path compression.
 *
 * Sources: J. W. H. Liu, 1990, "The role of elimination trees in sparse factorization", SIAM
 * J. Matrix Anal. Appl. 11(1):134-172; T. A. Davis, 2006, "Direct Methods for Sparse Linear
 * Systems", SIAM, chapter 4 (elimination tree, row patterns, up-looking Cholesky).
 * @internal
 */
export interface SparseCholesky {
  readonly n: number;
  /** Nonzeros of L (including its diagonal). */
  readonly factorEntries: number;
  /** Position in `values` of entry (i, j) of A (original numbering), or -1 when it is not stored. */
  entry(i: number, j: number): number;
  /** Position in `values` of diagonal entry (i, i) of A (original numbering). */
  diagonal(i: number): number;
  /** The values of A's upper triangle in the permuted numbering; set them, then `factor()`. */
  readonly values: Float64Array;
  /**
   * Factorizes the current values. Returns -1 on success, else the original index of the
   * node whose pivot was not positive.
   */
  factor(): number;
  /** Solves A x = b in place (original numbering). */
  solve(b: Float64Array): void;
}

/**
 * Prepares the factorization of matrices with the pattern of `graph` plus the diagonal
 * (the graph's edges are the off-diagonal nonzeros).
 * @internal
 */
export function sparseCholesky(graph: AdjacencyGraph): SparseCholesky {
  const n = graph.n;
  const order = nestedDissection(graph);
  const inv = new Int32Array(n); // inv[original] = permuted index
  for (let k = 0; k < n; k++) inv[order[k] as number] = k;

  // Upper triangle of C = P A P^T by columns: column j holds rows i <= j, diagonal last.
  const colCount = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) {
    const j = inv[v] as number;
    for (let p = graph.ptr[v] as number; p < (graph.ptr[v + 1] as number); p++) {
      const i = inv[graph.adj[p] as number] as number;
      if (i < j) colCount[j + 1] = (colCount[j + 1] as number) + 1;
    }
    colCount[j + 1] = (colCount[j + 1] as number) + 1; // diagonal
  }
  const cp = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) cp[j + 1] = (cp[j] as number) + (colCount[j + 1] as number);
  const nnzC = cp[n] as number;
  const ci = new Int32Array(nnzC);
  const next = cp.slice(0, n);
  for (let v = 0; v < n; v++) {
    const j = inv[v] as number;
    for (let p = graph.ptr[v] as number; p < (graph.ptr[v + 1] as number); p++) {
      const i = inv[graph.adj[p] as number] as number;
      if (i < j) {
        const q = next[j] as number;
        ci[q] = i;
        next[j] = q + 1;
      }
    }
  }
  for (let j = 0; j < n; j++) {
    // Sort the column's rows (insertion sort: columns are short) and put the diagonal last.
    const a = cp[j] as number;
    const b = next[j] as number;
    for (let p = a + 1; p < b; p++) {
      const x = ci[p] as number;
      let q = p - 1;
      while (q >= a && (ci[q] as number) > x) {
        ci[q + 1] = ci[q] as number;
        q--;
      }
      ci[q + 1] = x;
    }
    ci[b] = j;
  }
  const values = new Float64Array(nnzC);

  // Elimination tree (Liu 1990) with path compression through `ancestor`.
  const parent = new Int32Array(n).fill(-1);
  const ancestor = new Int32Array(n).fill(-1);
  for (let k = 0; k < n; k++) {
    for (let p = cp[k] as number; p < (cp[k + 1] as number) - 1; p++) {
      let i = ci[p] as number;
      while (i !== -1 && i < k) {
        const nx = ancestor[i] as number;
        ancestor[i] = k;
        if (nx === -1) parent[i] = k;
        i = nx;
      }
    }
  }

  // Row patterns of L (the row subtrees), in an order where each node precedes its
  // ancestors, and the column counts of L.
  const flag = new Int32Array(n).fill(-1);
  const stack = new Int32Array(n);
  const lCount = new Int32Array(n).fill(1); // diagonal
  const rowPtr = new Int32Array(n + 1);
  let rowList = new Int32Array(Math.max(16, 4 * nnzC));
  let rowFill = 0;
  for (let k = 0; k < n; k++) {
    flag[k] = k;
    let top = n;
    for (let p = cp[k] as number; p < (cp[k + 1] as number) - 1; p++) {
      let i = ci[p] as number;
      let len = 0;
      while (flag[i] !== k) {
        stack[len++] = i;
        flag[i] = k;
        i = parent[i] as number;
      }
      while (len > 0) stack[--top] = stack[--len] as number;
    }
    const count = n - top;
    if (rowFill + count > rowList.length) {
      const grown = new Int32Array(Math.max(rowList.length * 2, rowFill + count));
      grown.set(rowList);
      rowList = grown;
    }
    for (let t = top; t < n; t++) {
      const j = stack[t] as number;
      rowList[rowFill++] = j;
      lCount[j] = (lCount[j] as number) + 1;
    }
    rowPtr[k + 1] = rowFill;
  }
  const lp = new Int32Array(n + 1);
  for (let j = 0; j < n; j++) lp[j + 1] = (lp[j] as number) + (lCount[j] as number);
  const nnzL = lp[n] as number;
  const li = new Int32Array(nnzL);
  const lx = new Float64Array(nnzL);
  const fillPos = new Int32Array(n);
  const x = new Float64Array(n);
  const y = new Float64Array(n);

  const entry = (a: number, b: number): number => {
    let i = inv[a] as number;
    let j = inv[b] as number;
    if (i > j) {
      const t = i;
      i = j;
      j = t;
    }
    // Binary search in column j (sorted rows, diagonal last).
    let lo = cp[j] as number;
    let hi = (cp[j + 1] as number) - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((ci[mid] as number) < i) lo = mid + 1;
      else hi = mid;
    }
    return ci[lo] === i ? lo : -1;
  };

  const factor = (): number => {
    // Locals, so that the compiler keeps them in registers in the inner loop.
    const lxs = lx;
    const lis = li;
    const xs = x;
    const fill = fillPos;
    const rows = rowList;
    for (let k = 0; k < n; k++) {
      // Scatter column k of C (upper part) into x.
      const end = (cp[k + 1] as number) - 1;
      for (let p = cp[k] as number; p < end; p++) xs[ci[p] as number] = values[p] as number;
      let d = values[end] as number;
      const tEnd = rowPtr[k + 1] as number;
      for (let t = rowPtr[k] as number; t < tEnd; t++) {
        const i = rows[t] as number;
        const start = lp[i] as number;
        const lki = (xs[i] as number) / (lxs[start] as number);
        xs[i] = 0;
        const stop = fill[i] as number;
        for (let p = start + 1; p < stop; p++) {
          const r = lis[p] as number;
          xs[r] = (xs[r] as number) - (lxs[p] as number) * lki;
        }
        d -= lki * lki;
        lis[stop] = k;
        lxs[stop] = lki;
        fill[i] = stop + 1;
      }
      if (!(d > 0)) {
        // Reset the fill positions for a later call, then report the pivot.
        for (let j = 0; j < n; j++) fillPos[j] = lp[j] as number;
        x.fill(0);
        return order[k] as number;
      }
      const p0 = lp[k] as number;
      li[p0] = k;
      lx[p0] = Math.sqrt(d);
      fillPos[k] = p0 + 1;
    }
    // Ready for the next call: every column starts empty again.
    for (let j = 0; j < n; j++) fillPos[j] = lp[j] as number;
    return -1;
  };
  for (let j = 0; j < n; j++) fillPos[j] = lp[j] as number;

  const solve = (b: Float64Array): void => {
    const lxs = lx;
    const lis = li;
    const lps = lp;
    const ys = y;
    const ord = order;
    for (let k = 0; k < n; k++) ys[k] = b[ord[k] as number] as number;
    // L y' = y (columns of L: diagonal first, then rows below).
    for (let j = 0; j < n; j++) {
      const p0 = lps[j] as number;
      const yj = (ys[j] as number) / (lxs[p0] as number);
      ys[j] = yj;
      for (let p = p0 + 1; p < (lps[j + 1] as number); p++) {
        const r = lis[p] as number;
        ys[r] = (ys[r] as number) - (lxs[p] as number) * yj;
      }
    }
    // L^T x = y'.
    for (let j = n - 1; j >= 0; j--) {
      const p0 = lps[j] as number;
      let s = ys[j] as number;
      for (let p = p0 + 1; p < (lps[j + 1] as number); p++) {
        s -= (lxs[p] as number) * (ys[lis[p] as number] as number);
      }
      ys[j] = s / (lxs[p0] as number);
    }
    for (let k = 0; k < n; k++) b[ord[k] as number] = ys[k] as number;
  };

  if (nnzL > 2 ** 30) {
    throw new HeadflowError('OUT_OF_RANGE', `the network's factor would hold ${nnzL} entries.`);
  }
  return {
    n,
    factorEntries: nnzL,
    entry,
    diagonal: (i: number) => (cp[(inv[i] as number) + 1] as number) - 1,
    values,
    factor,
    solve,
  };
}

/**
 * Reverse Cuthill–McKee ordering (Cuthill & McKee 1969; reversal after George 1971), started at a
 * pseudo-peripheral vertex found by the George–Liu level-structure search (George & Liu, Computer
 * Solution of Large Sparse Positive Definite Systems, 1981). Neighbours are visited in order of
 * increasing degree, ties by index, so the order is deterministic. Disconnected parts are ordered
 * one after the other.
 */
import type { SymmetricSparse } from './sparse.js';

export type Adjacency = readonly (readonly number[])[];

/** Graph of the off-diagonal entries of K. */
export function adjacencyOf(K: SymmetricSparse): number[][] {
  return K.rows.map((row, i) => [...row.keys()].filter((j) => j !== i).sort((a, b) => a - b));
}

/** Breadth-first level structure from `root` over unvisited vertices. */
function levelStructure(adjacency: Adjacency, root: number, blocked: Uint8Array): number[][] {
  const seen = new Uint8Array(adjacency.length);
  seen[root] = 1;
  const levels: number[][] = [[root]];
  for (;;) {
    const next: number[] = [];
    for (const v of levels[levels.length - 1] as number[]) {
      for (const w of adjacency[v] as readonly number[]) {
        if (seen[w] === 0 && blocked[w] === 0) {
          seen[w] = 1;
          next.push(w);
        }
      }
    }
    if (next.length === 0) return levels;
    levels.push(next);
  }
}

function pseudoPeripheral(adjacency: Adjacency, start: number, blocked: Uint8Array): number {
  const degree = (v: number): number => (adjacency[v] as readonly number[]).length;
  let root = start;
  let levels = levelStructure(adjacency, root, blocked);
  for (;;) {
    const last = levels[levels.length - 1] as number[];
    let candidate = last[0] as number;
    for (const v of last) if (degree(v) < degree(candidate) || (degree(v) === degree(candidate) && v < candidate)) candidate = v;
    const candidateLevels = levelStructure(adjacency, candidate, blocked);
    if (candidateLevels.length <= levels.length) return root;
    root = candidate;
    levels = candidateLevels;
  }
}

/** Permutation `order`: order[newPosition] = oldIndex. */
export function reverseCuthillMcKee(adjacency: Adjacency): Int32Array {
  const n = adjacency.length;
  const degree = (v: number): number => (adjacency[v] as readonly number[]).length;
  const visited = new Uint8Array(n);
  const order: number[] = [];
  const byDegree = Array.from({ length: n }, (_, i) => i).sort((a, b) => degree(a) - degree(b) || a - b);
  for (const seed of byDegree) {
    if (visited[seed] === 1) continue;
    const root = pseudoPeripheral(adjacency, seed, visited);
    visited[root] = 1;
    order.push(root);
    for (let head = order.length - 1; head < order.length; head++) {
      const v = order[head] as number;
      const fresh = (adjacency[v] as readonly number[]).filter((w) => visited[w] === 0);
      fresh.sort((a, b) => degree(a) - degree(b) || a - b);
      for (const w of fresh) {
        visited[w] = 1;
        order.push(w);
      }
    }
  }
  return Int32Array.from(order.reverse());
}

/** Inverse permutation: position[oldIndex] = newPosition. */
export function inversePermutation(order: Int32Array): Int32Array {
  const position = new Int32Array(order.length);
  order.forEach((old, p) => {
    position[old] = p;
  });
  return position;
}

/** Half-bandwidth max |p(i) − p(j)| over the edges, for the ordering `order` (identity if omitted). */
export function bandwidth(adjacency: Adjacency, order?: Int32Array): number {
  const position = order === undefined ? Int32Array.from(adjacency, (_, i) => i) : inversePermutation(order);
  let b = 0;
  adjacency.forEach((neighbours, i) => {
    for (const j of neighbours) b = Math.max(b, Math.abs((position[i] as number) - (position[j] as number)));
  });
  return b;
}

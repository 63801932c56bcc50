import KDBush from 'kdbush';

/**
 * k-nearest-neighbour search over a static point set.
 * Own code on top of kdbush's kd-sorted arrays, because kdbush v4 offers only box and radius queries and
 * geokdbush (its kNN companion) is spherical; a depth-first walk with a sorted buffer of k is the textbook
 * branch-and-bound search (Friedman, Bentley & Finkel 1977, ACM TOMS 3(3), 209–226).
 */
export interface NeighbourIndex {
  readonly size: number;
  /**
   * Writes the ids of the k nearest points to (x, y), nearest first, into `ids` and their squared distances
   * into `d2`; skips the point `exclude` (−1 for none). Returns how many were written (min(k, size − excluded)).
   */
  nearest(x: number, y: number, k: number, ids: Int32Array, d2: Float64Array, exclude?: number): number;
}

/** Leaf size of the tree: small leaves suit k ≈ 16 queries on a few hundred to a few thousand points. */
const NODE_SIZE = 8;

/**
 * Builds the index over parallel coordinate arrays.
 *
 * @example
 * const index = createNeighbourIndex(new Float64Array([0, 10, 20]), new Float64Array([0, 0, 0]));
 * const ids = new Int32Array(2), d2 = new Float64Array(2);
 * index.nearest(12, 0, 2, ids, d2); // 2 written: ids [1, 2], d2 [4, 64]
 */
export function createNeighbourIndex(xs: ArrayLike<number>, ys: ArrayLike<number>): NeighbourIndex {
  const n = xs.length;
  if (ys.length !== n) throw new Error(`xs and ys must have the same length (${n} vs ${ys.length})`);
  const tree = new KDBush(Math.max(n, 1), NODE_SIZE);
  for (let i = 0; i < n; i++) tree.add(xs[i], ys[i]);
  if (n === 0) tree.add(0, 0);
  tree.finish();
  const treeIds = tree.ids;
  const coords = tree.coords;
  const nodeSize = tree.nodeSize;
  // stack frames: left, right, axis, and the squared distance from the query to the frame's half-plane
  const stackInt = new Int32Array(3 * 64);
  const stackBound = new Float64Array(64);

  function nearest(qx: number, qy: number, k: number, ids: Int32Array, d2: Float64Array, exclude = -1): number {
    if (n === 0 || k <= 0) return 0;
    let count = 0;
    let worst = Infinity; // squared distance of the k-th best so far
    stackInt[0] = 0;
    stackInt[1] = n - 1;
    stackInt[2] = 0;
    stackBound[0] = 0;
    let sp = 1;
    while (sp > 0) {
      sp--;
      if (stackBound[sp] >= worst) continue;
      const left = stackInt[3 * sp];
      const right = stackInt[3 * sp + 1];
      const axis = stackInt[3 * sp + 2];
      const leaf = right - left <= nodeSize;
      const from = leaf ? left : (left + right) >> 1;
      const to = leaf ? right : from;
      for (let i = from; i <= to; i++) {
        const id = treeIds[i];
        if (id === exclude) continue;
        const dx = coords[2 * i] - qx;
        const dy = coords[2 * i + 1] - qy;
        const dist2 = dx * dx + dy * dy;
        if (dist2 >= worst) continue;
        // insertion into the sorted buffer (k is small)
        let j = count < k ? count++ : k - 1;
        while (j > 0 && d2[j - 1] > dist2) {
          d2[j] = d2[j - 1];
          ids[j] = ids[j - 1];
          j--;
        }
        d2[j] = dist2;
        ids[j] = id;
        if (count === k) worst = d2[k - 1];
      }
      if (leaf) continue;
      const m = from;
      const split = axis === 0 ? qx - coords[2 * m] : qy - coords[2 * m + 1];
      const parentBound = stackBound[sp];
      const splitBound = split * split;
      const farBound = splitBound > parentBound ? splitBound : parentBound;
      const nextAxis = 1 - axis;
      // far half pushed first so the near half is searched first and tightens `worst` early
      const farLeft = split < 0 ? m + 1 : left;
      const farRight = split < 0 ? right : m - 1;
      const nearLeft = split < 0 ? left : m + 1;
      const nearRight = split < 0 ? m - 1 : right;
      if (farLeft <= farRight && farBound < worst) {
        stackInt[3 * sp] = farLeft;
        stackInt[3 * sp + 1] = farRight;
        stackInt[3 * sp + 2] = nextAxis;
        stackBound[sp++] = farBound;
      }
      if (nearLeft <= nearRight) {
        stackInt[3 * sp] = nearLeft;
        stackInt[3 * sp + 1] = nearRight;
        stackInt[3 * sp + 2] = nextAxis;
        stackBound[sp++] = parentBound;
      }
    }
    return count;
  }

  return { size: n, nearest };
}

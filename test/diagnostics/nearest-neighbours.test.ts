import { describe, expect, it } from 'vitest';
import { nearestPairs } from '../../src/diagnostics/nearest-neighbours.js';
import { seededRandom } from '../../src/diagnostics/random.js';

describe('nearest neighbours (k-d tree) of the swing segments', () => {
  /** The plain search over all pairs: the k smallest (distance, index), duplicates skipped. */
  function bruteForce(flat: Float64Array, s: number, d: number, kk: number, rows: Int32Array): number[] {
    const out: number[] = [];
    for (let a = 0; a < s; a++) {
      const found: [number, number][] = [];
      for (let b = 0; b < s; b++) {
        if (b === a) continue;
        let dist = 0;
        for (let c = 0; c < d; c++) dist += (flat[a * d + c] - flat[b * d + c]) ** 2;
        if (dist > 0) found.push([dist, b]);
      }
      found.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
      for (const [, b] of found.slice(0, kk)) out.push(rows[a], rows[b]);
    }
    return out;
  }

  for (const [label, values] of [
    ['continuous values', (u: () => number) => 2 * u() - 1],
    ['few distinct values (ties and duplicates)', (u: () => number) => Math.floor(4 * u()) - 1.5],
  ] as const) {
    it(`equals the search over all pairs (${label})`, () => {
      const u = seededRandom(77);
      for (const [s, d, kk] of [
        [1000, 5, 3],
        [300, 3, 3],
        [400, 8, 3],
        [120, 5, 4],
        [50, 2, 1],
        [9, 4, 8],
        [8, 1, 3],
      ]) {
        const flat = Float64Array.from({ length: s * d }, () => values(u));
        const rows = Int32Array.from({ length: s }, (_, a) => 3 * a + 1);
        expect(Array.from(nearestPairs(flat, s, d, kk, rows)), `s ${s}, d ${d}, k ${kk}`).toEqual(bruteForce(flat, s, d, kk, rows));
      }
    });
  }
});

import { describe, expect, it } from 'vitest';
import { assignFolds, foldSizes } from '../../src/diagnostics/folds.js';
import { permutation, seededRandom } from '../../src/diagnostics/random.js';

describe('fold assignment', () => {
  it('blocks: contiguous in file order, the first n mod k folds one row longer (scikit-learn KFold(shuffle=False), user guide 3.1.2.1)', () => {
    const folds = assignFolds(11, 3, 'blocks', 1);
    expect(Array.from(folds.foldOf)).toEqual([0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2]);
    expect(foldSizes(10, 4)).toEqual([3, 3, 2, 2]);
  });

  it('shuffled: same sizes, every row in one fold, reproducible from the seed, different for another seed', () => {
    const a = assignFolds(1000, 7, 'shuffled', 5);
    const b = assignFolds(1000, 7, 'shuffled', 5);
    const c = assignFolds(1000, 7, 'shuffled', 6);
    expect(Array.from(a.foldOf)).toEqual(Array.from(b.foldOf));
    expect(Array.from(a.foldOf)).not.toEqual(Array.from(c.foldOf));
    const counts = new Array<number>(7).fill(0);
    for (const f of a.foldOf) counts[f]++;
    expect(counts).toEqual(foldSizes(1000, 7));
    // Not left in file order: the first 143 rows are not all in fold 0.
    expect(a.foldOf.subarray(0, 143).some((f) => f !== 0)).toBe(true);
  });

  it('k above n becomes n (leave-one-out folds); 0 rows give one empty fold', () => {
    expect(assignFolds(3, 5, 'blocks', 1).k).toBe(3);
    expect(assignFolds(0, 5, 'blocks', 1).sizes).toEqual([0]);
  });

  it('rejects a non-integer k or negative n', () => {
    expect(() => assignFolds(10, 0, 'blocks', 1)).toThrow(RangeError);
    expect(() => assignFolds(-1, 2, 'blocks', 1)).toThrow(RangeError);
    expect(() => seededRandom(Number.NaN)).toThrow(RangeError);
  });

  it('the generator is roughly uniform and the shuffle is a permutation', () => {
    const u = seededRandom(123);
    const bins = new Array<number>(10).fill(0);
    for (let i = 0; i < 100000; i++) bins[Math.floor(u() * 10)]++;
    // Each bin expects 10000 with sd about 95; 6 sd is far beyond chance (common practice).
    for (const b of bins) expect(Math.abs(b - 10000), `bins ${bins.join(',')}`).toBeLessThan(600);
    const p = permutation(50, seededRandom(9));
    expect([...p].sort((x, y) => x - y)).toEqual(Array.from({ length: 50 }, (_, i) => i));
  });
});

// Generated gzip training files for the streamed-memory tests (test/run/streamed-memory*.test.ts).
import { once } from 'node:events';
import { createWriteStream } from 'node:fs';
import { createGzip } from 'node:zlib';

/**
 * Writes `rows` rows of x1..x`inputs`, y as gzip CSV (level 1): each x uniform in [0, 1) from a
 * seeded linear congruential generator, y = sum (j + 1) x_j plus a uniform wobble in [-0.5, 0.5),
 * six decimals, written in batches of 20,000 lines.
 */
export async function writeGzipRows(file: string, rows: number, seed: number, inputs: number): Promise<void> {
  const gzip = createGzip({ level: 1 });
  const out = createWriteStream(file);
  gzip.pipe(out);
  let s = seed >>> 0;
  gzip.write(`${Array.from({ length: inputs }, (_, j) => `x${j + 1}`).join(',')},y\n`);
  const batch: string[] = [];
  for (let i = 0; i < rows; i++) {
    let y = 0;
    const cells: string[] = [];
    for (let j = 0; j < inputs; j++) {
      s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
      const x = s / 2 ** 32;
      y += (j + 1) * x;
      cells.push(x.toFixed(6));
    }
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    cells.push((y + s / 2 ** 32 - 0.5).toFixed(6));
    batch.push(cells.join(','));
    if (batch.length === 20000 || i === rows - 1) {
      if (!gzip.write(`${batch.join('\n')}\n`)) await once(gzip, 'drain');
      batch.length = 0;
    }
  }
  gzip.end();
  await once(out, 'finish');
}

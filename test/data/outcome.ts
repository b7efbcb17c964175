/**
 * Reads a table and turns the outcome into plain data (values as bit patterns so that -0,
 * subnormals and NaN compare exactly), so tests can compare the two paths with toEqual.
 */

import { InputError } from '../../src/core/errors.js';
import type { RepoReader } from '../../src/repo/types.js';
import { readTable, readTableChunks, type ReadTableOptions } from '../../src/data/table.js';

/** A read's result or its error, as plain data. */
export type Outcome =
  | { ok: true; header: string[]; rows: number; columns: Record<string, string[]>; lines: number[] }
  | { ok: false; code: string; message: string; file?: string; line?: number; key?: string };

/** The bits of a double as 16 hex digits (tells -0 from 0). */
export function bits(x: number): string {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  return view.getBigUint64(0).toString(16).padStart(16, '0');
}

/** Reads `path` with readTable; any non-InputError is rethrown (so the test fails on it). */
export async function outcome(repo: RepoReader, path: string, options: ReadTableOptions): Promise<Outcome> {
  try {
    const table = await readTable(repo, path, options);
    const columns: Record<string, string[]> = {};
    for (const [name, values] of table.columns) columns[name] = Array.from(values, bits);
    return { ok: true, header: table.header, rows: table.rows, columns, lines: Array.from(table.lines) };
  } catch (error) {
    return asOutcome(error);
  }
}

/** Reads `path` with readTableChunks and concatenates; checks chunk sizes on the way. */
export async function chunkedOutcome(
  repo: RepoReader,
  path: string,
  options: ReadTableOptions,
): Promise<Outcome & { chunkSizes?: number[] }> {
  try {
    const columns: Record<string, string[]> = Object.fromEntries(options.columns.map((c) => [c, [] as string[]]));
    const lines: number[] = [];
    const chunkSizes: number[] = [];
    for await (const chunk of readTableChunks(repo, path, options)) {
      chunkSizes.push(chunk.rows);
      options.columns.forEach((name, k) => {
        if (chunk.columns[k].length !== chunk.rows)
          throw new Error(`column ${name} has ${chunk.columns[k].length} values, expected ${chunk.rows}`);
        columns[name] = [...columns[name], ...Array.from(chunk.columns[k], bits)];
      });
      if (chunk.lines.length !== chunk.rows) throw new Error(`lines has ${chunk.lines.length} entries, expected ${chunk.rows}`);
      lines.push(...chunk.lines);
    }
    const rows = lines.length;
    return { ok: true, header: [], rows, columns, lines, chunkSizes };
  } catch (error) {
    return asOutcome(error);
  }
}

function asOutcome(error: unknown): Outcome {
  if (!(error instanceof InputError)) throw error;
  return { ok: false, code: error.code, message: error.message, ...error.location };
}

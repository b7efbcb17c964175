/**
 * Where the passes over a model's training rows get them: from columns held in memory (today's
 * path, {@link memoryRowSource}), or streamed again from the file, or from its parts in order, on
 * every pass ({@link fileRowSource}) for training data too large to hold, so that memory does not
 * grow with the rows. Both hand out the rows in file order, in chunks of consecutive rows.
 *
 * Which one a model takes: {@link streamsTrainingData} (one file: {@link streamsTrainingFile}). A streamed model keeps a bounded sample
 * of its training rows in memory ({@link RowReservoir}) for the diagnostics that need rows at
 * hand (swing, spikes, the complexity sweep, charts); docs/scale.md describes what each uses.
 */
import { mix32 } from '../core/mix32.js';
import type { RepoReader } from '../repo/types.js';
import type { CsvFormat, SplitFilter } from './csv-format.js';
import { isGzipPath } from './gzip-stream.js';
import type { ModelData } from './model-data.js';
import { readTableChunks } from './table.js';
import { DEFAULT_CHUNK_ROWS } from './csv-rules.js';
import { partsLabel, type DataPart } from './data-parts.js';

/**
 * A chunk of consecutive training rows: the columns of {@link ModelData} for those rows only. Read
 * from parts, `file` is the parts' label, `lines` are table-wide and `parts` lists the parts
 * reached so far with their line offsets (data-parts.ts: `placeOfLine` names a row's part and line).
 */
export type RowChunk = Pick<ModelData, 'inputs' | 'y' | 'lines' | 'rows' | 'file' | 'parts'>;

/** The training rows of one model, handed out chunk by chunk in file order (parts one after the other). */
export interface RowSource {
  /** Repository-relative path of the file; read from parts, their label (data-parts.ts `partsLabel`). */
  readonly file: string;
  /** True when every pass reads the file again (the rows are never held whole). */
  readonly streamed: boolean;
  /**
   * Calls `visit(chunk, start)` for consecutive chunks of rows (`start`: index of the chunk's
   * first row among all rows); a chunk's arrays may be reused after `visit` returns.
   * @param chunkRows rows per chunk of a streamed source (default: its own); in-memory: one chunk
   */
  forEachChunk(visit: (chunk: RowChunk, start: number) => void, chunkRows?: number): Promise<void>;
}

/**
 * The rows of in-memory data as one chunk: the passes then work exactly as over the columns
 * themselves (same blocks, same additions in the same order).
 */
export function memoryRowSource(data: RowChunk): RowSource {
  return {
    file: data.file,
    streamed: false,
    async forEachChunk(visit) {
      visit(data, 0);
    },
  };
}

/** How {@link fileRowSource} reads the file: as the in-memory loader would (table.ts options). */
export interface FileRowSourceOptions {
  /** Input columns in `design.inputs` order. */
  inputs: readonly string[];
  /** Target column. */
  target: string;
  /** Rows per chunk (default 65536); a multiple of the design's block rows keeps the blocks of the in-memory path. */
  chunkRows?: number;
  /** Size cap in bytes (caps.max_file_mb). */
  maxBytes: number;
  format?: Partial<CsvFormat>;
  split?: SplitFilter;
  /** Receives the rows dropped for a missing cell (`missing: drop`), counted afresh on each pass. */
  counts?: { dropped: number };
}

/**
 * The training rows streamed from their file, or from its parts in the order given, through
 * readTable's chunk interface ({@link readTableChunks}: fast numeric path, general path, gzip, one
 * header check across parts) on every pass. Memory: one chunk of `chunkRows` x (inputs + 1)
 * doubles at a time (two read from parts), independent of the rows in the file.
 *
 * Read from parts, the chunks are cut again across the parts' ends ({@link PartsRechunker}): every
 * chunk but the last holds `chunkRows` rows, as from one file, so that the design's blocks, and
 * with them every sum of the passes, are those of the same rows held in memory.
 *
 * @param path the file, or its parts in reading order (at least one)
 */
export function fileRowSource(repo: RepoReader, path: string | readonly string[], options: FileRowSourceOptions): RowSource {
  const columns = [...options.inputs, options.target];
  const d = options.inputs.length;
  const file = typeof path === 'string' ? path : partsLabel(path);
  return {
    file,
    streamed: true,
    async forEachChunk(visit, chunkRows = options.chunkRows ?? DEFAULT_CHUNK_ROWS) {
      let start = 0;
      if (options.counts) options.counts.dropped = 0;
      const parts: DataPart[] | undefined = typeof path === 'string' ? undefined : [];
      const read = readTableChunks(repo, path, {
        columns,
        maxBytes: options.maxBytes,
        chunkRows,
        ...(options.format ? { format: options.format } : {}),
        ...(options.split ? { split: options.split } : {}),
        ...(options.counts ? { counts: options.counts } : {}),
        ...(parts ? { parts } : {}),
        // Every consumer copies what it keeps (the reservoir, the factors, the sums), so the reader
        // refills the same arrays: no garbage of a chunk's size per chunk.
        recycle: true,
      });
      if (parts === undefined) {
        for await (const chunk of read) {
          visit({ inputs: chunk.columns.slice(0, d), y: chunk.columns[d], lines: chunk.lines, rows: chunk.rows, file }, start);
          start += chunk.rows;
        }
        return;
      }
      const whole = new PartsRechunker(d + 1, chunkRows);
      const hand = (rows: number): void => {
        const cut = whole.columns.map((c) => c.subarray(0, rows));
        visit({ inputs: cut.slice(0, d), y: cut[d], lines: whole.lines.subarray(0, rows), rows, file, parts }, start);
        start += rows;
      };
      for await (const chunk of read) whole.add(chunk.columns, chunk.lines, chunk.rows, hand);
      if (whole.rows > 0) hand(whole.rows);
    },
  };
}

/**
 * Cuts chunks of rows again into chunks of exactly `chunkRows` rows (the last may be short),
 * copying them into arrays of its own: the chunks of a table read from parts, which end at every
 * part's end, become those of one file. Memory: `chunkRows` x (columns + 1/2) doubles.
 */
class PartsRechunker {
  /** The rows gathered so far, column by column. */
  readonly columns: Float64Array[];
  readonly lines: Int32Array;
  /** Rows gathered and not yet handed out. */
  rows = 0;
  readonly #size: number;

  /**
   * @param columns columns of each row
   * @param size rows of each chunk handed out (>= 1)
   */
  constructor(columns: number, size: number) {
    this.#size = size;
    this.columns = Array.from({ length: columns }, () => new Float64Array(size));
    this.lines = new Int32Array(size);
  }

  /** Adds `rows` rows; calls `full(size)` each time `size` rows are gathered (then starts again at 0). */
  add(columns: readonly Float64Array[], lines: Int32Array, rows: number, full: (rows: number) => void): void {
    let from = 0;
    while (from < rows) {
      const take = Math.min(rows - from, this.#size - this.rows);
      for (let c = 0; c < this.columns.length; c++) this.columns[c].set(columns[c].subarray(from, from + take), this.rows);
      this.lines.set(lines.subarray(from, from + take), this.rows);
      this.rows += take;
      from += take;
      if (this.rows === this.#size) {
        full(this.rows);
        this.rows = 0;
      }
    }
  }
}

/**
 * Default threshold of {@link streamsTrainingFile}: 128 MiB of CSV text. About 1.2 million rows of
 * 8 inputs and a target at the benchmark's 111 bytes a row; held in memory such a file takes about
 * 100 MiB of columns plus the run's own (the L workload of docs/benchmarks.md, 1 million rows,
 * 111 MB, peaks near 200 MiB), so files below it keep today's in-memory path and those above
 * stream, and a model of 8 inputs stays under about 256 MiB either way.
 */
export const STREAM_ABOVE_BYTES = 128 * 1024 * 1024;

/**
 * Assumed ratio of CSV text to gzip bytes when judging a `.gz` file by its stored size (the
 * decompressed size is not known before reading it; numeric CSV compresses about 2 to 4 times,
 * the benchmark's random `%.10g` numbers 1.9 times at `gzip -1`): 4, the upper end, so that a
 * large compressed file streams rather than risks being held.
 */
export const GZIP_RATIO = 4;

/**
 * Estimated CSV text of a data file in bytes: its stored size, times {@link GZIP_RATIO} for `.gz`.
 * @param size stored size in bytes
 */
export function estimatedTextBytes(path: string, size: number): number {
  return isGzipPath(path) ? size * GZIP_RATIO : size;
}

/**
 * Whether a training file streams: when its estimated CSV text ({@link estimatedTextBytes}) is
 * above `aboveBytes` (default {@link STREAM_ABOVE_BYTES}).
 * @param size stored size in bytes
 */
export function streamsTrainingFile(path: string, size: number, aboveBytes: number = STREAM_ABOVE_BYTES): boolean {
  return estimatedTextBytes(path, size) > aboveBytes;
}

/**
 * Whether training data streams, read from one file or from parts: when the estimated CSV text of
 * all its files together (each as {@link estimatedTextBytes}, so gzip parts at {@link GZIP_RATIO}
 * times their size) is above `aboveBytes` (default {@link STREAM_ABOVE_BYTES}).
 * @param files each file's path and stored size in bytes (one entry for one file)
 */
export function streamsTrainingData(files: readonly { path: string; size: number }[], aboveBytes: number = STREAM_ABOVE_BYTES): boolean {
  let text = 0;
  for (const f of files) text += estimatedTextBytes(f.path, f.size);
  return text > aboveBytes;
}

/**
 * The stored sizes of training data's files, for {@link streamsTrainingData}.
 * @param file the training file (`data.train`)
 * @param parts its parts in reading order, when read from parts
 * @returns each file's path and stored size in bytes: the parts when given, else the one file
 */
export async function trainingFileSizes(
  repo: RepoReader,
  file: string,
  parts: readonly string[] | undefined,
): Promise<{ path: string; size: number }[]> {
  const out: { path: string; size: number }[] = [];
  for (const path of parts ?? [file]) out.push({ path, size: await repo.size(path) });
  return out;
}

/** Rows a streamed model keeps for its sampled diagnostics: 100,000 (about 8 MB at 8 inputs). */
export const SAMPLE_ROWS = 100_000;

/**
 * A seeded uniform sample of at most `capacity` rows of a stream of rows (reservoir sampling,
 * Vitter's algorithm R: Vitter, "Random sampling with a reservoir", ACM TOMS 11(1), 1985), kept in
 * file order. While the rows seen fit, the sample is every row, so a small file's sample is the
 * file itself. Memory: capacity x (inputs + 2) numbers.
 */
export class RowReservoir {
  readonly #capacity: number;
  readonly #inputs: Float64Array[];
  readonly #y: Float64Array;
  readonly #lines: Int32Array;
  readonly #index: Float64Array;
  #seen = 0;
  #state: number;

  /**
   * @param inputs input columns
   * @param capacity rows kept at most (>= 1)
   * @param seed seed of the choice (a 32-bit integer)
   */
  constructor(inputs: number, capacity: number, seed: number) {
    this.#capacity = capacity;
    this.#inputs = Array.from({ length: inputs }, () => new Float64Array(capacity));
    this.#y = new Float64Array(capacity);
    this.#lines = new Int32Array(capacity);
    this.#index = new Float64Array(capacity);
    this.#state = seed >>> 0;
  }

  /** Rows seen so far. */
  get seen(): number {
    return this.#seen;
  }

  /** Offers the rows of one chunk, in order. */
  add(chunk: RowChunk): void {
    for (let i = 0; i < chunk.rows; i++) {
      const t = this.#seen++;
      let slot = t;
      if (t >= this.#capacity) {
        slot = Math.floor(this.#next() * (t + 1));
        if (slot >= this.#capacity) continue;
      }
      for (let c = 0; c < this.#inputs.length; c++) this.#inputs[c][slot] = chunk.inputs[c][i];
      this.#y[slot] = chunk.y[i];
      this.#lines[slot] = chunk.lines[i];
      this.#index[slot] = t;
    }
  }

  /** The sample in file order, as model data of `file` (rows = min(seen, capacity)). */
  rows(file: string): ModelData {
    const m = Math.min(this.#seen, this.#capacity);
    const order = Array.from({ length: m }, (_, i) => i).sort((a, b) => this.#index[a] - this.#index[b]);
    const pick = (from: Float64Array): Float64Array => Float64Array.from(order, (i) => from[i]);
    return {
      inputs: this.#inputs.map(pick),
      y: pick(this.#y),
      lines: Int32Array.from(order, (i) => this.#lines[i]),
      rows: m,
      file,
    };
  }

  /** Uniform in [0, 1): 53 bits from two steps of a Weyl sequence through a 32-bit mixer. */
  #next(): number {
    const hi = this.#mix() >>> 5;
    const lo = this.#mix() >>> 6;
    return (hi * 67108864 + lo) / 9007199254740992;
  }

  #mix(): number {
    this.#state = (this.#state + 0x9e3779b9) >>> 0;
    return mix32(this.#state);
  }
}

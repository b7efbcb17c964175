/**
 * Where the passes over a model's training rows get them: from columns held in memory (today's
 * path, {@link memoryRowSource}), or streamed again from the file on every pass
 * ({@link fileRowSource}) for a training file too large to hold, so that memory does not grow
 * with the rows. Both hand out the rows in file order, in chunks of consecutive rows.
 *
 * Which one a model takes: {@link streamsTrainingFile}. A streamed model keeps a bounded sample
 * of its training rows in memory ({@link RowReservoir}) for the diagnostics that need rows at
 * hand (swing, spikes, the complexity sweep, charts); docs/scale.md describes what each uses.
 */
import { mix32 } from '../core/mix32.js';
import type { RepoReader } from '../repo/types.js';
import type { CsvFormat, SplitFilter } from './csv-format.js';
import { isGzipPath } from './gzip-stream.js';
import type { ModelData } from './model-data.js';
import { readTableChunks } from './table.js';

/** A chunk of consecutive training rows: the columns of {@link ModelData} for those rows only. */
export type RowChunk = Pick<ModelData, 'inputs' | 'y' | 'lines' | 'rows' | 'file'>;

/** The training rows of one model, handed out chunk by chunk in file order. */
export interface RowSource {
  /** Repository-relative path of the file. */
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
 * The training rows streamed from their file through readTable's chunk interface
 * ({@link readTableChunks}: fast numeric path, general path, gzip) on every pass. Memory: one chunk
 * of `chunkRows` x (inputs + 1) doubles at a time, independent of the rows in the file.
 */
export function fileRowSource(repo: RepoReader, path: string, options: FileRowSourceOptions): RowSource {
  const columns = [...options.inputs, options.target];
  const d = options.inputs.length;
  return {
    file: path,
    streamed: true,
    async forEachChunk(visit, chunkRows = options.chunkRows) {
      let start = 0;
      if (options.counts) options.counts.dropped = 0;
      const read = readTableChunks(repo, path, {
        columns,
        maxBytes: options.maxBytes,
        ...(chunkRows ? { chunkRows } : {}),
        ...(options.format ? { format: options.format } : {}),
        ...(options.split ? { split: options.split } : {}),
        ...(options.counts ? { counts: options.counts } : {}),
        // Every consumer copies what it keeps (the reservoir, the factors, the sums), so the reader
        // refills the same arrays: no garbage of a chunk's size per chunk.
        recycle: true,
      });
      for await (const chunk of read) {
        visit({ inputs: chunk.columns.slice(0, d), y: chunk.columns[d], lines: chunk.lines, rows: chunk.rows, file: path }, start);
        start += chunk.rows;
      }
    },
  };
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
 * Whether a training file streams: when its estimated CSV text (the stored size, times
 * {@link GZIP_RATIO} for `.gz`) is above `aboveBytes` (default {@link STREAM_ABOVE_BYTES}).
 * @param size stored size in bytes
 */
export function streamsTrainingFile(path: string, size: number, aboveBytes: number = STREAM_ABOVE_BYTES): boolean {
  const text = isGzipPath(path) ? size * GZIP_RATIO : size;
  return text > aboveBytes;
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

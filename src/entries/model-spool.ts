/**
 * Each model's part of the JSON report set aside while the run goes on: a run that writes only
 * the JSON report to a file (`fitgate check --format json --out FILE`) renders each model's text
 * (report/json.ts `jsonModelBytes`) as soon as its outcome is final and keeps a small copy of the
 * outcome ({@link smallCopy}: what the verdict, the counts and the exit status read); the report is
 * then written from the copies with each model's text ({@link ModelSpool.text}). The run keeps
 * neither each outcome's object graph (typed arrays, chart objects, figures, checks) nor its text
 * until the end.
 *
 * Where the text goes: given the `--out` file ({@link SpoolTarget}), into one temporary file in the
 * real folder that file is written to, opened as safe-write.ts opens its own temporary files
 * (`openTempBeside`: the folder checked and made as for the report, `O_CREAT | O_EXCL |
 * O_NOFOLLOW`, never an existing file, never through a link). Its name is removed as soon as it is
 * open, so that nothing is left behind however the run ends (where the platform cannot remove an
 * open file's name, {@link ModelSpool.close} removes it); the text is read back through the open
 * descriptor alone, in chunks of {@link SPOOL_READ_BYTES}, while the report is written. The file is
 * created with the first model's text. When it cannot be opened or written (a folder that is
 * refused, a full disk), the text is kept in memory instead and the report's own write reports the
 * problem, as without a spool. Without a target, the text is kept in memory.
 */
import { closeSync, readSync, unlinkSync, writeSync } from 'node:fs';
import { jsonModelBytes } from '../report/json.js';
import type { ModelResult } from '../result/result.js';
import { registerModelRender, type ModelHandoff, type RenderedModel } from '../run/model-handoff.js';
import { openTempBeside, type TempFile, type WritePlace } from './safe-write.js';

/** Models' report text set aside; see the module comment. */
export interface ModelSpool {
  /** Renders the model's text, sets it aside and returns the small copy to keep in the Result. */
  keep(model: ModelResult): ModelResult;
  /**
   * The same in two steps, for a run on several threads: {@link SPOOL_RENDER} renders the model on
   * the thread that evaluated it, `take` sets the text aside here (run/model-handoff.ts).
   */
  handoff: ModelHandoff;
  /**
   * The text set aside for a copy {@link keep} returned, in pieces, or undefined for any other
   * model: its UTF-8 bytes, whole when they were kept in memory; read from the spool file as they
   * are asked for, in one buffer used again for the next piece (so each piece is valid until the
   * next is asked for). A piece that cannot be read throws.
   */
  text(model: ModelResult): Iterable<Uint8Array> | undefined;
  /** Drops every text, closes and removes the spool file (calling it again does nothing); {@link keep} then returns models whole. */
  close(): void;
}

/** The report file the spooled text is for: the spool file goes in the folder it is written to. */
export interface SpoolTarget {
  /** The `--out` path, absolute or relative to the process's folder. */
  file: string;
  /** Its option and boundary folders, as the report's own write gets them (safe-write.ts). */
  place: WritePlace;
}

/** Bytes read from the spool file at a time while the report is written. */
export const SPOOL_READ_BYTES = 1 << 16;

/** Suffix of the spool file's name (`.NAME.PID.RANDOM.spool`). */
export const SPOOL_SUFFIX = 'spool';

/**
 * What the Result keeps of a model whose text is set aside: what the run's summary and exit
 * status read (name, descriptor path, verdict; result.ts `summarise`), with the row counts, the
 * parameter count and the error, and nothing else: no figures, no checks, no chart data, no extra
 * data (empty lists, nulls). The report's text of the model comes from the spool, never from this
 * copy; a copy is a few hundred bytes where the whole outcome's object graph is tens of kilobytes.
 * @param model a model's outcome
 */
export function smallCopy(model: ModelResult): ModelResult {
  return {
    name: model.name,
    descriptor: model.descriptor,
    ...(model.kind === undefined ? {} : { kind: model.kind }),
    verdict: model.verdict,
    rows: { train: model.rows.train, holdout: model.rows.holdout },
    parameters: model.parameters,
    columns: [],
    metrics: null,
    coefficients: [],
    shipped: null,
    checks: [],
    error: model.error === null ? null : { ...model.error },
  };
}

/** Name of the spool's render in the registry of run/model-handoff.ts. */
export const SPOOL_RENDER = 'json-model-spool';

/**
 * A model's small copy ({@link smallCopy}) and its part of the JSON report as UTF-8 bytes
 * (report/json.ts `jsonModelBytes`).
 * @param model a model's outcome
 */
export function renderForSpool(model: ModelResult): RenderedModel {
  return { kept: smallCopy(model), text: jsonModelBytes(model) };
}

// Registered on every thread that loads this module (worker threads load the CLI bundle whole).
registerModelRender(SPOOL_RENDER, renderForSpool);

/** Where one model's text lies in the spool file. */
interface Extent {
  start: number;
  bytes: number;
}

/** Replaceable file operations, for tests (a write or a read that fails). */
export interface SpoolHooks {
  /** As `fs.writeSync(fd, bytes, offset, length, position)`. Default `fs.writeSync`. */
  write?: (fd: number, bytes: Uint8Array, offset: number, length: number, position: number) => number;
  /** As `fs.readSync(fd, bytes, offset, length, position)`. Default `fs.readSync`. */
  read?: (fd: number, bytes: Uint8Array, offset: number, length: number, position: number) => number;
}

/**
 * Opens a spool for one run.
 * @param target the report file the text is for (the spool file goes beside it), or undefined to keep the text in memory
 * @param hooks replaced file operations, for tests; default none
 */
export function openModelSpool(target?: SpoolTarget, hooks: SpoolHooks = {}): ModelSpool {
  const write = hooks.write ?? writeSync;
  const read = hooks.read ?? readSync;
  let texts = new Map<ModelResult, Uint8Array>();
  let extents = new Map<ModelResult, Extent>();
  // The spool file: undefined until the first model, null when there is none (no target, or it failed).
  let file: TempFile | null | undefined = target === undefined ? null : undefined;
  let named = false;
  let end = 0;
  let open = true;

  const openFile = (): TempFile | null => {
    if (target === undefined) return null;
    let opened: TempFile;
    try {
      opened = openTempBeside(target.file, target.place, SPOOL_SUFFIX);
    } catch {
      // The report's own write meets the same problem and reports it.
      return null;
    }
    named = true;
    try {
      unlinkSync(opened.path);
      named = false;
    } catch {
      // Removed by close() instead.
    }
    return opened;
  };
  /** Appends `text` to the spool file; false (nothing kept there) when the write fails. */
  const append = (spool: TempFile, copy: ModelResult, bytes: Uint8Array): boolean => {
    try {
      // Each round writes at least one byte, so this ends after at most bytes.length rounds.
      for (let offset = 0; offset < bytes.length; ) {
        const n = write(spool.fd, bytes, offset, bytes.length - offset, end + offset);
        if (!(n > 0)) return false;
        offset += n;
      }
    } catch {
      return false;
    }
    extents.set(copy, { start: end, bytes: bytes.length });
    end += bytes.length;
    return true;
  };
  // One buffer for every read of the run: the bytes go to the report as they are, never decoded.
  let buffer: Buffer | null = null;
  const fileText = function* (spool: TempFile, extent: Extent): Generator<Uint8Array> {
    buffer ??= Buffer.allocUnsafe(SPOOL_READ_BYTES);
    const chunk = buffer;
    // Each round reads at least one byte, so this ends after at most extent.bytes rounds.
    for (let done = 0; done < extent.bytes; ) {
      const n = read(spool.fd, chunk, 0, Math.min(chunk.length, extent.bytes - done), extent.start + done);
      if (!(n > 0)) throw new Error('the model spool file ended early');
      done += n;
      yield chunk.subarray(0, n);
    }
  };

  const take = ({ kept, text }: RenderedModel): ModelResult => {
    if (file === undefined) file = openFile();
    if (file === null || !append(file, kept, text)) texts.set(kept, text);
    return kept;
  };
  return {
    keep(model) {
      if (!open) return model;
      return take(renderForSpool(model));
    },
    handoff: {
      render: SPOOL_RENDER,
      take(rendered) {
        // A closed spool keeps nothing: the copy alone would lose the model's text.
        if (!open) throw new Error('the model spool is closed');
        return take(rendered);
      },
    },
    text(model) {
      if (!open) return undefined;
      const kept = texts.get(model);
      if (kept !== undefined) return [kept];
      const extent = extents.get(model);
      if (extent === undefined || file === null || file === undefined) return undefined;
      return fileText(file, extent);
    },
    close() {
      if (!open) return;
      open = false;
      texts = new Map();
      extents = new Map();
      if (file !== null && file !== undefined) {
        try {
          closeSync(file.fd);
        } catch {
          // closed already; nothing more to free
        }
        if (named) {
          try {
            unlinkSync(file.path);
          } catch {
            // gone already
          }
        }
      }
      file = null;
    },
  };
}

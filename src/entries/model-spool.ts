/**
 * Each model's part of the JSON report kept on disk while the run goes on: a run that writes only
 * the JSON report to a file (`fitgate check --format json --out FILE`) writes each model's text
 * (report/json.ts `jsonModelReport`) as soon as its outcome is final and keeps a small copy of the
 * outcome in memory (no chart data, no check detail: what the verdict, the counts and the exit
 * status read); the report is then written from the copies with each model's text read back
 * ({@link ModelSpool.text}). The memory of such a run no longer grows by a whole outcome per model.
 *
 * The text goes to one file in a new private folder of the system's temporary folder (made by
 * `mkdtemp`, mode 0700; the file opened with `O_CREAT | O_EXCL | O_NOFOLLOW`, mode 0600), read back
 * only by this process and removed by {@link ModelSpool.close}. When the folder cannot be made or a
 * write fails, the outcomes are kept whole in memory instead, and the report is the same.
 */
import { closeSync, constants, mkdtempSync, openSync, readSync, rmSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { jsonModelReport } from '../report/json.js';
import type { ModelResult } from '../result/result.js';

/** Models' report text on disk; see the module comment. */
export interface ModelSpool {
  /** The private folder holding the file (removed by {@link close}). */
  readonly folder: string;
  /**
   * Writes the model's text and returns the small copy to keep in the Result; returns the model
   * itself (kept whole) when the text could not be written.
   */
  keep(model: ModelResult): ModelResult;
  /** The text written for a copy {@link keep} returned (one piece), or undefined for any other model. */
  text(model: ModelResult): Iterable<string> | undefined;
  /** Closes and removes the file and its folder (best effort; calling it again does nothing). */
  close(): void;
}

/** Where one model's text lies in the file. */
interface Place {
  offset: number;
  length: number;
}

/**
 * The outcome without what only the report's text needs: no chart data, no check detail.
 * @param model a model's outcome
 */
export function smallCopy(model: ModelResult): ModelResult {
  const copy: ModelResult = { ...model, checks: model.checks.map((check) => ({ ...check })) };
  delete copy.charts;
  delete copy.classifier_charts;
  for (const check of copy.checks) delete check.detail;
  return copy;
}

/**
 * Opens a spool for one run.
 * @returns the spool, or null when no private temporary folder or file can be made (then the run
 *   keeps its outcomes whole)
 */
export function openModelSpool(): ModelSpool | null {
  let folder: string;
  try {
    folder = mkdtempSync(path.join(tmpdir(), 'fitgate-'));
  } catch {
    return null;
  }
  let fd: number;
  try {
    fd = openSync(
      path.join(folder, 'models.json'),
      constants.O_RDWR | constants.O_CREAT | constants.O_EXCL | (constants.O_NOFOLLOW ?? 0),
      0o600,
    );
  } catch {
    rmSync(folder, { recursive: true, force: true });
    return null;
  }
  const places = new Map<ModelResult, Place>();
  let end = 0;
  let broken = false;
  let open = true;
  return {
    folder,
    keep(model) {
      if (broken || !open) return model;
      try {
        const bytes = Buffer.from([...jsonModelReport(model)].join(''), 'utf8');
        // Each round writes at least one byte, so this ends after at most bytes.length rounds.
        for (let done = 0; done < bytes.length; ) {
          const n = writeSync(fd, bytes, done, bytes.length - done, end + done);
          if (!(n > 0)) throw new Error('the write made no progress');
          done += n;
        }
        const copy = smallCopy(model);
        places.set(copy, { offset: end, length: bytes.length });
        end += bytes.length;
        return copy;
      } catch {
        // A full disk: keep this and every later outcome whole; those written stay readable.
        broken = true;
        return model;
      }
    },
    text(model) {
      const place = places.get(model);
      if (place === undefined || !open) return undefined;
      const bytes = Buffer.allocUnsafe(place.length);
      for (let done = 0; done < place.length; ) {
        const n = readSync(fd, bytes, done, place.length - done, place.offset + done);
        if (!(n > 0)) throw new Error('the temporary report file was cut short');
        done += n;
      }
      // One model's text at once, so that no character is split between two reads.
      return [bytes.toString('utf8')];
    },
    close() {
      if (!open) return;
      open = false;
      places.clear();
      try {
        closeSync(fd);
      } catch {
        // closed already
      }
      rmSync(folder, { recursive: true, force: true });
    },
  };
}

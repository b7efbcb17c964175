/**
 * Each model's part of the JSON report kept as text while the run goes on: a run that writes only
 * the JSON report to a file (`fitgate check --format json --out FILE`) renders each model's text
 * (report/json.ts `jsonModelReport`) as soon as its outcome is final and keeps a small copy of the
 * outcome (no chart data, no check detail: what the verdict, the counts and the exit status read)
 * beside that one string; the report is then written from the copies with each model's text
 * ({@link ModelSpool.text}). The run no longer keeps each outcome's object graph (typed arrays,
 * chart objects, check details) until the end, only its finished text. Nothing is written to or read
 * from disk: the spool lives in this process's memory.
 */
import { jsonModelReport } from '../report/json.js';
import type { ModelResult } from '../result/result.js';

/** Models' report text held as strings; see the module comment. */
export interface ModelSpool {
  /** Renders the model's text and returns the small copy to keep in the Result. */
  keep(model: ModelResult): ModelResult;
  /** The text kept for a copy {@link keep} returned (one piece), or undefined for any other model. */
  text(model: ModelResult): Iterable<string> | undefined;
  /** Drops every kept text (calling it again does nothing); {@link keep} then returns models whole. */
  close(): void;
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

/** Opens a spool for one run. */
export function openModelSpool(): ModelSpool {
  let texts = new Map<ModelResult, string>();
  let open = true;
  return {
    keep(model) {
      if (!open) return model;
      const copy = smallCopy(model);
      texts.set(copy, [...jsonModelReport(model)].join(''));
      return copy;
    },
    text(model) {
      const text = open ? texts.get(model) : undefined;
      return text === undefined ? undefined : [text];
    },
    close() {
      open = false;
      texts = new Map();
    },
  };
}

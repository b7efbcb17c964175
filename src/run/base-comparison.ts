/**
 * A model's figures against the same model on the base commit of a pull request. The base model
 * is found by name; a model renamed in the pull request is found by its descriptor path, and one
 * renamed and moved by its data files, so that renaming a model cannot escape `base-change`.
 */
import type { Descriptor } from '../config/types.js';
import { dataFiles } from '../config/data-paths.js';
import { fromJsonNumber, jsonNumber, type BaseComparison, type JsonNumber, type ModelMetrics, type ModelResult } from '../result/result.js';

/** How a head model was matched with a base model. */
export type MatchedBy = 'name' | 'descriptor' | 'data';

/** The base model a head model is compared with. */
export interface BaseMatch {
  model: ModelResult;
  by: MatchedBy;
}

/** The base commit's outcomes to compare with, by head descriptor path. */
export interface BaseInput {
  /** Each head model's base model, by the head descriptor's path; absent: new. */
  matches: ReadonlyMap<string, BaseMatch>;
  /** Full SHA of the base commit. */
  commit: string;
}

/**
 * The data files and target of a descriptor, as one key (`train`, `holdout`, `target`); a side
 * read from parts is the list of all its parts (so that a model whose parts change is not matched
 * by its first part alone).
 */
export function dataKey(descriptor: Pick<Descriptor, 'data'>): string {
  const side = (which: 'train' | 'holdout'): string | string[] => {
    const files = dataFiles(descriptor.data, which);
    return (which === 'train' ? descriptor.data.trainParts : descriptor.data.holdoutParts) === undefined ? files[0] : files;
  };
  return JSON.stringify([side('train'), side('holdout'), descriptor.data.target]);
}

/** The outcome of {@link matchBase}. */
export interface BaseMatching {
  /** Each matched head model's base model, by head descriptor path. */
  matches: Map<string, BaseMatch>;
  /** Base models no head model matched (removed, or renamed and moved with other data files). */
  unmatched: ModelResult[];
}

/**
 * Pairs head models with base models, in three rounds, each base model used at most once:
 * 1. the same name;
 * 2. the same descriptor path (the model was renamed in place);
 * 3. the same data key ({@link dataKey}: train, hold-out and target), when exactly one base model
 *    left and exactly one head model left share it (the model was renamed and moved).
 *
 * @param head the head run's descriptors
 * @param base the base run's outcomes
 * @param baseData the base descriptors' data keys by base model name (models whose descriptor
 *   could not be read have none)
 */
export function matchBase(head: readonly Descriptor[], base: readonly ModelResult[], baseData: ReadonlyMap<string, string>): BaseMatching {
  const matches = new Map<string, BaseMatch>();
  const used = new Set<ModelResult>();
  const byName = new Map(base.map((m) => [m.name, m]));
  for (const d of head) {
    const m = byName.get(d.name);
    if (m !== undefined && !used.has(m)) {
      matches.set(d.file, { model: m, by: 'name' });
      used.add(m);
    }
  }
  const byPath = new Map(base.map((m) => [m.descriptor, m]));
  for (const d of head) {
    if (matches.has(d.file)) continue;
    const m = byPath.get(d.file);
    if (m !== undefined && !used.has(m)) {
      matches.set(d.file, { model: m, by: 'descriptor' });
      used.add(m);
    }
  }
  const baseByKey = new Map<string, ModelResult[]>();
  for (const m of base) {
    const key = baseData.get(m.name);
    if (used.has(m) || key === undefined) continue;
    baseByKey.set(key, [...(baseByKey.get(key) ?? []), m]);
  }
  const headByKey = new Map<string, Descriptor[]>();
  for (const d of head) if (!matches.has(d.file)) headByKey.set(dataKey(d), [...(headByKey.get(dataKey(d)) ?? []), d]);
  for (const [key, ds] of headByKey) {
    const ms = baseByKey.get(key) ?? [];
    if (ds.length !== 1 || ms.length !== 1) continue;
    matches.set(ds[0].file, { model: ms[0], by: 'data' });
    used.add(ms[0]);
  }
  return { matches, unmatched: base.filter((m) => !used.has(m)) };
}

/** Relative change (head - base) / base; +Infinity when base is 0 and head is not; null when either is missing. */
function relativeChange(head: number, base: number): number | null {
  if (Number.isNaN(head) || Number.isNaN(base)) return null;
  if (base === 0) return head === 0 ? 0 : Infinity;
  return (head - base) / Math.abs(base);
}

/**
 * The `base` field of a model result: `new`, or the base figures and the changes, with the base
 * model's name and path when it was matched under another name (`renamed`). A base descriptor
 * that could not be read has its path for a name; matched by that path it is `compared`.
 */
export function compareWithBase(metrics: ModelMetrics, match: BaseMatch | null, commit: string): BaseComparison {
  const classifier = metrics.task === 'classification';
  if (match === null) {
    return {
      status: 'new',
      commit,
      holdout_rmse: null,
      gap_ratio: null,
      holdout_rmse_change: null,
      gap_ratio_change: null,
      ...(classifier ? { holdout_log_loss: null, holdout_log_loss_change: null } : {}),
    };
  }
  const baseline = match.model;
  const unreadable = baseline.error !== null && baseline.name === baseline.descriptor;
  const renamed = match.by !== 'name' && !unreadable;
  const b = baseline.metrics;
  const headRmse = fromJsonNumber(metrics.holdout_rmse);
  const headGap = fromJsonNumber(metrics.gap_ratio);
  const baseRmse = b ? fromJsonNumber(b.holdout_rmse) : Number.NaN;
  const baseGap = b ? fromJsonNumber(b.gap_ratio) : Number.NaN;
  const rmseChange = relativeChange(headRmse, baseRmse);
  const gapChange = Number.isNaN(headGap) || Number.isNaN(baseGap) ? null : headGap - baseGap;
  return {
    status: renamed ? 'renamed' : 'compared',
    commit,
    ...(renamed
      ? { previous: { name: baseline.name, descriptor: baseline.descriptor, matched_by: match.by === 'data' ? 'data' : 'descriptor' } }
      : {}),
    holdout_rmse: b ? b.holdout_rmse : null,
    gap_ratio: b ? b.gap_ratio : null,
    holdout_rmse_change: rmseChange === null ? null : jsonNumber(rmseChange),
    gap_ratio_change: gapChange === null ? null : jsonNumber(gapChange),
    ...(classifier ? logLossComparison(metrics, b) : {}),
  };
}

/** A figure of a metrics record as a number: NaN when absent or not a number. */
function figure(metrics: ModelMetrics | null, key: string): number {
  const v = metrics?.[key];
  return typeof v === 'number' || v === 'Infinity' || v === '-Infinity' || v === 'NaN' ? fromJsonNumber(v) : Number.NaN;
}

/**
 * A classifier's hold-out log-loss on the base commit and its relative change (the figure of
 * `base-change` for classifiers). A base model that was not a classifier (or not checked) has no
 * log-loss: both null.
 */
function logLossComparison(
  metrics: ModelMetrics,
  base: ModelMetrics | null,
): { holdout_log_loss: JsonNumber | null; holdout_log_loss_change: JsonNumber | null } {
  const baseLoss = base?.task === 'classification' ? figure(base, 'holdout_log_loss') : Number.NaN;
  const change = relativeChange(figure(metrics, 'holdout_log_loss'), baseLoss);
  return {
    holdout_log_loss: Number.isNaN(baseLoss) ? null : jsonNumber(baseLoss),
    holdout_log_loss_change: change === null ? null : jsonNumber(change),
  };
}

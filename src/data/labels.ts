/**
 * The target of a binary classifier as 0/1: the two classes of the training rows, whichever way
 * the file writes them (0/1, true/false, or two text labels with `data.positive` naming the
 * positive one), checked and mapped to 1 (positive) and 0 (negative).
 */
import type { Descriptor, SettingsFile } from '../config/types.js';
import { InputError, quoteValue } from '../core/errors.js';
import { loadModelData, type ModelTables } from './load-model-data.js';
import { placeOfLine, type LinePlace } from './data-parts.js';
import type { RepoReader } from '../repo/types.js';

/** Largest number of distinct labels collected before a target is judged not binary. */
const MAX_LABELS = 20;

/**
 * A classifier's rows are always held in memory, never streamed as a sample (its fit makes passes
 * of its own over every row; run/fit-classifier.ts refuses training files too large to hold).
 */
const HELD = { streamAboveBytes: Number.POSITIVE_INFINITY } as const;

/** How the target's classes were read. */
export interface ClassLabels {
  /** The positive class as written in the file (e.g. `1`, `true`, `churned`). */
  positive: string;
  /** The negative class as written. */
  negative: string;
  /** `numeric`: the target was read as numbers; `text`: as labels. */
  kind: 'numeric' | 'text';
}

/** A classifier's tables with the target mapped to 0/1, and the labels behind it. */
export interface ClassifierTables extends ModelTables {
  labels: ClassLabels;
}

/**
 * Reads a classifier's columns: the inputs as numbers, the target as two classes mapped to 1
 * (positive) and 0 (negative). Numbers: the two values 0 and 1 (1 positive), or two other
 * numbers with `data.positive` naming one. Text: `true`/`false` (any case; true positive), or
 * two labels with `data.positive` naming one. The hold-out rows may hold only labels the
 * training rows hold.
 * @throws InputError `target-classes` when the training rows hold fewer or more than two
 *   classes (naming those found), `positive-label` when `data.positive` is needed and missing or
 *   names no class found, and the errors of {@link loadModelData}
 */
export async function loadClassifierData(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
): Promise<ClassifierTables> {
  let tables: ModelTables;
  try {
    tables = await loadModelData(repo, descriptor, inputs, settings, HELD);
  } catch (error) {
    if (error instanceof InputError && error.code === 'csv-cell' && error.location.key === descriptor.data.target) {
      return loadTextLabels(repo, descriptor, inputs, settings);
    }
    throw error;
  }
  const found = distinctNumbers(tables.train.y, tables.train.rows);
  const shown = found.map((v) => String(v));
  const labels = chooseClasses(descriptor, shown, 'numeric');
  const positive = Number(labels.positive);
  const negative = Number(labels.negative);
  for (const data of [tables.train, tables.holdout]) {
    const y = data.y;
    for (let i = 0; i < data.rows; i++) {
      const v = y[i];
      if (v === positive) y[i] = 1;
      else if (v === negative) y[i] = 0;
      else throw unknownLabel(descriptor, placeOfLine(data, data.lines[i]), String(v), labels);
    }
  }
  return { ...tables, labels };
}

/**
 * The inputs as numbers and the target as text labels: read as the numeric target would be (the
 * descriptor's separator, split column, dropped rows, category inputs and weights), the labels
 * coded by first appearance in the training rows.
 * @throws InputError `target-classes` when the training rows hold more than {@link MAX_LABELS} labels
 */
async function loadTextLabels(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
): Promise<ClassifierTables> {
  const { targetText, ...tables } = await loadModelData(repo, descriptor, inputs, settings, { ...HELD, targetAsText: true });
  const text = targetText as { train: string[]; holdout: string[] };
  const found: string[] = [];
  for (const label of text.train) {
    if (found.includes(label)) continue;
    if (found.length >= MAX_LABELS) {
      throw new InputError(
        'target-classes',
        `a binary classifier needs exactly two classes in the target \`${descriptor.data.target}\`; ${tables.train.file} holds more than ${MAX_LABELS}`,
        { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' },
      );
    }
    found.push(label);
  }
  const labels = chooseClasses(descriptor, found, 'text');
  for (const [data, cells] of [
    [tables.train, text.train],
    [tables.holdout, text.holdout],
  ] as const) {
    for (let i = 0; i < data.rows; i++) {
      const label = cells[i];
      if (label === labels.positive) data.y[i] = 1;
      else if (label === labels.negative) data.y[i] = 0;
      else throw unknownLabel(descriptor, placeOfLine(data, data.lines[i]), label, labels);
    }
  }
  return { ...tables, labels };
}

/**
 * Picks the positive and negative class among the labels found in the training rows.
 * @throws InputError `target-classes` or `positive-label`
 */
function chooseClasses(descriptor: Descriptor, found: readonly string[], kind: ClassLabels['kind']): ClassLabels {
  const where = { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' };
  const list =
    found
      .slice(0, 6)
      .map((l) => quoteValue(l, 30))
      .join(', ') + (found.length > 6 ? ', …' : '');
  if (found.length !== 2) {
    const count = found.length >= MAX_LABELS ? `at least ${MAX_LABELS}` : String(found.length);
    throw new InputError(
      'target-classes',
      `a binary classifier needs exactly two classes in the target \`${descriptor.data.target}\`; the training rows hold ${count} (${list})`,
      where,
    );
  }
  const positive = descriptor.data.positive ?? null;
  if (positive !== null) {
    const at = found.indexOf(positive);
    if (at < 0) {
      throw new InputError(
        'positive-label',
        `\`data.positive\` is ${quoteValue(positive, 30)} but the training rows' classes are ${list}; expected one of them`,
        {
          ...where,
          key: 'data.positive',
        },
      );
    }
    return { positive, negative: found[1 - at], kind };
  }
  if (kind === 'numeric' && found.includes('0') && found.includes('1')) return { positive: '1', negative: '0', kind };
  const lower = found.map((l) => l.toLowerCase());
  if (lower.includes('true') && lower.includes('false')) {
    const at = lower.indexOf('true');
    return { positive: found[at], negative: found[1 - at], kind };
  }
  throw new InputError(
    'positive-label',
    `the target \`${descriptor.data.target}\` holds the classes ${list}; set \`data.positive\` to the one that is the positive class (0/1 and true/false need no setting)`,
    where,
  );
}

function unknownLabel(descriptor: Descriptor, place: LinePlace, label: string, labels: ClassLabels): InputError {
  return new InputError(
    'target-classes',
    `the target \`${descriptor.data.target}\` is ${quoteValue(label, 30)} on line ${place.line} of ${place.file}; the training rows' classes are ${quoteValue(labels.positive, 30)} and ${quoteValue(labels.negative, 30)}`,
    { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' },
  );
}

/** Distinct values of y[0..n), in order of first appearance (at most {@link MAX_LABELS}). */
function distinctNumbers(y: Float64Array, n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n && out.length < MAX_LABELS; i++) if (!out.includes(y[i])) out.push(y[i]);
  return out;
}

/**
 * `leakage`: hold-out rows that repeat a training row.
 */
import { clip } from '../core/errors.js';
import type { Check } from './types.js';
import { linesText, partLines } from '../data/data-parts.js';
import { classifierLeakage } from './classifier/measures.js';
import { predictionsLeakage } from './predictions/measures.js';

const check: Check = {
  id: 'leakage',
  title: 'Hold-out rows in the training data',
  limitKey: 'leakage',
  defaultLimit: 0,
  direction: 'above',
  limitSummary: 'Hold-out rows that also appear in the training data (the default 0 fails when there is any).',
  description: `- Default \`0\` (fail when any row repeats; common practice: hold-out rows must
  be unseen). Points at \`data.holdout\`.
- Figure: the number of hold-out rows whose values in every input column of the model equal those of
  some training row (exact comparison of the parsed numbers, -0 equal to 0; found through a hash of
  the values' bit patterns, confirmed value by value). The message says how many of them repeat the
  target too, and names the first 5 lines of the hold-out file and the first matching training line
  of each. A training file read as a stream (docs/scale.md) is compared row by row in full: its rows
  stream past the hold-out rows' hash table in the scoring pass.
- Metrics: \`holdout_rows_in_training\` (the figure) and \`leaked_rows\`: hold-out rows equal to a
  training row in the inputs and the target. Only the model's columns are compared: a column of the
  file that no term reads does not count (a comparison on every column of the files can give a
  smaller count).
- Models whose inputs take few distinct values (counts, categories coded as numbers) repeat inputs
  by nature: set \`leakage\` to a tolerated count or \`off\` for them.
- Detail: \`columns\`, \`holdout_rows\`, \`input_matches\`, \`target_matches\`, \`holdout_lines\`,
  \`train_lines\`, \`holdout_file\`, \`train_file\`; with data read from parts, the lines are each part's own
  and \`holdout_line_files\` / \`train_line_files\` name the part of each.`,
  advice: 'Remove the repeated rows from the hold-out file (or from the training file) so that the hold-out rows are new to the fit.',
  line: (d) => d.data.lines.holdout,
  measureClassifier: classifierLeakage,
  measurePredictions: predictionsLeakage,
  measure(context) {
    const { holdout, train, design } = context;
    if (design.inputs.length === 0) {
      return { value: null, reason: 'not-applicable', message: 'the model reads no input column, so no row can repeat' };
    }
    const leak = context.analyses.leakage();
    const metrics = { leaked_rows: leak.fullMatches, holdout_rows_in_training: leak.inputMatches };
    const detail = {
      columns: [...design.inputs],
      holdout_rows: leak.holdoutRows,
      input_matches: leak.inputMatches,
      target_matches: leak.fullMatches,
      holdout_lines: partLines(holdout, leak.holdoutLines)?.lines ?? leak.holdoutLines,
      train_lines: partLines(train, leak.trainLines)?.lines ?? leak.trainLines,
      holdout_file: holdout.file,
      train_file: train.file,
      // Read from parts: the part of each listed line (the lines are each part's own).
      ...(holdout.parts !== undefined ? { holdout_line_files: partLines(holdout, leak.holdoutLines)?.files } : {}),
      ...(train.parts !== undefined ? { train_line_files: partLines(train, leak.trainLines)?.files } : {}),
    };
    if (leak.inputMatches === 0) {
      return {
        value: 0,
        message: `no hold-out row of ${leak.holdoutRows} repeats a training row in ${design.inputs.map((c) => clip(c)).join(', ')}`,
        metrics,
        detail,
      };
    }
    const lines = (data: typeof holdout, ls: number[]): string => `${linesText(data, ls)}${leak.inputMatches > ls.length ? ', …' : ''}`;
    const target =
      leak.fullMatches === leak.inputMatches
        ? 'all with the same target'
        : leak.fullMatches === 0
          ? 'none with the same target'
          : `${leak.fullMatches} with the same target`;
    return {
      value: leak.inputMatches,
      message: `${leak.inputMatches} of ${leak.holdoutRows} hold-out rows repeat a training row in ${design.inputs.map((c) => clip(c)).join(', ')} (${target}): ${lines(holdout, leak.holdoutLines)}; first matching training rows: ${lines(train, leak.trainLines)}`,
      metrics,
      detail,
    };
  },
};

export default check;

/**
 * Loads the columns one model needs from its training and hold-out files.
 */
import type { Descriptor, SettingsFile } from '../config/types.js';
import { InputError, clip, quoteValue } from '../core/errors.js';
import type { ModelData } from './model-data.js';
import { readTable } from './table.js';
import type { RepoReader } from '../repo/types.js';

/** Training and hold-out columns of one model. */
export interface ModelTables {
  train: ModelData;
  holdout: ModelData;
  /** Training input columns by name (for fixing term parameters). */
  trainColumns: Map<string, Float64Array>;
}

/**
 * Reads the input columns (in `inputs` order) and the target of both files.
 * @throws InputError `target-as-input` when a term reads the target column,
 *   `no-rows` when either file has no data rows
 */
export async function loadModelData(
  repo: RepoReader,
  descriptor: Descriptor,
  inputs: readonly string[],
  settings: SettingsFile,
): Promise<ModelTables> {
  const { data } = descriptor;
  if (inputs.includes(data.target)) {
    throw new InputError(
      'target-as-input',
      `the target column \`${clip(data.target)}\` is also used as an input by a term; a model may not read its own target`,
      { file: descriptor.file, line: data.lines.target, key: 'data.target' },
    );
  }
  const columns = [...inputs, data.target];
  const maxBytes = settings.caps.maxFileBytes;
  const format = data.format;
  const split = data.split ?? null;
  const load = async (path: string, line: number, key: string): Promise<ModelData & { byName: Map<string, Float64Array> }> => {
    let table;
    // With a split column both sides read the one file, each keeping its own label's rows.
    const side =
      split === null
        ? undefined
        : key === 'data.train'
          ? { column: split.column, keep: split.train, other: split.holdout }
          : { column: split.column, keep: split.holdout, other: split.train };
    try {
      table = await readTable(repo, path, { columns, maxBytes, ...(format ? { format } : {}), ...(side ? { split: side } : {}) });
    } catch (error) {
      throw withAsker(error, descriptor);
    }
    if (table.rows === 0) {
      const why = side ? ` labelled ${quoteValue(side.keep)} in column ${quoteValue(side.column)}` : table.dropped > 0 ? ` left after dropping ${table.dropped} with missing cells` : '';
      throw new InputError('no-rows', `\`${clip(path)}\` has no data rows${why}; expected at least one row`, {
        file: descriptor.file,
        line,
        key,
      });
    }
    return {
      inputs: inputs.map((c) => table.columns.get(c) as Float64Array),
      y: table.columns.get(data.target) as Float64Array,
      lines: table.lines,
      rows: table.rows,
      file: path,
      ...(format?.missing === 'drop' ? { dropped: table.dropped } : {}),
      byName: table.columns,
    };
  };
  const train = await load(data.train, data.lines.train, 'data.train');
  const holdout = await load(data.holdout, data.lines.holdout, 'data.holdout');
  const { byName, ...trainData } = train;
  const { byName: _unused, ...holdoutData } = holdout;
  return { train: trainData, holdout: holdoutData, trainColumns: byName };
}

/**
 * A missing column names the descriptor line that asked for it: `data.target`, or the first term
 * that reads the column. Other errors pass unchanged.
 */
function withAsker(error: unknown, descriptor: Descriptor): unknown {
  if (!(error instanceof InputError) || error.code !== 'csv-missing-column' || error.location.key === undefined) return error;
  const column = error.location.key;
  const term = descriptor.terms.find((t) => (t.kind === 'linear' ? t.columns.includes(column) : t.of === column));
  const asker = column === descriptor.data.target ? `\`data.target\` on line ${descriptor.data.lines.target}` : term ? `the ${term.kind} term on line ${term.line}` : null;
  if (asker === null) return error;
  return new InputError(error.code, `${error.message} (asked for by ${asker} of ${clip(descriptor.file)})`, error.location);
}


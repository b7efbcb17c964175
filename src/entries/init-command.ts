/**
 * `fitgate init TRAIN.csv`: writes a first descriptor for a training CSV (and the settings file
 * when the repository has none), and, when no hold-out file is given, splits a reproducible
 * hold-out off the training file into two new CSV files beside it. Every file is checked before
 * any is written: nothing is overwritten without `--force` (the settings file never is).
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { descriptorText, firstModelParameters, ratioLimitFor, settingsText } from '../config/init-files.js';
import { DEFAULT_MODEL_PATTERNS, DEFAULT_SETTINGS_PATH } from '../config/settings-file.js';
import { InputError, quoteValue } from '../core/errors.js';
import { REPOSITORY_URL } from '../core/links.js';
import { nearestWord } from '../core/nearest.js';
import { VERSION } from '../core/version.js';
import { readHeader, readTable, type Table } from '../data/table.js';
import { DECIMAL_COMMA_HINT, DEFAULT_MAX_BYTES, MISSING_HINT } from '../data/csv-rules.js';
import { isGzipPath, openDataFile } from '../data/gzip-stream.js';
import type { CsvFormat } from '../data/csv-format.js';
import { splitRows } from '../diagnostics/holdout-split.js';
import { createFsRepository } from '../repo/fs-repository.js';
import { existsInRepo, FILE_EXISTS, writeInRepo } from './repo-write.js';
import type { RepoReader } from '../repo/types.js';
import type { InitCommand } from './args.js';
import type { CommandOutcome } from './command-outcome.js';

/** Folder the first descriptor goes into, repository-relative. */
const MODELS_FOLDER = 'models';

/** Most columns init tries to read as numbers (a wider file keeps the first ones that are). */
const MAX_COLUMNS = 200;

/**
 * Where the JSON Schema is for a file in `folder`: the installed package's copy when the
 * repository has one (`node_modules/fitgate/dist/schema/`), else the copy published with this
 * version in fitgate's repository.
 */
function schemaLocation(root: string, folder: string, file: 'descriptor' | 'settings'): string {
  const installed = `node_modules/fitgate/dist/schema/${file}.schema.json`;
  if (existsSync(path.join(root, installed))) return path.posix.relative(folder === '' ? '.' : folder, installed);
  return `${REPOSITORY_URL.replace('https://github.com/', 'https://raw.githubusercontent.com/')}/v${VERSION}/dist/schema/${file}.schema.json`;
}

/** Reads the columns that hold numbers only (the target must be one of them), under `format`. */
async function numericTable(
  repo: RepoReader,
  file: string,
  header: string[],
  target: string,
  format: Partial<CsvFormat>,
): Promise<{ table: Table; dropped: string[] }> {
  let columns = [target, ...header.filter((c) => c !== target)].slice(0, MAX_COLUMNS);
  const dropped: string[] = header.length > MAX_COLUMNS ? header.filter((c) => !columns.includes(c)) : [];
  for (let attempt = 0; attempt <= MAX_COLUMNS; attempt++) {
    try {
      return { table: await readTable(repo, file, { columns, format }), dropped };
    } catch (error) {
      const bad = error instanceof InputError && error.code === 'csv-cell' ? error.location.key : undefined;
      if (bad === undefined || bad === target || !columns.includes(bad)) throw error;
      columns = columns.filter((c) => c !== bad);
      dropped.push(bad);
    }
  }
  throw new InputError('csv-cell', 'too many columns that are not numbers', { file });
}

/**
 * The numeric columns under the decimal mark asked for; under `auto`, a decimal comma when more
 * columns read as numbers with it than with a point (a file separated by commas cannot have one).
 * An error of the init's own reading names the init option that settles it, not the descriptor key.
 */
async function readNumbers(
  repo: RepoReader,
  command: InitCommand,
  header: string[],
  target: string,
): Promise<{ table: Table; dropped: string[]; decimal: '.' | ',' }> {
  const attempt = async (decimal: '.' | ','): Promise<{ table: Table; dropped: string[]; decimal: '.' | ',' }> => ({
    ...(await numericTable(repo, command.train, header, target, { decimal, missing: command.missing })),
    decimal,
  });
  try {
    if (command.decimal !== 'auto') return await attempt(command.decimal);
    let point: Awaited<ReturnType<typeof attempt>> | null = null;
    let pointError: unknown = null;
    try {
      point = await attempt('.');
      if (point.dropped.length === 0) return point;
    } catch (error) {
      pointError = error;
    }
    let comma: Awaited<ReturnType<typeof attempt>> | null = null;
    try {
      comma = await attempt(',');
    } catch {
      // Not a decimal-comma file either: the point's outcome stands.
    }
    if (comma !== null && (point === null || comma.dropped.length < point.dropped.length)) return comma;
    if (point !== null) return point;
    throw pointError;
  } catch (error) {
    if (!(error instanceof InputError) || error.code !== 'csv-cell') throw error;
    const message = error.message
      .replace(MISSING_HINT, '. Hint: to drop the rows with a missing cell in a used column, give `--missing drop`')
      .replace(DECIMAL_COMMA_HINT, '. Hint: if the file writes numbers with a decimal comma (1,5 for 1.5), give `--decimal ,`');
    throw new InputError(error.code, message, error.location);
  }
}

/**
 * The text of a data file as the CSV readers read it (data/gzip-stream.ts `openDataFile`:
 * decompressed when its name ends in `.gz`, within the plain-file size cap).
 */
async function fileText(repo: RepoReader, file: string): Promise<string> {
  const pieces: Uint8Array[] = [];
  for await (const piece of openDataFile(repo, file, DEFAULT_MAX_BYTES)) pieces.push(piece);
  return new TextDecoder('utf-8').decode(Buffer.concat(pieces)).replace(/^\uFEFF/, '');
}

/**
 * The text of the data rows `indexes` of a CSV, from the rows' physical lines: the header (the
 * first line that is not blank), then each row's lines up to the next row's (lines between rows
 * that were not read as rows, such as rows dropped for a missing cell, go with the row before
 * them; those before the first row, with the first row). Blank lines are left out.
 */
function rowsText(lines: string[], rowLines: Int32Array, indexes: Int32Array): string {
  const header = lines.findIndex((line) => line.trim() !== '');
  const out = [lines[header]];
  for (const i of indexes) {
    const own = rowLines[i] - 1;
    const first = i === 0 ? header + 1 : own;
    const end = i + 1 < rowLines.length ? rowLines[i + 1] - 1 : lines.length;
    for (let j = first; j < end; j++) if (lines[j].trim() !== '' || j === own) out.push(lines[j]);
  }
  return `${out.join('\n')}\n`;
}

/** A model name from a file name: letters, digits, `-`, `_`, `.` only. */
function nameFrom(file: string): string {
  const stem = path.posix
    .basename(file)
    .replace(/(\.csv)?(\.gz)?$/i, '')
    .replace(/[-_.]?train(ing)?$/i, '');
  const name = stem
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 100);
  return name === '' ? 'model' : name;
}

/** Runs `fitgate init`; see the module comment. */
export async function runInit(command: InitCommand): Promise<CommandOutcome> {
  const repo = createFsRepository(command.root);
  const header = await readHeader(repo, command.train);
  const target = command.target ?? header[header.length - 1];
  if (!header.includes(target)) {
    const near = nearestWord(target, header);
    throw new InputError(
      'csv-missing-column',
      `no column ${quoteValue(target, 60)}${near !== null ? ` (did you mean ${quoteValue(near, 60)}?)` : ''}; expected one of: ${header.slice(0, 20).join(', ')}`,
      { file: command.train, key: '--target' },
    );
  }
  const { table, dropped, decimal } = await readNumbers(repo, command, header, target);
  const inputs = header.filter((c) => c !== target && table.columns.has(c));
  if (inputs.length === 0)
    throw new InputError(
      'csv-missing-column',
      `no numeric column besides the target ${quoteValue(target, 60)}; expected at least one input column`,
      { file: command.train },
    );
  if (command.name !== null && !/^[A-Za-z0-9._-]{1,100}$/.test(command.name)) {
    throw new InputError('option-value', `expected 1 to 100 letters, digits, \`-\`, \`_\` or \`.\`, got ${quoteValue(command.name, 60)}`, {
      key: '--name',
    });
  }
  const name = command.name ?? nameFrom(command.train);
  const descriptorPath = `${MODELS_FOLDER}/${name}.model.yml`;
  const writes: Array<{ file: string; text: string | Uint8Array; overwrite: boolean }> = [];
  const notes: string[] = [];
  const said: string[] = [];

  let trainFile = command.train;
  let holdoutFile = command.holdout;
  let trainRows = table.rows;
  if (holdoutFile === null) {
    if (table.rows < 3)
      throw new InputError('csv-empty', `has ${table.rows} data rows; expected at least 3 to split a hold-out off (or give --holdout)`, {
        file: command.train,
      });
    const split = splitRows(table.rows, command.holdoutShare, command.split, command.seed);
    const lines = (await fileText(repo, command.train)).split(/\r?\n/);
    while (lines.length > 0 && lines[lines.length - 1].trim() === '') lines.pop();
    // A gzip file splits into gzip files: data/x.csv.gz -> data/x-train.csv.gz and data/x-holdout.csv.gz.
    const gzip = isGzipPath(command.train);
    const stem = command.train.replace(gzip ? /(\.csv)?\.gz$/i : /\.csv$/i, '');
    const ending = gzip ? '.csv.gz' : '.csv';
    const packed = (text: string): string | Uint8Array => (gzip ? gzipSync(text) : text);
    trainFile = `${stem}-train${ending}`;
    holdoutFile = `${stem}-holdout${ending}`;
    trainRows = split.train.length;
    writes.push({ file: trainFile, text: packed(rowsText(lines, table.lines, split.train)), overwrite: command.force });
    writes.push({ file: holdoutFile, text: packed(rowsText(lines, table.lines, split.holdout)), overwrite: command.force });
    const how =
      command.split === 'last'
        ? `the last ${split.holdout.length} of ${table.rows} rows (a block at the end, for data in time order)`
        : `${split.holdout.length} of ${table.rows} rows drawn at random with seed ${command.seed} (reproducible: \`--seed ${command.seed}\` gives the same split)`;
    notes.push(`Hold-out: ${how}, split off ${command.train} by fitgate init.`);
    said.push(
      `split ${command.train}: ${trainRows} training rows -> ${trainFile}, ${split.holdout.length} hold-out rows -> ${holdoutFile}; hold-out = ${how}`,
    );
  } else if (!(await repo.isFile(holdoutFile))) {
    throw new InputError('file-missing', `hold-out file not found in ${repo.label}`, { file: holdoutFile, key: '--holdout' });
  }
  if (decimal === ',') said.push('read the numbers with a decimal comma (data.decimal: "," in the descriptor)');
  if (table.dropped > 0) {
    notes.push(
      `Rows with a missing cell in a used column: ${table.dropped} in ${command.train}; data.missing: drop leaves them out of every check.`,
    );
    said.push(
      `${table.dropped} rows of ${command.train} have a missing cell in a used column: data.missing: drop leaves them out of every check`,
    );
  }
  if (dropped.length > 0) {
    notes.push(`Left out (not numeric): ${dropped.slice(0, 10).join(', ')}${dropped.length > 10 ? ', ...' : ''}.`);
    said.push(`left out columns that are not numbers: ${dropped.slice(0, 10).join(', ')}${dropped.length > 10 ? ', ...' : ''}`);
  }
  const ratio = ratioLimitFor(firstModelParameters(inputs.length, command.degree), trainRows);
  const folder = path.posix.dirname(descriptorPath);
  writes.push({
    file: descriptorPath,
    overwrite: command.force,
    text: descriptorText(
      {
        name,
        task: command.task,
        train: path.posix.relative(folder, trainFile),
        holdout: path.posix.relative(folder, holdoutFile),
        target,
        inputs,
        degree: command.degree,
        rows: trainRows,
        schema: schemaLocation(command.root, folder, 'descriptor'),
        notes,
        decimal,
        missing: command.missing,
      },
      ratio,
    ),
  });
  if (!existsInRepo(command.root, DEFAULT_SETTINGS_PATH)) {
    writes.push({
      file: DEFAULT_SETTINGS_PATH,
      overwrite: false,
      text: settingsText(schemaLocation(command.root, '', 'settings'), `${MODELS_FOLDER}/**/*.model.yml`),
    });
  } else
    said.push(
      `kept the settings file ${DEFAULT_SETTINGS_PATH} as it is (its \`models\` patterns must match ${descriptorPath}; the default is ${DEFAULT_MODEL_PATTERNS.join(', ')})`,
    );

  // Every file is checked before any is written, so that a refusal leaves the tree as it was.
  const blocked = writes.filter((w) => !w.overwrite && existsInRepo(command.root, w.file));
  if (blocked.length > 0) {
    throw new InputError(
      FILE_EXISTS,
      `exists; nothing was written. Run again with --force to overwrite ${
        blocked.length === 1
          ? 'it'
          : `it and ${blocked
              .slice(1)
              .map((b) => b.file)
              .join(', ')}`
      }`,
      { file: blocked[0].file },
    );
  }
  for (const w of writes) writeInRepo(command.root, w.file, w.text, w.overwrite);
  const lines = [
    ...writes.map((w) => `wrote ${w.file}`),
    ...said,
    `params_per_sample: ${ratio.value} (${ratio.comment})`,
    `next: fitgate check ${descriptorPath}`,
  ];
  return { stdout: `${lines.join('\n')}\n`, stderr: '', status: 0 };
}

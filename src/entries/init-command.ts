/**
 * `fitgate init TRAIN.csv`: writes a first descriptor for a training CSV (and the settings file
 * when the repository has none), and, when no hold-out file is given, splits a reproducible
 * hold-out off the training file into two new CSV files beside it. Every file is checked before
 * any is written: nothing is overwritten without `--force` (the settings file never is).
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import { descriptorText, firstModelParameters, ratioLimitFor, settingsText } from '../config/init-files.js';
import { DEFAULT_MODEL_PATTERNS, DEFAULT_SETTINGS_PATH } from '../config/settings-file.js';
import { InputError, quoteValue } from '../core/errors.js';
import { REPOSITORY_URL } from '../core/links.js';
import { nearestWord } from '../core/nearest.js';
import { VERSION } from '../core/version.js';
import { readHeader, readTable, type Table } from '../data/table.js';
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

/** Reads the columns that hold numbers only (the target must be one of them). */
async function numericTable(
  repo: RepoReader,
  file: string,
  header: string[],
  target: string,
): Promise<{ table: Table; dropped: string[] }> {
  let columns = [target, ...header.filter((c) => c !== target)].slice(0, MAX_COLUMNS);
  const dropped: string[] = header.length > MAX_COLUMNS ? header.filter((c) => !columns.includes(c)) : [];
  for (let attempt = 0; attempt <= MAX_COLUMNS; attempt++) {
    try {
      return { table: await readTable(repo, file, { columns }), dropped };
    } catch (error) {
      const bad = error instanceof InputError && error.code === 'csv-cell' ? error.location.key : undefined;
      if (bad === undefined || bad === target || !columns.includes(bad)) throw error;
      columns = columns.filter((c) => c !== bad);
      dropped.push(bad);
    }
  }
  throw new InputError('csv-cell', 'too many columns that are not numbers', { file });
}

/** The text of the data rows `indexes` of a CSV (with its header lines), from the rows' physical lines. */
function rowsText(lines: string[], rowLines: Int32Array, indexes: Int32Array): string {
  const out = lines.slice(0, rowLines[0] - 1);
  for (const i of indexes) {
    const first = rowLines[i] - 1;
    const end = i + 1 < rowLines.length ? rowLines[i + 1] - 1 : lines.length;
    for (let j = first; j < end; j++) if (lines[j].trim() !== '' || j === first) out.push(lines[j]);
  }
  return `${out.join('\n')}\n`;
}

/** A model name from a file name: letters, digits, `-`, `_`, `.` only. */
function nameFrom(file: string): string {
  const stem = path.posix
    .basename(file)
    .replace(/\.csv$/i, '')
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
  const { table, dropped } = await numericTable(repo, command.train, header, target);
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
  const writes: Array<{ file: string; text: string; overwrite: boolean }> = [];
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
    const lines = new TextDecoder('utf-8')
      .decode(await repo.read(command.train))
      .replace(/^\uFEFF/, '')
      .split(/\r?\n/);
    while (lines.length > 0 && lines[lines.length - 1].trim() === '') lines.pop();
    const stem = command.train.replace(/\.csv$/i, '');
    trainFile = `${stem}-train.csv`;
    holdoutFile = `${stem}-holdout.csv`;
    trainRows = split.train.length;
    writes.push({ file: trainFile, text: rowsText(lines, table.lines, split.train), overwrite: command.force });
    writes.push({ file: holdoutFile, text: rowsText(lines, table.lines, split.holdout), overwrite: command.force });
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

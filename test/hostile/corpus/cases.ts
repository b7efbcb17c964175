/**
 * The corpus of broken and hostile repositories. Each case is a generator of a small
 * repository (the base one of repo.ts with one thing broken), the exit status the CLI must
 * give, and the words its message must contain. The runner (corpus.test.ts) writes each case
 * into a temporary folder next to an `outside/` folder holding files with a secret marker,
 * and runs it through the CLI and the action's entry point.
 *
 * `$OUTSIDE` in file texts, link targets, arguments and inputs is the absolute path of that
 * outside folder; `../../outside/...` from `models/` and `../outside/...` from the root reach it
 * by climbing.
 */
import type { FileSpec } from '../harness.js';
import { descriptor, HOLDOUT, repo, rows, SETTINGS, TRAIN } from './repo.js';

/** One hostile repository and what fitgate must make of it. */
export interface CorpusCase {
  /** Short kebab-case name. */
  id: string;
  /** What is broken, in words. */
  about: string;
  /** The repository's files. */
  files: Record<string, FileSpec>;
  /** Extra CLI arguments after `check --root <repo>`. Default none. */
  args?: string[];
  /** Action inputs (`config`, ...), or `null` when the case has no action form (reason in `cliOnly`). Default none. */
  inputs?: Record<string, string> | null;
  /** Why the case only runs through the CLI (the action has no input for it). */
  cliOnly?: string;
  /** Exit status of the CLI: 0 within limits, 1 over a limit, 2 could not be checked. */
  exit: 0 | 1 | 2;
  /** Words the message must contain (CLI: standard output and error; action: standard output). */
  words: string[];
  /** Expected verdicts of named models in the JSON report, when the run gets that far. */
  verdicts?: Record<string, string>;
  /** `merge`: the CLI runs `fitgate merge <args>` (report paths relative to the case's base folder, e.g. `repo/a.json`). Default `check`. */
  command?: 'merge';
  /**
   * The files of a base commit: the case is then a pull request against it (the CLI gets
   * `--base HEAD`, the action a pull_request event). Default none.
   */
  base?: Record<string, FileSpec>;
}

const m = 'models/m.model.yml';
const train = 'data/train.csv';
const holdout = 'data/holdout.csv';
const settings = 'fitgate.yml';

/** A descriptor with one `extra` block. */
const withExtra = (extra: string): Record<string, FileSpec> => repo({ [m]: descriptor({ extra }) });
/** A descriptor with other terms. */
const withTerms = (terms: string): Record<string, FileSpec> => repo({ [m]: descriptor({ terms }) });
/** Training file replaced. */
const withTrain = (text: FileSpec): Record<string, FileSpec> => repo({ [train]: text });

/** A YAML alias bomb ("billion laughs"): nine levels of nine aliases each. */
function aliasBomb(): string {
  const lines = ['version: 1', 'name: m', 'a0: &a0 [lol, lol, lol, lol, lol, lol, lol, lol, lol]'];
  for (let i = 1; i <= 9; i++) lines.push(`a${i}: &a${i} [${Array.from({ length: 9 }, () => `*a${i - 1}`).join(', ')}]`);
  return `${lines.join('\n')}\n`;
}

/** Bytes that are not UTF-8 text (seeded, fixed). */
function binaryBytes(n: number): Uint8Array {
  const out = new Uint8Array(n);
  let s = 12345;
  for (let i = 0; i < n; i++) {
    s = (s * 1103515245 + 12345) >>> 0;
    out[i] = s >>> 24;
  }
  out[0] = 0x89; // as a PNG starts
  out[1] = 0x00;
  return out;
}

const latin1Header = (): Uint8Array => Uint8Array.from([...Buffer.from('x,y'), 0xb0, ...Buffer.from('C\n1,2\n2,4\n3,7\n')]);

/** A settings file with one `models` pattern (on line 3). */
const pattern = (p: string): string => `version: 1\nmodels:\n  - ${JSON.stringify(p)}\n`;

/** The three lines of a Git LFS pointer file, as the git-lfs specification (spec/v1) lays them out; the oid is made up. */
const LFS_POINTER = `version https://git-lfs.github.com/spec/v1\noid sha256:${'4d7a'.repeat(16)}\nsize 48213\n`;

/** One model of a shard report, as `fitgate check --format json` writes it: its one check gives its verdict. */
function reportModel(name: string, verdict: 'pass' | 'fail'): Record<string, unknown> {
  return {
    name,
    descriptor: `models/${name.replace(/[^a-z]/gi, '')}.model.yml`,
    verdict,
    rows: { train: 30, holdout: 10 },
    parameters: 2,
    columns: ['(intercept)', 'x'],
    metrics: {
      train_rmse: 0.1,
      holdout_rmse: verdict === 'fail' ? 0.5 : 0.12,
      gap_ratio: verdict === 'fail' ? 5 : 1.2,
      params_per_sample: 0.07,
      max_std_coefficient: 1,
      max_std_coefficient_column: 'x',
      max_abs_coefficient: 2,
      rank: 2,
      condition_number: 3,
    },
    coefficients: [1, 2],
    shipped: null,
    checks: [
      {
        id: 'generalisation-gap',
        code: `generalisation-gap/${verdict}`,
        status: verdict,
        value: verdict === 'fail' ? 5 : 1.2,
        limitKey: 'gap_ratio',
        limit: 1.5,
        warn: null,
        line: 3,
        message: 'hold-out RMSE against training RMSE',
        advice: '',
      },
    ],
    error: null,
  };
}

/** A shard report's JSON text; `spoil` edits the object first. */
function shardReport(
  models: Record<string, unknown>[],
  shard: { index: number; count: number } | null,
  // biome-ignore lint/suspicious/noExplicitAny: a spoiler writes any key into the report
  spoil: (r: Record<string, any>) => void = () => undefined,
): string {
  const verdicts = models.map((m) => m.verdict as string);
  // biome-ignore lint/suspicious/noExplicitAny: the report is spoiled key by key below
  const report: Record<string, any> = {
    tool: { name: 'fitgate', version: '0.1.0' },
    verdict: verdicts.includes('fail') ? 'fail' : 'pass',
    counts: {
      models: models.length,
      pass: verdicts.filter((v) => v === 'pass').length,
      warn: 0,
      fail: verdicts.filter((v) => v === 'fail').length,
      error: 0,
    },
    models,
    notes: shard ? [`shard ${shard.index}/${shard.count}`] : [],
    ...(shard ? { shard } : {}),
  };
  spoil(report);
  return JSON.stringify(report, null, 2);
}

/** Merge cases: the CLI only (the action has no merge). */
const merge = { command: 'merge' as const, inputs: null, cliOnly: 'the action has no merge command' };

/** Every case. */
export const CASES: CorpusCase[] = [
  // YAML syntax and structure
  {
    id: 'yaml-syntax-descriptor',
    about: 'a descriptor with an unclosed flow sequence',
    files: repo({ [m]: 'version: 1\nname: [oops\ndata: 1\n' }),
    exit: 2,
    words: ['models/m.model.yml:', 'not valid YAML'],
  },
  {
    id: 'yaml-syntax-settings',
    about: 'settings with a bad indentation',
    files: repo({ [settings]: 'version: 1\nmodels:\n  - "models/*.model.yml"\n bad: [\n' }),
    exit: 2,
    words: ['fitgate.yml:', 'not valid YAML'],
  },
  {
    id: 'yaml-duplicate-key',
    about: 'a key given twice',
    files: repo({ [m]: `${descriptor()}name: other\n` }),
    exit: 2,
    words: ['models/m.model.yml:', '`name` appears twice'],
  },
  {
    id: 'yaml-collection-key',
    about: 'a mapping used as a key (YAML allows it; no key of ours is one)',
    files: repo({ [m]: `${descriptor()}{ from: 0, to: 10 }: 3\n` }),
    exit: 2,
    words: ['models/m.model.yml:', 'a mapping used as a key'],
  },
  {
    id: 'yaml-not-a-mapping',
    about: 'a descriptor that is a list',
    files: repo({ [m]: '- 1\n- 2\n' }),
    exit: 2,
    words: ['models/m.model.yml', 'expected'],
  },
  {
    id: 'yaml-empty-descriptor',
    about: 'an empty descriptor file',
    files: repo({ [m]: '' }),
    exit: 2,
    words: ['models/m.model.yml', 'expected'],
  },
  {
    id: 'yaml-alias-bomb',
    about: 'nine levels of nine aliases (387 million leaves)',
    files: repo({ [m]: aliasBomb() }),
    exit: 2,
    words: ['models/m.model.yml', 'aliases'],
  },
  {
    id: 'yaml-deep-flow',
    about: '100,000 nested flow lists',
    files: repo({ [m]: { make: () => `version: 1\nname: ${'['.repeat(100_000)}\n` } }),
    exit: 2,
    words: ['models/m.model.yml', 'nested'],
  },
  {
    id: 'yaml-deep-block',
    about: '200 levels of nested block mappings',
    files: repo({ [m]: { make: () => `version: 1\n${Array.from({ length: 200 }, (_, i) => `${' '.repeat(i)}k${i}:`).join('\n')} 1\n` } }),
    exit: 2,
    words: ['models/m.model.yml', 'nested'],
  },
  {
    id: 'yaml-too-large',
    about: 'a 2 MiB descriptor',
    files: repo({ [m]: { make: () => `${descriptor()}# ${'x'.repeat(2 * 1024 * 1024)}\n` } }),
    exit: 2,
    words: ['models/m.model.yml', 'at most 1048576 bytes'],
  },
  {
    id: 'yaml-binary-descriptor',
    about: 'a descriptor of binary bytes',
    files: repo({ [m]: binaryBytes(2000) }),
    exit: 2,
    words: ['models/m.model.yml', 'UTF-8'],
  },
  {
    id: 'yaml-nul-in-settings',
    about: 'settings with a NUL byte',
    files: repo({ [settings]: `${SETTINGS}\u0000\n` }),
    exit: 2,
    words: ['fitgate.yml', 'NUL'],
  },

  // Schema violations
  {
    id: 'schema-unknown-key-descriptor',
    about: 'a misspelt key',
    files: repo({ [m]: descriptor().replace('terms:', 'termz: 1\nterms:') }),
    exit: 2,
    words: ['models/m.model.yml:', 'termz'],
  },
  {
    id: 'schema-unknown-key-settings',
    about: 'a misspelt settings key',
    files: repo({ [settings]: `${SETTINGS}limitz: {}\n` }),
    exit: 2,
    words: ['fitgate.yml:', 'limitz'],
  },
  {
    id: 'schema-wrong-type',
    about: 'degree written as a word',
    files: withTerms('  - polynomial: { of: x, degree: three }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'degree', '"three"'],
  },
  {
    id: 'schema-degree-zero',
    about: 'degree 0',
    files: withTerms('  - polynomial: { of: x, degree: 0 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'degree', '0'],
  },
  {
    id: 'schema-degree-negative',
    about: 'degree -2',
    files: withTerms('  - polynomial: { of: x, degree: -2 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'degree', '-2'],
  },
  {
    id: 'schema-degree-absurd',
    about: 'degree 100000',
    files: withTerms('  - polynomial: { of: x, degree: 100000 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'degree', '100000'],
  },
  {
    id: 'schema-degree-fraction',
    about: 'degree 2.5',
    files: withTerms('  - polynomial: { of: x, degree: 2.5 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'degree', '2.5'],
  },
  {
    id: 'schema-width-zero',
    about: 'rbf width 0',
    files: withTerms('  - rbf: { of: x, centers: [1, 2], width: 0 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'width'],
  },
  {
    id: 'schema-width-negative',
    about: 'rbf width -1',
    files: withTerms('  - rbf: { of: x, centers: [1, 2], width: -1 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'width', '-1'],
  },
  {
    id: 'schema-terms-empty',
    about: 'an empty term list',
    files: repo({ [m]: descriptor().replace(/terms:\n.*\n/, 'terms: []\n') }),
    exit: 2,
    words: ['models/m.model.yml:', 'terms'],
  },
  {
    id: 'schema-ridge-negative',
    about: 'ridge -0.1',
    files: withExtra('fit:\n  ridge: -0.1\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'ridge', '-0.1'],
  },
  {
    id: 'schema-limit-warn-above-fail',
    about: 'a limit whose warning is above its failure',
    files: withExtra('limits:\n  gap_ratio: { warn: 3, fail: 2 }\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'warn 3 is above fail 2'],
  },
  {
    id: 'schema-limit-warn-above-fail-settings',
    about: 'the same in the settings file',
    files: repo({ [settings]: `${SETTINGS}limits:\n  swing: { warn: 0.9, fail: 0.5 }\n` }),
    exit: 2,
    words: ['fitgate.yml:', 'warn 0.9 is above fail 0.5'],
  },
  {
    id: 'schema-limit-negative',
    about: 'a negative limit',
    files: withExtra('limits:\n  gap_ratio: -1\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'gap_ratio'],
  },
  {
    id: 'schema-version',
    about: 'version 2',
    files: repo({ [m]: descriptor().replace('version: 1', 'version: 2') }),
    exit: 2,
    words: ['models/m.model.yml:', 'version'],
  },
  { id: 'schema-folds-one', about: 'one fold', files: withExtra('fit:\n  folds: 1\n'), exit: 2, words: ['models/m.model.yml:', 'folds'] },
  {
    id: 'schema-caps-zero',
    about: 'a file cap of 0 MiB',
    files: repo({ [settings]: `${SETTINGS}caps:\n  max_file_mb: 0\n` }),
    exit: 2,
    words: ['fitgate.yml:', 'max_file_mb'],
  },
  {
    id: 'schema-name-markup',
    about: 'a model name that is HTML',
    files: repo({ [m]: descriptor({ name: '"<img src=x onerror=alert(1)>"' }) }),
    exit: 2,
    words: ['models/m.model.yml:', '`name`', 'expected only letters'],
  },

  // Which descriptors: duplicates, globs, missing files
  {
    id: 'duplicate-names',
    about: 'two descriptors with the same name',
    files: repo({ 'models/n.model.yml': descriptor() }),
    exit: 2,
    words: ['models/n.model.yml', 'also used by models/m.model.yml'],
  },
  {
    id: 'glob-matches-nothing',
    about: 'a pattern that matches no file',
    files: repo({ [settings]: 'version: 1\nmodels: ["nowhere/*.model.yml"]\n' }),
    exit: 2,
    words: ['fitgate.yml:', 'nowhere/*.model.yml', 'matches no file'],
  },
  {
    id: 'no-descriptors-at-all',
    about: 'no settings and no descriptors',
    files: { 'README.md': 'nothing here\n' },
    exit: 2,
    words: ['**/*.model.yml', 'matches no file'],
  },
  {
    id: 'data-file-missing',
    about: 'a training path that names no file',
    files: repo({ [train]: null }),
    exit: 2,
    words: ['models/m.model.yml:', 'data/train.csv', 'not a file'],
  },
  {
    id: 'data-path-is-folder',
    about: 'a training path that names a folder',
    files: repo({ [m]: descriptor({ train: '../data' }) }),
    exit: 2,
    words: ['models/m.model.yml:', 'not a file'],
  },
  {
    id: 'config-missing',
    about: '--config naming no file',
    files: repo(),
    args: ['--config', 'other.yml'],
    inputs: { config: 'other.yml' },
    exit: 2,
    words: ['other.yml', 'settings file not found'],
  },
  {
    id: 'descriptor-argument-missing',
    about: 'a descriptor argument naming no file',
    files: repo(),
    args: ['repo/models/none.model.yml'],
    inputs: null,
    cliOnly: 'the action checks what the settings match',
    exit: 2,
    words: ['descriptor not found'],
  },

  // Paths that leave the repository
  {
    id: 'outside-data-dotdot',
    about: 'data.train climbing out with ..',
    files: repo({ [m]: descriptor({ train: '../../outside/secret.csv' }) }),
    exit: 2,
    words: ['models/m.model.yml:', 'leaves the repository'],
  },
  {
    id: 'outside-data-absolute',
    about: 'data.train as an absolute path',
    files: repo({ [m]: descriptor({ train: '$OUTSIDE/secret.csv' }) }),
    exit: 2,
    words: ['models/m.model.yml:', 'is absolute'],
  },
  {
    id: 'outside-data-link-absolute',
    about: 'the training file is a link to an absolute path outside',
    files: repo({ [train]: { link: '$OUTSIDE/secret.csv' } }),
    exit: 2,
    words: ['models/m.model.yml:', 'outside the repository'],
  },
  {
    id: 'outside-data-link-relative',
    about: 'the training file is a relative link climbing out',
    files: repo({ [train]: { link: '../../outside/secret.csv' } }),
    exit: 2,
    words: ['models/m.model.yml:', 'outside the repository'],
  },
  {
    id: 'outside-folder-link',
    about: 'a folder inside that is a link to a folder outside',
    files: repo({ lib: { link: '$OUTSIDE' }, [m]: descriptor({ train: '../lib/secret.csv' }) }),
    exit: 2,
    words: ['models/m.model.yml:', 'outside the repository'],
  },
  {
    id: 'outside-descriptor-link',
    about: 'the descriptor is a link to a descriptor outside (matched like a file, refused when read)',
    files: repo({ [m]: { link: '$OUTSIDE/secret.model.yml' } }),
    exit: 2,
    words: ['models/m.model.yml', 'outside the repository'],
  },
  {
    id: 'outside-settings-link',
    about: 'fitgate.yml is a link to a file outside',
    files: repo({ [settings]: { link: '../outside/secret.yml' } }),
    exit: 2,
    words: ['fitgate.yml', 'outside the repository'],
  },
  {
    id: 'outside-config-dotdot',
    about: '--config climbing out',
    files: repo(),
    args: ['--config', '../outside/secret.yml'],
    inputs: { config: '../outside/secret.yml' },
    exit: 2,
    words: ['../outside/secret.yml', 'inside'],
  },
  {
    id: 'outside-config-absolute',
    about: '--config as an absolute path outside',
    files: repo(),
    args: ['--config', '$OUTSIDE/secret.yml'],
    inputs: { config: '$OUTSIDE/secret.yml' },
    exit: 2,
    words: ['secret.yml', 'inside'],
  },
  {
    id: 'outside-descriptor-argument',
    about: 'a descriptor argument outside the root',
    files: repo(),
    args: ['outside/secret.model.yml'],
    inputs: null,
    cliOnly: 'the action takes no descriptor paths',
    exit: 2,
    words: ['outside the repository'],
  },
  {
    id: 'outside-descriptor-argument-absolute',
    about: 'a descriptor argument as an absolute path outside',
    files: repo(),
    args: ['$OUTSIDE/secret.model.yml'],
    inputs: null,
    cliOnly: 'the action takes no descriptor paths',
    exit: 2,
    words: ['outside the repository'],
  },
  {
    id: 'outside-descriptor-argument-link',
    about: 'a descriptor argument that is a link inside pointing out',
    files: repo({ 'models/link.model.yml': { link: '$OUTSIDE/secret.model.yml' } }),
    args: ['repo/models/link.model.yml'],
    inputs: null,
    cliOnly: 'the action takes no descriptor paths',
    exit: 2,
    words: ['outside the repository'],
  },
  {
    id: 'outside-glob-dotdot',
    about: 'a models pattern climbing out',
    files: repo({ [settings]: 'version: 1\nmodels: ["../outside/*.model.yml"]\n' }),
    exit: 2,
    words: ['fitgate.yml:', 'leaves the repository'],
  },
  {
    id: 'outside-glob-absolute',
    about: 'a models pattern that is absolute',
    files: repo({ [settings]: 'version: 1\nmodels: ["$OUTSIDE/*.model.yml"]\n' }),
    exit: 2,
    words: ['fitgate.yml:', 'leaves the repository'],
  },
  {
    id: 'outside-glob-through-link',
    about: 'a models pattern under a folder link to outside (never followed, and said so)',
    files: repo({ [settings]: 'version: 1\nmodels: ["ext/*.model.yml"]\n', ext: { link: '$OUTSIDE' } }),
    exit: 2,
    words: ['fitgate.yml:', 'matches no file', 'ext is a symbolic link', 'never followed'],
  },
  {
    id: 'link-loop',
    about: 'a training file that is a link to itself',
    files: repo({ [train]: { link: 'train.csv' } }),
    exit: 2,
    words: ['models/m.model.yml:', 'loop'],
  },
  {
    id: 'nul-in-path',
    about: 'a data path with a NUL character',
    files: repo({ [m]: descriptor({ train: '"../data/train.csv\\0.txt"' }) }),
    exit: 2,
    words: ['models/m.model.yml:', 'NUL'],
  },

  // The repository root: its real path must stay inside the workspace (action) or the working directory (CLI)
  {
    id: 'root-link-to-ancestor',
    about: 'the root folder is a link to a folder above the checkout',
    files: repo({ ml: { link: '../..' } }),
    args: ['--root', 'repo/ml'],
    inputs: { 'working-directory': 'ml' },
    exit: 2,
    words: ['ml leads out of', 'through a symbolic link'],
  },

  // Files fitgate writes: never through a link, never out of the repository through a folder link
  {
    id: 'write-out-link',
    about: '--out naming a link to a file outside',
    files: repo({ 'report.txt': { link: '$OUTSIDE/plain.txt' } }),
    args: ['--out', 'repo/report.txt'],
    inputs: null,
    cliOnly: 'the action has no --out (its JSON report goes to RUNNER_TEMP)',
    exit: 2,
    words: ['`--out`', 'report.txt is a symbolic link'],
  },
  {
    id: 'write-html-folder-link',
    about: 'the HTML report folder is a link to a folder outside',
    files: repo({ site: { link: '$OUTSIDE' } }),
    args: ['--html', 'repo/site'],
    inputs: { html: 'site' },
    exit: 2,
    words: ['html`', 'site leads out of'],
  },
  {
    id: 'write-junit-link',
    about: 'the JUnit file is a link to a file outside',
    files: repo({ 'junit.xml': { link: '$OUTSIDE/plain.txt' } }),
    args: ['--junit', 'repo/junit.xml'],
    inputs: { junit: 'junit.xml' },
    exit: 2,
    words: ['junit`', 'junit.xml is a symbolic link'],
  },
  {
    id: 'write-sarif-through-parent-link',
    about: 'the SARIF path goes through a folder link to the parent',
    files: repo({ up: { link: '..' } }),
    args: ['--sarif', 'repo/up/outside/x.sarif'],
    inputs: { sarif: 'up/outside/x.sarif' },
    exit: 2,
    words: ['sarif`', 'leads out of'],
  },

  // Runner commands inside a line (the older ##[...] form) and after a line break
  {
    id: 'command-in-file-name',
    about: 'a broken descriptor whose file name holds ##[error] mid-line and a line break before ::error::',
    files: repo({ 'models/a ##[error]forged\n::error::forged.model.yml': 'version: 1\nname: [broken\n' }),
    exit: 2,
    words: ['forged'],
    verdicts: { m: 'pass', 'models/a ##[error]forged\n::error::forged.model.yml': 'error' },
  },
  {
    id: 'command-in-cell',
    about: 'a bad cell whose text is ##[error]forged',
    files: withTrain(TRAIN.replace('\n3,', '\nx ##[error]forged,')),
    exit: 2,
    words: ['data/train.csv:5', 'forged'],
  },
  {
    id: 'command-in-target',
    about: 'a target column named with ##[warning] that the data lacks',
    files: repo({ [m]: descriptor({ target: '"y ##[warning]forged"' }) }),
    exit: 2,
    words: ['forged'],
  },

  // CSV contents
  { id: 'csv-empty', about: 'an empty training file', files: withTrain(''), exit: 2, words: ['data/train.csv', 'no header row'] },
  {
    id: 'csv-header-only',
    about: 'a training file with a header and no rows',
    files: withTrain('x,y\n'),
    exit: 2,
    words: ['data/train.csv', 'no data rows'],
  },
  {
    id: 'csv-ragged',
    about: 'a row with an extra field',
    files: withTrain(`${TRAIN}31,63,9\n`),
    exit: 2,
    words: ['data/train.csv:32', 'fields'],
  },
  {
    id: 'csv-text-cell',
    about: 'text in a used column',
    files: withTrain(TRAIN.replace('\n3,', '\nthree,')),
    exit: 2,
    words: ['data/train.csv:5', '"three"'],
  },
  {
    id: 'csv-nan-cell',
    about: 'NaN in a used column',
    files: withTrain(TRAIN.replace('\n3,', '\nNaN,')),
    exit: 2,
    words: ['data/train.csv:5', 'NaN'],
  },
  {
    id: 'csv-infinity-cell',
    about: 'Infinity in a used column',
    files: withTrain(TRAIN.replace('\n3,', '\nInfinity,')),
    exit: 2,
    words: ['data/train.csv:5', 'Infinity'],
  },
  {
    id: 'csv-empty-cell',
    about: 'an empty cell in a used column',
    files: withTrain(TRAIN.replace('\n3,', '\n,')),
    exit: 2,
    words: ['data/train.csv:5', 'empty'],
  },
  {
    id: 'csv-overflow-cell',
    about: '1e999 in a used column',
    files: withTrain(TRAIN.replace('\n3,', '\n1e999,')),
    exit: 2,
    words: ['data/train.csv:5', '1e999'],
  },
  { id: 'csv-missing-target', about: 'no target column', files: withTrain(rows(30, 0, 1, 'x,z')), exit: 2, words: ['data/train.csv', 'y'] },
  {
    id: 'csv-missing-input-holdout',
    about: 'the hold-out file lacks an input column',
    files: repo({ [holdout]: rows(10, 0.5, 3, 'u,y') }),
    exit: 2,
    words: ['data/holdout.csv', 'x'],
  },
  {
    id: 'csv-duplicate-header',
    about: 'a header name given twice',
    files: withTrain(
      rows(30, 0, 1, 'x,x')
        .replace('x,x', 'x,y,x')
        .replace(/\n(\d[^,\n]*),([^\n]*)/g, '\n$1,$2,0'),
    ),
    exit: 2,
    words: ['data/train.csv:1', 'x'],
  },
  {
    id: 'csv-binary',
    about: 'a training file of binary bytes',
    files: withTrain(binaryBytes(4000)),
    exit: 2,
    words: ['data/train.csv', 'UTF-8'],
  },
  {
    id: 'csv-latin1',
    about: 'a header in Latin-1, not UTF-8',
    files: withTrain(latin1Header()),
    exit: 2,
    words: ['data/train.csv', 'UTF-8'],
  },
  {
    id: 'csv-long-cell',
    about: 'a 100,000-character cell (the message quotes a short piece)',
    files: withTrain(TRAIN.replace('\n3,', `\n${'7'.repeat(50)}${'z'.repeat(100_000)},`)),
    exit: 2,
    words: ['data/train.csv:5', '777'],
  },
  { id: 'csv-bom-works', about: 'a byte-order mark (accepted)', files: withTrain(`\ufeff${TRAIN}`), exit: 0, words: ['PASS'] },
  {
    id: 'csv-crlf-works',
    about: 'CRLF line ends (accepted)',
    files: repo({ [train]: rows(30, 0, 1, 'x,y', '\r\n'), [holdout]: rows(10, 0.5, 3, 'x,y', '\r\n') }),
    exit: 0,
    words: ['PASS'],
  },
  {
    id: 'csv-bom-crlf-works',
    about: 'a byte-order mark and CRLF together (accepted)',
    files: withTrain(`\ufeff${rows(30, 0, 1, 'x,y', '\r\n')}`),
    exit: 0,
    words: ['PASS'],
  },
  {
    id: 'csv-near-max-double',
    about: 'inputs near 1e308, finite: their squares would overflow, so a clear error',
    files: repo({
      [train]: rows(30, 0, 1).replace(/\n(\d+),/g, (_, x: string) => `\n${x}e306,`),
      [holdout]: rows(10, 0.5, 3).replace(/\n([\d.]+),/g, (_, x: string) => `\n${x}e306,`),
    }),
    exit: 2,
    words: ['models/m.model.yml', 'design column `x`', '1e+140'],
  },
  {
    id: 'csv-near-max-double-unused',
    about: 'a column near 1e308 that no term reads (a result, not an error)',
    files: repo({
      [train]: rows(30)
        .replace('x,y', 'x,y,big')
        .replace(/\n([^\n]+)/g, '\n$1,1.7e308'),
      [holdout]: HOLDOUT.replace('x,y', 'x,y,big').replace(/\n([^\n]+)/g, '\n$1,-1.7e308'),
    }),
    exit: 0,
    words: ['m'],
  },
  {
    id: 'constant-input',
    about: 'an input column that never changes (a result, not an error)',
    files: repo({
      [train]: rows(30)
        .replace(/\n(\d+),/g, '\n5,')
        .replace('x,y', 'x,y'),
      [holdout]: HOLDOUT,
    }),
    exit: 1,
    words: ['m'],
  },
  {
    id: 'constant-target',
    about: 'a target that never changes',
    files: withTrain(rows(30).replace(/,([-\d.]+)\n/g, ',7\n')),
    exit: 2,
    words: ['models/m.model.yml:', 'constant'],
  },
  // Three rows not on one line (rows(3) happens to be collinear: the fit would interpolate them
  // and both errors would be rounding noise).
  {
    id: 'fewer-rows-than-folds',
    about: '3 training rows and 5 folds with cross-validation on',
    files: repo({ [train]: 'x,y\n0,1\n1,3.5\n2,4.6\n', [m]: descriptor({ extra: 'limits:\n  cv_ratio: 2\n  params_per_sample: off\n' }) }),
    exit: 1,
    words: ['cross-validation'],
  },
  {
    id: 'more-params-than-rows',
    about: '10 radial centres for 5 rows (a result: fail, not an error)',
    files: repo({ [train]: rows(5), [m]: descriptor({ terms: '  - rbf: { of: x, centers: { from: 0, to: 4, count: 10 }, width: 1 }\n' }) }),
    exit: 1,
    words: ['parameter-ratio'],
    verdicts: { m: 'fail' },
  },

  // Resource caps
  {
    id: 'cap-file-size',
    about: 'a training file over caps.max_file_mb',
    files: repo({ [settings]: `${SETTINGS}caps:\n  max_file_mb: 0.0001\n` }),
    exit: 2,
    words: ['data/train.csv', 'caps.max_file_mb'],
  },
  {
    id: 'cap-file-size-sparse',
    about: 'a 3 GiB (sparse) training file against the default 512 MiB cap',
    files: repo({ [train]: { sparseBytes: 3 * 1024 ** 3 } }),
    exit: 2,
    words: ['data/train.csv', 'caps.max_file_mb'],
  },
  {
    id: 'cap-cells',
    about: 'rows x parameters over caps.max_cells',
    files: repo({ [settings]: `${SETTINGS}caps:\n  max_cells: 10\n` }),
    exit: 2,
    words: ['models/m.model.yml', 'caps.max_cells'],
  },
  {
    id: 'cap-parameters',
    about: '10,000 radial centres',
    files: withTerms('  - rbf: { of: x, centers: { from: 0, to: 30, count: 10000 }, width: 1 }\n'),
    exit: 2,
    words: ['models/m.model.yml', 'design columns'],
  },
  {
    id: 'cap-parameters-at-samples',
    about: 'a radial centre at each of 150,000 training rows (an array that large once overflowed the call stack)',
    files: repo({
      [train]: { make: () => rows(150_000) },
      [m]: descriptor({ terms: '  - rbf: { of: x, centers: at-samples, width: 1 }\n' }),
    }),
    exit: 2,
    words: ['models/m.model.yml', 'design columns'],
  },

  // Bounded work: the estimate, the folds, the time limit
  {
    id: 'cap-operations',
    about: 'a model over caps.max_operations',
    files: repo({ [settings]: `${SETTINGS}caps:\n  max_operations: 1000\n` }),
    exit: 2,
    words: ['models/m.model.yml', 'caps.max_operations', 'estimated work'],
  },
  {
    id: 'cap-operations-default',
    about: '200 radial columns on 20,000 rows with a width sweep, over the default estimate cap',
    files: repo({
      [train]: { make: () => rows(20_000, 0, 0.0015) },
      [m]: descriptor({ terms: '  - rbf: { of: x, centers: { from: 0, to: 30, count: 199 }, width: 0.2 }\n' }),
    }),
    exit: 2,
    words: ['models/m.model.yml', 'caps.max_operations', 'complexity sweep'],
  },
  {
    id: 'schema-folds-too-many',
    about: '1,000 folds (at most 50)',
    files: withExtra('fit:\n  folds: 1000\n'),
    exit: 2,
    words: ['models/m.model.yml:', 'folds', 'from 2 to 50'],
  },
  {
    id: 'schema-folds-too-many-settings',
    about: '1,000 folds as the settings default',
    files: repo({ [settings]: `${SETTINGS}fit:\n  folds: 1000\n` }),
    exit: 2,
    words: ['fitgate.yml:', 'folds', 'from 2 to 50'],
  },
  {
    id: 'leakage-repeated-rows',
    about: 'one input value repeated in 100,000 training and 100,000 hold-out rows (the leakage scan once compared every pair)',
    files: repo({
      [train]: { make: () => rows(100_000).replace(/\n[^,\n]+,/g, '\n1,') },
      [holdout]: { make: () => rows(100_000).replace(/\n[^,\n]+,/g, '\n1,') },
    }),
    exit: 1,
    words: ['leakage'],
    verdicts: { m: 'fail' },
  },
  {
    id: 'time-limit',
    about: 'a model of minutes of work (its estimate let through) under a 4 s time limit, beside a small one',
    files: repo({
      [settings]: `${SETTINGS}caps:\n  max_model_seconds: 4\n  max_operations: 1e15\n`,
      'data/big.csv': { make: () => rows(60_000, 0, 0.0005) },
      'models/heavy.model.yml': descriptor({
        name: 'heavy',
        train: '../data/big.csv',
        terms: '  - rbf: { of: x, centers: { from: 0, to: 30, count: 150 }, width: 0.05 }\n',
      }),
    }),
    exit: 2,
    words: ['models/heavy.model.yml', 'time limit of 4 s', 'caps.max_model_seconds'],
    verdicts: { heavy: 'error', m: 'pass' },
  },

  // The base comparison cannot be dodged by renaming
  {
    id: 'base-rename-in-place',
    about: 'a pull request that makes a model worse and renames it in its file, to escape base_change',
    base: repo({ [m]: descriptor({ extra: 'limits:\n  base_change: 0.1\n' }) }),
    files: repo({
      [m]: descriptor({ name: 'm-renamed', extra: 'limits:\n  base_change: 0.1\n' }),
      [holdout]: rows(10, 0.5, 3).replace(/,([-\d.]+)\n/g, (_, y: string) => `,${(Number(y) + 3).toFixed(3)}\n`),
    }),
    args: ['--base', 'HEAD'],
    inputs: {},
    exit: 1,
    words: ['base-change', 'm-renamed is compared with m (models/m.model.yml) of the base commit, found by its descriptor path'],
    verdicts: { 'm-renamed': 'fail' },
  },
  {
    id: 'base-rename-and-move',
    about: 'the same model renamed and moved to another descriptor file (found by its data files)',
    base: repo({ [m]: descriptor({ extra: 'limits:\n  base_change: 0.1\n' }) }),
    files: repo({
      [m]: null,
      'models/other.model.yml': descriptor({ name: 'other', extra: 'limits:\n  base_change: 0.1\n' }),
      [holdout]: rows(10, 0.5, 3).replace(/,([-\d.]+)\n/g, (_, y: string) => `,${(Number(y) + 3).toFixed(3)}\n`),
    }),
    args: ['--base', 'HEAD'],
    inputs: {},
    exit: 1,
    words: ['base-change', 'other is compared with m (models/m.model.yml) of the base commit, found by its data files'],
    verdicts: { other: 'fail' },
  },

  // Globs stay inside (Hardening item 3)
  {
    id: 'glob-dotdot-in-braces',
    about: 'a .. segment inside braces',
    files: repo({ [settings]: pattern('{..,models}/*.model.yml') }),
    exit: 2,
    words: ['fitgate.yml:3', '`..` segment'],
  },
  {
    id: 'glob-dotdot-in-extglob',
    about: 'a .. segment inside an extglob',
    files: repo({ [settings]: pattern('@(..)/outside/*.model.yml') }),
    exit: 2,
    words: ['fitgate.yml:3', '`..` segment'],
  },
  {
    id: 'glob-dotdot-middle',
    about: 'a .. segment in the middle of a pattern',
    files: repo({ [settings]: pattern('models/../../outside/*.model.yml') }),
    exit: 2,
    words: ['fitgate.yml:3', '`..` segment'],
  },
  {
    id: 'glob-dotdot-backslash',
    about: 'a .. segment between backslashes',
    files: repo({ [settings]: pattern('models\\..\\..\\outside\\*.model.yml') }),
    exit: 2,
    words: ['fitgate.yml:3', '`..` segment'],
  },
  {
    id: 'glob-brace-bomb',
    about: '40 brace pairs (2^40 alternatives)',
    files: repo({ [settings]: pattern(`models/${'{a,b}'.repeat(40)}.model.yml`) }),
    exit: 2,
    words: ['fitgate.yml:3', 'alternatives'],
  },
  {
    id: 'glob-too-long',
    about: 'a 5,000-character pattern',
    files: repo({ [settings]: pattern(`models/${'x'.repeat(5000)}*.model.yml`) }),
    exit: 2,
    words: ['fitgate.yml:3', 'at most 1000'],
  },
  {
    id: 'glob-many-stars',
    about: '25 stars against a 200-character name (a backtracking matcher would not finish)',
    files: repo({
      [settings]: pattern(`models/${'*a'.repeat(25)}b.model.yml`),
      [`models/${'a'.repeat(200)}.model.yml`]: descriptor({ name: 'long' }),
    }),
    exit: 2,
    words: ['fitgate.yml:3', 'matches no file'],
  },
  {
    id: 'glob-skips-node-modules-and-git',
    about: 'descriptors under node_modules and .git (the same name as the real one) are not searched by **',
    files: repo({
      [settings]: pattern('**/*.model.yml'),
      'node_modules/pkg/evil.model.yml': descriptor(),
      '.git/evil.model.yml': descriptor(),
    }),
    exit: 0,
    words: ['PASS'],
  },
  {
    id: 'glob-names-node-modules',
    about: 'a pattern that names node_modules searches it',
    files: repo({
      [settings]: 'version: 1\nmodels:\n  - "models/*.model.yml"\n  - "node_modules/pkg/*.model.yml"\n',
      'node_modules/pkg/n.model.yml': descriptor({ name: 'n', train: '../../data/train.csv', holdout: '../../data/holdout.csv' }),
    }),
    exit: 0,
    words: ['PASS'],
    verdicts: { m: 'pass', n: 'pass' },
  },

  // Nothing is skipped silently (Hardening item 7)
  {
    id: 'settings-is-folder',
    about: 'fitgate.yml is a folder',
    files: repo({ [settings]: null, 'fitgate.yml/inner.txt': 'x' }),
    exit: 2,
    words: ['fitgate.yml', 'is a folder'],
  },
  {
    id: 'settings-dangling-link',
    about: 'fitgate.yml is a link to nothing',
    files: repo({ [settings]: { link: 'nowhere.yml' } }),
    exit: 2,
    words: ['fitgate.yml', 'leads to nothing'],
  },
  {
    id: 'settings-fifo',
    about: 'fitgate.yml is a FIFO (reading it would wait for ever)',
    files: repo({ [settings]: { fifo: true } }),
    exit: 2,
    words: ['fitgate.yml', 'FIFO'],
  },
  {
    id: 'settings-yaml-name',
    about: 'fitgate.yaml instead of fitgate.yml: noted, defaults used',
    files: repo({ [settings]: null, 'fitgate.yaml': pattern('nowhere/*.model.yml') }),
    exit: 0,
    words: ['fitgate.yaml is not read', 'fitgate.yml'],
  },
  {
    id: 'descriptor-yaml-beside-yml',
    about: 'a *.model.yaml beside the *.model.yml descriptors: noted',
    files: repo({ 'models/n.model.yaml': descriptor({ name: 'n' }) }),
    exit: 0,
    words: ['models/n.model.yaml', 'not read'],
  },
  {
    id: 'descriptor-yaml-only',
    about: 'only *.model.yaml descriptors: the empty pattern names them',
    files: repo({ [m]: null, 'models/m.model.yaml': descriptor() }),
    exit: 2,
    words: ['matches no file', 'models/m.model.yaml is not read'],
  },
  {
    id: 'descriptor-fifo',
    about: 'a matched descriptor that is a FIFO: that model is an error, the others are checked',
    files: repo({ 'models/f.model.yml': { fifo: true } }),
    exit: 2,
    words: ['models/f.model.yml', 'FIFO'],
    verdicts: { m: 'pass', 'models/f.model.yml': 'error' },
  },
  {
    id: 'descriptor-dangling-link',
    about: 'a matched descriptor that is a link to nothing',
    files: repo({ 'models/d.model.yml': { link: 'gone.model.yml' } }),
    exit: 2,
    words: ['models/d.model.yml', 'leads to nothing'],
    verdicts: { m: 'pass', 'models/d.model.yml': 'error' },
  },
  {
    id: 'data-fifo',
    about: 'a training file that is a FIFO',
    files: repo({ [train]: { fifo: true } }),
    exit: 2,
    words: ['models/m.model.yml:', 'FIFO'],
  },
  {
    id: 'data-dangling-link',
    about: 'a training file that is a link to nothing',
    files: repo({ [train]: { link: 'gone.csv' } }),
    exit: 2,
    words: ['models/m.model.yml:', 'leads to nothing'],
  },

  // Numbers and formats (Hardening item 10)
  {
    id: 'csv-underflow-cell',
    about: '1e-400 in a used column (reads as 0)',
    files: withTrain(TRAIN.replace('\n3,', '\n1e-400,')),
    exit: 2,
    words: ['data/train.csv:5', '1e-400', 'too small'],
  },
  {
    id: 'csv-subnormal-cell',
    about: '4.9e-324 in a used column (a subnormal)',
    files: withTrain(TRAIN.replace('\n3,', '\n4.9e-324,')),
    exit: 2,
    words: ['data/train.csv:5', '4.9e-324', 'too small'],
  },
  {
    id: 'csv-lfs-pointer',
    about: 'the training file is a Git LFS pointer',
    files: withTrain(LFS_POINTER),
    exit: 2,
    words: ['data/train.csv', 'Git LFS pointer'],
  },
  {
    id: 'csv-semicolons-work',
    about: 'a semicolon-separated training file (separator detected, accepted)',
    files: withTrain(TRAIN.replace(/,/g, ';')),
    exit: 0,
    words: ['PASS'],
  },
  {
    id: 'csv-tabs-work',
    about: 'a tab-separated training file (separator detected, accepted)',
    files: withTrain(TRAIN.replace(/,/g, '\t')),
    exit: 0,
    words: ['PASS'],
  },
  {
    id: 'csv-separators-ambiguous',
    about: 'a header with semicolons and tabs and no comma',
    files: withTrain(TRAIN.replace(/,/g, ';').replace('x;y', 'x;y\tz')),
    exit: 2,
    words: ['data/train.csv', 'data.separator'],
  },
  {
    id: 'csv-cr-only',
    about: 'CR-only line ends',
    files: withTrain(rows(30, 0, 1, 'x,y', '\r')),
    exit: 2,
    words: ['data/train.csv', 'CR-only line ends'],
  },
  {
    id: 'csv-header-endless',
    about: 'a 4 MiB first line without a line feed',
    files: withTrain({ make: () => `x,y,${'c,'.repeat(2 * 1024 * 1024)}` }),
    exit: 2,
    words: ['data/train.csv', 'first 1048576 bytes'],
  },
  {
    id: 'csv-header-wide',
    about: 'a header of 100,001 columns',
    files: withTrain({ make: () => `${Array.from({ length: 100_001 }, (_, i) => `c${i}`).join(',')}\n` }),
    exit: 2,
    words: ['data/train.csv', '100001 columns'],
  },

  // merge trusts nothing (Hardening item 9)
  {
    id: 'merge-deep',
    about: 'a report of 100,000 nested lists',
    files: { 'a.json': { make: () => '['.repeat(100_000) } },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['repo/a.json:1:65', 'more than 64 levels'],
  },
  {
    id: 'merge-huge-number',
    about: 'a report with 1e999 (parses to Infinity)',
    files: {
      'a.json': shardReport([reportModel('a', 'pass')], null).replace('"coefficients": [\n        1,', '"coefficients": [\n        1e999,'),
    },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['repo/a.json:', '1e999'],
  },
  {
    id: 'merge-verdict-edited',
    about: 'a failing model edited to pass',
    files: {
      'a.json': shardReport([reportModel('a', 'fail')], null, (r) => {
        r.models[0].verdict = 'pass';
        r.verdict = 'pass';
        r.counts = { models: 1, pass: 1, warn: 0, fail: 0, error: 0 };
      }),
    },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['models[0].verdict', 'was it edited'],
  },
  {
    id: 'merge-status-edited',
    about: 'a failing check edited to pass (and its model)',
    files: {
      'a.json': shardReport([reportModel('a', 'fail')], null, (r) => {
        r.models[0].checks[0].status = 'pass';
        r.models[0].verdict = 'pass';
        r.verdict = 'pass';
        r.counts = { models: 1, pass: 1, warn: 0, fail: 0, error: 0 };
      }),
    },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['models[0].checks[0].status', 'was it edited'],
  },
  {
    id: 'merge-proto-key',
    about: 'a model with a __proto__ key',
    files: {
      'a.json': shardReport([reportModel('a', 'pass')], null).replace(
        '"name": "a",',
        '"__proto__": { "verdict": "fail" },\n      "name": "a",',
      ),
    },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['models[0].__proto__', 'not part of a fitgate JSON report'],
  },
  {
    id: 'merge-wrong-type',
    about: 'a row count that is a string',
    files: { 'a.json': shardReport([reportModel('a', 'pass')], null, (r) => (r.models[0].rows.train = '30')) },
    args: ['repo/a.json'],
    ...merge,
    exit: 2,
    words: ['models[0].rows.train', 'a whole number'],
  },
  {
    id: 'merge-proto-names',
    about: 'models named __proto__, constructor and hasOwnProperty merge as plain names',
    files: {
      'a.json': shardReport([reportModel('__proto__', 'pass'), reportModel('constructor', 'pass')], { index: 1, count: 2 }),
      'b.json': shardReport([reportModel('hasOwnProperty', 'pass')], { index: 2, count: 2 }),
    },
    args: ['repo/a.json', 'repo/b.json', '--expect', '2'],
    ...merge,
    exit: 0,
    words: ['__proto__', 'constructor', 'hasOwnProperty'],
    verdicts: { ['__proto__']: 'pass', constructor: 'pass', hasOwnProperty: 'pass' },
  },
  {
    id: 'merge-missing-shard-expect',
    about: 'two reports where --expect 3 asks for three',
    files: { 'a.json': shardReport([reportModel('a', 'pass')], null), 'b.json': shardReport([reportModel('b', 'pass')], null) },
    args: ['repo/a.json', 'repo/b.json', '--expect', '3'],
    ...merge,
    exit: 2,
    words: ['--expect 3', 'got 2'],
  },
  {
    id: 'merge-missing-shard-named',
    about: 'shards 1/3 and 3/3 without 2/3',
    files: {
      'a.json': shardReport([reportModel('a', 'pass')], { index: 1, count: 3 }),
      'c.json': shardReport([reportModel('c', 'pass')], { index: 3, count: 3 }),
    },
    args: ['repo/a.json', 'repo/c.json'],
    ...merge,
    exit: 2,
    words: ['shard 2/3 is missing'],
  },

  // One bad model among good ones
  {
    id: 'one-bad-among-good',
    about: 'three models, one with a bad cell: every model gets its outcome',
    files: repo({
      'models/a.model.yml': descriptor({ name: 'a' }),
      'models/b.model.yml': descriptor({ name: 'b', train: '../data/bad.csv' }),
      'data/bad.csv': TRAIN.replace('\n3,', '\nx3,'),
    }),
    exit: 2,
    words: ['data/bad.csv:5', '"x3"'],
    verdicts: { a: 'pass', b: 'error', m: 'pass' },
  },
];

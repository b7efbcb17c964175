/**
 * The action's inputs: the only module that calls `core.getInput`. The runner passes each
 * input as an `INPUT_<NAME>` variable with the name upper-cased and hyphens kept
 * (`INPUT_FAIL-ON`), and applies `action.yml` defaults only inside a real run, so the defaults
 * are applied here too. Bad values throw an InputError that says what was expected. The workspace
 * and the root are taken as real paths (`realpath(3)`).
 */
import * as core from '@actions/core';
import { accessSync, constants, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { InputError, quoteValue } from '../core/errors.js';
import { realFolder } from '../repo/real-folder.js';
import type { Settings } from '../run/settings.js';
import { parseShard, type Shard } from '../run/shard.js';

/** Everything the action reads from its inputs and environment. */
export interface ActionInputs {
  /**
   * The run's settings; `root` is the real path of the workspace joined with `working-directory`
   * (every symbolic link resolved), which must lie inside the workspace's real path.
   */
  settings: Settings;
  /** The workspace's real path (absolute): annotations are relative to it. */
  workspace: string;
  /** The root's real path relative to the workspace's, with `/` (`''` for the workspace itself). */
  prefix: string;
  /** Post or update the pull-request comment. Default true. */
  comment: boolean;
  /** Token for the comment; empty when none was given. Never printed. */
  token: string;
  /** Folder for the JSON report: `RUNNER_TEMP`, else the system's temporary folder. */
  tempDir: string;
  /** Check only this share of the models (`K/N`); null: every model. */
  shard: Shard | null;
  /** File reports to write (absolute paths inside the workspace), null when not asked for. */
  files: { html: string | null; sarif: string | null; junit: string | null };
}

/** Defaults of every input, as in action.yml. */
export const INPUT_DEFAULTS = {
  config: 'fitgate.yml',
  'working-directory': '.',
  comment: 'true',
  'fail-on': 'fail',
  'github-token': '',
  html: '',
  sarif: '',
  junit: '',
  shard: '',
} as const;

/** An input's name. */
export type InputName = keyof typeof INPUT_DEFAULTS;

/** An input's value, trimmed, or its default when empty or absent. */
function input(name: InputName): string {
  let value = core.getInput(name);
  // Some local runners replace hyphens with underscores; accept that spelling too.
  if (value === '' && name.includes('-')) value = core.getInput(name.replace(/-/g, '_'));
  return value === '' ? INPUT_DEFAULTS[name] : value;
}

function bad(name: InputName, expected: string, value: string): InputError {
  return new InputError('input', `input \`${name}\` must be ${expected}, got ${quoteValue(value)}`, { key: name });
}

/** A YAML 1.2 core-schema boolean, as `core.getBooleanInput` accepts. */
function booleanInput(name: InputName): boolean {
  const value = input(name);
  if (['true', 'True', 'TRUE'].includes(value)) return true;
  if (['false', 'False', 'FALSE'].includes(value)) return false;
  throw bad(name, '`true` or `false`', value);
}

/** A path inside `base` (called `baseName` in messages), relative to it with `/`, or an InputError naming the input. */
function insidePath(name: InputName, base: string, value: string, baseName: string): string {
  if (value.includes('\0')) throw bad(name, 'a path', value);
  const absolute = path.resolve(base, value);
  const rel = path.relative(base, absolute);
  if (rel.startsWith('..') || path.isAbsolute(rel)) throw bad(name, `a path inside the ${baseName}`, value);
  return rel.split(path.sep).join('/');
}

/**
 * Checks the runner's file for the step's outputs: `GITHUB_OUTPUT`, when set, must name an existing
 * file this process may write (the runner creates it before the step starts). Unset, the outputs
 * go to the log as workflow commands (@actions/core does that).
 * @throws InputError `runner-file` naming the variable and the path otherwise
 */
export function checkOutputFile(file: string | undefined): void {
  if (file === undefined || file === '') return;
  let problem: string | null = null;
  try {
    if (!statSync(file).isFile()) problem = 'is not a file';
    else accessSync(file, constants.W_OK);
  } catch (error) {
    problem = (error as NodeJS.ErrnoException).code === 'ENOENT' ? 'does not exist' : 'cannot be written';
  }
  if (problem !== null) {
    throw new InputError(
      'runner-file',
      `expected the file the runner creates for the step's outputs, got ${quoteValue(file)}, which ${problem}`,
      { key: 'GITHUB_OUTPUT' },
    );
  }
}

/**
 * Reads and checks every input (`INPUT_*` variables), `GITHUB_WORKSPACE`, `RUNNER_TEMP` and
 * `GITHUB_OUTPUT` ({@link checkOutputFile}) from the process environment.
 * @param cwd folder used when `GITHUB_WORKSPACE` is unset; default `process.cwd()`
 * @throws InputError for a bad value (the run must not go on: exit status 2), a workspace or
 *   `working-directory` that is not an existing folder, or a `working-directory` whose real path
 *   leaves the workspace's real path
 */
export function readInputs(cwd: string = process.cwd()): ActionInputs {
  const env = process.env;
  checkOutputFile(env.GITHUB_OUTPUT);
  // Real paths: the root is checked against the workspace as it is on disk, so that a folder
  // replaced by a link to a parent (or anywhere outside) is refused here, once.
  const workspace = realFolder(path.resolve(env.GITHUB_WORKSPACE || cwd), { key: 'GITHUB_WORKSPACE', within: null });
  const named = insidePath('working-directory', workspace, input('working-directory'), 'workspace');
  const root = realFolder(path.join(workspace, named), {
    key: 'working-directory',
    within: workspace,
    insideOnly: true,
    withinName: 'workspace',
  });
  const prefix = path.relative(workspace, root).split(path.sep).join('/');

  const configValue = input('config');
  const config = insidePath('config', root, configValue, 'working directory');
  if (config === '') throw bad('config', 'a settings file inside the working directory', configValue);

  const failOn = input('fail-on');
  if (failOn !== 'fail' && failOn !== 'warn') throw bad('fail-on', '`fail` or `warn`', failOn);

  const output = (name: 'html' | 'sarif' | 'junit'): string | null => {
    const value = input(name);
    return value === '' ? null : path.join(workspace, insidePath(name, workspace, value, 'workspace'));
  };

  const shardText = input('shard');
  return {
    shard: shardText === '' ? null : parseShard(shardText, 'shard'),
    files: { html: output('html'), sarif: output('sarif'), junit: output('junit') },
    settings: {
      root,
      config,
      configExplicit: config !== INPUT_DEFAULTS.config,
      descriptors: [],
      failOn,
    },
    workspace,
    prefix,
    comment: booleanInput('comment'),
    token: input('github-token'),
    tempDir: env.RUNNER_TEMP || os.tmpdir(),
  };
}

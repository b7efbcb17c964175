import { mkdirSync, mkdtempSync, readFileSync, realpathSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import os, { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { checkOutputFile, INPUT_DEFAULTS, readInputs } from '../../src/entries/inputs.js';

const saved = { ...process.env };
// A real workspace (the root is resolved with realpath): `ml/`, a link `up` to the workspace's
// parent (a folder replaced by a link leading out), a link `models` to `ml` (staying inside).
const WORKSPACE = realpathSync(mkdtempSync(path.join(tmpdir(), 'fitgate-inputs-')));
mkdirSync(path.join(WORKSPACE, 'ml'));
symlinkSync('..', path.join(WORKSPACE, 'up'));
symlinkSync('ml', path.join(WORKSPACE, 'models'));
afterAll(() => rmSync(WORKSPACE, { recursive: true, force: true }));

beforeEach(() => {
  for (const k of Object.keys(process.env)) if (k.startsWith('INPUT_')) delete process.env[k];
  process.env.GITHUB_WORKSPACE = WORKSPACE;
  process.env.RUNNER_TEMP = '/tmp/runner-temp';
});

afterEach(() => {
  for (const k of Object.keys(process.env)) if (!(k in saved)) delete process.env[k];
  Object.assign(process.env, saved);
});

/** The InputError readInputs throws, or a failure when it throws nothing. */
function inputError(): InputError {
  try {
    readInputs();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error(
    `readInputs accepted ${JSON.stringify(Object.fromEntries(Object.entries(process.env).filter(([k]) => k.startsWith('INPUT_'))))}`,
  );
}

describe('readInputs', () => {
  it('resolves the file report inputs inside the workspace and refuses paths that leave it', () => {
    process.env.INPUT_HTML = 'reports/html';
    process.env.INPUT_SARIF = 'fitgate.sarif';
    process.env.INPUT_JUNIT = '';
    expect(readInputs().files).toEqual({
      html: path.join(WORKSPACE, 'reports/html'),
      sarif: path.join(WORKSPACE, 'fitgate.sarif'),
      junit: null,
    });
    process.env.INPUT_JUNIT = '../outside.xml';
    const error = inputError();
    expect(error.location.key).toBe('junit');
  });

  it('applies every default itself when the runner gives no INPUT_ variables', () => {
    const inputs = readInputs();
    expect(inputs).toEqual({
      settings: { root: WORKSPACE, config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' },
      workspace: WORKSPACE,
      prefix: '',
      comment: true,
      token: '',
      tempDir: '/tmp/runner-temp',
      files: { html: null, sarif: null, junit: null },
      shard: null,
    });
  });

  it('reads hyphenated names as the runner passes them (INPUT_FAIL-ON, INPUT_WORKING-DIRECTORY, INPUT_GITHUB-TOKEN)', () => {
    process.env['INPUT_FAIL-ON'] = 'warn';
    process.env['INPUT_WORKING-DIRECTORY'] = './ml/';
    process.env['INPUT_GITHUB-TOKEN'] = 'secret';
    process.env.INPUT_CONFIG = 'conf/gate.yml';
    process.env.INPUT_COMMENT = 'False';
    const inputs = readInputs();
    expect(inputs.settings).toEqual({
      root: path.join(WORKSPACE, 'ml'),
      config: 'conf/gate.yml',
      configExplicit: true,
      descriptors: [],
      failOn: 'warn',
    });
    expect(inputs.prefix).toBe('ml');
    expect(inputs.comment).toBe(false);
    expect(inputs.token).toBe('secret');
  });

  it('resolves working-directory with realpath: a link inside the workspace is followed, one leading out is refused', () => {
    process.env['INPUT_WORKING-DIRECTORY'] = 'models';
    const inputs = readInputs();
    expect(inputs.settings.root).toBe(path.join(WORKSPACE, 'ml'));
    expect(inputs.prefix).toBe('ml');
    process.env['INPUT_WORKING-DIRECTORY'] = 'up';
    const error = inputError();
    expect(error.code).toBe('folder-refused');
    expect(error.location.key).toBe('working-directory');
    expect(error.message).toMatch(/leads out of the workspace .* through a symbolic link/);
    process.env['INPUT_WORKING-DIRECTORY'] = 'up/ml';
    expect(inputError().location.key).toBe('working-directory');
    process.env['INPUT_WORKING-DIRECTORY'] = 'nowhere';
    expect(inputError().message).toMatch(/does not exist; expected an existing folder/);
  });

  it('takes the workspace as its real path', () => {
    process.env.GITHUB_WORKSPACE = path.join(WORKSPACE, 'models');
    const inputs = readInputs();
    expect(inputs.workspace).toBe(path.join(WORKSPACE, 'ml'));
    expect(inputs.settings.root).toBe(path.join(WORKSPACE, 'ml'));
  });

  it('also accepts underscores for hyphens (some local runners)', () => {
    process.env.INPUT_FAIL_ON = 'warn';
    expect(readInputs().settings.failOn).toBe('warn');
  });

  it('treats empty values as absent and trims white space', () => {
    process.env['INPUT_FAIL-ON'] = '';
    process.env.INPUT_CONFIG = '  fitgate.yml  ';
    const inputs = readInputs();
    expect(inputs.settings.failOn).toBe('fail');
    expect(inputs.settings.config).toBe('fitgate.yml');
  });

  it.each([
    ['INPUT_FAIL-ON', 'error', '`fail-on`', 'input `fail-on` must be `fail` or `warn`, got "error"'],
    ['INPUT_COMMENT', 'yes', '`comment`', 'input `comment` must be `true` or `false`, got "yes"'],
    [
      'INPUT_WORKING-DIRECTORY',
      '../up',
      '`working-directory`',
      'input `working-directory` must be a path inside the workspace, got "../up"',
    ],
    ['INPUT_WORKING-DIRECTORY', '/etc', '`working-directory`', 'input `working-directory` must be a path inside the workspace, got "/etc"'],
    ['INPUT_CONFIG', '../fitgate.yml', '`config`', 'input `config` must be a path inside the working directory, got "../fitgate.yml"'],
    ['INPUT_CONFIG', '.', '`config`', 'input `config` must be a settings file inside the working directory, got "."'],
  ])('refuses %s=%j with a message that says what to fix', (name, value, key, message) => {
    process.env[name] = value;
    const error = inputError();
    expect(error.code).toBe('input');
    expect(error.location.key).toBe(key.slice(1, -1));
    expect(error.message).toBe(message);
    expect(error.describe()).toBe(`${key}: ${message}`);
  });

  it('refuses a GITHUB_OUTPUT that names no writable file, naming the variable and the path', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-output-'));
    try {
      const file = path.join(dir, 'output.txt');
      writeFileSync(file, '');
      process.env.GITHUB_OUTPUT = file;
      expect(readInputs().workspace).toBe(WORKSPACE);
      for (const absent of [undefined, '']) expect(() => checkOutputFile(absent)).not.toThrow();
      for (const [value, problem] of [
        [path.join(dir, 'missing.txt'), 'does not exist'],
        [dir, 'is not a file'],
      ]) {
        process.env.GITHUB_OUTPUT = value;
        const error = inputError();
        expect(error.code).toBe('runner-file');
        expect(error.describe()).toBe(
          `\`GITHUB_OUTPUT\`: expected the file the runner creates for the step's outputs, got ${JSON.stringify(value)}, which ${problem}`,
        );
      }
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('has one default per input of action.yml, equal to the default there', () => {
    const action = parse(readFileSync(path.resolve(fileURLToPath(new URL('../../action.yml', import.meta.url))), 'utf8')) as {
      inputs: Record<string, { default?: string }>;
    };
    expect(Object.keys(INPUT_DEFAULTS).sort()).toEqual(Object.keys(action.inputs).sort());
    for (const [name, spec] of Object.entries(action.inputs)) {
      // The token's default is a workflow expression the runner fills in; outside a run there is none.
      if (name === 'github-token') continue;
      expect(INPUT_DEFAULTS[name as keyof typeof INPUT_DEFAULTS], name).toBe(String(spec.default ?? ''));
    }
  });
});

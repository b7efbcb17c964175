// parseYamlDocument (src/config/yaml-parse.ts): the `yaml` library's debugging switches
// LOG_TOKENS and LOG_STREAM print to standard output through console.log (yaml's
// dist/parse/parser.js and dist/compose/composer.js); through parseYamlDocument they print nothing,
// the document is the same, and the process's environment is the same object afterwards.
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { parseDocument } from 'yaml';
import { parseYamlDocument } from '../../src/config/yaml-parse.js';

const TEXT = 'version: 1\nname: pressing-yield\nterms:\n  - polynomial: { of: temperature, degree: 2 }\n';
const OPTIONS = { version: '1.2', schema: 'core', uniqueKeys: false } as const;

afterEach(() => {
  delete process.env.LOG_TOKENS;
  delete process.env.LOG_STREAM;
  vi.restoreAllMocks();
});

describe('parseYamlDocument', () => {
  it('prints nothing with LOG_TOKENS and LOG_STREAM set (the library itself prints), and gives the same document', () => {
    process.env.LOG_TOKENS = '1';
    process.env.LOG_STREAM = '1';
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const direct = parseDocument(TEXT, OPTIONS);
    expect(log.mock.calls.length, 'the library prints its tokens when called directly').toBeGreaterThan(0);
    log.mockClear();
    const hidden = parseYamlDocument(TEXT, OPTIONS);
    expect(log).not.toHaveBeenCalled();
    expect(hidden.toJS()).toEqual(direct.toJS());
    expect(hidden.errors).toEqual([]);
  });

  it('gives the environment back, the same object, after a parse and after a throw', () => {
    const before = process.env;
    parseYamlDocument(TEXT, OPTIONS);
    expect(process.env).toBe(before);
    expect(() => parseYamlDocument(TEXT, { ...OPTIONS, version: 'no-such-version' as '1.2' })).toThrow();
    expect(process.env).toBe(before);
    expect(process.env.PATH).toBe(before.PATH);
  });

  it('keeps a JSON report on standard output whole with the switches set (the built CLI)', () => {
    const bundle = path.join(process.cwd(), 'dist', 'cli', 'index.js');
    const run = (env: Record<string, string>) =>
      spawnSync(process.execPath, [bundle, 'check', '--root', 'examples', '--format', 'json', '--jobs', '1'], {
        encoding: 'utf8',
        env: { ...process.env, ...env },
        maxBuffer: 64 * 1024 * 1024,
      });
    const plain = run({});
    const switched = run({ LOG_TOKENS: '1', LOG_STREAM: '1' });
    expect(switched.status).toBe(plain.status);
    expect(() => JSON.parse(switched.stdout)).not.toThrow();
    expect(switched.stdout).toBe(plain.stdout);
  });
});

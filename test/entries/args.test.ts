// The command line (src/args.ts): every command, option form and mistake, without running a
// pipeline. The bundle's own behaviour on these is exercised in test/cli.test.ts.
import { mkdirSync, mkdtempSync, realpathSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseArgs, type Parsed } from '../../src/entries/args.js';
import { InputError } from '../../src/core/errors.js';
import { VERSION } from '../../src/core/version.js';

// A real working directory: --root is resolved with realpath. It holds `sub/`, a link `up` to its
// parent (a folder replaced by a link leading out), and a link `inner` to `sub` (staying inside).
const cwd = realpathSync(mkdtempSync(path.join(tmpdir(), 'fitgate-args-')));
mkdirSync(path.join(cwd, 'sub'));
symlinkSync('..', path.join(cwd, 'up'));
symlinkSync('sub', path.join(cwd, 'inner'));
afterAll(() => rmSync(cwd, { recursive: true, force: true }));

function check(argv: string[]): Extract<Parsed, { kind: 'check' }> {
  const parsed = parseArgs(['check', ...argv], cwd);
  if (parsed.kind !== 'check') throw new Error(`expected a check command, got ${JSON.stringify(parsed)}`);
  return parsed;
}

function printed(argv: string[]): { text: string; status: number } {
  const parsed = parseArgs(argv, cwd);
  if (parsed.kind !== 'print') throw new Error(`expected text to print, got ${parsed.kind}`);
  return { text: parsed.text, status: parsed.status };
}

describe('fitgate check', () => {
  it('has the documented defaults', () => {
    expect(check([])).toEqual({
      kind: 'check',
      settings: { root: cwd, config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' },
      format: 'text',
      out: null,
      color: null,
      debug: false,
      verbose: false,
      base: null,
      shard: null,
      jobs: null,
      html: null,
      sarif: null,
      junit: null,
    });
  });

  it('reads options in any order around the descriptors, with = or a separate value', () => {
    const parsed = check([
      'models/a.model.yml',
      '--format=json',
      'models/b.model.yml',
      '--out',
      'r.json',
      '--fail-on',
      'warn',
      '--debug',
      '--jobs',
      '3',
      '--shard=2/5',
      '--base',
      'main',
      '--html',
      'site',
      '--sarif',
      'r.sarif',
      '--junit',
      'r.xml',
    ]);
    expect(parsed.settings.descriptors).toEqual(['models/a.model.yml', 'models/b.model.yml']);
    expect(parsed).toMatchObject({
      format: 'json',
      out: 'r.json',
      debug: true,
      jobs: 3,
      shard: { index: 2, count: 5 },
      base: 'main',
      html: 'site',
      sarif: 'r.sarif',
      junit: 'r.xml',
    });
    expect(parsed.settings.failOn).toBe('warn');
  });

  it('keeps the last value of a repeated option, and the last of --color and --no-color', () => {
    expect(check(['--format', 'json', '--format', 'markdown']).format).toBe('markdown');
    expect(check(['--color']).color).toBe(true);
    expect(check(['--no-color']).color).toBe(false);
    expect(check(['--color', '--no-color']).color).toBe(false);
    expect(check(['--no-color', '--color']).color).toBe(true);
  });

  it('takes everything after -- as descriptors, even names starting with a dash', () => {
    expect(check(['--', '-odd.model.yml']).settings.descriptors).toEqual(['-odd.model.yml']);
  });

  it('resolves the root and descriptors from the working directory, the settings file from the root', () => {
    const parsed = check(['--root', 'sub', '--config', 'conf/fg.yml', 'sub/models/a.model.yml']);
    expect(parsed.settings).toMatchObject({
      root: path.join(cwd, 'sub'),
      config: 'conf/fg.yml',
      configExplicit: true,
      descriptors: ['models/a.model.yml'],
    });
  });

  it('takes the root as its real path, and descriptors written through the link or the real folder', () => {
    const parsed = check(['--root', 'inner', 'inner/models/a.model.yml', 'sub/models/b.model.yml']);
    expect(parsed.settings.root).toBe(path.join(cwd, 'sub'));
    expect(parsed.settings.descriptors).toEqual(['models/a.model.yml', 'models/b.model.yml']);
  });

  it('refuses a --root that is a link leading out of the working directory, or no folder at all', () => {
    expect(() => check(['--root', 'up'])).toThrow(
      expect.objectContaining({ code: 'folder-refused', location: { key: '--root' } }) as Error,
    );
    expect(() => check(['--root', 'up'])).toThrow(/leads out of the working directory .* through a symbolic link/);
    expect(() => check(['--root', 'missing'])).toThrow(/does not exist; expected an existing folder/);
    // Named outside the working directory, the root is taken as named (its real path).
    expect(check(['--root', '..']).settings.root).toBe(path.dirname(cwd));
  });

  it('refuses paths outside the root with the key that named them', () => {
    expect(() => check(['../elsewhere.model.yml'])).toThrow(InputError);
    expect(() => check(['--config', '../fitgate.yml'])).toThrow(/outside the repository root/);
  });

  it('refuses a bad --jobs or --shard as an InputError naming the option', () => {
    for (const argv of [
      ['--jobs', '0'],
      ['--jobs', '1.5'],
      ['--jobs', 'many'],
    ]) {
      expect(() => check(argv)).toThrow(expect.objectContaining({ code: 'jobs-value', location: { key: '--jobs' } }) as Error);
    }
    expect(() => check(['--shard', '3/2'])).toThrow(expect.objectContaining({ location: { key: '--shard' } }) as Error);
  });

  it('treats an empty --base as no base', () => {
    expect(check(['--base', '']).base).toBeNull();
  });
});

describe('fitgate merge', () => {
  it('parses reports, format, output and fail-on', () => {
    expect(parseArgs(['merge', 'a.json', 'dir/b.json', '--format', 'markdown', '--out', 'all.md', '--fail-on', 'warn'], cwd)).toEqual({
      kind: 'merge',
      reports: [`${cwd}/a.json`, `${cwd}/dir/b.json`],
      format: 'markdown',
      out: 'all.md',
      color: null,
      failOn: 'warn',
      debug: false,
      verbose: false,
      html: null,
      sarif: null,
      junit: null,
      expect: null,
    });
  });

  it('refuses the options only check has', () => {
    expect(printed(['merge', 'a.json', '--root', 'x'])).toEqual({
      text: "error: unknown option '--root'\n(run `fitgate merge --help` for the options)\n",
      status: 2,
    });
  });
});

describe('mistakes on the command line (status 2, a pointer to the help)', () => {
  it.each([
    [['frob'], "error: unknown command 'frob'\n(run `fitgate --help` for the commands)\n"],
    [['--bogus'], "error: unknown option '--bogus'\n(run `fitgate --help` for the commands)\n"],
    [['help', 'frob'], "error: unknown command 'frob'\n(run `fitgate --help` for the commands)\n"],
    [['check', '--bogus'], "error: unknown option '--bogus'\n(run `fitgate check --help` for the options)\n"],
    [['check', '-x'], "error: unknown option '-x'\n(run `fitgate check --help` for the options)\n"],
    [
      ['check', '--format', 'xml'],
      "error: option '--format <format>' argument 'xml' is invalid; expected one of text, json, markdown\n(run `fitgate check --help` for the options)\n",
    ],
    [
      ['check', '--fail-on=never'],
      "error: option '--fail-on <level>' argument 'never' is invalid; expected one of fail, warn\n(run `fitgate check --help` for the options)\n",
    ],
    [['check', '--out'], "error: option '--out <file>' argument missing\n(run `fitgate check --help` for the options)\n"],
    [['check', '--debug=yes'], "error: option '--debug' takes no value\n(run `fitgate check --help` for the options)\n"],
    [['merge'], "error: missing required argument 'report'\n(run `fitgate merge --help` for the options)\n"],
  ])('%j', (argv, text) => {
    expect(printed(argv)).toEqual({ text, status: 2 });
  });
});

describe('help and version (status 0)', () => {
  it('prints the version', () => {
    expect(printed(['--version'])).toEqual({ text: `${VERSION}\n`, status: 0 });
    expect(printed(['-V'])).toEqual({ text: `${VERSION}\n`, status: 0 });
  });

  it('prints the main help with --help, -h and help (status 0), and with no command (status 2)', () => {
    const main = printed(['--help']);
    expect(main.status).toBe(0);
    expect(printed([])).toEqual({ text: main.text, status: 2 });
    expect(main.text).toMatch(/^Usage: fitgate \[options\] \[command\]\n/);
    for (const argv of [['-h'], ['help']]) expect(printed(argv)).toEqual(main);
    for (const command of ['check [options] [descriptor...]', 'merge [options] <report...>', 'help [command]'])
      expect(main.text).toContain(`  ${command}`);
  });

  it('prints a command help that lists every option, wherever --help stands', () => {
    const help = printed(['check', '--help']);
    expect(help.status).toBe(0);
    expect(printed(['check', 'a.model.yml', '-h', '--bogus'])).toEqual(help);
    expect(printed(['help', 'check'])).toEqual(help);
    for (const flag of [
      '--root <dir>',
      '--config <file>',
      '--format <format>',
      '--out <file>',
      '--fail-on <level>',
      '--color',
      '--no-color',
      '--base <ref>',
      '--shard <K/N>',
      '--jobs <n>',
      '--html <dir>',
      '--sarif <file>',
      '--junit <file>',
      '--debug',
      '-h, --help',
    ]) {
      expect(help.text).toContain(`  ${flag} `);
    }
    expect(help.text).toContain('one of text, json, markdown; default: text');
    expect(printed(['merge', '--help']).text).toMatch(/^Usage: fitgate merge \[options\] <report\.\.\.>\n/);
  });

  it('wraps every help line to 80 columns', () => {
    for (const argv of [[], ['check', '--help'], ['merge', '--help'], ['init', '--help'], ['refit', '--help'], ['explain', '--help']]) {
      for (const line of printed(argv).text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
    }
  });
});

// `fitgate init`, through the command (the sources run as `node cli.js`): the files it writes,
// the reproducible hold-out split, the limit suited to the row count, and refusing to overwrite.
import { existsSync, mkdirSync, readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { gunzipSync, gzipSync } from 'node:zlib';
import path from 'node:path';
import { parse } from 'yaml';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LIMIT_KEYS } from '../../src/config/generated/limit-keys.js';
import { VERSION } from '../../src/core/version.js';
import { sourceCli } from './source-cli.js';
import { writeRepo } from './small-repo.js';

let cli: ReturnType<typeof sourceCli>;
const cleanup: Array<() => void> = [];
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => {
  cli?.remove();
  for (const f of cleanup) f();
});

/** A greenhouse log: `rows` rows of vent opening, a site label (text) and humidity, in time order. */
function log(rows: number): string {
  const lines = ['hour,vent_pct,site,humidity_pct'];
  for (let i = 0; i < rows; i++) {
    const vent = 5 + ((i * 37) % 90);
    lines.push(`${i},${vent},north,${(82 - 0.35 * vent + 0.8 * Math.sin(1.7 * i)).toFixed(3)}`);
  }
  return `${lines.join('\n')}\n`;
}

function repo(files: Record<string, string>): string {
  const r = writeRepo(files);
  cleanup.push(r.remove);
  return r.dir;
}

const read = (dir: string, rel: string) => readFileSync(path.join(dir, rel), 'utf8');
const dataRows = (text: string) => text.trimEnd().split('\n').slice(1);

describe('fitgate init with one CSV', () => {
  it('splits a seeded hold-out, writes a settings file and a descriptor that check passes', () => {
    const dir = repo({ 'data/air.csv': log(20) });
    const r = cli.run(['init', 'data/air.csv', '--target', 'humidity_pct'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain('wrote data/air-train.csv\nwrote data/air-holdout.csv\nwrote models/air.model.yml\nwrote fitgate.yml\n');
    expect(r.stdout).toContain('5 of 20 rows drawn at random with seed 1');
    const train = dataRows(read(dir, 'data/air-train.csv'));
    const holdout = dataRows(read(dir, 'data/air-holdout.csv'));
    expect([train.length, holdout.length]).toEqual([15, 5]);
    expect([...train, ...holdout].sort()).toEqual(dataRows(log(20)).sort());
    expect(read(dir, 'data/air-holdout.csv').split('\n')[0]).toBe('hour,vent_pct,site,humidity_pct');

    const descriptor = read(dir, 'models/air.model.yml');
    expect(descriptor.split('\n')[0]).toBe(
      `# yaml-language-server: $schema=https://raw.githubusercontent.com/fitgate/fitgate/v${VERSION}/dist/schema/descriptor.schema.json`,
    );
    expect(read(dir, 'fitgate.yml').split('\n')[0]).toBe(
      `# yaml-language-server: $schema=https://raw.githubusercontent.com/fitgate/fitgate/v${VERSION}/dist/schema/settings.schema.json`,
    );
    const value = parse(descriptor) as { data: Record<string, string>; terms: unknown[]; limits: Record<string, number> };
    expect(value.data).toEqual({ train: '../data/air-train.csv', holdout: '../data/air-holdout.csv', target: 'humidity_pct' });
    // The text column is left out, and said so.
    expect(value.terms).toEqual([{ linear: ['hour', 'vent_pct'] }]);
    expect(descriptor).toContain('# Left out (not numeric): site.');
    // 3 parameters for 15 rows = 0.2: the default 0.1 would fail; the limit written lets it through and says why.
    expect(value.limits).toEqual({ params_per_sample: 0.2 });
    expect(descriptor).toMatch(
      /params_per_sample: 0.2 +# 3 parameters for 15 training rows: the default 0.1 \(common practice: at least 10 rows per parameter\) would fail this small file/,
    );
    for (const { key } of LIMIT_KEYS) {
      if (key !== 'params_per_sample') expect(descriptor, key).toMatch(new RegExp(`\\n  # ${key}: `));
      expect(read(dir, 'fitgate.yml'), key).toMatch(new RegExp(`\\n#   ${key}: `));
    }
    const check = cli.run(['check', '--jobs', '1'], dir);
    expect(check.status, check.stdout).toBe(0);
    expect(check.stdout).toContain('note: settings: fitgate.yml');
  });

  it('splits the same way with the same seed, differently with another, and by a block at the end with --split last', () => {
    const runs = [
      ['--seed', '7'],
      ['--seed', '7'],
      ['--seed', '8'],
      ['--split', 'last'],
    ].map((extra) => {
      const dir = repo({ 'data/air.csv': log(40) });
      const r = cli.run(['init', 'data/air.csv', ...extra], dir);
      expect(r.status, r.stderr).toBe(0);
      return read(dir, 'data/air-holdout.csv');
    });
    expect(runs[1]).toBe(runs[0]);
    expect(runs[2]).not.toBe(runs[0]);
    expect(dataRows(runs[3])).toEqual(dataRows(log(40)).slice(30));
  });

  it('writes the default limit, saying it suits the file, when there are rows enough', () => {
    const dir = repo({ 'data/air.csv': log(200) });
    expect(cli.run(['init', 'data/air.csv', '--holdout-share', '0.2'], dir).status).toBe(0);
    expect(read(dir, 'models/air.model.yml')).toMatch(
      /params_per_sample: 0.1 +# 3 parameters for 160 training rows: the default 0.1 \(common practice: at least 10 rows per parameter\) suits this file/,
    );
  });

  it('never overwrites a file without --force, and writes nothing when one is in the way', () => {
    const dir = repo({ 'data/air.csv': log(20), 'models/air.model.yml': '# mine\n' });
    const refused = cli.run(['init', 'data/air.csv'], dir);
    expect(refused.status).toBe(2);
    expect(refused.stderr).toBe('fitgate: models/air.model.yml: exists; nothing was written. Run again with --force to overwrite it\n');
    expect(read(dir, 'models/air.model.yml')).toBe('# mine\n');
    for (const f of ['data/air-train.csv', 'data/air-holdout.csv', 'fitgate.yml']) expect(existsSync(path.join(dir, f)), f).toBe(false);
    const forced = cli.run(['init', 'data/air.csv', '--force'], dir);
    expect(forced.status, forced.stderr).toBe(0);
    expect(read(dir, 'models/air.model.yml')).toContain('name: air');
  });

  it('keeps an existing settings file as it is, even with --force', () => {
    const dir = repo({ 'data/air.csv': log(20), 'fitgate.yml': "version: 1\n# the team's own\n" });
    const r = cli.run(['init', 'data/air.csv', '--force'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(read(dir, 'fitgate.yml')).toBe("version: 1\n# the team's own\n");
    expect(r.stdout).toContain('kept the settings file fitgate.yml as it is');
  });

  it('never writes through a link that leads outside the repository', () => {
    const outside = repo({ 'keep.txt': 'x\n' });
    const dir = repo({ 'data/air.csv': log(20) });
    symlinkSync(outside, path.join(dir, 'models'));
    const r = cli.run(['init', 'data/air.csv'], dir);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^fitgate: `models\/air\.model\.yml`: .* leads out of .* through a symbolic link/);
    expect(existsSync(path.join(outside, 'air.model.yml'))).toBe(false);
  });
});

describe('fitgate init with a hold-out file', () => {
  it('uses both files and the target given, with degree-2 terms on request, and points at an installed schema', () => {
    const dir = repo({
      'data/air-train.csv': log(60),
      'data/air-holdout.csv': log(20),
      'node_modules/fitgate/dist/schema/descriptor.schema.json': '{}\n',
    });
    mkdirSync(path.join(dir, 'models'));
    const r = cli.run(
      [
        'init',
        'data/air-train.csv',
        '--holdout',
        'data/air-holdout.csv',
        '--target',
        'humidity_pct',
        '--degree',
        '2',
        '--name',
        'greenhouse',
      ],
      dir,
    );
    expect(r.status, r.stderr).toBe(0);
    const descriptor = read(dir, 'models/greenhouse.model.yml');
    expect(descriptor.split('\n')[0]).toBe('# yaml-language-server: $schema=../node_modules/fitgate/dist/schema/descriptor.schema.json');
    const value = parse(descriptor) as { data: Record<string, string>; terms: unknown[] };
    expect(value.data).toEqual({ train: '../data/air-train.csv', holdout: '../data/air-holdout.csv', target: 'humidity_pct' });
    expect(value.terms).toEqual([{ polynomial: { of: 'hour', degree: 2 } }, { polynomial: { of: 'vent_pct', degree: 2 } }]);
    expect(existsSync(path.join(dir, 'data/air-train-train.csv'))).toBe(false);
    const check = cli.run(['check', '--jobs', '1'], dir);
    expect([0, 1]).toContain(check.status);
  });

  it('names a target that is not a column and suggests the nearest one', () => {
    const dir = repo({ 'data/air.csv': log(20) });
    const r = cli.run(['init', 'data/air.csv', '--target', 'humidty_pct'], dir);
    expect(r.status).toBe(2);
    expect(r.stderr).toBe(
      'fitgate: data/air.csv: `--target`: no column "humidty_pct" (did you mean "humidity_pct"?); expected one of: hour, vent_pct, site, humidity_pct\n',
    );
  });
});

describe('fitgate init with data as it arrives', () => {
  /** The greenhouse log written with semicolons and decimal commas, as some spreadsheet locales save it. */
  const commaLog = (rows: number) => log(rows).replaceAll(',', ';').replaceAll('.', ',');

  it('reads decimal commas (auto), writes data.decimal into the descriptor, and check reads the split files', () => {
    const dir = repo({ 'data/air.csv': commaLog(40) });
    const r = cli.run(['init', 'data/air.csv', '--target', 'humidity_pct'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain('read the numbers with a decimal comma');
    const value = parse(read(dir, 'models/air.model.yml')) as { data: Record<string, string>; terms: unknown[] };
    expect(value.data).toMatchObject({ decimal: ',', target: 'humidity_pct' });
    expect(value.terms).toEqual([{ linear: ['hour', 'vent_pct'] }]);
    expect(read(dir, 'data/air-train.csv').split('\n')[1]).toMatch(/^\d+;\d+;north;\d+,\d+$/);
    const check = cli.run(['check', '--jobs', '1'], dir);
    expect([0, 1], check.stdout + check.stderr).toContain(check.status);
  });

  it('with --decimal . a decimal-comma target is refused with the init option that reads it', () => {
    const dir = repo({ 'data/air.csv': commaLog(20) });
    const r = cli.run(['init', 'data/air.csv', '--target', 'humidity_pct', '--decimal', '.'], dir);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/column "humidity_pct": expected a finite decimal number .*give `--decimal ,`/);
    expect(r.stderr).not.toContain('in the descriptor');
  });

  it('missing cells: refused with the option that drops them; with --missing drop the rows are dropped, counted and written down', () => {
    const text = log(40)
      .split('\n')
      .map((line, i) => (i === 5 ? line.replace(/,[^,]*$/, ',NA') : i === 9 ? line.replace(/,[^,]*$/, ',') : line))
      .join('\n');
    const dir = repo({ 'data/air.csv': text });
    const refused = cli.run(['init', 'data/air.csv', '--target', 'humidity_pct'], dir);
    expect(refused.status).toBe(2);
    expect(refused.stderr).toMatch(/data\/air\.csv:6: .*got "NA".*give `--missing drop`/);
    const r = cli.run(['init', 'data/air.csv', '--target', 'humidity_pct', '--missing', 'drop'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain(
      '2 rows of data/air.csv have a missing cell in a used column: data.missing: drop leaves them out of every check',
    );
    const descriptor = read(dir, 'models/air.model.yml');
    expect((parse(descriptor) as { data: Record<string, string> }).data).toMatchObject({ missing: 'drop' });
    expect(descriptor).toContain('# Rows with a missing cell in a used column: 2 in data/air.csv');
    // Every row stays in the split files, each once; the check drops the two.
    const split = [...dataRows(read(dir, 'data/air-train.csv')), ...dataRows(read(dir, 'data/air-holdout.csv'))];
    expect(split.sort()).toEqual(dataRows(text).sort());
    const check = cli.run(['check', '--jobs', '1'], dir);
    expect([0, 1], check.stdout + check.stderr).toContain(check.status);
  });

  it('splits a gzip file into gzip files that check reads', () => {
    const dir = repo({});
    mkdirSync(path.join(dir, 'data'));
    writeFileSync(path.join(dir, 'data/air.csv.gz'), gzipSync(log(40)));
    const r = cli.run(['init', 'data/air.csv.gz', '--target', 'humidity_pct'], dir);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stdout).toContain('wrote data/air-train.csv.gz\nwrote data/air-holdout.csv.gz\n');
    const train = dataRows(gunzipSync(readFileSync(path.join(dir, 'data/air-train.csv.gz'))).toString('utf8'));
    const holdout = dataRows(gunzipSync(readFileSync(path.join(dir, 'data/air-holdout.csv.gz'))).toString('utf8'));
    expect([...train, ...holdout].sort()).toEqual(dataRows(log(40)).sort());
    expect((parse(read(dir, 'models/air.model.yml')) as { data: Record<string, string> }).data).toMatchObject({
      train: '../data/air-train.csv.gz',
      holdout: '../data/air-holdout.csv.gz',
    });
    const check = cli.run(['check', '--jobs', '1'], dir);
    expect([0, 1], check.stdout + check.stderr).toContain(check.status);
  });
});

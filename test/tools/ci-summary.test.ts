// .ci/run's closing line (.ci/test-summary.mjs) on reports shaped as vitest 4.1 writes them with
// `--reporter=json` (shapes captured from real runs: a file that throws while loading has status
// `failed`, its message, and no assertion results; a throwing afterAll leaves its tests `passed`).
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
// @ts-expect-error the summariser is a plain ES module without types
import { summarise } from '../../.ci/test-summary.mjs';

const script = fileURLToPath(new URL('../../.ci/test-summary.mjs', import.meta.url));
const test = (status: string) => ({ ancestorTitles: [], fullName: 't', status, title: 't', failureMessages: [] });
const file = (name: string, status: string, tests: object[], message = '') => ({
  assertionResults: tests,
  status,
  message,
  name: path.resolve(name),
});

describe('.ci/run closing line', () => {
  it('counts passed, failed and skipped tests', () => {
    const report = {
      testResults: [
        file('test/a.test.ts', 'failed', [test('passed'), test('failed'), test('skipped'), test('todo')]),
        file('test/b.test.ts', 'passed', [test('passed')]),
      ],
    };
    const s = summarise(report, 1);
    expect(s.lines).toEqual(['tests: 2 passed, 1 failed, 2 skipped']);
  });

  it('counts a test file that failed to load as failed and names it', () => {
    const report = {
      testResults: [
        file('test/load.test.ts', 'failed', [], 'boom at load\n    at somewhere'),
        file('test/ok.test.ts', 'passed', [test('passed')]),
      ],
    };
    const s = summarise(report, 1);
    expect(s.lines).toEqual(['failed outside its tests: test/load.test.ts: boom at load', 'tests: 1 passed, 1 failed, 0 skipped']);
  });

  it('counts a file whose hook threw while its tests passed', () => {
    const s = summarise({ testResults: [file('test/after.test.ts', 'failed', [test('passed')], 'after boom')] }, 1);
    expect(s.lines.at(-1)).toBe('tests: 1 passed, 1 failed, 0 skipped');
  });

  it('counts a non-zero vitest status with a clean report (an unhandled error) as a failure', () => {
    const s = summarise({ testResults: [file('test/ok.test.ts', 'passed', [test('passed'), test('passed')])] }, 1);
    expect(s.failed).toBe(1);
    expect(s.lines.at(-1)).toBe('tests: 2 passed, 1 failed, 0 skipped');
    expect(summarise({ testResults: [file('test/ok.test.ts', 'passed', [test('passed')])] }, 0).failed).toBe(0);
  });

  it('prints a failure line and exits 1 when the report is missing', () => {
    const run = spawnSync(process.execPath, [script, path.join(fileURLToPath(new URL('.', import.meta.url)), 'no-such-report.json'), '0'], {
      encoding: 'utf8',
    });
    expect(run.status).toBe(1);
    const lines = run.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^the vitest report is missing or unreadable \(ENOENT/);
    expect(lines.at(-1)).toBe('tests: 0 passed, 1 failed, 0 skipped');
  });
});

// The closing line of .ci/run: `tests: N passed, N failed, N skipped` from vitest's JSON report.
//
//   node .ci/test-summary.mjs REPORT.json VITEST_EXIT_STATUS
//
// A test file that failed outside its tests (it did not load, or a hook threw) counts as one
// failed test and is named on a line of its own; a missing or unreadable report counts as one
// failure; so does a non-zero vitest status with no failure in the report (an error outside any
// test). Exit status 1 when anything failed, else 0.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * Counts a vitest JSON report. `report`: the parsed JSON, or null when missing/unreadable
 * (`problem` says why); `vitestStatus`: vitest's exit status.
 * @returns {{ lines: string[], passed: number, failed: number, skipped: number }}
 */
export function summarise(report, vitestStatus, problem = '') {
  const lines = [];
  if (report === null) {
    lines.push(`the vitest report is missing or unreadable (${problem.slice(0, 120)}); vitest exited with status ${vitestStatus}`);
    lines.push('tests: 0 passed, 1 failed, 0 skipped');
    return { lines, passed: 0, failed: 1, skipped: 0 };
  }
  let passed = 0;
  let failed = 0;
  let skipped = 0;
  const files = Array.isArray(report.testResults) ? report.testResults : [];
  for (const file of files) {
    const tests = Array.isArray(file.assertionResults) ? file.assertionResults : [];
    for (const t of tests) {
      if (t.status === 'passed') passed++;
      else if (t.status === 'failed') failed++;
      else skipped++;
    }
    if (file.status === 'failed' && !tests.some((t) => t.status === 'failed')) {
      failed++;
      const first = String(file.message ?? '')
        .split('\n')[0]
        .slice(0, 160);
      lines.push(`failed outside its tests: ${path.relative(process.cwd(), String(file.name))}: ${first || 'no message'}`);
    }
  }
  if (files.length === 0) {
    failed++;
    lines.push('the vitest report lists no test file');
  }
  if (vitestStatus !== 0 && failed === 0) {
    failed = 1;
    lines.push(`vitest exited with status ${vitestStatus} although no test failed (an error outside any test; see the log above)`);
  }
  lines.push(`tests: ${passed} passed, ${failed} failed, ${skipped} skipped`);
  return { lines, passed, failed, skipped };
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const [file, status] = process.argv.slice(2);
  let report = null;
  let problem = '';
  try {
    report = JSON.parse(readFileSync(file, 'utf8'));
  } catch (e) {
    problem = e instanceof Error ? e.message : String(e);
  }
  const { lines, failed } = summarise(report, Number(status), problem);
  for (const line of lines) console.log(line);
  process.exitCode = failed > 0 ? 1 : 0;
}

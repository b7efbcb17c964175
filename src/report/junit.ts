/**
 * The JUnit XML report, read by most CI systems' test views: one `<testsuite>` per model, one
 * `<testcase>` per check (`classname` the model, `name` the check id). A failing check is a
 * `<failure>` with its message; a warning passes and carries the message in `<system-out>`
 * (unless `failOn` is `warn`, then it fails too); a skipped check is `<skipped>`; a model that
 * could not be checked is one test case `load` with an `<error>`. All text is XML-escaped with
 * {@link escapeXml}.
 */
import { formatNumber } from '../core/format.js';
import { fromJsonNumber, type CheckResult, type ModelResult, type Result } from '../result/result.js';
import { escapeXml } from './escape.js';
import { limitText } from './wording.js';

/** Options of the JUnit report. */
export interface JunitOptions {
  /** `fail` (default): only failing checks are failures; `warn`: warnings are failures too. */
  failOn?: 'fail' | 'warn';
}

function attrs(pairs: Record<string, string | number>): string {
  return Object.entries(pairs)
    .map(([k, v]) => ` ${k}="${escapeXml(String(v))}"`)
    .join('');
}

function figure(c: CheckResult): string {
  const value = c.value === null ? '–' : formatNumber(fromJsonNumber(c.value));
  return `value ${value}; limit ${limitText(c)}`;
}

interface Counts {
  tests: number;
  failures: number;
  errors: number;
  skipped: number;
}

function suite(m: ModelResult, failOn: 'fail' | 'warn'): { xml: string; counts: Counts } {
  const cases: string[] = [];
  const counts: Counts = { tests: 0, failures: 0, errors: 0, skipped: 0 };
  const common = { classname: m.name, file: m.descriptor };
  if (m.error) {
    counts.tests = 1;
    counts.errors = 1;
    const where = `${m.error.file ?? m.descriptor}${m.error.line ? `:${m.error.line}` : ''}`;
    cases.push(
      `    <testcase${attrs({ ...common, name: 'load', ...(m.error.line ? { line: m.error.line } : {}) })}>\n` +
        `      <error${attrs({ message: m.error.message, type: m.error.code })}>${escapeXml(`${where}: ${m.error.message}`)}</error>\n` +
        '    </testcase>',
    );
  }
  for (const c of m.checks) {
    counts.tests++;
    const open = `    <testcase${attrs({ ...common, name: c.id, line: c.line })}`;
    const text = `${m.descriptor}:${c.line}: ${c.message}. ${figure(c)}.${c.advice ? ` ${c.advice}` : ''}`;
    if (c.status === 'fail' || (c.status === 'warn' && failOn === 'warn')) {
      counts.failures++;
      cases.push(`${open}>\n      <failure${attrs({ message: c.message, type: c.code })}>${escapeXml(text)}</failure>\n    </testcase>`);
    } else if (c.status === 'warn') {
      cases.push(`${open}>\n      <system-out>${escapeXml(`WARNING: ${text}`)}</system-out>\n    </testcase>`);
    } else if (c.status === 'skipped') {
      counts.skipped++;
      cases.push(`${open}>\n      <skipped${attrs({ message: c.message })}/>\n    </testcase>`);
    } else {
      cases.push(`${open}/>`);
    }
  }
  const head = `  <testsuite${attrs({ name: m.name, tests: counts.tests, failures: counts.failures, errors: counts.errors, skipped: counts.skipped, file: m.descriptor })}`;
  // A model trained elsewhere says so in the suite's properties (JUnit's place for facts of a suite).
  if (m.kind) cases.unshift(`    <properties>\n      <property${attrs({ name: 'kind', value: m.kind })}/>\n    </properties>`);
  return { xml: cases.length ? `${head}>\n${cases.join('\n')}\n  </testsuite>` : `${head}/>`, counts };
}

/**
 * The JUnit XML report in pieces (the head, then one test suite per model), to write one after
 * another: joined, they are {@link formatJunit}'s text.
 * @param result the run's Result
 * @param options what counts as a failure; defaults in {@link JunitOptions}
 */
export function* junitReport(result: Result, options: JunitOptions = {}): Generator<string> {
  const failOn = options.failOn ?? 'fail';
  const suites = result.models.map((m) => suite(m, failOn));
  const total: Counts = { tests: 0, failures: 0, errors: 0, skipped: 0 };
  for (const s of suites) {
    total.tests += s.counts.tests;
    total.failures += s.counts.failures;
    total.errors += s.counts.errors;
    total.skipped += s.counts.skipped;
  }
  const head = `<testsuites${attrs({ name: result.tool.name, tests: total.tests, failures: total.failures, errors: total.errors, skipped: total.skipped })}`;
  if (suites.length === 0) {
    yield `<?xml version="1.0" encoding="UTF-8"?>\n${head}/>\n`;
    return;
  }
  yield `<?xml version="1.0" encoding="UTF-8"?>\n${head}>`;
  for (const s of suites) yield `\n${s.xml}`;
  yield '\n</testsuites>\n';
}

/**
 * Formats the Result as JUnit XML ({@link junitReport} joined).
 * @param result the run's Result
 * @param options what counts as a failure; defaults in {@link JunitOptions}
 */
export function formatJunit(result: Result, options: JunitOptions = {}): string {
  return [...junitReport(result, options)].join('');
}

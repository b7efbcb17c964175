/**
 * The SARIF 2.1.0 report (OASIS Static Analysis Results Interchange Format, Version 2.1.0,
 * OASIS Standard, 2020), the format code scanning reads. One rule per check of the registry
 * (id, title, description, advice, `helpUri` to the check's docs page); one result per check that fails (`error`) or warns
 * (`warning`), and a `note` for a check that could not be computed, each at the descriptor line
 * the check points at. Models that could not be checked are tool execution notifications at
 * the file and line of the problem. Passing and switched-off checks are not results.
 */
import { createHash } from 'node:crypto';
import { CHECKS } from '../checks/index.js';
import { formatNumber } from '../core/format.js';
import { checkDocsUrl } from '../core/links.js';
import { fromJsonNumber, type CheckResult, type Result } from '../result/result.js';
import { jsonPieces } from '../core/json-pieces.js';

/** Options of the SARIF report. */
export interface SarifOptions {
  /**
   * Path of the checked root inside the repository that code scanning knows, with `/`, prepended
   * to every descriptor path (e.g. `examples` for `fitgate check --root examples`). Default
   * empty: the root is the repository's.
   */
  pathPrefix?: string;
  /** `informationUri` of the tool (documentation), or none. Default none. */
  informationUri?: string;
}

/** The `$schema` written into the log (the OASIS standard's schema). */
export const SARIF_SCHEMA_URI = 'https://docs.oasis-open.org/sarif/sarif/v2.1.0/os/schemas/sarif-schema-2.1.0.json';

type Level = 'error' | 'warning' | 'note';

function levelOf(c: CheckResult): Level | null {
  if (c.status === 'fail') return 'error';
  if (c.status === 'warn') return 'warning';
  if (c.status === 'skipped' && c.code.endsWith('/internal-error')) return 'note';
  return null;
}

/** A repository path as a relative URI reference: each segment percent-encoded. */
function pathUri(prefix: string, path: string): string {
  const full = [prefix.replace(/^\/+|\/+$/g, ''), path].filter((s) => s !== '').join('/');
  return full
    .split('/')
    .map((s) => encodeURIComponent(s))
    .join('/');
}

function ruleName(id: string): string {
  return id.replace(/(^|-)([a-z0-9])/g, (_, _dash: string, c: string) => c.toUpperCase());
}

/** A stable fingerprint of a finding: model name and check id (not the line, which moves). */
function fingerprint(model: string, check: string): string {
  return createHash('sha256').update(`${model}\u0000${check}`).digest('hex').slice(0, 32);
}

function region(line: number | null | undefined): { startLine: number } | undefined {
  return typeof line === 'number' && Number.isInteger(line) && line >= 1 ? { startLine: line } : undefined;
}

/**
 * Builds the SARIF log object of a run.
 * @param result the run's Result
 * @param options path prefix and tool URI; defaults in {@link SarifOptions}
 */
export function sarifLog(result: Result, options: SarifOptions = {}): Record<string, unknown> {
  const prefix = options.pathPrefix ?? '';
  const ruleIndex = new Map(CHECKS.map((c, i) => [c.id, i]));
  const rules = CHECKS.map((c) => ({
    id: c.id,
    name: ruleName(c.id),
    shortDescription: { text: c.title },
    fullDescription: { text: c.description },
    help: { text: c.advice },
    helpUri: checkDocsUrl(c.id),
    defaultConfiguration: { level: 'error' },
    properties: { limitKey: c.limitKey },
  }));
  const results: Record<string, unknown>[] = [];
  const notifications: Record<string, unknown>[] = [];
  for (const m of result.models) {
    if (m.error) {
      const file = m.error.file ?? m.descriptor;
      const r = region(m.error.line);
      notifications.push({
        level: 'error',
        message: { text: `${m.name}: could not be checked: ${m.error.message}` },
        descriptor: { id: m.error.code },
        locations: [
          { physicalLocation: { artifactLocation: { uri: pathUri(prefix, file), uriBaseId: '%SRCROOT%' }, ...(r ? { region: r } : {}) } },
        ],
      });
      continue;
    }
    for (const c of m.checks) {
      const level = levelOf(c);
      if (level === null) continue;
      const advice = c.advice ? ` ${c.advice}` : '';
      const r = region(c.line);
      const index = ruleIndex.get(c.id);
      results.push({
        ruleId: c.id,
        ...(index === undefined ? {} : { ruleIndex: index }),
        level,
        message: { text: `${m.name}: ${c.message}.${advice}` },
        locations: [
          {
            physicalLocation: {
              artifactLocation: { uri: pathUri(prefix, m.descriptor), uriBaseId: '%SRCROOT%' },
              ...(r ? { region: r } : {}),
            },
          },
        ],
        partialFingerprints: { 'fitgateFinding/v1': fingerprint(m.name, c.id) },
        properties: {
          model: m.name,
          ...(m.kind ? { kind: m.kind } : {}),
          code: c.code,
          value: c.value === null ? null : formatNumber(fromJsonNumber(c.value)),
          limit: c.limit,
          ...(c.floor ? { floor: c.floor } : {}),
          warn: c.warn,
        },
      });
    }
  }
  return {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: {
          driver: {
            name: result.tool.name,
            version: result.tool.version,
            semanticVersion: result.tool.version,
            ...(options.informationUri ? { informationUri: options.informationUri } : {}),
            rules,
          },
        },
        invocations: [
          {
            executionSuccessful: notifications.length === 0,
            ...(notifications.length ? { toolExecutionNotifications: notifications } : {}),
          },
        ],
        columnKind: 'unicodeCodePoints',
        results,
      },
    ],
  };
}

/**
 * The SARIF report in pieces (one result each at most), to write one after another: joined, they
 * are {@link formatSarif}'s text.
 */
export function* sarifReport(result: Result, options: SarifOptions = {}): Generator<string> {
  yield* jsonPieces(sarifLog(result, options));
  yield '\n';
}

/** The SARIF report as JSON text (two-space indentation, final newline). */
export function formatSarif(result: Result, options: SarifOptions = {}): string {
  return `${JSON.stringify(sarifLog(result, options), null, 2)}\n`;
}

import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv } from 'ajv';
import addFormatsModule from 'ajv-formats';
import { describe, expect, it } from 'vitest';
import { CHECKS } from '../../src/checks/index.js';
import { formatSarif, sarifLog, SARIF_SCHEMA_URI } from '../../src/report/sarif.js';
import { summarise } from '../../src/result/result.js';
import { VERSION } from '../../src/core/version.js';
import { AWKWARD, awkwardResult } from './fixture.js';

// The SARIF 2.1.0 JSON schema as shipped in @microsoft/jest-sarif (lib/schemas/sarif-2.1.0-rtm.5.json:
// the schema of the 2.1.0 release the OASIS standard was approved from). It is written as
// draft-04; its only draft-04-specific keyword is the top-level `id`, renamed to `$id` here so
// that Ajv (draft-07) reads it.
const require = createRequire(import.meta.url);
const schemaPath = require.resolve('@microsoft/jest-sarif/lib/schemas/sarif-2.1.0-rtm.5.json');
const schema = JSON.parse(readFileSync(schemaPath, 'utf8')) as Record<string, unknown>;
delete schema.$schema;
schema.$id = schema.id;
delete schema.id;
const addFormats = addFormatsModule as unknown as (ajv: Ajv) => Ajv;
// unicodeRegExp off: the schema's `language` pattern has a stray `]` that the `u` flag rejects (plain RegExp reads it as a literal).
const ajv = new Ajv({ allErrors: true, strict: false, unicodeRegExp: false });
addFormats(ajv);
const validate = ajv.compile(schema);

function valid(text: string): void {
  const ok = validate(JSON.parse(text));
  expect(ok, JSON.stringify(validate.errors, null, 2)).toBe(true);
}

type Log = {
  runs: { tool: { driver: { rules: { id: string }[] } }; results: Record<string, unknown>[]; invocations: Record<string, unknown>[] }[];
};

describe('formatSarif', () => {
  it('passes the SARIF 2.1.0 schema for awkward content, an empty run, and a path prefix', () => {
    valid(formatSarif(awkwardResult()));
    valid(formatSarif(summarise([], '1')));
    valid(formatSarif(awkwardResult(), { pathPrefix: 'examples/', informationUri: 'https://example.org/fitgate' }));
  });

  it('the schema rejects a broken log (the validation can fail)', () => {
    const log = sarifLog(awkwardResult()) as Log;
    (log.runs[0].results[0] as Record<string, unknown>).level = 'fatal';
    expect(validate(log)).toBe(false);
  });

  it('has one rule per registry check, in registry order', () => {
    const log = sarifLog(awkwardResult()) as Log;
    expect(log.runs[0].tool.driver.rules.map((r) => r.id)).toEqual(CHECKS.map((c) => c.id));
  });

  it("gives every rule a helpUri to its check's heading on the docs page", () => {
    const log = sarifLog(awkwardResult()) as { runs: { tool: { driver: { rules: { id: string; helpUri: string }[] } } }[] };
    const docs = readFileSync(new URL('../../docs/checks.md', import.meta.url), 'utf8');
    for (const rule of log.runs[0].tool.driver.rules) {
      expect(rule.helpUri).toBe(`https://github.com/fitgate/fitgate/blob/v${VERSION}/docs/checks.md#${rule.id}`);
      expect(docs, `docs/checks.md heading of ${rule.id}`).toContain(`\n### ${rule.id}\n`);
    }
  });

  it('reports fail as error, warn as warning, an internal error as note, at the descriptor line; passes are not results', () => {
    const log = sarifLog(awkwardResult()) as Log;
    const results = log.runs[0].results.map((r) => ({
      rule: r.ruleId,
      level: r.level,
      line: (r.locations as { physicalLocation: { region: { startLine: number } } }[])[0].physicalLocation.region.startLine,
      uri: (r.locations as { physicalLocation: { artifactLocation: { uri: string } } }[])[0].physicalLocation.artifactLocation.uri,
    }));
    expect(results).toEqual([
      { rule: 'generalisation-gap', level: 'error', line: 11, uri: 'models/odd%20name%7C%3Cx%3E.model.yml' },
      { rule: 'parameter-ratio', level: 'warning', line: 9, uri: 'models/odd%20name%7C%3Cx%3E.model.yml' },
      { rule: 'swing', level: 'note', line: 10, uri: 'models/odd%20name%7C%3Cx%3E.model.yml' },
    ]);
  });

  it('keeps repository text exact in messages (JSON escapes it) (golden)', () => {
    const log = sarifLog(awkwardResult()) as Log;
    expect((log.runs[0].results[0].message as { text: string }).text).toBe(`${AWKWARD}: ratio is ∞ for ${AWKWARD}. Fix ${AWKWARD}`);
    const text = formatSarif(awkwardResult());
    expect(text).toContain('"text": "a|b <c> & \\"d\\" \'e\' 🍎 `f` #g;: ratio is ∞ for');
    expect(text).toContain(`"$schema": "${SARIF_SCHEMA_URI}"`);
    expect(text).toContain('"value": "NaN"');
  });

  it('reports a model that could not be checked as a tool notification at its file and line', () => {
    const log = sarifLog(awkwardResult()) as Log;
    const inv = log.runs[0].invocations[0] as { executionSuccessful: boolean; toolExecutionNotifications: Record<string, unknown>[] };
    expect(inv.executionSuccessful).toBe(false);
    expect(inv.toolExecutionNotifications).toEqual([
      {
        level: 'error',
        message: { text: 'broken & <bad>: could not be checked: expected a number, got "x<y"' },
        descriptor: { id: 'bad-number' },
        locations: [
          { physicalLocation: { artifactLocation: { uri: 'data/b%26d.csv', uriBaseId: '%SRCROOT%' }, region: { startLine: 7 } } },
        ],
      },
    ]);
  });

  it('gives the same fingerprint for the same model and check, whatever the line', () => {
    const a = sarifLog(awkwardResult()) as Log;
    const moved = awkwardResult();
    moved.models[1].checks[0].line = 40;
    const b = sarifLog(moved) as Log;
    expect(b.runs[0].results[0].partialFingerprints).toEqual(a.runs[0].results[0].partialFingerprints);
    expect(a.runs[0].results[1].partialFingerprints).not.toEqual(a.runs[0].results[0].partialFingerprints);
  });
});

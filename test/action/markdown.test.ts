import { describe, expect, it } from 'vitest';
import { formatMarkdown, verdictLine } from '../../src/report/markdown.js';
import { COMMENT_MARKER, COMMENT_MAX_BYTES, formatComment, formatSummary, SUMMARY_MAX_BYTES } from '../../src/report/summary.js';
import { summarise } from '../../src/result/result.js';
import { awkwardResult, check, model } from './result-fixture.js';

describe('formatMarkdown', () => {
  it('renders awkward content as golden Markdown: pipes, <, &, emoji, NaN and ∞, new and compared models', () => {
    expect(formatMarkdown(awkwardResult())).toBe(
      [
        '## fitgate',
        '',
        '**ERROR**: 1 of 3 models could not be checked (3 checked: 1 pass, 0 warn, 1 fail, 1 error)',
        '',
        '> base commit abc1234 is not available; fetch it',
        '',
        '| Status | Model | Hold-out RMSE | Gap ratio | Params / row | Largest std. coef. | Against base |',
        '| --- | --- | ---: | ---: | ---: | ---: | --- |',
        '| FAIL | a\\|b &lt;c&gt; &amp; d 🌡️ | NaN | ∞ | 0.2 | 0.5 | RMSE +50%, gap +0.25 |',
        '| pass | plain | 1.5 | 1.5 | 0.2 | 0.5 | new |',
        '| ERROR | ::error::x | – | – | – | – | – |',
        '',
        '### FAIL: a\\|b &lt;c&gt; &amp; d 🌡️',
        '',
        'Descriptor: models/a\\|b &lt;c&gt; &amp; d 🌡️.model.yml',
        '',
        '| Check | Status | Value | Limit | Line |',
        '| --- | --- | ---: | --- | ---: |',
        '| generalisation-gap | FAIL | ∞ | fail > 1.5 | 12 |',
        '| parameter-ratio | WARN | 0.25 | warn > 0.1, fail > 0.5 | 8 |',
        '',
        '- **generalisation-gap**: ratio 100% of a, b: c next line. Use fewer terms.',
        '- **parameter-ratio**: column \\`x\\|y\\` &lt;big&gt;. Change it.',
        '',
        '### ERROR: ::error::x',
        '',
        'Descriptor: models/weird.model.yml',
        '',
        'Could not be checked. data/a,b:c.csv line 3: bad ::warning::injected',
        '',
      ].join('\n'),
    );
  });

  it('says so when there are no models', () => {
    const empty = summarise([], '0.1.0');
    expect(verdictLine(empty)).toBe('**pass**: no models to check (0 checked: 0 pass, 0 warn, 0 fail, 0 error)');
    expect(formatMarkdown(empty)).toBe('## fitgate\n\n**pass**: no models to check (0 checked: 0 pass, 0 warn, 0 fail, 0 error)\n\n');
  });

  it('cuts repository text that is very long', () => {
    const long = 'x'.repeat(5000);
    const md = formatMarkdown(summarise([model({ name: long, verdict: 'pass' })], '0.1.0'));
    expect(md).toContain(`| pass | ${'x'.repeat(299)}… |`);
  });
});

describe('size caps', () => {
  /** A monorepo of `n` models, every third failing with a long message. */
  function monorepo(n: number) {
    return summarise(
      Array.from({ length: n }, (_, i) =>
        model({
          name: `model-${String(i).padStart(6, '0')}`,
          verdict: i % 3 === 0 ? 'fail' : 'pass',
          checks: i % 3 === 0 ? [check({ id: 'generalisation-gap', status: 'fail', message: 'm'.repeat(400) })] : [],
        }),
      ),
      '0.1.0',
    );
  }

  it('keeps the job summary under 1 MiB and says what was cut', () => {
    const result = monorepo(20_000);
    const md = formatSummary(result);
    const bytes = Buffer.byteLength(md);
    expect(bytes, `summary of 20,000 models is ${bytes} bytes`).toBeLessThanOrEqual(SUMMARY_MAX_BYTES);
    expect(SUMMARY_MAX_BYTES).toBeLessThan(1024 * 1024);
    expect(md).toMatch(/_Cut to stay under the size limit: \d+ of 20000 table rows and \d+ of 6667 model details left out\./);
    // Failing models come first in a cut table.
    expect(md).toContain('| FAIL | model-000000 |');
  });

  it('does not cut a report that fits', () => {
    const md = formatSummary(monorepo(30));
    expect(md).not.toContain('Cut to stay under');
    expect(md.match(/^\| (FAIL|pass) \| model-/gm)).toHaveLength(30);
    expect(md.match(/^### FAIL: /gm)).toHaveLength(10);
  });

  it('cuts the comment to fit GitHub comment bodies and starts it with the marker', () => {
    const body = formatComment(monorepo(5_000));
    expect(body.startsWith(`${COMMENT_MARKER}\n## fitgate\n`)).toBe(true);
    expect(Buffer.byteLength(body)).toBeLessThanOrEqual(COMMENT_MAX_BYTES);
    expect(body.length).toBeLessThan(65_536);
    expect(body).toContain('Cut to stay under the size limit');
  });

  it('holds the cap for any budget over a small floor', () => {
    const result = monorepo(300);
    for (const maxBytes of [2_000, 5_000, 20_000, 100_000]) {
      const size = Buffer.byteLength(formatMarkdown(result, { maxBytes }));
      expect(size, `maxBytes ${maxBytes}: got ${size}`).toBeLessThanOrEqual(maxBytes);
    }
  });
});

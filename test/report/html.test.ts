import { describe, expect, it } from 'vitest';
import { formatHtml } from '../../src/report/html.js';
import { summarise } from '../../src/result/result.js';
import { AWKWARD, awkwardResult } from './fixture.js';

const ESCAPED = 'a|b &lt;c&gt; &amp; &quot;d&quot; &#39;e&#39; 🍎 `f` #g;';

describe('formatHtml', () => {
  const html = formatHtml(awkwardResult());

  it('escapes repository text everywhere it appears (golden fragments)', () => {
    expect(html).toContain(`<h2 id="model-2-name">${ESCAPED}</h2>`);
    expect(html).toContain(`<a href="#model-2">${ESCAPED}</a>`);
    expect(html).toContain(`data-model="${ESCAPED}"`);
    expect(html).toContain('<code class="muted">models/odd name|&lt;x&gt;.model.yml</code>');
    expect(html).toContain(
      '<p class="error-text">Could not be checked. data/b&amp;d.csv line 7: expected a number, got &quot;x&lt;y&quot;</p>',
    );
    expect(html).toContain(`<td class="finding">ratio is ∞ for ${ESCAPED}. <span class="advice">Fix ${ESCAPED}</span></td>`);
    expect(html).not.toContain(AWKWARD);
    expect(html).not.toContain('<c>');
    expect(html).not.toContain('<bad>');
  });

  it('shows NaN and infinity as text', () => {
    expect(html).toContain('<td class="num">∞</td><td class="num">warn &gt; 1.3, fail &gt; 1.5</td><td class="num">11</td>');
    expect(html).toContain('<td class="num">NaN</td>');
  });

  it('is self-contained: no script, no external reference, a policy that forbids fetching', () => {
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/\b(?:src|href)="(?!#|data:)/);
    expect(html).not.toMatch(/url\((?!#)/);
    expect(html).not.toMatch(/@import/);
    const urls = html.match(/https?:\/\/[^\s"'<>)]+/g) ?? [];
    expect(
      urls.every((u) => u === 'http://www.w3.org/2000/svg'),
      urls.join(', '),
    ).toBe(true);
    expect(html).toContain(`content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"`);
    expect(html).toContain('@media print');
  });

  it('draws the charts of a one-input model with text alternatives', () => {
    const kinds = [...html.matchAll(/data-chart="([a-z-]+)"/g)].map((m) => m[1]);
    expect(kinds).toEqual(['fit-curve', 'residuals', 'cv-curve', 'coefficients']);
    for (const m of html.matchAll(/<svg [^>]*aria-labelledby="([^"]+)"/g)) {
      const [title, desc] = m[1].split(' ');
      expect(html).toContain(`<title id="${title}">`);
      expect(html).toContain(`<desc id="${desc}">`);
    }
    expect(html).toContain('<g data-series="train" data-count="3"');
    expect(html).toContain('<g data-series="holdout" data-count="2"');
    expect(html).toContain(`<title>${ESCAPED}: -30</title>`);
  });

  it('renders a run without models', () => {
    const empty = formatHtml(summarise([], '1'));
    expect(empty).toContain('every model within its limits');
    expect(empty).toContain('<tbody></tbody>');
  });

  it('escapes the heading options', () => {
    expect(formatHtml(summarise([], '1'), { title: '<T&>', subtitle: '"s"' })).toContain(
      '<h1>&lt;T&amp;&gt;</h1><p class="muted">&quot;s&quot;</p>',
    );
  });
});

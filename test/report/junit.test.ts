import { describe, expect, it } from 'vitest';
import { formatJunit } from '../../src/report/junit.js';
import { summarise } from '../../src/result/result.js';
import { awkwardResult } from './fixture.js';

const NAME = 'a|b &lt;c&gt; &amp; &quot;d&quot; &apos;e&apos; 🍎 `f` #g;';
const FILE = 'models/odd name|&lt;x&gt;.model.yml';

describe('formatJunit', () => {
  it('writes one test case per model and check, escaped, with failures, warnings, skips and load errors (golden)', () => {
    const expected = [
      '<?xml version="1.0" encoding="UTF-8"?>',
      '<testsuites name="fitgate" tests="5" failures="1" errors="1" skipped="1">',
      '  <testsuite name="broken &amp; &lt;bad&gt;" tests="1" failures="0" errors="1" skipped="0" file="models/broken.model.yml">',
      '    <testcase classname="broken &amp; &lt;bad&gt;" file="models/broken.model.yml" name="load" line="7">',
      '      <error message="expected a number, got &quot;x&lt;y&quot;" type="bad-number">data/b&amp;d.csv:7: expected a number, got &quot;x&lt;y&quot;</error>',
      '    </testcase>',
      '  </testsuite>',
      `  <testsuite name="${NAME}" tests="4" failures="1" errors="0" skipped="1" file="${FILE}">`,
      `    <testcase classname="${NAME}" file="${FILE}" name="generalisation-gap" line="11">`,
      `      <failure message="ratio is ∞ for ${NAME}" type="generalisation-gap/fail">${FILE}:11: ratio is ∞ for ${NAME}. value ∞; limit warn &gt; 1.3, fail &gt; 1.5. Fix ${NAME}</failure>`,
      '    </testcase>',
      `    <testcase classname="${NAME}" file="${FILE}" name="parameter-ratio" line="9">`,
      `      <system-out>WARNING: ${FILE}:9: NaN per row. value NaN; limit warn &gt; 1.3, fail &gt; 1.5. Fix ${NAME}</system-out>`,
      '    </testcase>',
      `    <testcase classname="${NAME}" file="${FILE}" name="coefficient-size" line="10"/>`,
      `    <testcase classname="${NAME}" file="${FILE}" name="swing" line="10">`,
      '      <skipped message="could not be computed"/>',
      '    </testcase>',
      '  </testsuite>',
      '</testsuites>',
      '',
    ].join('\n');
    expect(formatJunit(awkwardResult())).toBe(expected);
  });

  it('counts warnings as failures with failOn warn', () => {
    const xml = formatJunit(awkwardResult(), { failOn: 'warn' });
    expect(xml).toContain('<testsuites name="fitgate" tests="5" failures="2" errors="1" skipped="1">');
    expect(xml).toContain('<failure message="NaN per row" type="parameter-ratio/warn">');
  });

  it('writes an empty suite list for a run without models', () => {
    expect(formatJunit(summarise([], '1'))).toBe(
      '<?xml version="1.0" encoding="UTF-8"?>\n<testsuites name="fitgate" tests="0" failures="0" errors="0" skipped="0"/>\n',
    );
  });

  it('never lets raw markup characters from the repository through', () => {
    const xml = formatJunit(awkwardResult());
    const text = xml.replace(/<\/?[a-z?][^<>]*>/gi, '');
    expect(text, 'text outside tags').not.toMatch(/[<>]/);
    expect(xml).not.toContain('<c>');
    expect(xml).not.toContain('"x<y"');
  });
});

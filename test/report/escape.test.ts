import { describe, expect, it } from 'vitest';
import { escapeMermaid, escapeXml } from '../../src/report/escape.js';
import { AWKWARD } from './fixture.js';

describe('escapeXml', () => {
  it('turns markup characters into entities', () => {
    expect(escapeXml(AWKWARD)).toBe('a|b &lt;c&gt; &amp; &quot;d&quot; &apos;e&apos; 🍎 `f` #g;');
  });
  it('replaces characters XML 1.0 forbids and writes tab, line feed and carriage return as character references', () => {
    expect(escapeXml('a\u0000b\u001bc\td\ne\rf\ufffeg')).toBe('a\ufffdb\ufffdc&#9;d&#10;e&#13;f\ufffdg');
  });
  it('keeps ]]> and a closing tag as text', () => {
    expect(escapeXml(']]></failure><x a="1">')).toBe(']]&gt;&lt;/failure&gt;&lt;x a=&quot;1&quot;&gt;');
  });
  it('replaces lone surrogates but keeps pairs', () => {
    expect(escapeXml('x\ud800y\udc00z🍎')).toBe('x\ufffdy\ufffdz🍎');
  });
  it('leaves the empty string empty', () => {
    expect(escapeXml('')).toBe('');
  });
});

describe('escapeMermaid', () => {
  it('makes text safe inside a double-quoted Mermaid string', () => {
    expect(escapeMermaid(AWKWARD)).toBe("a|b ‹c› & 'd' 'e' 🍎 'f' ＃g;");
  });
  it('turns line breaks and control characters into one space each run', () => {
    expect(escapeMermaid('a\r\nb\u001b[31mc')).toBe('a b [31mc');
  });
});

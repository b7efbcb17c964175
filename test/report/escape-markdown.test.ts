import { describe, expect, it } from 'vitest';
import { escapeMarkdown } from '../../src/report/escape.js';

describe('escapeMarkdown', () => {
  it.each([
    ['plain-name_v2', 'plain-name\\_v2'],
    ['a|b', 'a\\|b'],
    ['<img src=x onerror=alert(1)>', '&lt;img src=x onerror=alert(1)&gt;'],
    ['<!-- fitgate-report -->', '&lt;!-- fitgate-report --&gt;'],
    ["the target's range", "the target's range"],
    ['R&D [link](http://x) `code` *b* ~s~', 'R&amp;D \\[link\\](http://x) \\`code\\` \\*b\\* \\~s\\~'],
    ['line one\nline two\r\nthree', 'line one line two three'],
    ['ping @team', 'ping @\u200bteam'],
    ['back\\slash', 'back\\\\slash'],
    ['emoji 🍎 stays', 'emoji 🍎 stays'],
  ])('escapes %j', (input, want) => {
    expect(escapeMarkdown(input)).toBe(want);
  });
});

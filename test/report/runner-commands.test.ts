// Runner commands in plain text (src/report/runner-commands.ts), byte for byte.
import { describe, expect, it } from 'vitest';
import {
  defuseLegacyCommands,
  MAX_SERVER_TEXT,
  neutraliseJson,
  neutraliseLog,
  neutraliseLogLine,
  quoteServerText,
} from '../../src/report/runner-commands.js';

/**
 * What the runner would take as a command in one line (actions/runner,
 * src/Runner.Common/ActionCommand.cs): `::` first after leading white space, or `##[` anywhere;
 * format and control characters are treated as absent (a culture-aware comparison may skip them).
 */
function runnerSeesCommand(line: string): boolean {
  const plain = line.replace(/[\p{C}\p{M}]/gu, '');
  return plain.trimStart().startsWith('::') || plain.includes('##[');
}

const ATTACKS = [
  '::error::forged',
  '   ::warning file=a::x',
  '\t::add-mask::x',
  'model x ##[error]forged in the middle',
  '##[set-output name=verdict]pass',
  '#\u200b#\u200b[error]zero-width between',
  '\u200b::error::zero-width before',
  '\u00a0\u3000::error::unicode spaces before',
  '\ufeff::error::byte-order mark before',
  '\u0085::error::next-line before',
  'a\n::error::after a line break',
  'a\r::error::after a carriage return',
  'a\u2028::error::after a line separator',
  '###[error]three',
  '#\u0301#[error]combining mark',
];

describe('neutraliseLogLine', () => {
  it.each(ATTACKS)('leaves no runner command in %j, on one line', (text) => {
    const line = neutraliseLogLine(text);
    expect(line).not.toMatch(/[\r\n\u0085\u2028\u2029]/);
    expect(runnerSeesCommand(line), JSON.stringify(line)).toBe(false);
    // Applying it again changes nothing.
    expect(neutraliseLogLine(line)).toBe(line);
  });

  it('shows the text: `» ` before a leading `::`, a space inside `##[`, spaces for line breaks', () => {
    expect(neutraliseLogLine('::error::forged')).toBe('» ::error::forged');
    expect(neutraliseLogLine('model x ##[error]forged')).toBe('model x ## [error]forged');
    expect(neutraliseLogLine('a\n::error::b')).toBe('a ::error::b');
    expect(neutraliseLogLine('a\r\nb')).toBe('a b');
  });

  it('leaves ordinary text alone', () => {
    for (const text of ['PASS: 3 models', 'C# [x] and #[y] and a::b', '  indented', '']) expect(neutraliseLogLine(text)).toBe(text);
  });
});

describe('neutraliseLog', () => {
  it('treats each line on its own and keeps the line feeds', () => {
    expect(neutraliseLog('ok\n::error::x\nmid ##[error]y\n')).toBe('ok\n» ::error::x\nmid ## [error]y\n');
  });
});

describe('defuseLegacyCommands', () => {
  it('breaks ##[ and leaves line breaks and :: alone (for command data, which the toolkit escapes)', () => {
    expect(defuseLegacyCommands('a\n##[error]x ::y')).toBe('a\n## [error]x ::y');
  });
});

describe('neutraliseJson', () => {
  it('keeps the data exactly and leaves no runner command in any line', () => {
    const value = {
      name: 'm ##[error]forged',
      cell: '#\u200b#[warning]x',
      text: '::error::not at a line start',
      sep: 'a\u2028::error::b\u2029c\u0085d',
      list: [['##[', 1]],
    };
    const json = neutraliseJson(JSON.stringify(value, null, 2));
    expect(JSON.parse(json)).toEqual(value);
    for (const line of json.split('\n')) expect(runnerSeesCommand(line), line).toBe(false);
    expect(json).not.toMatch(/[\u0085\u2028\u2029]/);
    expect(json).toContain('"m ##\\u005berror]forged"');
  });

  it('escapes each line separator alone, in one-byte and two-byte text, and leaves other text as it is', () => {
    expect(neutraliseJson('"a\u0085b"')).toBe('"a\\u0085b"');
    expect(neutraliseJson('"a\u2028b"')).toBe('"a\\u2028b"');
    expect(neutraliseJson('"é\u2029b"')).toBe('"é\\u2029b"');
    expect(neutraliseJson('"x ##[y"')).toBe('"x ##\\u005by"');
    const plain = JSON.stringify({ name: 'm # one', values: [1.5, -2, null], note: 'é ✓' }, null, 2);
    expect(neutraliseJson(plain)).toBe(plain);
  });
});

describe('quoteServerText', () => {
  it('cuts to the limit and cleans control, format and command text', () => {
    expect(quoteServerText('x'.repeat(500))).toBe(`${'x'.repeat(MAX_SERVER_TEXT - 1)}…`);
    expect(quoteServerText('Bad\ncredentials\u001b[31m ##[error]forged\u202e')).toBe('Bad credentials\\u001b[31m ## [error]forged\\u202e');
    expect(quoteServerText('::error::forged')).toBe('» ::error::forged');
    expect(quoteServerText('Resource not accessible by integration')).toBe('Resource not accessible by integration');
  });
});

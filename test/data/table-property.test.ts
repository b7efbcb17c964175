import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { memoryRepo } from './memory-repo.js';
import { bits, outcome } from './outcome.js';

const FILE = 'data/t.csv';
/** Bounded runs: about 2 s per property on an idle machine (timeouts below allow for a busy one). */
const RUNS = 200;

/** Like C's printf("%.10g", x): 10 significant digits, trailing zeros dropped, exponent form outside 1e-4 .. 1e10. */
function g10(x: number): string {
  if (x === 0) return Object.is(x, -0) ? '-0' : '0';
  const [mantissa, exponentText] = x.toExponential(9).split('e');
  const exponent = Number(exponentText);
  const strip = (s: string): string => (s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s);
  if (exponent < -4 || exponent >= 10) {
    const sign = exponent < 0 ? '-' : '+';
    return `${strip(mantissa)}e${sign}${String(Math.abs(exponent)).padStart(2, '0')}`;
  }
  return strip(x.toFixed(9 - exponent));
}

/** Smallest positive normal double, 2^-1022 (IEEE 754 binary64). */
const MIN_NORMAL = 2 ** -1022;

/** True when a printed number overflows, or names a nonzero value that reads as 0 or a subnormal. */
function outOfRange(text: string): boolean {
  const v = Number(text);
  if (!Number.isFinite(v)) return true;
  if (v !== 0) return Math.abs(v) < MIN_NORMAL;
  return /[1-9]/.test(text.split(/[eE]/)[0]);
}

/** The ways a number gets printed into a cell. */
const FORMATS: Array<(x: number, k: number) => string> = [
  (x) => String(x),
  (x, k) => x.toExponential(k % 21),
  (x, k) => x.toFixed(k % 21),
  (x, k) => x.toPrecision(1 + (k % 21)),
  (x) => g10(x),
  (x) => g10(x).toUpperCase(),
];

const cell = fc.record({
  value: fc.oneof(
    fc.double({ noNaN: true, noDefaultInfinity: true }),
    fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }),
    fc.integer({ min: -1e9, max: 1e9 }),
  ),
  format: fc.nat(FORMATS.length - 1),
  digits: fc.nat(40),
  padding: fc.constantFrom('', ' ', '\t', '  '),
  quoted: fc.constantFrom(false, false, false, true),
});

describe('fast and general paths on random numeric tables', () => {
  it('give identical doubles, equal to Number() of each cell text (toString, toExponential, toFixed, toPrecision, %.10g)', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 1, max: 4 }).chain((width) =>
          fc.record({
            width: fc.constant(width),
            rows: fc.array(fc.array(cell, { minLength: width, maxLength: width }), { minLength: 0, maxLength: 12 }),
            newline: fc.constantFrom('\n', '\r\n'),
            finalNewline: fc.boolean(),
          }),
        ),
        async ({ width, rows, newline, finalNewline }) => {
          const names = Array.from({ length: width }, (_, j) => `c${j}`);
          const texts = rows.map((row) => row.map((c) => FORMATS[c.format](c.value, c.digits)));
          const lines = rows.map((row, i) =>
            row
              .map((c, j) => {
                const text = `${c.padding}${texts[i][j]}${c.padding}`;
                return c.quoted ? `"${text}"` : text;
              })
              .join(','),
          );
          const csv = [names.join(','), ...lines].join(newline) + (finalNewline ? newline : '');
          const fast = await outcome(memoryRepo({ [FILE]: csv }), FILE, { columns: names });
          const general = await outcome(memoryRepo({ [FILE]: csv }), FILE, { columns: names, general: true });
          expect(fast, `fast vs general on ${JSON.stringify(csv)}`).toEqual(general);
          // Rounding to few digits can push a value near 1.8e308 over the top, and a subnormal (or a
          // nonzero text that reads as 0) underflows: both must be csv-cell.
          if (texts.some((row) => row.some((t) => outOfRange(t)))) {
            expect(fast.ok ? 'ok' : fast.code, JSON.stringify(csv)).toBe('csv-cell');
            return;
          }
          if (!fast.ok) throw new Error(`unexpected ${fast.code}: ${fast.message} on ${JSON.stringify(csv)}`);
          names.forEach((name, j) => {
            // Reference: JavaScript's Number() of the printed text (the contract).
            expect(fast.columns[name], `column ${name} of ${JSON.stringify(csv)}`).toEqual(texts.map((row) => bits(Number(row[j]))));
          });
          expect(fast.lines).toEqual(rows.map((_, i) => i + 2));
        },
      ),
      { numRuns: RUNS },
    );
  }, 60_000);

  it('agree on arbitrary text, cut anywhere (same table or same InputError), and throw nothing else', async () => {
    const piece = fc.constantFrom(
      '0',
      '1',
      '7',
      '.',
      '-',
      '+',
      'e',
      'E',
      ',',
      ',',
      ',',
      '\n',
      '\n',
      '\n',
      '\r\n',
      '\r',
      ' ',
      '\t',
      '"',
      '""',
      'x',
      'NaN',
      'Infinity',
      '1e999',
      '1e-400',
      '5e-324',
      '0e-999',
      '\u00e9',
      '\uFEFF',
      '\u00a0',
      '\u2028',
      '\f',
      '\0',
    );
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom('', 'a,b\n', 'a\n', ' a , b \r\n', '"a","b"\n'),
        fc.array(piece, { maxLength: 40 }),
        fc.subarray(['a', 'b']),
        fc.uniqueArray(fc.nat(200), { maxLength: 4 }),
        async (head, body, columns, cutAt) => {
          const csv = head + body.join('');
          // The fast path also gets the stream cut at random places.
          const length = new TextEncoder().encode(csv).length;
          const cuts = [...new Set(cutAt.map((c) => c % (length + 1)))].sort((x, y) => x - y);
          const fast = await outcome(memoryRepo({ [FILE]: csv }, { cuts }), FILE, { columns });
          const general = await outcome(memoryRepo({ [FILE]: csv }), FILE, { columns, general: true });
          expect(fast, `fast vs general on ${JSON.stringify(csv)}`).toEqual(general);
        },
      ),
      { numRuns: RUNS },
    );
  }, 60_000);
});

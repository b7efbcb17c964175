/**
 * Number formatting shared by check messages and reporters.
 */

/**
 * Formats a figure for people: 4 significant digits (whole numbers from 1e4 to 1e6 are rounded to
 * an integer), exponent form below 1e-3 and from 1e6,
 * `∞`/`-∞` for infinities and `NaN` for NaN. `null` gives `–`.
 */
export function formatNumber(x: number | null | undefined, digits = 4): string {
  if (x === null || x === undefined) return '–';
  if (Number.isNaN(x)) return 'NaN';
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a < 1e-3 || a >= 1e6)
    return x
      .toExponential(digits - 1)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'e');
  if (a >= 10 ** digits) return String(Math.round(x));
  const text = x.toPrecision(digits);
  return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
}

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
  if (a < 1e-3 || a >= 1e6) {
    // `1.200e+7` -> `1.2e7`: the mantissa's trailing zeros (and a bare point) go, and the `+`.
    const text = x.toExponential(digits - 1);
    const e = text.indexOf('e');
    const exponent = text.charCodeAt(e + 1) === 0x2b ? text.slice(e + 2) : text.slice(e + 1);
    return `${withoutTrailingZeros(text.slice(0, e))}e${exponent}`;
  }
  if (a >= 10 ** digits) return String(Math.round(x));
  const text = x.toPrecision(digits);
  return text.includes('e') ? text : withoutTrailingZeros(text);
}

/**
 * A decimal numeral without the zeros that end its fraction, and without its point when nothing
 * of the fraction is left (`1.2500` -> `1.25`, `3.000` -> `3`); a numeral without a point as it is.
 * The same as replacing the pattern `\.?0+$` in a numeral that has a point, without a pattern.
 */
function withoutTrailingZeros(text: string): string {
  if (!text.includes('.')) return text;
  let end = text.length;
  while (text.charCodeAt(end - 1) === 0x30) end--;
  if (text.charCodeAt(end - 1) === 0x2e) end--;
  return end === text.length ? text : text.slice(0, end);
}

/**
 * Axis labels from column names: a trailing unit suffix (`_m`, `_kg`, `_c`, `_pct`, ...) is shown
 * as a unit in brackets after the name, e.g. `depth_m` -> `depth_m (m)`, `exit_temp_c` ->
 * `exit_temp_c (°C)`. Names without a known suffix stay as they are. The name is kept whole so
 * that readers find the column they know.
 */

/** Unit suffixes (lower case, after the last `_`) and how they are shown. Common practice in data files. */
const UNITS: Record<string, string> = {
  mm: 'mm',
  cm: 'cm',
  m: 'm',
  km: 'km',
  in: 'in',
  ft: 'ft',
  mg: 'mg',
  g: 'g',
  kg: 'kg',
  t: 't',
  lb: 'lb',
  ml: 'mL',
  l: 'L',
  m3: 'm³',
  ms: 'ms',
  s: 's',
  sec: 's',
  min: 'min',
  h: 'h',
  hr: 'h',
  hours: 'h',
  days: 'days',
  d: 'd',
  c: '°C',
  degc: '°C',
  f: '°F',
  degf: '°F',
  k: 'K',
  pct: '%',
  percent: '%',
  ppm: 'ppm',
  ppb: 'ppb',
  pa: 'Pa',
  kpa: 'kPa',
  mpa: 'MPa',
  bar: 'bar',
  psi: 'psi',
  w: 'W',
  kw: 'kW',
  mw: 'MW',
  kwh: 'kWh',
  wh: 'Wh',
  j: 'J',
  kj: 'kJ',
  v: 'V',
  a: 'A',
  hz: 'Hz',
  rpm: 'rpm',
  usd: 'USD',
  eur: 'EUR',
  gbp: 'GBP',
  mps: 'm/s',
  kmh: 'km/h',
  lpm: 'L/min',
};

/** The unit a column name ends in (`depth_m` -> `m`), or null. */
export function unitOf(column: string): string | null {
  const i = column.lastIndexOf('_');
  if (i <= 0 || i === column.length - 1) return null;
  return UNITS[column.slice(i + 1).toLowerCase()] ?? null;
}

/** Axis label of a column: the name, then its unit in brackets when the name ends in one (plain text, not escaped). */
export function axisLabel(column: string): string {
  const unit = unitOf(column);
  return unit ? `${column} (${unit})` : column;
}

/**
 * Test helper (not shipped): reads the NIST StRD linear least-squares `.dat` files and the
 * shared reference folder.
 *
 * Source of the files: NIST Information Technology Laboratory, Statistical Reference Datasets,
 * Linear Least Squares Regression, https://www.itl.nist.gov/div898/strd/ (dataset pages
 * https://www.itl.nist.gov/div898/strd/lls/data/<Name>.shtml). Layout (see
 * /work/shared/reference/README.md): CRLF lines; a header whose `File Format` entry gives the
 * 1-based line ranges of the certified values and of the data; data columns y first, then x.
 */
import { readFileSync } from 'node:fs';
import { sharedReferenceDir } from '../tools/require-tool.js';

/** The shared, read-only reference folder (outside the repository); tests check it with requireTool. */
export const referenceDir = sharedReferenceDir;

/** One parsed StRD dataset. */
export interface NistDataset {
  name: string;
  /** Certified parameter estimates, in order of their index (B0.. or B1..). */
  estimates: number[];
  /** Certified standard deviations of the estimates. */
  estimateSds: number[];
  /** Index of the first parameter: 0 with an intercept, 1 without (NoInt1, NoInt2). */
  firstIndex: number;
  residualSd: number;
  rSquared: number;
  /** Response, length n. */
  y: number[];
  /** Predictors, one array per predictor column, each length n. */
  x: number[][];
}

/** Reads `<referenceDir>/nist-strd/<name>.dat`. */
export function readNist(name: string): NistDataset {
  return parseNist(name, readFileSync(`${referenceDir}nist-strd/${name}.dat`, 'latin1'));
}

/** Parses the text of one StRD linear least-squares file. */
export function parseNist(name: string, text: string): NistDataset {
  const lines = text.split(/\r?\n/);
  const range = (label: string): [number, number] => {
    const line = lines.find((l) => l.includes(label) && /\(lines\s+\d+\s+to\s+\d+\)/.test(l));
    const m = line?.match(/\(lines\s+(\d+)\s+to\s+(\d+)\)/);
    if (!m) throw new Error(`${name}: no "${label} (lines a to b)" entry in the header`);
    return [Number(m[1]), Number(m[2])];
  };
  const [c0, c1] = range('Certified Values');
  const [d0, d1] = range('Data');
  const certified = lines.slice(c0 - 1, c1);
  const params: { index: number; est: number; sd: number }[] = [];
  let residualSd = Number.NaN;
  let rSquared = Number.NaN;
  for (const l of certified) {
    const b = l.match(/^\s*B(\d+)\s+(\S+)\s+(\S+)\s*$/);
    if (b) params.push({ index: Number(b[1]), est: Number(b[2]), sd: Number(b[3]) });
    const sd = l.match(/^\s*Standard Deviation\s+(\S+)\s*$/);
    if (sd) residualSd = Number(sd[1]);
    const r2 = l.match(/^\s*R-Squared\s+(\S+)\s*$/);
    if (r2) rSquared = Number(r2[1]);
  }
  if (params.length === 0 || Number.isNaN(residualSd)) throw new Error(`${name}: certified block not understood`);
  const rows = lines
    .slice(d0 - 1, d1)
    .map((l) => l.trim())
    .filter((l) => l !== '')
    .map((l) => l.split(/\s+/).map(Number));
  const width = rows[0].length;
  for (const [i, r] of rows.entries()) {
    if (r.length !== width || r.some((v) => !Number.isFinite(v))) throw new Error(`${name}: data line ${d0 + i} not numeric`);
  }
  return {
    name,
    estimates: params.map((q) => q.est),
    estimateSds: params.map((q) => q.sd),
    firstIndex: params[0].index,
    residualSd,
    rSquared,
    y: rows.map((r) => r[0]),
    x: Array.from({ length: width - 1 }, (_, j) => rows.map((r) => r[j + 1])),
  };
}

/**
 * The certified model's design, column-major n x p: with one predictor, raw powers
 * x^firstIndex .. x^(firstIndex + p - 1) (no centring, as NIST certifies them); with several,
 * an intercept column followed by the predictors as they are.
 */
export function nistDesign(d: NistDataset): { X: Float64Array; n: number; p: number } {
  const n = d.y.length;
  const p = d.estimates.length;
  const X = new Float64Array(n * p);
  if (d.x.length === 1) {
    for (let j = 0; j < p; j++) for (let i = 0; i < n; i++) X[j * n + i] = d.x[0][i] ** (j + d.firstIndex);
  } else {
    for (let i = 0; i < n; i++) X[i] = 1;
    for (let j = 1; j < p; j++) for (let i = 0; i < n; i++) X[j * n + i] = d.x[j - 1][i];
  }
  return { X, n, p };
}

/** Log relative error, capped at 15: -log10(|est - cert| / |cert|), or -log10|est| when cert = 0. */
export function lre(estimate: number, certified: number): number {
  const err = certified === 0 ? Math.abs(estimate) : Math.abs(estimate - certified) / Math.abs(certified);
  if (Number.isNaN(err)) return 0;
  return err === 0 ? 15 : Math.min(15, Math.max(0, -Math.log10(err)));
}

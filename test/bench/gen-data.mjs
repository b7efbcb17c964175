// Synthetic regression data with the sizes and shapes of ../shared/bench/gen_data.py, in JavaScript
// (the same columns, feature ranges, signal terms, noise, number printing and 5 leaked rows; not the
// same random numbers: this uses xoshiro128** (Blackman & Vigna 2018) with Box-Muller normals).
//
//   node test/bench/gen-data.mjs --out DIR --rows N --holdout-rows M --features F --seed S
//
// Writes DIR/train.csv and DIR/holdout.csv with the header `x1,...,xF,y`, every number printed as
// C's printf("%.10g") prints it (formatG10 below).
import { closeSync, mkdirSync, openSync, writeSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const NOISE_SD = 0.5;
export const N_LEAKED = 5;

/** Feature slots: [lo, hi, term]; feature j (0-based) uses slot j mod 8, shifted by 10 * floor(j / 8). */
const SPECS = [
  [0, 50, (x) => 2 * Math.sin(x / 8)],
  [-3, 3, (x) => 0.5 * x * x - x],
  [1, 100, (x) => 3 * Math.log(x)],
  [0, 1, (x) => 4 * Math.sqrt(x)],
  [-10, 10, (x) => 1.5 * Math.cos(x / 3)],
  [5, 15, (x) => 0.05 * (x - 10) ** 3],
  [0.1, 10, (x) => 2 * Math.tanh(x - 5)],
  [-1, 1, (x) => Math.exp(x)],
];

function featureSpec(j) {
  const [lo, hi, f] = SPECS[j % SPECS.length];
  const shift = 10 * Math.floor(j / SPECS.length);
  return { lo: lo + shift, hi: hi + shift, f: (x) => f(x - shift) };
}

/** A seeded generator: xoshiro128** state from splitmix32 of the seed; uniform doubles with 53 random bits. */
export function createRandom(seed) {
  let z = seed >>> 0;
  const split = () => {
    z = (z + 0x9e3779b9) >>> 0;
    let t = z;
    t = Math.imul(t ^ (t >>> 16), 0x85ebca6b);
    t = Math.imul(t ^ (t >>> 13), 0xc2b2ae35);
    return (t ^ (t >>> 16)) >>> 0;
  };
  let a = split(),
    b = split(),
    c = split(),
    d = split();
  const next = () => {
    const r = Math.imul(((Math.imul(b, 5) << 7) | (Math.imul(b, 5) >>> 25)) >>> 0, 9) >>> 0;
    const t = b << 9;
    c ^= a;
    d ^= b;
    b ^= c;
    a ^= d;
    c ^= t;
    d = (d << 11) | (d >>> 21);
    return r;
  };
  const uniform = () => ((next() >>> 5) * 67108864 + (next() >>> 6)) / 9007199254740992;
  let spare = null;
  const normal = () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    let u;
    do u = uniform();
    while (u === 0);
    const v = uniform();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
  return { uniform, normal, int: (n) => Math.floor(uniform() * n) };
}

/** C's printf("%.10g", x): 10 significant digits, exponent form below 1e-4 or from 1e10, trailing zeros dropped. */
export function formatG10(x) {
  if (x === 0) return Object.is(x, -0) ? '-0' : '0';
  const e = x.toExponential(9); // d.ddddddddde±X, correctly rounded
  const at = e.indexOf('e');
  const exp = Number(e.slice(at + 1));
  if (exp < -4 || exp >= 10) {
    let mant = e.slice(0, at);
    if (mant.includes('.')) mant = mant.replace(/0+$/, '').replace(/\.$/, '');
    const sign = exp < 0 ? '-' : '+';
    const digits = String(Math.abs(exp)).padStart(2, '0');
    return `${mant}e${sign}${digits}`;
  }
  let fixed = x.toFixed(9 - exp);
  if (fixed.includes('.')) fixed = fixed.replace(/0+$/, '').replace(/\.$/, '');
  return fixed;
}

function draw(random, n, features) {
  const x = [];
  for (let j = 0; j < features; j++) {
    const { lo, hi } = featureSpec(j);
    const col = new Float64Array(n);
    for (let i = 0; i < n; i++) col[i] = lo + (hi - lo) * random.uniform();
    x.push(col);
  }
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) y[i] = NOISE_SD * random.normal();
  for (let j = 0; j < features; j++) {
    const { f } = featureSpec(j);
    const col = x[j];
    for (let i = 0; i < n; i++) y[i] += f(col[i]);
  }
  return [...x, y];
}

function distinct(random, n, count) {
  const picked = new Set();
  while (picked.size < count) picked.add(random.int(n));
  return [...picked];
}

function writeCsv(file, columns, header) {
  const fd = openSync(file, 'w');
  try {
    writeSync(fd, `${header}\n`);
    const n = columns[0].length;
    let text = '';
    for (let i = 0; i < n; i++) {
      let line = formatG10(columns[0][i]);
      for (let j = 1; j < columns.length; j++) line += `,${formatG10(columns[j][i])}`;
      text += `${line}\n`;
      if (text.length > 1 << 20) {
        writeSync(fd, text);
        text = '';
      }
    }
    if (text) writeSync(fd, text);
  } finally {
    closeSync(fd);
  }
}

/**
 * Writes OUT/train.csv and OUT/holdout.csv.
 * @returns the leaked pairs (0-based data rows, train -> hold-out)
 */
export function generate({ out, rows, holdoutRows, features, seed }) {
  if (!(features >= 1 && rows >= N_LEAKED && holdoutRows >= N_LEAKED))
    throw new RangeError('need features >= 1, rows >= 5, holdout rows >= 5');
  const random = createRandom(seed);
  const train = draw(random, rows, features);
  const hold = draw(random, holdoutRows, features);
  const src = distinct(random, rows, N_LEAKED);
  const dst = distinct(random, holdoutRows, N_LEAKED);
  src.forEach((s, k) => {
    for (const col of hold.keys()) hold[col][dst[k]] = train[col][s];
  });
  mkdirSync(out, { recursive: true });
  const header = [...Array.from({ length: features }, (_, j) => `x${j + 1}`), 'y'].join(',');
  writeCsv(path.join(out, 'train.csv'), train, header);
  writeCsv(path.join(out, 'holdout.csv'), hold, header);
  return src.map((s, k) => [s, dst[k]]);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const args = process.argv.slice(2);
  const get = (name) => {
    const i = args.indexOf(name);
    if (i < 0 || i + 1 >= args.length) throw new Error(`missing ${name}`);
    return args[i + 1];
  };
  const pairs = generate({
    out: get('--out'),
    rows: Number(get('--rows')),
    holdoutRows: Number(get('--holdout-rows')),
    features: Number(get('--features')),
    seed: Number(get('--seed')),
  });
  process.stderr.write(`leaked (train row -> holdout row): ${pairs.map((p) => p.join('->')).join(', ')}\n`);
}

// Writes the invented data of the parts example (an invented cider cooperative's press log, kept
// as one file per week; every number is made up): node examples/parts/generate-data.mjs
// Deterministic: a seeded generator (mulberry32), values rounded to 3 decimals.
import { mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('./press/', import.meta.url));

function generator(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function normal(random) {
  const u = Math.max(random(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
}

const r3 = (x) => Math.round(x * 1000) / 1000;

// One week of pressings: juice density (g/ml) rises with the sugar reading (degrees Brix) and
// falls a little with the juice temperature; 40 pressings a week.
function week(seed) {
  const random = generator(seed);
  const rows = [];
  for (let i = 0; i < 40; i++) {
    const brix = 9 + 7 * random();
    const temp = 8 + 14 * random();
    const density = 1.0 + 0.0041 * brix - 0.00022 * (temp - 15) + 0.0008 * normal(random);
    rows.push([r3(brix), r3(temp), Math.round(density * 100000) / 100000]);
  }
  return rows;
}

function write(name, rows) {
  mkdirSync(new URL(`./press/${name}/..`, import.meta.url), { recursive: true });
  writeFileSync(`${here}${name}`, `brix,juice_temp_c,density_g_ml\n${rows.map((r) => r.join(',')).join('\n')}\n`);
}

for (let w = 1; w <= 4; w++) write(`log/week-0${w}.csv`, week(100 + w));
for (let w = 5; w <= 6; w++) write(`holdout/week-0${w}.csv`, week(100 + w));

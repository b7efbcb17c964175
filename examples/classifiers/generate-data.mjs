// Writes the invented data of the classifier example (an invented cider cooperative's apple
// sorting line; every number is made up): node examples/classifiers/generate-data.mjs
// Deterministic: a seeded generator (mulberry32), values rounded to 3 decimals.
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('./data/', import.meta.url));

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

function write(name, header, rows) {
  writeFileSync(`${here}${name}`, `${header}\n${rows.map((r) => r.join(',')).join('\n')}\n`);
}

// bruise-reject: bruising grows with drop height and falls with firmness; labels reject / keep.
function bruise(seed, n) {
  const random = generator(seed);
  const rows = [];
  for (let i = 0; i < n; i++) {
    const firmness = 40 + 25 * random();
    const drop = 5 + 45 * random();
    const eta = -1.2 - 0.12 * (firmness - 52) + 0.09 * (drop - 27) + 0.002 * (drop - 27) ** 2;
    rows.push([r3(firmness), r3(drop), random() < 1 / (1 + Math.exp(-eta)) ? 'reject' : 'keep']);
  }
  return rows;
}
write('bruise-train.csv', 'firmness_n,drop_height_cm,decision', bruise(11, 1500));
write('bruise-holdout.csv', 'firmness_n,drop_height_cm,decision', bruise(12, 1000));

// stem-check: the camera score decides alone (stem present exactly when it is above 0.6).
function stem(seed, n) {
  const random = generator(seed);
  const rows = [];
  for (let i = 0; i < n; i++) {
    const score = random();
    const size = 60 + 20 * random();
    rows.push([r3(score), r3(size), score > 0.6 ? 1 : 0]);
  }
  return rows;
}
write('stem-train.csv', 'camera_score,diameter_mm,stem_present', stem(21, 200));
write('stem-holdout.csv', 'camera_score,diameter_mm,stem_present', stem(22, 100));

// wax-defect: a rare defect, few rows, a high-degree surface in two inputs.
function wax(seed, n) {
  const random = generator(seed);
  const rows = [];
  for (let i = 0; i < n; i++) {
    const gloss = 20 + 60 * random();
    const temp = 8 + 10 * random();
    const eta = -2.3 + 0.04 * (gloss - 50) + 0.5 * normal(random);
    rows.push([r3(gloss), r3(temp), random() < 1 / (1 + Math.exp(-eta)) ? 'true' : 'false']);
  }
  return rows;
}
write('wax-train.csv', 'gloss_units,room_temp_c,defect', wax(31, 90));
write('wax-holdout.csv', 'gloss_units,room_temp_c,defect', wax(32, 400));

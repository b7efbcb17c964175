// Writes the invented data of the "models trained elsewhere" example (an invented parcel courier;
// every number is made up): node examples/elsewhere/generate-data.mjs
// Deterministic: a seeded generator (mulberry32), values rounded to 3 decimals. The "predictions"
// are invented too: they imitate a model trained in another tool (one that remembers part of its
// training noise, and one that is well calibrated); nothing here was trained.
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

// delivery-minutes: minutes from depot to door grow with distance and stops, more at rush hour.
// The training predictions keep 80 % of each row's noise (a model that learnt its rows by heart);
// the hold-out predictions miss the noise entirely and carry an error of their own.
function delivery(seed, n, training) {
  const random = generator(seed);
  const rows = [];
  for (let i = 0; i < n; i++) {
    const distance = 1 + 24 * random();
    const stops = Math.floor(1 + 9 * random());
    const hour = 8 + Math.floor(11 * random());
    const rush = hour === 8 || hour === 9 || hour === 17 || hour === 18 ? 7 : 0;
    const truth = 6 + 2.1 * distance + 3.2 * stops + rush;
    const noise = 4 * normal(random);
    const minutes = truth + noise;
    const predicted = training ? truth + 0.8 * noise + 0.6 * normal(random) : truth + 2.5 * normal(random);
    rows.push([r3(distance), stops, hour, r3(minutes), r3(predicted)]);
  }
  return rows;
}

// late-parcel: a parcel is late more often when far and heavy; the scores are calibrated
// probabilities written by the other tool to a side file, keyed by parcel id, in its own order.
function parcels(seed, n, prefix) {
  const random = generator(seed);
  const data = [];
  const scores = [];
  for (let i = 0; i < n; i++) {
    const id = `${prefix}-${String(i + 1).padStart(4, '0')}`;
    const distance = 1 + 24 * random();
    const weight = 0.2 + 19.8 * random();
    const eta = -2.2 + 0.11 * (distance - 12) + 0.09 * (weight - 10);
    const p = 1 / (1 + Math.exp(-eta));
    const late = random() < p ? 1 : 0;
    const score = 1 / (1 + Math.exp(-(eta + 0.15 * normal(random))));
    data.push([id, r3(distance), r3(weight), late]);
    scores.push([id, r3(score)]);
  }
  // The side file lists the parcels in another order (sorted by score), as a scoring job might.
  scores.sort((a, b) => a[1] - b[1] || (a[0] < b[0] ? -1 : 1));
  return { data, scores };
}

write('delivery-train.csv', 'distance_km,stops,hour,minutes,predicted_minutes', delivery(501, 600, true));
write('delivery-holdout.csv', 'distance_km,stops,hour,minutes,predicted_minutes', delivery(502, 200, false));
const train = parcels(601, 800, 'T');
const holdout = parcels(602, 300, 'H');
write('parcels-train.csv', 'parcel_id,distance_km,weight_kg,late', train.data);
write('parcels-holdout.csv', 'parcel_id,distance_km,weight_kg,late', holdout.data);
write('late-scores-train.csv', 'parcel_id,p_late', train.scores);
write('late-scores-holdout.csv', 'parcel_id,p_late', holdout.scores);

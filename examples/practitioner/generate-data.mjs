// Writes the invented data of the second example repository: models as practitioners write them
// (the same made-up cider cooperative). Deterministic: Park-Miller generator with fixed seeds, so
// re-running reproduces the committed CSV files byte for byte. Run: node examples/practitioner/generate-data.mjs
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const here = fileURLToPath(new URL('.', import.meta.url));

/** Park-Miller minimal standard generator, uniform in (0, 1). */
function uniform(seed) {
  let s = seed;
  return () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
}

/** Normal deviates by the Box-Muller transform. */
function normal(u) {
  return () => Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
}

function write(name, header, rows) {
  const text = [header.join(','), ...rows.map((r) => r.map((v) => (typeof v === 'number' ? Number(v.toPrecision(6)) : v)).join(','))].join(
    '\n',
  );
  writeFileSync(`${here}data/${name}`, `${text}\n`);
}

/** Training and hold-out rows from one row maker: every fourth row is held out. */
function split(n, make) {
  const train = [];
  const holdout = [];
  for (let i = 0; i < n; i++) (i % 4 === 3 ? holdout : train).push(make(i));
  return [train, holdout];
}

// cellar-sensor: a humidity sensor's reading error depends on temperature x humidity.
{
  const u = uniform(101);
  const e = normal(uniform(102));
  const [tr, ho] = split(160, () => {
    const t = 4 + 14 * u();
    const rh = 55 + 40 * u();
    return [t, rh, 0.8 + 0.05 * t - 0.02 * rh + 0.004 * t * rh - 0.0008 * t * t + 0.15 * e()];
  });
  write('sensor-train.csv', ['temp_c', 'rh_pct', 'error_pct'], tr);
  write('sensor-holdout.csv', ['temp_c', 'rh_pct', 'error_pct'], ho);
}

// shop-demand: bottles sold per day at the farm shop, weekly seasonality and a price effect.
{
  const u = uniform(201);
  const e = normal(uniform(202));
  const promos = ['none', 'none', 'flyer', 'radio'];
  const lift = { none: 0, flyer: 9, radio: 16 };
  const [tr, ho] = split(280, (i) => {
    const price = 4 + 2 * u();
    const promo = promos[Math.floor(u() * 4)];
    const week = 30 * Math.sin((2 * Math.PI * i) / 7) + 12 * Math.cos((4 * Math.PI * i) / 7);
    return [i, price, promo, 180 + week - 14 * price + lift[promo] + 0.05 * i + 4 * e()];
  });
  write('shop-train.csv', ['day', 'price_eur', 'promotion', 'bottles'], tr);
  write('shop-holdout.csv', ['day', 'price_eur', 'promotion', 'bottles'], ho);
}

// yeast-dose: fermentation rate against yeast nutrient dose, logarithmic over two decades.
{
  const u = uniform(301);
  const e = normal(uniform(302));
  const [tr, ho] = split(90, () => {
    const dose = 10 ** (-1 + 2.3 * u());
    const l = Math.log(dose);
    return [dose, 2 + 1.1 * l - 0.12 * l * l + 0.08 * e()];
  });
  write('yeast-train.csv', ['dose_g_hl', 'rate'], tr);
  write('yeast-holdout.csv', ['dose_g_hl', 'rate'], ho);
}

// refractometer: calibration line, each reference reading with its own standard uncertainty.
{
  const u = uniform(401);
  const e = normal(uniform(402));
  const [tr, ho] = split(48, () => {
    const brix = 2 + 18 * u();
    const sigma = 0.02 + 0.01 * brix;
    return [brix, 0.12 + 0.985 * brix + sigma * e(), sigma];
  });
  write('refractometer-train.csv', ['reference_brix', 'reading_brix', 'sigma_brix'], tr);
  write('refractometer-holdout.csv', ['reference_brix', 'reading_brix', 'sigma_brix'], ho);
}

// must-cooling: temperature of must over the first hours in the cooling jacket (natural spline).
{
  const u = uniform(501);
  const e = normal(uniform(502));
  const [tr, ho] = split(120, () => {
    const h = 30 * u();
    return [h, 8 + 14 * Math.exp(-h / 6) + 0.6 * Math.sin(h / 4) + 0.2 * e()];
  });
  write('cooling-train.csv', ['hours', 'must_c'], tr);
  write('cooling-holdout.csv', ['hours', 'must_c'], ho);
}

// press-batches: juice yield against press pressure; each row is the mean of several pressings,
// so its weight is the number of pressings (`data.weight`): the noise of a mean shrinks with it.
{
  const u = uniform(601);
  const e = normal(uniform(602));
  const [tr, ho] = split(96, () => {
    const bar = 1 + 7 * u();
    const batches = 1 + Math.floor(12 * u());
    return [bar, batches, 52 + 6.5 * bar - 0.45 * bar * bar + (1.8 / Math.sqrt(batches)) * e()];
  });
  write('press-train.csv', ['pressure_bar', 'batches', 'yield_pct'], tr);
  write('press-holdout.csv', ['pressure_bar', 'batches', 'yield_pct'], ho);
}

// haze-storage: haze of stored cider grows by a roughly constant factor a week, with a
// multiplicative noise: a model of log(haze) (`data.target_transform: log`).
{
  const u = uniform(701);
  const e = normal(uniform(702));
  const [tr, ho] = split(100, () => {
    const weeks = 40 * u();
    return [weeks, Math.exp(0.4 + 0.085 * weeks - 0.0006 * weeks * weeks + 0.08 * e())];
  });
  write('haze-train.csv', ['weeks', 'haze_ntu'], tr);
  write('haze-holdout.csv', ['weeks', 'haze_ntu'], ho);
}

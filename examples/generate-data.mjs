// Writes the invented data of the example repository (a made-up cider cooperative).
// Deterministic: a small linear congruential generator with fixed seeds, so re-running this
// script reproduces the committed CSV files byte for byte. Run: node examples/generate-data.mjs
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
  const text = [header.join(','), ...rows.map((r) => r.map((v) => Number(v.toPrecision(6))).join(','))].join('\n');
  writeFileSync(`${here}data/${name}`, `${text}\n`);
}

// press-yield: litres of juice from kilograms of apples and press minutes (smooth, plenty of rows).
{
  const u = uniform(11);
  const e = normal(u);
  const rows = (n) =>
    Array.from({ length: n }, () => {
      const kg = 20 + 180 * u();
      const minutes = 5 + 25 * u();
      const litres = 0.62 * kg - 0.0007 * kg * kg + 0.9 * minutes - 0.012 * minutes * minutes + 1.5 * e();
      return [kg, minutes, litres];
    });
  write('press-train.csv', ['apples_kg', 'press_min', 'juice_l'], rows(120));
  write('press-holdout.csv', ['apples_kg', 'press_min', 'juice_l'], rows(40));
}

// cellar-temperature: degrees Celsius against depth in metres; only ten training readings.
{
  const u = uniform(23);
  const e = normal(u);
  const temp = (d) => 14 - 6 * Math.exp(-d / 1.5) + 0.25 * e();
  const train = Array.from({ length: 10 }, (_, i) => {
    const d = 0.3 + i * 0.6 + 0.1 * u();
    return [d, temp(d)];
  });
  const holdout = Array.from({ length: 12 }, () => {
    const d = 0.3 + 5.5 * u();
    return [d, temp(d)];
  });
  write('cellar-train.csv', ['depth_m', 'temp_c'], train);
  write('cellar-holdout.csv', ['depth_m', 'temp_c'], holdout);
}

// sugar-curve: sugar content (degrees Brix) of fermenting juice over days.
{
  const u = uniform(37);
  const e = normal(u);
  const brix = (t) => 3 + 9 / (1 + Math.exp((t - 7) / 1.6)) + 0.3 * e();
  const train = Array.from({ length: 40 }, () => {
    const t = 14 * u();
    return [t, brix(t)];
  }).sort((a, b) => a[0] - b[0]);
  const holdout = Array.from({ length: 20 }, () => {
    const t = 14 * u();
    return [t, brix(t)];
  });
  write('sugar-train.csv', ['day', 'brix'], train);
  write('sugar-holdout.csv', ['day', 'brix'], holdout);
}

// tank-cooling: temperature of a fermentation tank in the hours after the chiller starts; ten
// readings taken at irregular times. A degree-9 polynomial through them swings between readings.
{
  const u = uniform(41);
  const e = normal(u);
  const temp = (h) => 12 + 10 * Math.exp(-h / 6) + 0.3 * e();
  const hours = [0.2, 0.9, 1.4, 3.8, 4.5, 8.9, 10.2, 15.5, 16.1, 23.7];
  const train = hours.map((h) => [h, temp(h)]);
  const holdout = Array.from({ length: 12 }, () => {
    const h = 0.2 + 23.5 * u();
    return [h, temp(h)];
  });
  write('tank-train.csv', ['hours', 'temp_c'], train);
  write('tank-holdout.csv', ['hours', 'temp_c'], holdout);
}

// bottle-fill: millilitres filled against line speed and nozzle pressure. The hold-out file was
// assembled carelessly: five of its rows are copies of training rows (leakage).
{
  const u = uniform(53);
  const e = normal(u);
  const rows = (n) =>
    Array.from({ length: n }, () => {
      const speed = 20 + 40 * u();
      const pressure = 1 + 2 * u();
      return [speed, pressure, 752 - 0.35 * speed + 6 * pressure + 1.2 * e()];
    });
  const train = rows(150);
  const holdout = rows(35);
  for (const k of [3, 17, 42, 88, 120]) holdout.splice((k * 7) % holdout.length, 0, train[k]);
  write('fill-train.csv', ['line_speed', 'nozzle_bar', 'fill_ml'], train);
  write('fill-holdout.csv', ['line_speed', 'nozzle_bar', 'fill_ml'], holdout);
}

// keg-weight: weight of a filled keg against the litres of cider in it. The shipped coefficients
// in the descriptor came from last season's heavier steel kegs; this season's data no longer match.
{
  const u = uniform(67);
  const e = normal(u);
  const rows = (n) =>
    Array.from({ length: n }, () => {
      const litres = 10 + 40 * u();
      return [litres, 7.6 + 1.03 * litres + 0.08 * e()];
    });
  write('keg-train.csv', ['litres', 'weight_kg'], rows(60));
  write('keg-holdout.csv', ['litres', 'weight_kg'], rows(20));
}

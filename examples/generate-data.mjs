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

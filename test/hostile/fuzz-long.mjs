// The long fuzz run: `npm run fuzz` runs test/hostile/fuzz.test.ts with many more cases than
// `npm test` does, under a random seed unless FITGATE_FUZZ_SEED is set (a failure prints its seed
// and counterexample; set FITGATE_FUZZ_SEED to repeat it).
// Options (environment): FITGATE_FUZZ_RUNS (default 5000 in-process runs), FITGATE_FUZZ_CLI_RUNS (default 24).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = fileURLToPath(new URL('../..', import.meta.url));
const env = {
  ...process.env,
  FITGATE_FUZZ_RUNS: process.env.FITGATE_FUZZ_RUNS ?? '5000',
  FITGATE_FUZZ_CLI_RUNS: process.env.FITGATE_FUZZ_CLI_RUNS ?? '24',
  FITGATE_FUZZ_SEED: process.env.FITGATE_FUZZ_SEED ?? String(Math.floor(Math.random() * 2 ** 31)),
};
process.stdout.write(
  `fuzz: ${env.FITGATE_FUZZ_RUNS} in-process and ${env.FITGATE_FUZZ_CLI_RUNS} CLI runs, seed ${env.FITGATE_FUZZ_SEED}\n`,
);
const vitest = path.join(root, 'node_modules', 'vitest', 'vitest.mjs');
const run = spawnSync(process.execPath, [vitest, 'run', '--config', 'test/vitest.config.ts', 'test/hostile/fuzz.test.ts'], {
  cwd: root,
  env,
  stdio: 'inherit',
});
process.exitCode = run.status ?? 1;

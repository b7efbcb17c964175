/**
 * A small repository for the action's tests, made in a temporary folder as a real git
 * repository with two commits: the base (commit 1) and the pull request's head (commit 2).
 * The fitgate root is the sub-folder `ml/` (the action's `working-directory`).
 *
 * Models (every limit but the named ones is off, so that the findings are exact figures):
 * - `steady`: y = 2x + 1 plus a small fixed wobble; its own `base_change: 0.1`. The head
 *   commit triples the hold-out wobble, so its hold-out RMSE grows by more than 10 %: fail.
 * - `wide`: polynomial degree 2 on the base, 3 on the head, 12 rows: params_per_sample
 *   0.25 and 0.3333 over the fail limit 0.1.
 * - `lean`: one linear term, 12 rows: 2 / 12 = 0.1667 over its warning limit 0.1 (fail 0.5).
 * - `fresh` (head only): new in the pull request, passes.
 * - `models/bad,50%::error::x.model.yml` (head only): a descriptor that cannot be read.
 * - `lean-only.yml` (head only): settings that match only `lean` (a run whose verdict is warn).
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** The temporary repository. */
export interface Fixture {
  /** The workspace (git work tree top). */
  workspace: string;
  /** SHA of the base commit. */
  baseSha: string;
  /** SHA of the head commit. */
  headSha: string;
}

function rows(n: number, x0: number, step: number, f: (x: number, i: number) => number, header: string): string {
  const lines = [header];
  for (let i = 0; i < n; i++) {
    const x = x0 + i * step;
    lines.push(`${x},${f(x, i)}`);
  }
  return `${lines.join('\n')}\n`;
}

const wobble = (i: number): number => (((i * 7) % 5) - 2) * 0.1;

const SETTINGS = `version: 1
models:
  - "models/*.model.yml"
limits:
  gap_ratio: off
  coefficient: off
  cv_ratio: off
  leakage: off
  swing: off
  swing_beyond: off
  condition: off
  reproducibility: off
  params_per_sample: 0.1
`;

const steady = `version: 1
name: steady
data:
  train: ../data/steady-train.csv
  holdout: ../data/steady-holdout.csv
  target: y
terms:
  - linear: [x]
limits:
  params_per_sample: off
  base_change: 0.1
`;

const wide = (degree: number): string => `version: 1
name: wide
data:
  train: ../data/wide-train.csv
  holdout: ../data/wide-holdout.csv
  target: y
terms:
  - polynomial: { of: x, degree: ${degree} }
`;

const lean = `version: 1
name: lean
data:
  train: ../data/wide-train.csv
  holdout: ../data/wide-holdout.csv
  target: y
terms:
  - linear: [x]
limits:
  params_per_sample: { warn: 0.1, fail: 0.5 }
`;

const fresh = `version: 1
name: fresh
data:
  train: ../data/steady-train.csv
  holdout: ../data/steady-holdout.csv
  target: y
terms:
  - linear: [x]
limits:
  params_per_sample: off
`;

/** Name of the descriptor that cannot be read (awkward characters on purpose). */
export const BAD_DESCRIPTOR = 'models/bad,50%::error::x.model.yml';

function write(root: string, file: string, text: string): void {
  mkdirSync(path.dirname(path.join(root, file)), { recursive: true });
  writeFileSync(path.join(root, file), text);
}

function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, {
    cwd,
    encoding: 'utf8',
    env: {
      ...process.env,
      GIT_AUTHOR_NAME: 't',
      GIT_AUTHOR_EMAIL: 't@example.com',
      GIT_COMMITTER_NAME: 't',
      GIT_COMMITTER_EMAIL: 't@example.com',
      GIT_AUTHOR_DATE: '2024-01-01T00:00:00Z',
      GIT_COMMITTER_DATE: '2024-01-01T00:00:00Z',
    },
  }).trim();
}

/** Makes the two-commit repository; `headOnly: false` stops after the base commit. */
export function makeFixture(): Fixture {
  const workspace = mkdtempSync(path.join(tmpdir(), 'fitgate-action-'));
  const ml = path.join(workspace, 'ml');
  git(workspace, 'init', '-q', '-b', 'main');
  write(ml, 'fitgate.yml', SETTINGS);
  write(ml, 'models/steady.model.yml', steady);
  write(ml, 'models/wide.model.yml', wide(2));
  write(ml, 'models/lean.model.yml', lean);
  write(
    ml,
    'data/steady-train.csv',
    rows(20, 0, 1, (x, i) => 2 * x + 1 + wobble(i), 'x,y'),
  );
  write(
    ml,
    'data/steady-holdout.csv',
    rows(10, 0.5, 2, (x, i) => 2 * x + 1 + wobble(i + 3), 'x,y'),
  );
  write(
    ml,
    'data/wide-train.csv',
    rows(12, 0, 1, (x, i) => 0.5 * x * x - x + 3 + wobble(i), 'x,y'),
  );
  write(
    ml,
    'data/wide-holdout.csv',
    rows(6, 0.5, 2, (x, i) => 0.5 * x * x - x + 3 + wobble(i + 1), 'x,y'),
  );
  git(workspace, 'add', '-A');
  git(workspace, 'commit', '-q', '-m', 'base');
  const baseSha = git(workspace, 'rev-parse', 'HEAD');

  write(ml, 'models/wide.model.yml', wide(3));
  write(ml, 'models/fresh.model.yml', fresh);
  write(ml, BAD_DESCRIPTOR, 'version: 1\nname: [oops\n');
  write(ml, 'lean-only.yml', SETTINGS.replace('models/*.model.yml', 'models/lean.model.yml'));
  write(
    ml,
    'data/steady-holdout.csv',
    rows(10, 0.5, 2, (x, i) => 2 * x + 1 + 3 * wobble(i + 3), 'x,y'),
  );
  git(workspace, 'add', '-A');
  git(workspace, 'commit', '-q', '-m', 'head');
  const headSha = git(workspace, 'rev-parse', 'HEAD');
  return { workspace, baseSha, headSha };
}

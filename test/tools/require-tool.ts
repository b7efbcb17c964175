/**
 * Test helper (not shipped): the one place that checks what a test needs from outside the
 * repository (a Debian package, or a shared folder next to the repository) and decides what
 * happens when it is missing.
 *
 * - Locally, `requireTool(...)` returns a one-line reason, prints it once as a warning, and the
 *   test skips with the reason in its title (`describe.skipIf(missing !== null)(title + skipNote(missing))`).
 * - Under `CI=true` it throws instead, so the test file fails: a CI run never passes by skipping.
 *   `.ci/run`'s set-up step installs the Debian packages; the shared folders are checked out
 *   beside the repository and never copied into it.
 *
 * Nothing here installs anything.
 */
import { accessSync, constants, existsSync, statSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

/** Debian's Chromium (package `chromium`), driven by playwright-core. */
export const CHROMIUM = '/usr/bin/chromium';

/** Debian's Python (package `python3`); the python3-* packages install their modules for it. */
export const PYTHON3 = '/usr/bin/python3';

/** The shared, read-only reference data folder (NIST StRD, Anscombe), beside the repository; ends with `/`. */
export const sharedReferenceDir = fileURLToPath(new URL('../../../shared/reference/', import.meta.url));

/** The shared benchmark folder (reference scripts such as ref_check.py), beside the repository; ends with `/`. */
export const sharedBenchDir = fileURLToPath(new URL('../../../shared/bench/', import.meta.url));

/**
 * Something a test can need. `python3` is Debian's Python with its standard library alone (the
 * python3-* packages install it too). The `python3-*` names are Debian packages checked by
 * importing their module with {@link PYTHON3}: python3-numpy -> `numpy`, python3-pandas ->
 * `pandas`, python3-sklearn -> `sklearn`.
 */
export type Need = 'chromium' | 'python3' | 'python3-numpy' | 'python3-pandas' | 'python3-sklearn' | 'shared/reference' | 'shared/bench';

const PYTHON_MODULES: Partial<Record<Need, string>> = {
  'python3-numpy': 'numpy',
  'python3-pandas': 'pandas',
  'python3-sklearn': 'sklearn',
};

/** Prints the names of the given modules that fail to import, one per line (bounded: argv only). */
const PYTHON_PROBE =
  'import importlib, sys\nfor m in sys.argv[1:]:\n    try:\n        importlib.import_module(m)\n    except Exception:\n        print(m)\n';

function executable(file: string): boolean {
  try {
    accessSync(file, constants.X_OK);
    return statSync(file).isFile();
  } catch {
    return false;
  }
}

/** Reasons the given needs are not met (empty when all are). */
export function unmetNeeds(needs: readonly Need[]): string[] {
  const reasons: string[] = [];
  if (needs.includes('chromium') && !executable(CHROMIUM)) reasons.push(`${CHROMIUM} is missing (Debian package chromium)`);
  const packages = needs.filter((n) => PYTHON_MODULES[n] !== undefined);
  if (needs.includes('python3') && packages.length === 0 && !executable(PYTHON3))
    reasons.push(`${PYTHON3} is missing (Debian package python3)`);
  if (packages.length > 0) {
    if (!executable(PYTHON3)) {
      reasons.push(`${PYTHON3} is missing (Debian packages python3 ${packages.join(' ')})`);
    } else {
      const modules = packages.map((n) => PYTHON_MODULES[n] as string);
      const probe = spawnSync(PYTHON3, ['-c', PYTHON_PROBE, ...modules], {
        encoding: 'utf8',
        timeout: 120_000,
        env: { PATH: '/usr/bin:/bin', HOME: process.env.HOME ?? '/' },
      });
      if (probe.status !== 0) {
        reasons.push(
          `${PYTHON3} could not check its modules (status ${probe.status ?? probe.signal}): ${(probe.stderr || String(probe.error ?? '')).trim().slice(0, 200)}`,
        );
      } else {
        const failed = new Set(probe.stdout.split('\n').filter(Boolean));
        const absent = packages.filter((n) => failed.has(PYTHON_MODULES[n] as string));
        if (absent.length > 0)
          reasons.push(`${PYTHON3} cannot import ${absent.map((n) => PYTHON_MODULES[n]).join(', ')} (Debian packages ${absent.join(' ')})`);
      }
    }
  }
  if (needs.includes('shared/reference') && !existsSync(sharedReferenceDir))
    reasons.push(`the reference data folder ${sharedReferenceDir} is missing`);
  if (needs.includes('shared/bench') && !existsSync(`${sharedBenchDir}ref_check.py`))
    reasons.push(`the benchmark reference ${sharedBenchDir}ref_check.py is missing`);
  return reasons;
}

/**
 * Checks `needs` once, at the top of a test file. Returns null when all are met. When some are
 * not: under `CI=true` (`env.CI === 'true'`) throws an Error naming them; otherwise prints one
 * warning and returns the reason (one line, `; `-joined), to pass to {@link skipNote} and
 * `describe.skipIf`.
 */
export function requireTool(needs: readonly Need[], env: NodeJS.ProcessEnv = process.env): string | null {
  return skipOrThrow(unmetNeeds(needs), env);
}

/** The decision of {@link requireTool} for given reasons: null for none, else throw (CI=true) or warn and return the reason. */
export function skipOrThrow(reasons: readonly string[], env: NodeJS.ProcessEnv): string | null {
  if (reasons.length === 0) return null;
  const reason = reasons.join('; ');
  if (env.CI === 'true')
    throw new Error(
      `${reason}. Under CI=true a test may not skip: .ci/run's set-up step installs the Debian packages, and ../shared must be beside the repository.`,
    );
  console.warn(`skipping: ${reason} (apt-get install the packages named; tests fail instead of skipping under CI=true)`);
  return reason;
}

/** The suffix for a describe title: ` (skipped: <reason>)`, or '' when nothing is missing. */
export function skipNote(missing: string | null): string {
  return missing === null ? '' : ` (skipped: ${missing})`;
}

import { execFileSync } from 'node:child_process';
import { afterEach, describe, expect, it } from 'vitest';
import { allowOptimisingCompiler, compilerFlagsGiven, deferOptimisingCompiler, estimateWork, optimisingCompilerDeferred, SMALL_WORK } from '../src/optimising-compiler.js';

describe('when the optimising compiler runs', () => {
  afterEach(() => allowOptimisingCompiler());

  it('is turned off by the entry points and back on once, idempotently', () => {
    expect(optimisingCompilerDeferred()).toBe(false);
    deferOptimisingCompiler();
    expect(optimisingCompilerDeferred()).toBe(true);
    deferOptimisingCompiler();
    allowOptimisingCompiler();
    expect(optimisingCompilerDeferred()).toBe(false);
    allowOptimisingCompiler();
    expect(optimisingCompilerDeferred()).toBe(false);
  });

  it('computes the same numbers on baseline code as on optimised code (two processes, one without TurboFan)', () => {
    // Hot enough to be optimised in the default process; bit patterns printed exactly.
    const script = `let s = 0; const a = new Float64Array(4); for (let i = 1; i < 3e6; i++) { s += Math.exp(-i / 1e6) * Math.sqrt(i) / (1 + Math.log(i)) + Math.pow(1 + 1 / i, 3) * Math.sin(i); a[i & 3] += s * 1e-9; } const v = new DataView(new Float64Array([s, ...a]).buffer); let h = ''; for (let k = 0; k < 40; k++) h += v.getUint8(k).toString(16).padStart(2, '0'); console.log(h);`;
    const run = (flags: string[]): string => execFileSync(process.execPath, [...flags, '-e', script], { encoding: 'utf8' }).trim();
    const optimised = run([]);
    expect(optimised).toMatch(/^[0-9a-f]{80}$/);
    expect(run(['--no-turbofan'])).toBe(optimised);
  });
});

describe('compiler flags the user set are left alone', () => {
  it('sees them in the arguments of node and in NODE_OPTIONS', () => {
    expect(compilerFlagsGiven([], undefined)).toBe(false);
    expect(compilerFlagsGiven(['--max-old-space-size=4096'], '--enable-source-maps')).toBe(false);
    expect(compilerFlagsGiven(['--no-turbofan'], undefined)).toBe(true);
    expect(compilerFlagsGiven([], '--enable-source-maps --jitless')).toBe(true);
    expect(compilerFlagsGiven(['--no_opt'], undefined)).toBe(true);
    expect(compilerFlagsGiven(['--turbofan-filter=x'], undefined)).toBe(false);
  });
});

describe('work estimate (multiply-adds of the row loops, the decision between the two)', () => {
  it('keeps a small one-input model on baseline code and a bigger one on optimised code (the measurements in optimising-compiler.ts)', () => {
    // Degree 10 (11 columns), ridge sweep (no refits): 400 rows stay on baseline code; 1,000 rows
    // and the benchmark's S workload (2,000 rows) do not.
    expect(estimateWork({ rows: 400, columns: 11, inputs: 1, refits: 0 })).toBeLessThan(SMALL_WORK);
    expect(estimateWork({ rows: 1000, columns: 11, inputs: 1, refits: 0 })).toBeGreaterThan(SMALL_WORK);
    expect(estimateWork({ rows: 2000, columns: 11, inputs: 1, refits: 0 })).toBeGreaterThan(SMALL_WORK);
    // A degree sweep refits every setting.
    expect(estimateWork({ rows: 200, columns: 11, inputs: 1, refits: 13 })).toBeGreaterThan(SMALL_WORK);
    expect(estimateWork({ rows: 200, columns: 11, inputs: 1, refits: 0 })).toBeLessThan(SMALL_WORK);
  });

  it('counts the neighbour search of several inputs', () => {
    expect(estimateWork({ rows: 200, columns: 5, inputs: 2, refits: 0 })).toBeGreaterThan(SMALL_WORK);
    expect(estimateWork({ rows: 200, columns: 5, inputs: 1, refits: 0 })).toBeLessThan(SMALL_WORK);
  });
});

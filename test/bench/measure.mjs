// Runs one whole process and measures its wall time and peak resident memory.
// Peak memory comes from GNU time (`/usr/bin/time -f %M`, kilobytes) when it is installed,
// otherwise from polling /proc/<pid>/status VmHWM every 5 ms (may miss a short final peak).
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';

export const GNU_TIME = '/usr/bin/time';

/** How peak memory is measured on this machine. */
export function memoryMethod() {
  return existsSync(GNU_TIME) ? 'GNU time %M' : existsSync('/proc/self/status') ? '/proc VmHWM polling' : 'none';
}

/**
 * Runs `command args` in `cwd`; resolves { wall (s), peakMiB, status, stdout, stderr }.
 * Exit statuses in `okStatus` (default [0]) count as success; others reject with the stderr.
 */
export function measure(command, args, { cwd, okStatus = [0], env = process.env } = {}) {
  const method = memoryMethod();
  const dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-measure-'));
  const timeFile = path.join(dir, 'time.txt');
  const useTime = method === 'GNU time %M';
  const [cmd, argv] = useTime ? [GNU_TIME, ['-f', '%M', '-o', timeFile, command, ...args]] : [command, args];
  return new Promise((resolve, reject) => {
    const start = process.hrtime.bigint();
    const child = spawn(cmd, argv, { cwd, env, stdio: ['ignore', 'pipe', 'pipe'] });
    const out = [];
    const err = [];
    child.stdout.on('data', (b) => out.push(b));
    child.stderr.on('data', (b) => err.push(b));
    let hwmKb = 0;
    let poll = null;
    if (!useTime && method !== 'none') {
      poll = setInterval(() => {
        try {
          const m = /VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'));
          if (m) hwmKb = Math.max(hwmKb, Number(m[1]));
        } catch {
          // the process has ended
        }
      }, 5);
    }
    child.on('error', reject);
    child.on('close', async (status) => {
      const wall = Number(process.hrtime.bigint() - start) / 1e9;
      if (poll) clearInterval(poll);
      let peakKb = hwmKb;
      if (useTime) {
        try {
          const lines = (await readFile(timeFile, 'utf8')).trim().split('\n');
          peakKb = Number(lines[lines.length - 1]);
        } catch {
          peakKb = Number.NaN;
        }
      }
      rmSync(dir, { recursive: true, force: true });
      const stdout = Buffer.concat(out).toString('utf8');
      const stderr = Buffer.concat(err).toString('utf8');
      if (!okStatus.includes(status)) {
        reject(new Error(`${command} ${args.join(' ')} exited with ${status}:\n${stderr.slice(-2000)}`));
        return;
      }
      resolve({ wall, peakMiB: peakKb / 1024, status, stdout, stderr });
    });
  });
}

/** Median of numbers (mean of the middle two for an even count). */
export function median(values) {
  const s = [...values].sort((a, b) => a - b);
  const h = s.length >> 1;
  return s.length % 2 ? s[h] : (s[h - 1] + s[h]) / 2;
}

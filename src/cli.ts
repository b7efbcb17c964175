#!/usr/bin/env node
/**
 * The `fitgate` command: parse argv, run the pipeline, print a report, set the exit status
 * (0 within limits, 1 a model over a limit, 2 the run could not be done).
 */
// node:fs rather than node:fs/promises: a command reads and writes its few files in turn, and the
// promises module takes about 2 ms to load (readline and streams come with it).
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from './entries/args.js';
import { errorMessage, InputError } from './core/errors.js';
import type { ReportInput } from './result/merge.js';
import { isFitgateWorker } from './run/worker-role.js';
import { runCheck } from './entries/check-run.js';
import { openModelSpool, type ModelSpool } from './entries/model-spool.js';
import { writeReportStream } from './entries/report-file.js';
import { jsonReport } from './report/json.js';
import { escapeTerminal } from './report/escape.js';
import { neutraliseLog, neutraliseLogLine } from './report/runner-commands.js';
import { formatText } from './report/text.js';
import { exitStatus, type Result } from './result/result.js';
import { writeFileSafely } from './entries/safe-write.js';
import { VERSION } from './core/version.js';

/** Reads the report files of `fitgate merge`; a file that cannot be read is an InputError. */
function readReports(files: string[]): ReportInput[] {
  return files.map((file) => {
    try {
      return { file, text: readFileSync(file, 'utf8') };
    } catch (error) {
      throw new InputError('file-missing', `expected a readable JSON report file: ${errorMessage(error)}`, { file });
    }
  });
}

/** One line of standard error: control characters shown, no runner command (a file name may hold a line break and `::`). */
function errorLine(message: string): string {
  return `fitgate: ${neutraliseLogLine(escapeTerminal(message))}\n`;
}

/** Runs one command; the report goes to standard output or `--out`, the file reports where asked. */
async function main(argv: string[]): Promise<number> {
  let debug = argv.includes('--debug');
  let spool: ModelSpool | null = null;
  try {
    const parsed = parseArgs(argv, process.cwd());
    if (parsed.kind === 'print') {
      (parsed.status === 0 ? process.stdout : process.stderr).write(neutraliseLog(parsed.text));
      return parsed.status;
    }
    if (parsed.kind === 'explain' || parsed.kind === 'init' || parsed.kind === 'refit') {
      if (parsed.kind !== 'explain') debug = parsed.debug;
      const { runToolCommand } = await import('./entries/tool-commands.js');
      const outcome = await runToolCommand(parsed);
      process.stdout.write(outcome.stdout);
      process.stderr.write(outcome.stderr);
      return outcome.status;
    }
    debug = parsed.debug;
    let result: Result;
    let failOn: 'fail' | 'warn';
    // Modules only some runs need are loaded when asked for, so that a plain check starts fast.
    if (parsed.kind === 'merge') {
      const { mergeReports } = await import('./result/merge.js');
      result = mergeReports(readReports(parsed.reports), VERSION, { expect: parsed.expect });
      failOn = parsed.failOn;
    } else {
      // Only the JSON report, to a file: each model's text is rendered as soon as its outcome is
      // final and set aside in a spool file beside the report (checked as the report's own write
      // checks it, never through a link), and the Result keeps a small copy (entries/model-spool.ts).
      if (parsed.format === 'json' && parsed.out !== null && parsed.html === null && parsed.sarif === null && parsed.junit === null)
        spool = openModelSpool({ file: parsed.out, place: { option: '--out', within: [parsed.settings.root, process.cwd()] } });
      const handoff = spool === null ? undefined : spool.handoff;
      result = await runCheck(parsed.settings, { base: parsed.base, entry: 'command', shard: parsed.shard, jobs: parsed.jobs, handoff });
      failOn = parsed.settings.failOn;
    }
    const toFile = parsed.out !== null;
    const color = parsed.color ?? (!toFile && process.stdout.isTTY === true && !process.env.NO_COLOR);
    // Each format keeps runner commands out of its lines (the text and JSON reporters do it
    // themselves), so the report is safe to print in a CI step. The JSON report comes in pieces (one
    // model at a time), so that a run of any size is written without being one string.
    const pieces: Iterable<string | Uint8Array> =
      parsed.format === 'json'
        ? jsonReport(result, spool === null ? {} : { modelText: spool.text })
        : parsed.format === 'markdown'
          ? [neutraliseLog((await import('./report/markdown.js')).formatMarkdown(result))]
          : [formatText(result, { color, verbose: parsed.verbose })];
    // Where files may go: a path named inside the repository root or the working directory must
    // really stay inside it; a report that cannot be written does not stop the others.
    const cwd = process.cwd();
    const within = parsed.kind === 'check' ? [parsed.settings.root, cwd] : [cwd];
    const failures: string[] = [];
    if (parsed.out !== null) {
      try {
        writeFileSafely(parsed.out, pieces, { option: '--out', within });
      } catch (error) {
        failures.push(errorMessage(error));
      }
    } else await writeReportStream(process.stdout, pieces);
    // SARIF paths are relative to the working directory when the root lies inside it (code
    // scanning reads them from the checkout); merged shard reports run from the root.
    const prefix = parsed.kind === 'check' ? path.relative(cwd, parsed.settings.root).split(path.sep).join('/') : '';
    if (parsed.html !== null || parsed.sarif !== null || parsed.junit !== null) {
      const { writeFileReports } = await import('./entries/output-files.js');
      const missed = await writeFileReports(result, {
        html: parsed.html,
        sarif: parsed.sarif,
        junit: parsed.junit,
        sarifPrefix: prefix.startsWith('..') || path.isAbsolute(prefix) ? '' : prefix,
        failOn,
        within,
        optionPrefix: '--',
      });
      for (const failure of missed) failures.push(failure.message);
    }
    for (const message of failures) process.stderr.write(errorLine(message));
    return failures.length > 0 ? 2 : exitStatus(result, failOn);
  } catch (error) {
    process.stderr.write(errorLine(errorMessage(error)));
    if (debug && error instanceof Error && error.stack) process.stderr.write(`${neutraliseLog(error.stack)}\n`);
    else if (!(error instanceof InputError)) process.stderr.write('(run with --debug for the stack trace)\n');
    return 2;
  } finally {
    spool?.close();
  }
}

// In a model worker thread (the bundle is one file, so workers load it too) the worker loop runs
// instead: the command itself runs on the main thread only.
if (!isFitgateWorker()) {
  // A closed pipe (`fitgate check | head`) is not an error of the run.
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code !== 'EPIPE') throw error;
  });
  process.exitCode = await main(process.argv.slice(2));
}

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
import { defaultJobs } from './run/pool.js';
import { isFitgateWorker } from './run/worker-role.js';
import { runPipeline } from './run/pipeline.js';
import { createFsRepository } from './repo/fs-repository.js';
import { writeReportFile, writeReportStream } from './entries/report-file.js';
import { jsonReport } from './report/json.js';
import { escapeTerminal } from './report/escape.js';
import { formatText } from './report/text.js';
import { exitStatus, type Result } from './result/result.js';
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

/** Writes the reports asked for with `--html DIR`, `--sarif FILE` and `--junit FILE`. */
async function main(argv: string[]): Promise<number> {
  let debug = argv.includes('--debug');
  try {
    const parsed = parseArgs(argv, process.cwd());
    if (parsed.kind === 'print') {
      (parsed.status === 0 ? process.stdout : process.stderr).write(parsed.text);
      return parsed.status;
    }
    debug = parsed.debug;
    let result: Result;
    let failOn: 'fail' | 'warn';
    // Modules only some runs need are loaded when asked for, so that a plain check starts fast.
    if (parsed.kind === 'merge') {
      const { mergeReports } = await import('./result/merge.js');
      result = mergeReports(readReports(parsed.reports), VERSION);
      failOn = parsed.failOn;
    } else {
      let baseOptions = {};
      if (parsed.base !== null) {
        const { CLI_FETCH_HINT, evaluateBase } = await import('./action/base-commit.js');
        baseOptions = await evaluateBase(parsed.settings, parsed.base, { fetchHint: CLI_FETCH_HINT });
      }
      const scale = { shard: parsed.shard, jobs: parsed.jobs ?? defaultJobs(), root: parsed.settings.root };
      result = await runPipeline(parsed.settings, createFsRepository(parsed.settings.root), { ...baseOptions, ...scale });
      failOn = parsed.settings.failOn;
    }
    const toFile = parsed.out !== null;
    const color = parsed.color ?? (!toFile && process.stdout.isTTY === true && !process.env.NO_COLOR);
    // The JSON report comes in pieces (one model at a time), so that a run of any size is written
    // without being one string; the Markdown report is cut to a size and the text report is one
    // line per model.
    const pieces: Iterable<string> =
      parsed.format === 'json'
        ? jsonReport(result)
        : parsed.format === 'markdown'
          ? [(await import('./report/markdown.js')).formatMarkdown(result)]
          : [formatText(result, { color })];
    if (parsed.out !== null) writeReportFile(parsed.out, pieces, '--out');
    else await writeReportStream(process.stdout, pieces);
    // SARIF paths are relative to the working directory when the root lies inside it (code
    // scanning reads them from the checkout); merged shard reports run from the root.
    const prefix = parsed.kind === 'check' ? path.relative(process.cwd(), parsed.settings.root).split(path.sep).join('/') : '';
    if (parsed.html === null && parsed.sarif === null && parsed.junit === null) return exitStatus(result, failOn);
    const { writeFileReports } = await import('./entries/output-files.js');
    await writeFileReports(result, {
      html: parsed.html,
      sarif: parsed.sarif,
      junit: parsed.junit,
      sarifPrefix: prefix.startsWith('..') || path.isAbsolute(prefix) ? '' : prefix,
      failOn,
    });
    return exitStatus(result, failOn);
  } catch (error) {
    // One line whatever the message holds (a file name may contain a line break and a `::` command).
    process.stderr.write(`fitgate: ${escapeTerminal(errorMessage(error))}\n`);
    if (debug && error instanceof Error && error.stack) process.stderr.write(`${error.stack}\n`);
    else if (!(error instanceof InputError)) process.stderr.write('(run with --debug for the stack trace)\n');
    return 2;
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

#!/usr/bin/env node
/**
 * The `fitgate` command: parse argv, run the pipeline, print a report, set the exit status
 * (0 within limits, 1 a model over a limit, 2 the run could not be done).
 */
import { writeFile } from 'node:fs/promises';
import { parseArgs } from './args.js';
import { errorMessage, InputError } from './errors.js';
import { runPipeline } from './pipeline.js';
import { createFsRepository } from './repo/fs-repository.js';
import { formatJson } from './report/json.js';
import { formatMarkdown } from './report/markdown.js';
import { formatText } from './report/text.js';
import { exitStatus } from './result.js';

async function main(argv: string[]): Promise<number> {
  let debug = argv.includes('--debug');
  try {
    const parsed = parseArgs(argv, process.cwd());
    if (parsed.kind === 'print') {
      (parsed.status === 0 ? process.stdout : process.stderr).write(parsed.text);
      return parsed.status;
    }
    debug = parsed.debug;
    const result = await runPipeline(parsed.settings, createFsRepository(parsed.settings.root));
    const toFile = parsed.out !== null;
    const color = parsed.color ?? (!toFile && process.stdout.isTTY === true && !process.env.NO_COLOR);
    const text =
      parsed.format === 'json'
        ? formatJson(result)
        : parsed.format === 'markdown'
          ? formatMarkdown(result)
          : formatText(result, { color });
    if (parsed.out !== null) await writeFile(parsed.out, text);
    else process.stdout.write(text);
    return exitStatus(result, parsed.settings.failOn);
  } catch (error) {
    process.stderr.write(`fitgate: ${errorMessage(error)}\n`);
    if (debug && error instanceof Error && error.stack) process.stderr.write(`${error.stack}\n`);
    else if (!(error instanceof InputError)) process.stderr.write('(run with --debug for the stack trace)\n');
    return 2;
  }
}

process.exitCode = await main(process.argv.slice(2));

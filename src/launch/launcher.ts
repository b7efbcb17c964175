#!/usr/bin/env node
/**
 * The `fitgate` command as shipped (dist/cli/index.js): compiles the command's core
 * (dist/cli/core.js, src/cli.ts made a classic script by core-script.ts) from its V8 code cache
 * when this Node.js can use it, and runs it. Everything the command does is in cli.ts; a core
 * that cannot be read or started (a damaged installation) ends the run with status 2.
 *
 * This file and the rest of src/launch are CommonJS (src/launch/package.json): Node.js starts a
 * CommonJS entry without its ES module loader, about 7 ms sooner on the development machine. The
 * chunks the core loads on demand are ES modules in dist/cli/chunks/.
 */
import path from 'node:path';
import { compileCore, runCore } from './code-cache.js';

function cannotStart(error: unknown): void {
  process.stderr.write(`fitgate: cannot start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exitCode = 2;
}

try {
  const core = compileCore(path.join(__dirname, 'core.js'), path.join(__dirname, 'core.cache'));
  runCore(core.script, __filename, path.join(__dirname, 'chunks')).catch(cannotStart);
} catch (error) {
  cannotStart(error);
}

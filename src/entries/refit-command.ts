/**
 * `fitgate refit [descriptor...]`: refits every model and writes its coefficients into the
 * descriptor's `coefficients` (only those bytes change; see config/coefficients-text.ts), with
 * one summary line per descriptor. `--check` writes nothing and exits 1 when a descriptor's
 * shipped coefficients are stale (missing or apart from the refit), for a CI step. A model that
 * cannot be refitted is listed and makes the exit status 2; the others are still written. A
 * model scored as shipped (`fit.refit: false`) is kept as it is.
 */
import {
  blankCoefficients,
  compareCoefficients,
  scoresAsShipped,
  shippedCoefficients,
  withCoefficients,
} from '../config/coefficients-text.js';
import { errorMessage, InputError } from '../core/errors.js';
import { formatNumber } from '../core/format.js';
import { createFsRepository } from '../repo/fs-repository.js';
import { writeInRepo } from './repo-write.js';
import type { RepoReader } from '../repo/types.js';
import { fromJsonNumber } from '../result/result.js';
import { runPipeline } from '../run/pipeline.js';
import { escapeTerminal } from '../report/escape.js';
import type { RefitCommand } from './args.js';
import type { CommandOutcome } from './command-outcome.js';

/** Runs `fitgate refit`; see the module comment. */
export async function runRefit(command: RefitCommand): Promise<CommandOutcome> {
  const { settings } = command;
  const repo = createFsRepository(settings.root);
  // The refit ignores the shipped coefficients (a list that no longer fits the terms is what a
  // refit is for): YAML files are read with that key blanked out. Serial, so that every read
  // goes through this reader.
  const refitting: RepoReader = {
    ...repo,
    label: repo.label,
    resolve: (from, target, where) => repo.resolve(from, target, where),
    isFile: (p) => repo.isFile(p),
    size: (p) => repo.size(p),
    stream: (p, chunk) => repo.stream(p, chunk),
    glob: (patterns) => repo.glob(patterns),
    read: async (p) => {
      const bytes = await repo.read(p);
      if (!/\.ya?ml$/i.test(p)) return bytes;
      const text = new TextDecoder().decode(bytes);
      return scoresAsShipped(text) ? bytes : new TextEncoder().encode(blankCoefficients(text));
    },
  };
  const result = await runPipeline(settings, refitting, { jobs: 1 });
  const lines: string[] = [];
  let stale = 0;
  let errors = 0;
  let written = 0;
  for (const m of result.models) {
    const where = escapeTerminal(m.descriptor);
    if (m.error) {
      errors += 1;
      const at =
        m.error.file && m.error.file !== m.descriptor
          ? `${m.error.file}${m.error.line ? `:${m.error.line}` : ''}: `
          : m.error.line
            ? `line ${m.error.line}: `
            : '';
      lines.push(`error: ${where}: ${escapeTerminal(at + m.error.message)}`);
      continue;
    }
    if (m.kind === 'predictions') {
      lines.push(`kept: ${where}: trained elsewhere (\`predictions\`), nothing to refit`);
      continue;
    }
    const refit = m.coefficients.map((c) => fromJsonNumber(c));
    if (!refit.every(Number.isFinite)) {
      errors += 1;
      lines.push(`error: ${where}: the refit has coefficients that are not finite numbers; nothing written`);
      continue;
    }
    try {
      const text = new TextDecoder('utf-8', { fatal: true }).decode(await repo.read(m.descriptor));
      if (scoresAsShipped(text)) {
        lines.push(`kept: ${where}: scored as shipped (\`fit.refit: false\`), not refitted`);
        continue;
      }
      const shipped = shippedCoefficients(text);
      const { stale: isStale, largest, at } = compareCoefficients(shipped, refit);
      const count = `${refit.length} coefficient${refit.length === 1 ? '' : 's'}`;
      const change =
        shipped === null
          ? 'none shipped'
          : shipped.length !== refit.length
            ? `${shipped.length} shipped`
            : `largest difference ${formatNumber(largest)} at [${at}]`;
      if (command.check) {
        if (isStale) stale += 1;
        lines.push(
          isStale ? `stale: ${where}: ${count} from the refit, ${change}; run \`fitgate refit ${where}\`` : `current: ${where}: ${count}`,
        );
        continue;
      }
      if (!isStale && shipped !== null) {
        lines.push(`unchanged: ${where}: ${count}`);
        continue;
      }
      writeInRepo(settings.root, m.descriptor, withCoefficients(text, refit, m.descriptor), true);
      written += 1;
      lines.push(`wrote: ${where}: ${count} (${change})`);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      errors += 1;
      lines.push(`error: ${where}: ${escapeTerminal(error.location.file === m.descriptor ? error.message : errorMessage(error))}`);
    }
  }
  const models = `${result.models.length} model${result.models.length === 1 ? '' : 's'}`;
  lines.push(
    command.check
      ? `${models}: ${stale} with stale coefficients${errors > 0 ? `, ${errors} could not be refitted` : ''}`
      : `${models}: ${written} descriptor${written === 1 ? '' : 's'} written${errors > 0 ? `, ${errors} could not be refitted` : ''}`,
  );
  const status = errors > 0 ? 2 : command.check && stale > 0 ? 1 : 0;
  return { stdout: `${lines.join('\n')}\n`, stderr: '', status };
}

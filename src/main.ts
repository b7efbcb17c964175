/**
 * The action's entry: read the inputs, compare with the base commit on pull requests, run the
 * same pipeline as the CLI, hand the Result to the reporters (annotations, log, job summary,
 * comment), set the outputs, and fail the step exactly when the CLI would exit 1 or 2.
 * The only place that calls `core.setFailed`.
 */
import * as core from '@actions/core';
import * as github from '@actions/github';
import { runCheck } from './entries/check-run.js';
import { createCommentApi, upsertComment } from './action/comment.js';
import { pullRequestOf } from './action/event.js';
import { createReviewApi, hasSuggestions, repositoryPrefix, reviewSuggestions } from './action/review-suggestions.js';
import { failedCount, failureMessage, OUTPUTS, writeReport } from './action/outcome.js';
import { errorMessage, InputError } from './core/errors.js';
import { readInputs, type ActionInputs } from './entries/inputs.js';
import type { PullRequestEvent } from './action/event.js';
import type { Result } from './result/result.js';
import { isFitgateWorker } from './run/worker-role.js';
import { writeFileReports } from './entries/output-files.js';
import { OUTPUT_REFUSED } from './entries/safe-write.js';
import { createFsRepository } from './repo/fs-repository.js';
import { formatAnnotations, formatCommand, inputErrorAnnotation } from './report/annotations.js';
import { defuseLegacyCommands, neutraliseLogLine } from './report/runner-commands.js';
import { formatComment, formatSummary } from './report/summary.js';
import { formatText } from './report/text.js';

/**
 * Sets the step's outputs.
 * @throws InputError `runner-file` when GITHUB_OUTPUT cannot take them (readInputs checked it at
 *   the start; this is for a file that went away during the run)
 */
function setOutputs(outputs: Record<string, string>): void {
  try {
    for (const [name, value] of Object.entries(outputs)) core.setOutput(name, value);
  } catch (error) {
    throw new InputError('runner-file', `could not write the step's outputs: ${errorMessage(error)}`, { key: 'GITHUB_OUTPUT' });
  }
}

/** Writes one notice, warning or error line of our own (message escaped, no runner command). */
function say(level: 'notice' | 'warning' | 'error', message: string): void {
  process.stdout.write(`${formatCommand({ level, title: 'fitgate', message })}\n`);
}

/** Fails the step with a message whose runner commands are broken (the toolkit escapes the rest). */
function fail(message: string): void {
  core.setFailed(defuseLegacyCommands(message));
}

/**
 * Posts or updates the review suggestions (action/review-suggestions.ts); a fork's pull request
 * or a token that may not write gets one notice, other failures one warning. Never fails the run.
 */
async function suggestOnDiff(result: Result, inputs: ActionInputs, pr: PullRequestEvent): Promise<void> {
  if (pr.fromFork) {
    if (!hasSuggestions(result)) return;
    say(
      'notice',
      'review suggestions are skipped: the pull request comes from a fork, whose token cannot write review comments. The result is unchanged.',
    );
    return;
  }
  if (!pr.headSha) {
    core.info('review suggestions are skipped: the event names no head commit.');
    return;
  }
  const api = createReviewApi(inputs.token, pr, (line) => say('warning', `GitHub API: ${line}`));
  const repo = createFsRepository(inputs.settings.root);
  const source = {
    prefix: await repositoryPrefix(inputs.settings.root, inputs.prefix),
    read: async (file: string) => new TextDecoder().decode(await repo.read(file)),
  };
  const outcome = await reviewSuggestions(api, result, source, pr.headSha);
  if (outcome.kind === 'forbidden') {
    say(
      'notice',
      `review suggestions could not be written (HTTP ${outcome.status}): the token may not write review comments on this pull request (they need pull-requests: write). The result is unchanged.`,
    );
  } else if (outcome.kind === 'failed') {
    say('warning', `review suggestions could not be written: ${outcome.message}. The result is unchanged.`);
  } else {
    const { created, updated, unchanged, deleted } = outcome.counts;
    if (created + updated + unchanged + deleted > 0)
      core.info(`review suggestions: ${created} posted, ${updated} updated, ${unchanged} unchanged, ${deleted} removed`);
    for (const line of outcome.skipped) core.info(neutraliseLogLine(line));
  }
}

async function run(): Promise<void> {
  let prefix = '';
  try {
    const inputs = readInputs();
    // The runner hides the token in every later line of the log.
    if (inputs.token !== '') core.setSecret(inputs.token);
    prefix = inputs.prefix;
    const pr = pullRequestOf({
      eventName: github.context.eventName ?? '',
      payload: github.context.payload,
      repository: process.env.GITHUB_REPOSITORY,
    });

    // The base commit first, so that the head run can compare with it.
    const result = await runCheck(inputs.settings, { base: pr?.baseSha || null, entry: 'action', shard: inputs.shard, jobs: null });

    // Reporters: annotations and log, JSON report, file reports, job summary, comment. A file
    // that is refused (a link, a folder leading out of the workspace) fails the step as bad
    // input once every other reporter has run; a write that fails is a warning.
    process.stdout.write(formatAnnotations(result, { prefix }));
    for (const line of formatText(result).split('\n')) core.info(neutraliseLogLine(line));
    const refused: string[] = [];
    let report = '';
    try {
      report = await writeReport(result, inputs.tempDir, process.env.GITHUB_ACTION);
    } catch (error) {
      if (error instanceof InputError && error.code === OUTPUT_REFUSED) refused.push(error.describe());
      else say('warning', `could not write the JSON report: ${errorMessage(error)}`);
    }
    const files = await writeFileReports(result, {
      ...inputs.files,
      sarifPrefix: prefix,
      failOn: inputs.settings.failOn,
      within: [inputs.workspace],
      insideOnly: true,
    });
    for (const failure of files) {
      if (failure.refused) refused.push(failure.message);
      else say('warning', `could not write a file report: ${failure.message}`);
    }
    for (const message of refused) say('error', `a report file was refused: ${message}`);
    try {
      await core.summary.addRaw(formatSummary(result)).write();
    } catch (error) {
      say('warning', `could not write the job summary: ${errorMessage(error)}`);
    }
    if (inputs.comment && pr) {
      if (inputs.token === '') say('notice', 'no github-token: the pull-request comment is skipped; the report is in the job summary.');
      else {
        const api = createCommentApi(inputs.token, pr, (line) => say('warning', `GitHub API: ${line}`));
        const outcome = await upsertComment(api, formatComment(result));
        if (outcome.kind === 'forbidden') {
          say(
            'notice',
            `the pull-request comment could not be written (HTTP ${outcome.status}): the token may not write to this pull request (pull requests from forks get a read-only token; the comment needs pull-requests: write). The result is unchanged and the report is in the job summary.`,
          );
        } else if (outcome.kind === 'failed') {
          say('warning', `the pull-request comment could not be written: ${outcome.message}. The result is unchanged.`);
        }
        // Review suggestions on the descriptor lines of the diff (a forbidden comment said it all already).
        if (outcome.kind !== 'forbidden') {
          try {
            await suggestOnDiff(result, inputs, pr);
          } catch (error) {
            say('warning', `review suggestions could not be written: ${errorMessage(error)}. The result is unchanged.`);
          }
        }
      }
    }

    // Outputs and the step's status (a refused report file counts as bad input, as the CLI's exit status 2).
    setOutputs({
      [OUTPUTS.verdict]: refused.length > 0 ? 'error' : result.verdict,
      [OUTPUTS.failed]: String(failedCount(result, inputs.settings.failOn)),
      [OUTPUTS.report]: report,
    });
    const failure = failureMessage(result, inputs.settings.failOn);
    if (refused.length > 0)
      fail(
        `fitgate refused to write ${refused.length === 1 ? 'a report file' : `${refused.length} report files`} (see the errors above).${failure !== null ? ` ${failure}` : ''}`,
      );
    else if (failure !== null) fail(failure);
  } catch (error) {
    try {
      core.setOutput(OUTPUTS.verdict, 'error');
    } catch {
      // GITHUB_OUTPUT cannot take it: the error below is still the one to report.
    }
    if (error instanceof InputError) {
      if (error.location.file !== undefined) process.stdout.write(`${formatCommand(inputErrorAnnotation(error, prefix))}\n`);
      fail(`fitgate could not run: ${error.describe()}`);
    } else {
      if (error instanceof Error && error.stack) core.debug(defuseLegacyCommands(error.stack));
      fail(`fitgate failed unexpectedly: ${errorMessage(error)}`);
    }
  }
}

// In a model worker thread (the bundle is one file, so workers load it too) the worker loop runs instead.
if (!isFitgateWorker()) await run();

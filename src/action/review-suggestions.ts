/**
 * The reviewer's view: a check that proposes one new value for a descriptor setting (the
 * `complexity` check's `degree 3`) becomes one pull-request review comment holding a
 * ` ```suggestion ` block that replaces that descriptor line, so that the author applies it in
 * one click. Only lines in the pull request's diff can take one. Each comment carries a hidden
 * marker (model and check); later runs find it again and update it in place, never post a second.
 *
 * What happens to comments of earlier runs (oldest first, ours only, found by the marker):
 * - live (GitHub still places it on a line) on the same file and line as this run's suggestion
 *   of the same model and check: updated when the body differs, else left alone;
 * - live elsewhere, or a second one at the same place, or for a model this run checked that has
 *   no suggestion any more: deleted, since one click would apply a change that no longer stands;
 * - outdated (GitHub no longer places it: the lines around it changed): left as it is, folded
 *   away by GitHub with its replies;
 * - for a model this run did not check (another settings file, a model that could not be
 *   checked, a renamed model): left as it is.
 */
import { realpath } from 'node:fs/promises';
import nodePath from 'node:path';
import { tryGitTopLevel } from '../repo/git-repository.js';
import { escapeMarkdown } from '../report/escape.js';
import { quoteServerText } from '../report/runner-commands.js';
import type { Result } from '../result/result.js';
import { createOctokit, httpStatus, type PullRequestRef } from './comment.js';
import { diffLines } from './diff-lines.js';
import { rewriteSetting } from './suggested-line.js';

/** Start of the hidden marker of a review suggestion. */
export const SUGGESTION_MARKER = '<!-- fitgate-suggestion';

/** Most review suggestions written in one run (one per model and check; more are left out with one note). */
export const MAX_SUGGESTIONS = 50;

/** Longest descriptor line put in a suggestion, in characters (longer lines get none). */
export const MAX_SUGGESTED_LINE = 400;

/** Most changed files and review comments read (the REST API lists at most 3,000 files). */
const MAX_LISTED = 3000;

/** A review comment of the pull request, as far as it is read here. */
export interface ReviewComment {
  id: number;
  body: string;
  /** Repository-relative path. */
  path: string;
  /** The line GitHub places it on now (new side), or null when it is outdated. */
  line: number | null;
}

/** A changed file of the pull request. */
export interface ChangedFile {
  /** Repository-relative path. */
  filename: string;
  /** The unified diff of the file; absent for binary or very large files. */
  patch?: string;
}

/** The REST calls the review suggestions need; {@link createReviewApi} backs them. */
export interface ReviewApi {
  /** The pull request's changed files (all pages, at most 3,000). */
  files(): Promise<ChangedFile[]>;
  /** The pull request's review comments, oldest first (all pages). */
  comments(): Promise<ReviewComment[]>;
  /** Posts a single review comment on the new side of `path` at `line` of the commit `commit`. */
  create(comment: { body: string; path: string; line: number; commit: string }): Promise<void>;
  update(id: number, body: string): Promise<void>;
  remove(id: number): Promise<void>;
}

/**
 * {@link ReviewApi} through `@actions/github`'s Octokit (see {@link createOctokit}).
 * @param token a token with `pull-requests: write`
 * @param ref the pull request
 * @param log where Octokit's own warnings go (one cleaned line each)
 */
export function createReviewApi(token: string, ref: PullRequestRef, log: (line: string) => void = () => {}): ReviewApi {
  const octokit = createOctokit(token, log);
  const where = { owner: ref.owner, repo: ref.repo };
  const pull = { ...where, pull_number: ref.number };
  return {
    async files() {
      const all: ChangedFile[] = [];
      for await (const page of octokit.paginate.iterator(octokit.rest.pulls.listFiles, { ...pull, per_page: 100 })) {
        for (const f of page.data) all.push({ filename: f.filename, ...(typeof f.patch === 'string' ? { patch: f.patch } : {}) });
        if (all.length >= MAX_LISTED) break;
      }
      return all;
    },
    async comments() {
      const all: ReviewComment[] = [];
      for await (const page of octokit.paginate.iterator(octokit.rest.pulls.listReviewComments, { ...pull, per_page: 100 })) {
        for (const c of page.data)
          all.push({ id: c.id, body: c.body ?? '', path: c.path, line: typeof c.line === 'number' ? c.line : null });
        if (all.length >= MAX_LISTED) break;
      }
      return all;
    },
    async create(c) {
      await octokit.rest.pulls.createReviewComment({
        ...pull,
        body: c.body,
        path: c.path,
        line: c.line,
        side: 'RIGHT',
        commit_id: c.commit,
      });
    },
    async update(id, body) {
      await octokit.rest.pulls.updateReviewComment({ ...where, comment_id: id, body });
    },
    async remove(id) {
      await octokit.rest.pulls.deleteReviewComment({ ...where, comment_id: id });
    },
  };
}

/** One suggestion to place: a model's check proposes `after` for line `line` of `path`. */
export interface WantedSuggestion {
  model: string;
  check: string;
  /** Repository-relative path of the descriptor. */
  path: string;
  line: number;
  /** The line as it is, and as the suggestion writes it. */
  before: string;
  after: string;
  /** The whole comment body, marker first. */
  body: string;
}

/** Hidden marker of one model's check: the model name percent-encoded (no `-` either, so never `--`). */
export function suggestionMarker(model: string, check: string): string {
  const name = encodeURIComponent(model).replace(/-/g, '%2D');
  return `${SUGGESTION_MARKER} model=${name} check=${check.replace(/[^a-z0-9]/g, '_')} -->`;
}

/** Model and check of a marked comment body, or null when it carries no marker of ours. */
export function parseSuggestionMarker(body: string): { model: string; check: string } | null {
  const m = /<!-- fitgate-suggestion model=(\S+) check=(\S+) -->/.exec(body);
  if (!m) return null;
  try {
    return { model: decodeURIComponent(m[1]), check: m[2] };
  } catch {
    return null;
  }
}

/** A fence of backticks longer than any run of backticks in `text` (at least three). */
function fence(text: string): string {
  let longest = 0;
  for (const run of text.match(/`+/g) ?? []) longest = Math.max(longest, run.length);
  return '`'.repeat(Math.max(3, longest + 1));
}

/** The comment body: marker, one sentence, the suggestion block. */
export function suggestionBody(model: string, check: string, text: string, after: string): string {
  const name = [...model].length > 80 ? `${[...model].slice(0, 79).join('')}…` : model;
  const f = fence(after);
  return `${suggestionMarker(model, check)}\n**fitgate \`${check}\`** (model ${escapeMarkdown(name)}): ${escapeMarkdown(text)}.\n\n${f}suggestion\n${after}\n${f}\n`;
}

/** Where the descriptors are and how to read them. */
export interface SuggestionSource {
  /** The fitgate root's path relative to the repository top (`''` for the top itself), with `/`. */
  prefix: string;
  /** The text of a descriptor in the checkout (root-relative path); may throw. */
  read(descriptor: string): Promise<string>;
}

/**
 * The fitgate root's path relative to the top of its git work tree, with `/` (`''` at the top):
 * what turns a descriptor path of the Result into a path of the pull request's diff.
 * @param root the fitgate root (a real path)
 * @param fallback used when git cannot tell (the root relative to the workspace)
 */
export async function repositoryPrefix(root: string, fallback: string): Promise<string> {
  const top = await tryGitTopLevel(root);
  if (top === null) return fallback;
  try {
    return nodePath
      .relative(await realpath(top), await realpath(root))
      .split(nodePath.sep)
      .join('/');
  } catch {
    return fallback;
  }
}

/** What {@link planSuggestions} found: the suggestions to place, and why others were left out. */
export interface SuggestionPlan {
  wanted: WantedSuggestion[];
  /** One sentence per suggestion that cannot be placed (not a line of the diff is silent). */
  skipped: string[];
  /** Names of the models this run checked (not `error`): their stale comments may go. */
  checked: Set<string>;
}

/** The suggestions of a Result that name one new value (the checks' `suggestion.change`). */
export function hasSuggestions(result: Result): boolean {
  return result.models.some((m) => m.verdict !== 'error' && m.checks.some((c) => c.suggestion?.change !== undefined));
}

/**
 * Turns the Result's one-value suggestions into review suggestions on lines of the diff: reads
 * each descriptor from the checkout, rewrites the value ({@link rewriteSetting}), and keeps it
 * when that line is in the diff and the diff's text of the line is the checkout's (a checkout
 * that differs from the head commit there gets no suggestion).
 * @param result the head run's Result
 * @param files the pull request's changed files
 * @param source where the descriptors are
 */
export async function planSuggestions(result: Result, files: readonly ChangedFile[], source: SuggestionSource): Promise<SuggestionPlan> {
  const diff = new Map<string, Map<number, string>>();
  for (const f of files) if (f.patch !== undefined) diff.set(f.filename, diffLines(f.patch));
  const wanted: WantedSuggestion[] = [];
  const skipped: string[] = [];
  const checked = new Set<string>();
  for (const model of result.models) {
    if (model.verdict === 'error') continue;
    checked.add(model.name);
    for (const check of model.checks) {
      const s = check.suggestion;
      if (s?.change === undefined) continue;
      const path = source.prefix === '' ? model.descriptor : `${source.prefix}/${model.descriptor}`;
      const lines = diff.get(path);
      const quoted = quoteServerText(model.name);
      if (lines === undefined) continue;
      let text: string;
      try {
        text = await source.read(model.descriptor);
      } catch {
        skipped.push(`${quoted}: the descriptor could not be read again for the review suggestion`);
        continue;
      }
      const rewritten = rewriteSetting(text, s.line, s.change);
      if (rewritten === null) {
        if (lines.has(s.line))
          skipped.push(
            `${quoted}: no review suggestion for "${s.text.split(' (')[0]}": the value of \`${s.change.key}\` is not written as a plain number at line ${s.line}`,
          );
        continue;
      }
      const diffText = lines.get(rewritten.line);
      if (diffText === undefined) continue;
      if (diffText !== rewritten.before) {
        skipped.push(`${quoted}: no review suggestion: line ${rewritten.line} of the checkout differs from the pull request's head`);
        continue;
      }
      if (rewritten.after.length > MAX_SUGGESTED_LINE) {
        skipped.push(`${quoted}: no review suggestion: line ${rewritten.line} is longer than ${MAX_SUGGESTED_LINE} characters`);
        continue;
      }
      wanted.push({
        model: model.name,
        check: check.id,
        path,
        line: rewritten.line,
        before: rewritten.before,
        after: rewritten.after,
        body: suggestionBody(model.name, check.id, s.text, rewritten.after),
      });
    }
  }
  if (wanted.length > MAX_SUGGESTIONS) {
    skipped.push(`${wanted.length - MAX_SUGGESTIONS} more review suggestions left out (at most ${MAX_SUGGESTIONS} a run)`);
    wanted.length = MAX_SUGGESTIONS;
  }
  return { wanted, skipped, checked };
}

/** What {@link syncSuggestions} did. */
export interface SyncCounts {
  created: number;
  updated: number;
  unchanged: number;
  deleted: number;
}

/**
 * Brings the pull request's review suggestions of ours in line with `plan` (the rules are in
 * this module's comment). Throws what the API throws.
 * @param api the REST calls
 * @param plan what this run suggests
 * @param commit the pull request's head SHA (new comments are placed on it)
 */
export async function syncSuggestions(api: ReviewApi, plan: SuggestionPlan, commit: string): Promise<SyncCounts> {
  const counts: SyncCounts = { created: 0, updated: 0, unchanged: 0, deleted: 0 };
  const key = (model: string, check: string): string => JSON.stringify([model, check]);
  const wanted = new Map(plan.wanted.map((w) => [key(w.model, w.check), { w, placed: false }]));
  for (const c of await api.comments()) {
    const marker = parseSuggestionMarker(c.body);
    if (marker === null || c.line === null) continue;
    const entry = wanted.get(key(marker.model, marker.check));
    if (entry && !entry.placed && c.path === entry.w.path && c.line === entry.w.line) {
      entry.placed = true;
      if (c.body === entry.w.body) counts.unchanged += 1;
      else {
        await api.update(c.id, entry.w.body);
        counts.updated += 1;
      }
    } else if (entry || plan.checked.has(marker.model)) {
      await api.remove(c.id);
      counts.deleted += 1;
    }
  }
  for (const { w, placed } of wanted.values()) {
    if (placed) continue;
    await api.create({ body: w.body, path: w.path, line: w.line, commit });
    counts.created += 1;
  }
  return counts;
}

/** What {@link reviewSuggestions} did, for the entry to report. */
export type ReviewOutcome =
  | { kind: 'done'; counts: SyncCounts; skipped: string[] }
  | { kind: 'forbidden'; status: number; message: string }
  | { kind: 'failed'; message: string };

/**
 * Lists the changed files, plans the suggestions and syncs the review comments. Never throws:
 * 401, 403 and 404 come back as `forbidden` (a token that may not write: a fork's), other
 * failures as `failed`, each with the server's text cut and cleaned.
 * @param api the REST calls
 * @param result the head run's Result (the changed files are only listed when it has a one-value suggestion)
 * @param source where the descriptors are
 * @param commit the pull request's head SHA
 */
export async function reviewSuggestions(api: ReviewApi, result: Result, source: SuggestionSource, commit: string): Promise<ReviewOutcome> {
  try {
    // Without a suggestion the changed files are not needed, but earlier suggestions may have to go.
    const plan = await planSuggestions(result, hasSuggestions(result) ? await api.files() : [], source);
    const counts = await syncSuggestions(api, plan, commit);
    return { kind: 'done', counts, skipped: plan.skipped };
  } catch (error) {
    const status = httpStatus(error);
    const message = quoteServerText(error instanceof Error ? error.message : String(error));
    if (status === 401 || status === 403 || status === 404) return { kind: 'forbidden', status, message };
    return { kind: 'failed', message: status === null ? message : `HTTP ${status}: ${message}` };
  }
}

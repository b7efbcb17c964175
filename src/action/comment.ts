/**
 * The one pull-request comment: found again by its hidden marker and updated in place, created
 * only when none exists. A token that may not write (pull requests from forks, read-only
 * permissions) is not an error of the run: the caller turns it into a notice.
 */
import * as github from '@actions/github';
import { MAX_SERVER_TEXT, quoteServerText } from '../report/runner-commands.js';
import { COMMENT_MARKER } from '../report/summary.js';

/** Longest line of Octokit's own warnings printed (its text quotes the request and a response's headers). */
const MAX_LIBRARY_LINE = 200;

/** An existing comment: its id and body. */
export interface IssueComment {
  id: number;
  body: string;
}

/** The three calls the comment needs; {@link createCommentApi} backs them with the REST API. */
export interface CommentApi {
  /** Every comment of the pull request, oldest first (all pages). */
  list(): Promise<IssueComment[]>;
  create(body: string): Promise<void>;
  update(id: number, body: string): Promise<void>;
}

/** Where the comment goes. */
export interface PullRequestRef {
  owner: string;
  repo: string;
  number: number;
}

/** What {@link upsertComment} did. */
export type CommentOutcome =
  | { kind: 'created' }
  | { kind: 'updated'; id: number }
  | { kind: 'forbidden'; status: number; message: string }
  | { kind: 'failed'; message: string };

/** HTTP status of an Octokit request error, or null. */
export function httpStatus(error: unknown): number | null {
  if (typeof error === 'object' && error !== null && 'status' in error) {
    const status = (error as { status: unknown }).status;
    return typeof status === 'number' ? status : null;
  }
  return null;
}

/**
 * `@actions/github`'s Octokit (base URL from `GITHUB_API_URL`, proxy from the runner's settings)
 * whose own warnings and errors never reach the console: they go to `log`, one line each, cut and
 * cleaned with {@link quoteServerText}.
 * @param token the token (only handed to Octokit)
 * @param log where Octokit's warnings and errors go
 */
export function createOctokit(token: string, log: (line: string) => void): ReturnType<typeof github.getOctokit> {
  const say = (message: unknown): void => log(quoteServerText(String(message), MAX_LIBRARY_LINE));
  const quiet = { debug: () => {}, info: () => {}, warn: say, error: say };
  const octokit = github.getOctokit(token, { baseUrl: process.env.GITHUB_API_URL || 'https://api.github.com', log: quiet });
  // Octokit's request layer writes its warnings (a deprecated route, with the response's headers)
  // to `request.log`, else to the console, not to the `log` option: hand it the same logger on
  // every request (the proxy settings in `request` are kept).
  octokit.hook.before('request', (options) => {
    options.request = { ...options.request, log: quiet };
  });
  return octokit;
}

/**
 * The REST API behind {@link CommentApi}, through `@actions/github`'s Octokit (base URL from
 * `GITHUB_API_URL`, proxy from the runner's settings). The token is only handed to Octokit.
 * Octokit's own warnings and errors (some of them quote a response's headers) never reach the
 * console: they go to `log`, cut and cleaned with {@link quoteServerText}.
 * @param token a token with `pull-requests: write` (or `issues: write`)
 * @param ref the pull request
 * @param log where Octokit's warnings and errors go, one cleaned line each; default: dropped
 */
export function createCommentApi(token: string, ref: PullRequestRef, log: (line: string) => void = () => {}): CommentApi {
  const octokit = createOctokit(token, log);
  const where = { owner: ref.owner, repo: ref.repo, issue_number: ref.number };
  return {
    async list() {
      const all = await octokit.paginate(octokit.rest.issues.listComments, { ...where, per_page: 100 });
      return all.map((c) => ({ id: c.id, body: c.body ?? '' }));
    },
    async create(body) {
      await octokit.rest.issues.createComment({ ...where, body });
    },
    async update(id, body) {
      await octokit.rest.issues.updateComment({ owner: ref.owner, repo: ref.repo, comment_id: id, body });
    },
  };
}

/**
 * Updates fitgate's comment in place, or creates it when there is none. Never creates a second
 * one: when several carry the marker (made by hand), the oldest is updated.
 * 401, 403 and 404 come back as `forbidden` (the token may not write here); other failures as
 * `failed`. Neither throws. The message is the server's text cut and cleaned with
 * {@link quoteServerText} (at most {@link MAX_SERVER_TEXT} characters, one line, no runner
 * command), ready to print.
 * @param api the comment calls
 * @param body the comment, starting with {@link COMMENT_MARKER}
 */
export async function upsertComment(api: CommentApi, body: string): Promise<CommentOutcome> {
  try {
    const existing = (await api.list()).find((c) => c.body.includes(COMMENT_MARKER));
    if (existing) {
      await api.update(existing.id, body);
      return { kind: 'updated', id: existing.id };
    }
    await api.create(body);
    return { kind: 'created' };
  } catch (error) {
    const status = httpStatus(error);
    const message = quoteServerText(error instanceof Error ? error.message : String(error));
    if (status === 401 || status === 403 || status === 404) return { kind: 'forbidden', status, message };
    return { kind: 'failed', message: status === null ? message : `HTTP ${status}: ${message}` };
  }
}

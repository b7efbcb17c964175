/**
 * What the action needs from the event that started the workflow: the pull request (for the
 * comment) and its base commit (for the comparison). Other events have neither.
 */
import type { PullRequestRef } from './comment.js';

/** The parts of `@actions/github`'s context read here. */
export interface EventContext {
  eventName: string;
  payload: Record<string, unknown>;
  /** `owner/name` from `GITHUB_REPOSITORY`, or undefined. */
  repository: string | undefined;
}

/** The pull request an event is about. */
export interface PullRequestEvent extends PullRequestRef {
  /** SHA of the base commit (`pull_request.base.sha`), or null when the payload lacks it. */
  baseSha: string | null;
}

function record(x: unknown): Record<string, unknown> | null {
  return typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Record<string, unknown>) : null;
}

/**
 * The pull request of a `pull_request*` event, or null for any other event or a payload
 * without a pull request number or repository.
 * @param context event name, payload and repository
 */
export function pullRequestOf(context: EventContext): PullRequestEvent | null {
  if (!context.eventName.startsWith('pull_request')) return null;
  const pr = record(context.payload.pull_request);
  const number = pr?.number;
  if (typeof number !== 'number' || !Number.isInteger(number) || number <= 0) return null;
  let owner: string | undefined;
  let repo: string | undefined;
  if (context.repository && /^[^/]+\/[^/]+$/.test(context.repository)) [owner, repo] = context.repository.split('/');
  else {
    const r = record(context.payload.repository);
    owner = typeof record(r?.owner)?.login === 'string' ? (record(r?.owner)?.login as string) : undefined;
    repo = typeof r?.name === 'string' ? r.name : undefined;
  }
  if (!owner || !repo) return null;
  const sha = record(pr?.base)?.sha;
  return { owner, repo, number, baseSha: typeof sha === 'string' && /^[0-9a-f]{40,64}$/.test(sha) ? sha : null };
}

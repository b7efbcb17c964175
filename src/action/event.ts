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
  /** SHA of the pull request's head commit (`pull_request.head.sha`), or null when the payload lacks it. */
  headSha?: string | null;
  /**
   * True when the head branch lives in another repository than the base (a fork): its
   * `head.repo.full_name` differs from `base.repo.full_name`, or, when the payload lacks those,
   * `head.repo.fork` is true. Such runs get a token that cannot write to the pull request.
   */
  fromFork?: boolean;
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
  const head = record(pr?.head);
  const headSha = head?.sha;
  const headRepo = record(head?.repo);
  const baseRepo = record(record(pr?.base)?.repo);
  const fromFork =
    typeof headRepo?.full_name === 'string' && typeof baseRepo?.full_name === 'string'
      ? headRepo.full_name !== baseRepo.full_name
      : headRepo?.fork === true;
  return {
    owner,
    repo,
    number,
    baseSha: typeof sha === 'string' && /^[0-9a-f]{40,64}$/.test(sha) ? sha : null,
    headSha: typeof headSha === 'string' && /^[0-9a-f]{40,64}$/.test(headSha) ? headSha : null,
    fromFork,
  };
}

import { describe, expect, it } from 'vitest';
import { pullRequestOf } from '../../src/action/event.js';

const BASE = 'a'.repeat(40);
const HEAD = 'b'.repeat(40);

/** A pull_request event whose head lives in `headRepo`. */
function event(
  head: Record<string, unknown>,
  base: Record<string, unknown> = { sha: BASE, repo: { full_name: 'acme/models', fork: false } },
) {
  return { eventName: 'pull_request', payload: { pull_request: { number: 7, base, head } }, repository: 'acme/models' };
}

describe('pullRequestOf', () => {
  it('reads the head commit and tells a pull request from a fork by its head repository', () => {
    expect(pullRequestOf(event({ sha: HEAD, repo: { full_name: 'acme/models', fork: false } }))).toEqual({
      owner: 'acme',
      repo: 'models',
      number: 7,
      baseSha: BASE,
      headSha: HEAD,
      fromFork: false,
    });
    expect(pullRequestOf(event({ sha: HEAD, repo: { full_name: 'someone/models', fork: true } }))?.fromFork).toBe(true);
    // A repository that is itself a fork, with the branch in the same repository: not from a fork.
    expect(
      pullRequestOf(
        event({ sha: HEAD, repo: { full_name: 'acme/models', fork: true } }, { sha: BASE, repo: { full_name: 'acme/models', fork: true } }),
      )?.fromFork,
    ).toBe(false);
    // Without the names, the head repository's `fork` flag decides.
    expect(pullRequestOf(event({ sha: HEAD, repo: { fork: true } }, { sha: BASE }))?.fromFork).toBe(true);
  });

  it('gives null for a head SHA that is not one, and false without a head repository', () => {
    const pr = pullRequestOf(event({ sha: 'main; rm -rf /' }, { sha: BASE }));
    expect(pr?.headSha).toBeNull();
    expect(pr?.fromFork).toBe(false);
  });
});

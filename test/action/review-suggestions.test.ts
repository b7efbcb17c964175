import { describe, expect, it } from 'vitest';
import {
  parseSuggestionMarker,
  planSuggestions,
  reviewSuggestions,
  suggestionBody,
  suggestionMarker,
  type ChangedFile,
  type ReviewApi,
  type ReviewComment,
} from '../../src/action/review-suggestions.js';
import { summarise, type Result } from '../../src/result/result.js';
import { check, model } from './result-fixture.js';

const WIDE = `version: 1
name: wide
data:
  train: ../data/train.csv
  holdout: ../data/holdout.csv
  target: y
terms:
  - polynomial: { of: x, degree: 9 } # keep
`;
const PATCH =
  '@@ -6,3 +6,3 @@\n   target: y\n terms:\n-  - polynomial: { of: x, degree: 2 } # keep\n+  - polynomial: { of: x, degree: 9 } # keep\n';
const FILES: ChangedFile[] = [{ filename: 'ml/models/wide.model.yml', patch: PATCH }];
const SOURCE = {
  prefix: 'ml',
  read: async (file: string) => (file === 'models/wide.model.yml' ? WIDE : Promise.reject(new Error('no such file'))),
};
const HEAD = 'b'.repeat(40);

/** A Result whose model `wide` suggests `degree <value>` at line 8 (and `other` suggests nothing). */
function result(value: number | null, name = 'wide'): Result {
  const suggestion =
    value === null
      ? {}
      : { suggestion: { text: `degree ${value} (k-fold CV RMSE 0.18 against 0.22 now)`, line: 8, change: { key: 'degree', value } } };
  return summarise(
    [
      model({
        name,
        descriptor: 'models/wide.model.yml',
        verdict: 'pass',
        checks: [check({ id: 'complexity', status: 'pass', line: 8, ...suggestion })],
      }),
      model({ name: 'broken', verdict: 'error', metrics: null, error: { message: 'x', file: null, line: null, code: 'c' } }),
    ],
    '0.1.0',
    [],
  );
}

/** A fake review API over a list of comments, recording the calls. */
function fakeApi(comments: ReviewComment[], fail?: { status: number }) {
  const calls: string[] = [];
  let next = 500;
  const api: ReviewApi = {
    async files() {
      calls.push('files');
      if (fail) throw Object.assign(new Error('Resource not accessible by integration'), fail);
      return FILES;
    },
    async comments() {
      calls.push('comments');
      return comments.map((c) => ({ ...c }));
    },
    async create(c) {
      calls.push(`create ${c.path}:${c.line} @${c.commit.slice(0, 3)}`);
      comments.push({ id: next++, body: c.body, path: c.path, line: c.line });
    },
    async update(id, body) {
      calls.push(`update ${id}`);
      const c = comments.find((x) => x.id === id);
      if (c) c.body = body;
    },
    async remove(id) {
      calls.push(`remove ${id}`);
      comments.splice(
        comments.findIndex((x) => x.id === id),
        1,
      );
    },
  };
  return { api, calls, comments };
}

describe('review suggestions', () => {
  it('round-trips the hidden marker, whatever the model is called', () => {
    for (const name of ['wide', 'a-->b', 'x y %2D', '::error::x', 'ünï 🌡️']) {
      const marker = suggestionMarker(name, 'complexity');
      // The encoded name holds no white space and no `-` (so never `--` nor `-->`).
      expect(marker).toMatch(/^<!-- fitgate-suggestion model=[^\s-]+ check=complexity -->$/);
      expect(parseSuggestionMarker(`${marker}\nbody`)).toEqual({ model: name, check: 'complexity' });
    }
    expect(parseSuggestionMarker('<!-- fitgate-report -->')).toBeNull();
  });

  it('writes the body: marker, one sentence, a suggestion block whose fence outlasts the line', () => {
    expect(
      suggestionBody('wide|<b>', 'complexity', 'degree 3 (k-fold CV RMSE 0.1 against 0.2 now)', '  - polynomial: { of: x, degree: 3 }'),
    ).toBe(
      `${suggestionMarker('wide|<b>', 'complexity')}\n**fitgate \`complexity\`** (model wide\\|&lt;b&gt;): degree 3 (k-fold CV RMSE 0.1 against 0.2 now).\n\n\`\`\`suggestion\n  - polynomial: { of: x, degree: 3 }\n\`\`\`\n`,
    );
    expect(suggestionBody('m', 'complexity', 't', 'a: ```` b')).toContain('\n`````suggestion\na: ```` b\n`````\n');
  });

  it('plans the rewritten line of a model whose suggestion is on a line of the diff', async () => {
    const plan = await planSuggestions(result(3), FILES, SOURCE);
    expect(plan.wanted.map(({ body, ...w }) => w)).toEqual([
      {
        model: 'wide',
        check: 'complexity',
        path: 'ml/models/wide.model.yml',
        line: 8,
        before: '  - polynomial: { of: x, degree: 9 } # keep',
        after: '  - polynomial: { of: x, degree: 3 } # keep',
      },
    ]);
    expect(plan.skipped).toEqual([]);
    expect([...plan.checked]).toEqual(['wide']);
  });

  it('plans nothing for a line outside the diff, a file not in it, or a checkout that differs from the head', async () => {
    const outside = [{ filename: 'ml/models/wide.model.yml', patch: '@@ -1,1 +1,1 @@\n-version: 0\n+version: 1\n' }];
    expect((await planSuggestions(result(3), outside, SOURCE)).wanted).toEqual([]);
    expect((await planSuggestions(result(3), [{ filename: 'README.md', patch: PATCH }], SOURCE)).wanted).toEqual([]);
    const differs = [{ filename: 'ml/models/wide.model.yml', patch: PATCH.replace('degree: 9 } # keep\n', 'degree: 8 }\n') }];
    const plan = await planSuggestions(result(3), differs, SOURCE);
    expect(plan.wanted).toEqual([]);
    expect(plan.skipped).toEqual(["wide: no review suggestion: line 8 of the checkout differs from the pull request's head"]);
  });

  it('posts once, then leaves an equal comment alone, then updates the same comment', async () => {
    const { api, calls, comments } = fakeApi([{ id: 7, body: 'a reviewer', path: 'ml/models/wide.model.yml', line: 8 }]);
    expect(await reviewSuggestions(api, result(3), SOURCE, HEAD)).toEqual({
      kind: 'done',
      counts: { created: 1, updated: 0, unchanged: 0, deleted: 0 },
      skipped: [],
    });
    expect(calls).toEqual(['files', 'comments', 'create ml/models/wide.model.yml:8 @bbb']);
    expect(comments[1].body).toContain('```suggestion\n  - polynomial: { of: x, degree: 3 } # keep\n```');

    calls.length = 0;
    expect(await reviewSuggestions(api, result(3), SOURCE, HEAD)).toMatchObject({
      counts: { created: 0, updated: 0, unchanged: 1, deleted: 0 },
    });
    expect(calls).toEqual(['files', 'comments']);

    calls.length = 0;
    expect(await reviewSuggestions(api, result(4), SOURCE, HEAD)).toMatchObject({
      counts: { created: 0, updated: 1, unchanged: 0, deleted: 0 },
    });
    expect(calls).toEqual(['files', 'comments', 'update 500']);
    expect(comments.length).toBe(2);
    expect(comments[1].body).toContain('degree: 4 } # keep');
  });

  it('leaves outdated comments, removes a stale live one and a duplicate, and leaves models not checked alone', async () => {
    const marker = suggestionMarker('wide', 'complexity');
    const { api, calls } = fakeApi([
      { id: 1, body: `${marker}\nold`, path: 'ml/models/wide.model.yml', line: null },
      { id: 2, body: `${marker}\nold`, path: 'ml/models/wide.model.yml', line: 8 },
      { id: 3, body: `${marker}\ncopy`, path: 'ml/models/wide.model.yml', line: 8 },
      { id: 4, body: `${marker}\nelsewhere`, path: 'ml/models/wide.model.yml', line: 2 },
      { id: 5, body: `${suggestionMarker('broken', 'complexity')}\nx`, path: 'ml/models/broken.model.yml', line: 3 },
    ]);
    expect(await reviewSuggestions(api, result(3), SOURCE, HEAD)).toMatchObject({
      counts: { created: 0, updated: 1, unchanged: 0, deleted: 2 },
    });
    expect(calls).toEqual(['files', 'comments', 'update 2', 'remove 3', 'remove 4']);

    // The suggestion is gone: its live comment goes too; the changed files are not needed.
    calls.length = 0;
    expect(await reviewSuggestions(api, result(null), SOURCE, HEAD)).toMatchObject({ counts: { deleted: 1 } });
    expect(calls).toEqual(['comments', 'remove 2']);
  });

  it('turns 403 and 404 into forbidden and other failures into failed, without throwing', async () => {
    for (const status of [403, 404]) {
      expect(await reviewSuggestions(fakeApi([], { status }).api, result(3), SOURCE, HEAD)).toEqual({
        kind: 'forbidden',
        status,
        message: 'Resource not accessible by integration',
      });
    }
    expect(await reviewSuggestions(fakeApi([], { status: 502 }).api, result(3), SOURCE, HEAD)).toEqual({
      kind: 'failed',
      message: 'HTTP 502: Resource not accessible by integration',
    });
  });
});

import { describe, expect, it } from 'vitest';
import { upsertComment, type CommentApi, type IssueComment } from '../../src/action/comment.js';
import { COMMENT_MARKER } from '../../src/report/summary.js';

/** A fake comment API recording the calls. */
function fake(comments: IssueComment[], fail?: { on: 'list' | 'create' | 'update'; status?: number; message: string }) {
  const calls: string[] = [];
  const boom = (on: string): void => {
    if (fail?.on === on) throw Object.assign(new Error(fail.message), fail.status !== undefined ? { status: fail.status } : {});
  };
  const api: CommentApi = {
    async list() {
      calls.push('list');
      boom('list');
      return comments;
    },
    async create(body) {
      calls.push(`create ${body.slice(0, 23)}`);
      boom('create');
    },
    async update(id) {
      calls.push(`update ${id}`);
      boom('update');
    },
  };
  return { api, calls };
}

const body = `${COMMENT_MARKER}\n## fitgate\n`;

describe('upsertComment', () => {
  it('creates the comment when none carries the marker', async () => {
    const { api, calls } = fake([{ id: 1, body: 'hello' }]);
    expect(await upsertComment(api, body)).toEqual({ kind: 'created' });
    expect(calls).toEqual(['list', `create ${COMMENT_MARKER}`]);
  });

  it('updates the oldest comment with the marker and never creates a second', async () => {
    const { api, calls } = fake([
      { id: 1, body: 'hello' },
      { id: 5, body: `${COMMENT_MARKER}\nold` },
      { id: 9, body: `${COMMENT_MARKER}\ncopy` },
    ]);
    expect(await upsertComment(api, body)).toEqual({ kind: 'updated', id: 5 });
    expect(calls).toEqual(['list', 'update 5']);
  });

  it.each([401, 403, 404])('turns HTTP %i into forbidden without throwing', async (status) => {
    const { api } = fake([], { on: 'create', status, message: 'Resource not accessible by integration' });
    expect(await upsertComment(api, body)).toEqual({ kind: 'forbidden', status, message: 'Resource not accessible by integration' });
  });

  it('turns other failures into failed, with the status when there is one', async () => {
    expect(await upsertComment(fake([], { on: 'list', status: 502, message: 'Bad gateway' }).api, body)).toEqual({
      kind: 'failed',
      message: 'HTTP 502: Bad gateway',
    });
    expect(await upsertComment(fake([], { on: 'list', message: 'connect ECONNREFUSED' }).api, body)).toEqual({
      kind: 'failed',
      message: 'connect ECONNREFUSED',
    });
  });
});

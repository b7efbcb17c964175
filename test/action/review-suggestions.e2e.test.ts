/**
 * The action's review suggestions end to end: src/main.ts, transpiled to JavaScript (as
 * test/run/transpile.ts does, since dist/ is rebuilt only on release), runs on the two-commit
 * repository of fixture.ts with GITHUB_API_URL pointing at a stand-in for the REST API on
 * 127.0.0.1. In that repository the pull request raises `wide`'s polynomial from degree 2 to 3
 * on line 8 of ml/models/wide.model.yml; the complexity check suggests degree 2 there.
 */
import { execFile, execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { transpileSources } from '../run/transpile.js';
import { makeFixture, type Fixture } from './fixture.js';

const TOKEN = 'ghs_review-test-token-0815';
const WIDE = 'ml/models/wide.model.yml';
const PULL = '/repos/acme/models/pulls/7';

/** A review comment as the stand-in keeps it. */
interface Stored {
  id: number;
  body: string;
  path: string;
  line: number | null;
  commit_id: string;
  side: string;
}

/** The stand-in REST API: the issue comments and the review comments of acme/models#7, and its changed files. */
class FakeApi {
  server: Server;
  calls: string[] = [];
  issueComments: { id: number; body: string }[] = [];
  review: Stored[] = [];
  /** Changed files listed by the pulls/7/files endpoint. */
  files: { filename: string; status: string; patch?: string }[] = [];
  /** `forbidden`: every request gets 403; `read-only-pulls`: only the review-comment writes do. */
  mode: 'ok' | 'forbidden' | 'read-only-pulls' = 'ok';
  nextId = 300;
  url = '';

  constructor() {
    this.server = createServer((req, res) => void this.handle(req, res));
  }

  async start(): Promise<void> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const raw = Buffer.concat(chunks).toString('utf8');
    const body = raw ? (JSON.parse(raw) as Record<string, unknown>) : {};
    const url = new URL(req.url ?? '/', this.url);
    const method = req.method ?? '';
    this.calls.push(`${method} ${url.pathname}`);
    const send = (status: number, value: unknown): void => {
      res.writeHead(status, { 'content-type': 'application/json; charset=utf-8' });
      res.end(JSON.stringify(value));
    };
    const forbidden = (): void => send(403, { message: 'Resource not accessible by integration' });
    if (this.mode === 'forbidden') return forbidden();
    if (url.pathname === '/repos/acme/models/issues/7/comments') {
      if (method === 'GET') return send(200, this.issueComments);
      const comment = { id: this.nextId++, body: String(body.body) };
      this.issueComments.push(comment);
      return send(201, comment);
    }
    const issue = /^\/repos\/acme\/models\/issues\/comments\/(\d+)$/.exec(url.pathname);
    if (issue && method === 'PATCH') {
      const c = this.issueComments.find((x) => x.id === Number(issue[1]));
      if (c) c.body = String(body.body);
      return send(c ? 200 : 404, c ?? { message: 'Not Found' });
    }
    if (url.pathname === `${PULL}/files` && method === 'GET') return send(200, this.files);
    if (url.pathname === `${PULL}/comments` && method === 'GET')
      return send(
        200,
        this.review.map((c) => ({ ...c, user: { login: 'github-actions[bot]' } })),
      );
    if (this.mode === 'read-only-pulls') return forbidden();
    if (url.pathname === `${PULL}/comments` && method === 'POST') {
      const c: Stored = {
        id: this.nextId++,
        body: String(body.body),
        path: String(body.path),
        line: Number(body.line),
        commit_id: String(body.commit_id),
        side: String(body.side),
      };
      this.review.push(c);
      return send(201, c);
    }
    const review = /^\/repos\/acme\/models\/pulls\/comments\/(\d+)$/.exec(url.pathname);
    const c = review ? this.review.find((x) => x.id === Number(review[1])) : undefined;
    if (review && !c) return send(404, { message: 'Not Found' });
    if (c && method === 'PATCH') {
      c.body = String(body.body);
      return send(200, c);
    }
    if (c && method === 'DELETE') {
      this.review.splice(this.review.indexOf(c), 1);
      res.writeHead(204).end();
      return;
    }
    return send(404, { message: `no route ${method} ${url.pathname}` });
  }

  /** The calls to the review-comment and changed-file endpoints (the summary comment's are left out). */
  reviewCalls(): string[] {
    return this.calls.filter((c) => c.includes('/pulls/'));
  }
}

/** What one run left: status, workflow-command lines, the verdict output. */
interface Run {
  status: number;
  stdout: string;
  stderr: string;
  commands: string[];
  verdict: string | undefined;
}

let lib: { dir: string; remove: () => void } | undefined;
let fixture: Fixture;
let api: FakeApi;
let runs = 0;
/** `git diff` of wide.model.yml from the base to the head, from the first hunk header on (as the API's `patch`). */
let widePatch = '';

beforeAll(async () => {
  lib = transpileSources();
  fixture = makeFixture();
  api = new FakeApi();
  await api.start();
  const diff = execFileSync('git', ['diff', fixture.baseSha, fixture.headSha, '--', WIDE], { cwd: fixture.workspace, encoding: 'utf8' });
  widePatch = diff.slice(diff.indexOf('@@'));
  api.files = [{ filename: WIDE, status: 'modified', patch: widePatch }];
});

afterAll(async () => {
  lib?.remove();
  if (api) await new Promise((resolve) => api.server.close(resolve));
});

/** Runs the transpiled action on the fixture's pull request; `fork` makes the head another repository. */
function runAction(options: { fork?: boolean; inputs?: Record<string, string> } = {}): Promise<Run> {
  runs += 1;
  const tmp = path.join(fixture.workspace, '..', `${path.basename(fixture.workspace)}-review${runs}`);
  const outputFile = `${tmp}-output.txt`;
  const eventFile = `${tmp}-event.json`;
  writeFileSync(outputFile, '');
  writeFileSync(`${tmp}-summary.md`, '');
  const headRepo = options.fork ? 'someone/models' : 'acme/models';
  const pullRequest = {
    number: 7,
    base: { sha: fixture.baseSha, ref: 'main', repo: { full_name: 'acme/models', fork: false } },
    head: { sha: fixture.headSha, repo: { full_name: headRepo, fork: options.fork === true } },
  };
  writeFileSync(
    eventFile,
    JSON.stringify({
      action: 'synchronize',
      number: 7,
      pull_request: pullRequest,
      repository: { name: 'models', owner: { login: 'acme' } },
    }),
  );
  const env: NodeJS.ProcessEnv = {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    GITHUB_ACTIONS: 'true',
    GITHUB_WORKSPACE: fixture.workspace,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: eventFile,
    GITHUB_OUTPUT: outputFile,
    GITHUB_STEP_SUMMARY: `${tmp}-summary.md`,
    GITHUB_REPOSITORY: 'acme/models',
    GITHUB_API_URL: api.url,
    RUNNER_TEMP: `${tmp}-temp`,
    'INPUT_WORKING-DIRECTORY': 'ml',
    'INPUT_GITHUB-TOKEN': TOKEN,
    INPUT_COMMENT: 'true',
    ...options.inputs,
  };
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      [path.join(lib!.dir, 'main.js')],
      { cwd: fixture.workspace, env, encoding: 'utf8' },
      (error, stdout, stderr) => {
        const verdict = /^verdict<<(\S+)\n([\s\S]*?)\n\1$/m.exec(readFileSync(outputFile, 'utf8'))?.[2];
        resolve({
          status: error ? (typeof error.code === 'number' ? error.code : -1) : 0,
          stdout,
          stderr,
          commands: stdout.split('\n').filter((l) => l.startsWith('::')),
          verdict,
        });
      },
    );
  });
}

/** The notice and warning lines of fitgate's own (not the annotations at descriptor lines). */
function ownLines(run: Run): string[] {
  // The run's note naming its settings file is not about review suggestions.
  return run.commands.filter((l) => /^::(notice|warning) title=fitgate::/.test(l) && !l.startsWith('::notice title=fitgate::settings: '));
}

describe('review suggestions on the pull request', () => {
  let first: Run;

  it('posts one review comment with a suggestion block replacing the descriptor line', async () => {
    first = await runAction();
    expect(first.stderr).toBe('');
    expect(api.reviewCalls()).toEqual([`GET ${PULL}/files`, `GET ${PULL}/comments`, `POST ${PULL}/comments`]);
    expect(api.review.length).toBe(1);
    const [c] = api.review;
    expect({ path: c.path, line: c.line, side: c.side, commit_id: c.commit_id }).toEqual({
      path: WIDE,
      line: 8,
      side: 'RIGHT',
      commit_id: fixture.headSha,
    });
    expect(c.body).toMatch(
      /^<!-- fitgate-suggestion model=wide check=complexity -->\n\*\*fitgate `complexity`\*\* \(model wide\): degree 2 \(k-fold CV RMSE [\d.]+ against [\d.]+ now\)\.\n\n```suggestion\n {2}- polynomial: \{ of: x, degree: 2 \}\n```\n$/,
    );
    expect(first.stdout).toContain('review suggestions: 1 posted, 0 updated, 0 unchanged, 0 removed');
    expect(ownLines(first)).toEqual([]);
    expect(first.stdout.split('\n').filter((l) => l.includes(TOKEN))).toEqual([`::add-mask::${TOKEN}`]);
  });

  it('writes nothing on a second run with the same finding', async () => {
    api.calls = [];
    const before = api.review.map((c) => ({ ...c }));
    const run = await runAction();
    expect(api.reviewCalls()).toEqual([`GET ${PULL}/files`, `GET ${PULL}/comments`]);
    expect(api.review).toEqual(before);
    expect(run.commands).toEqual(first.commands);
    expect(run.status).toBe(first.status);
  });

  it('updates the same comment when the suggestion changed', async () => {
    // An earlier push had suggested degree 1 on the same line.
    const id = api.review[0].id;
    const current = api.review[0].body;
    api.review[0].body = current.replace('degree: 2 }', 'degree: 1 }');
    api.calls = [];
    await runAction();
    expect(api.reviewCalls()).toEqual([`GET ${PULL}/files`, `GET ${PULL}/comments`, `PATCH /repos/acme/models/pulls/comments/${id}`]);
    expect(api.review.map((c) => [c.id, c.body])).toEqual([[id, current]]);
  });

  it('posts nothing when the descriptor line is not in the diff', async () => {
    const saved = api.review;
    api.review = [];
    api.files = [
      { filename: 'ml/data/steady-holdout.csv', status: 'modified', patch: '@@ -1,2 +1,2 @@\n x,y\n-0.5,2.1\n+0.5,2.3\n' },
      { filename: WIDE, status: 'modified', patch: '@@ -1,2 +1,2 @@\n-version: 0\n+version: 1\n name: wide\n' },
    ];
    api.calls = [];
    const run = await runAction();
    api.files = [{ filename: WIDE, status: 'modified', patch: widePatch }];
    expect(api.reviewCalls()).toEqual([`GET ${PULL}/files`, `GET ${PULL}/comments`]);
    expect(api.review).toEqual([]);
    expect(run.status).toBe(first.status);
    api.review = saved;
  });

  it('skips with one notice on a fork and when the token may not write review comments; the verdict is unchanged', async () => {
    api.calls = [];
    const fork = await runAction({ fork: true });
    expect(api.reviewCalls()).toEqual([]);
    expect(ownLines(fork)).toEqual([
      '::notice title=fitgate::review suggestions are skipped: the pull request comes from a fork, whose token cannot write review comments. The result is unchanged.',
    ]);
    expect([fork.status, fork.verdict]).toEqual([first.status, first.verdict]);

    api.mode = 'read-only-pulls';
    api.review = [];
    const readOnly = await runAction();
    expect(ownLines(readOnly)).toEqual([
      '::notice title=fitgate::review suggestions could not be written (HTTP 403): the token may not write review comments on this pull request (they need pull-requests: write). The result is unchanged.',
    ]);
    expect([readOnly.status, readOnly.verdict]).toEqual([first.status, first.verdict]);

    // A token that may not write at all: the summary comment's notice is the only one.
    api.mode = 'forbidden';
    api.calls = [];
    const none = await runAction();
    api.mode = 'ok';
    expect(ownLines(none)).toHaveLength(1);
    expect(ownLines(none)[0]).toMatch(/^::notice title=fitgate::the pull-request comment could not be written \(HTTP 403\)/);
    expect(api.reviewCalls()).toEqual([]);
    expect([none.status, none.verdict]).toEqual([first.status, first.verdict]);
  });
});

// The HTML report of the example repository in real headless Chromium (Debian's `chromium`,
// driven by playwright-core): it loads without console errors or network requests, every model
// has its charts, each point chart draws exactly its rows (or the thinned count it states), and
// one screenshot per model goes to test-output/screenshots/ for people to review.
import { existsSync } from 'node:fs';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { formatHtml, HTML_FILE } from '../../src/report/html.js';
import type { Result } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
import { CHROMIUM, requireTool, skipNote } from '../tools/require-tool.js';
import { ACTION_FETCH_HINT, evaluateBase } from '../../src/action/base-commit.js';
import { makeFixture } from '../action/fixture.js';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const outDir = path.join(repoRoot, 'test-output', 'browser');
const shotDir = path.join(repoRoot, 'test-output', 'screenshots');
const missing = requireTool(['chromium']);

describe.skipIf(missing !== null)(`HTML report in Chromium${skipNote(missing)}`, () => {
  let browser: Browser;
  let result: Result;
  let url: string;

  beforeAll(async () => {
    const root = path.join(repoRoot, 'examples');
    result = await runPipeline(defaultSettings(root), createFsRepository(root), { jobs: 1 });
    await mkdir(outDir, { recursive: true });
    await mkdir(shotDir, { recursive: true });
    const file = path.join(outDir, HTML_FILE);
    await writeFile(file, formatHtml(result));
    url = pathToFileURL(file).href;
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('loads with no console errors and no request but the page itself, and shows every model', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const problems: string[] = [];
    const requests: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error' || m.type() === 'warning') problems.push(`${m.type()}: ${m.text()}`);
    });
    page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
    page.on('request', (r) => requests.push(r.url()));
    await page.goto(url, { waitUntil: 'load' });
    expect(problems, problems.join('\n')).toEqual([]);
    expect(requests).toEqual([url]);
    expect(result.models.length).toBeGreaterThan(0);
    const names = await page.$$eval('section.model', (els) => els.map((e) => e.getAttribute('data-model')));
    expect(names).toEqual(result.models.map((m) => m.name));
    await page.close();
  });

  it('gives every model its charts, and each point chart exactly its rows', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(url, { waitUntil: 'load' });
    for (const [i, m] of result.models.entries()) {
      const section = `section#model-${i + 1}`;
      if (m.error) continue;
      const charts = m.charts;
      if (!charts) throw new Error(`${m.name}: no chart data in the result`);
      const expected = [
        charts.fit ? 'fit-curve' : 'predicted-actual',
        'residuals',
        ...charts.partials.map(() => 'partial-curve'),
        ...(charts.sweep ? ['cv-curve'] : []),
        ...(charts.coefficients.columns.length ? ['coefficients'] : []),
      ];
      const kinds = await page.$$eval(`${section} svg.chart`, (els) => els.map((e) => e.getAttribute('data-chart')));
      expect(kinds, `${m.name}: charts`).toEqual(expected);
      // Every chart is drawn at a real size and has a text alternative.
      const boxes = await page.$$eval(`${section} svg.chart`, (els) =>
        els.map((e) => {
          const r = e.getBoundingClientRect();
          const [t, d] = (e.getAttribute('aria-labelledby') ?? '').split(' ');
          return {
            w: r.width,
            h: r.height,
            title: document.getElementById(t)?.textContent ?? '',
            desc: document.getElementById(d)?.textContent ?? '',
          };
        }),
      );
      for (const b of boxes) {
        expect(b.w, `${m.name}: chart width`).toBeGreaterThan(200);
        expect(b.h, `${m.name}: chart height`).toBeGreaterThan(100);
        expect(b.title.length, `${m.name}: title`).toBeGreaterThan(5);
        expect(b.desc.length, `${m.name}: description`).toBeGreaterThan(20);
      }
      // Point charts: marks in the DOM = kept rows = file rows (or the thinned count stated).
      const counted = await page.$$eval(`${section} svg[data-train-rows]`, (els) =>
        els.map((e) => ({
          kind: e.getAttribute('data-chart'),
          train: e.querySelectorAll('g[data-series="train"] .pt').length,
          holdout: e.querySelectorAll('g[data-series="holdout"] .pt').length,
          trainRows: Number(e.getAttribute('data-train-rows')),
          trainShown: Number(e.getAttribute('data-train-shown')),
          trainOmitted: Number(e.getAttribute('data-train-omitted')),
          holdoutRows: Number(e.getAttribute('data-holdout-rows')),
          holdoutShown: Number(e.getAttribute('data-holdout-shown')),
          holdoutOmitted: Number(e.getAttribute('data-holdout-omitted')),
        })),
      );
      expect(counted.length, `${m.name}: point charts`).toBe(2);
      for (const c of counted) {
        const where = `${m.name} ${c.kind}`;
        expect(c.trainRows, `${where}: training rows`).toBe(m.rows.train);
        expect(c.holdoutRows, `${where}: hold-out rows`).toBe(m.rows.holdout);
        expect(c.trainShown, `${where}: training rows kept`).toBe(charts.train.thinned ? charts.train.shown : m.rows.train);
        expect(c.holdoutShown, `${where}: hold-out rows kept`).toBe(charts.holdout.thinned ? charts.holdout.shown : m.rows.holdout);
        expect(c.train + c.trainOmitted, `${where}: training marks + omitted`).toBe(c.trainShown);
        expect(c.holdout + c.holdoutOmitted, `${where}: hold-out marks + omitted`).toBe(c.holdoutShown);
      }
    }
    await page.close();
  });

  it('writes one screenshot per example model for review', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(url, { waitUntil: 'load' });
    const written: string[] = [];
    for (const [i, m] of result.models.entries()) {
      const file = path.join(shotDir, `${m.name.replace(/[^A-Za-z0-9._-]+/g, '_')}.png`);
      await page.locator(`section#model-${i + 1}`).screenshot({ path: file });
      written.push(file);
    }
    await page.screenshot({ path: path.join(shotDir, 'overview.png') });
    expect(written.filter((f) => existsSync(f)).length).toBe(result.models.length);
    await page.close();
  });

  it('draws the base commit curve of a model the pull request changed, and screenshots it', async () => {
    // The action's test repository: its pull request raises `wide` from degree 2 to 3.
    const fixture = makeFixture();
    const settings = {
      root: path.join(fixture.workspace, 'ml'),
      config: 'fitgate.yml',
      configExplicit: false,
      descriptors: [],
      failOn: 'fail' as const,
    };
    const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    const pr = await runPipeline(settings, createFsRepository(settings.root), { ...options, jobs: 1 });
    const file = path.join(outDir, 'pull-request.html');
    await writeFile(file, formatHtml(pr));
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
    const i = pr.models.findIndex((m) => m.name === 'wide');
    const chart = page.locator(`section#model-${i + 1} svg[data-chart="fit-curve"]`);
    // Drawn at a real size inside the plot, dashed, and named in the legend.
    const drawn = await chart.locator('path.base-curve').evaluate((e) => {
      const r = e.getBoundingClientRect();
      return { w: r.width, h: r.height, dash: getComputedStyle(e).strokeDasharray, commit: e.getAttribute('data-commit') };
    });
    expect(drawn.w).toBeGreaterThan(100);
    expect(drawn.h).toBeGreaterThan(5);
    expect(drawn.dash).toMatch(/^5(px)?,? 4(px)?$/);
    expect(drawn.commit).toBe(fixture.baseSha.slice(0, 7));
    const labels = await chart.locator('g.legend text').allTextContents();
    expect(labels.at(-1)).toBe('base commit');
    // The legend's last label ends inside the picture.
    const inside = await chart.evaluate((svg) => {
      const texts = svg.querySelectorAll('g.legend text');
      return texts[texts.length - 1].getBoundingClientRect().right <= svg.getBoundingClientRect().right;
    });
    expect(inside).toBe(true);
    // Models the pull request did not change have no base curve.
    expect(await page.locator('path.base-curve').count()).toBe(1);
    const shot = path.join(shotDir, 'base-commit-wide.png');
    await chart.screenshot({ path: shot });
    expect(existsSync(shot)).toBe(true);
    await page.close();
  });
});

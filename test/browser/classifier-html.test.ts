// The HTML report of the example classifiers (examples/classifiers) in real headless Chromium
// (Debian's `chromium`, driven by playwright-core): no console errors or requests, every
// classifier has its ROC chart, calibration diagram and one probability curve per input, each
// chart draws what its data holds (ROC points, bins, kept rows), and one screenshot per
// classifier goes to test-output/screenshots/ for people to review.
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { formatHtml } from '../../src/report/html.js';
import type { Result } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';
import { CHROMIUM, requireTool, skipNote } from '../tools/require-tool.js';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const outDir = path.join(repoRoot, 'test-output', 'browser');
const shotDir = path.join(repoRoot, 'test-output', 'screenshots');
const missing = requireTool(['chromium']);

describe.skipIf(missing !== null)(`HTML report of classifiers in Chromium${skipNote(missing)}`, () => {
  let browser: Browser;
  let result: Result;
  let url: string;

  beforeAll(async () => {
    const root = path.join(repoRoot, 'examples', 'classifiers');
    result = await runPipeline(defaultSettings(root), createFsRepository(root), { jobs: 1 });
    await mkdir(outDir, { recursive: true });
    await mkdir(shotDir, { recursive: true });
    const file = path.join(outDir, 'classifiers.html');
    await writeFile(file, formatHtml(result));
    url = pathToFileURL(file).href;
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
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

  it('loads with no console errors and no request but the page itself', async () => {
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
    await page.close();
  });

  it('gives every classifier its ROC chart, calibration diagram and probability curves, each drawing its data', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(url, { waitUntil: 'load' });
    const checked = result.models.filter((m) => !m.error);
    expect(checked.length).toBeGreaterThanOrEqual(3);
    for (const [i, m] of result.models.entries()) {
      if (m.error) continue;
      const data = m.classifier_charts;
      if (!data) throw new Error(`${m.name}: no classifier chart data in the result`);
      const section = `section#model-${i + 1}`;
      const kinds = await page.$$eval(`${section} svg.chart`, (els) => els.map((e) => e.getAttribute('data-chart')));
      expect(kinds, m.name).toEqual(['roc-curve', 'calibration-diagram', ...data.curves.map(() => 'probability-curve')]);
      expect(data.curves.length).toBe(data.inputs.length);
      const sizes = await page.$$eval(`${section} svg.chart`, (els) =>
        els.map((e) => e.getBoundingClientRect()).map((r) => [r.width, r.height]),
      );
      for (const [w, h] of sizes) {
        expect(w).toBeGreaterThan(200);
        expect(h).toBeGreaterThan(100);
      }
      // ROC: one path per file with the kept points, drawn with a real length.
      const roc = await page.$$eval(`${section} svg[data-chart="roc-curve"] path.roc`, (els) =>
        els.map((e) => ({
          series: e.getAttribute('data-series'),
          count: Number(e.getAttribute('data-count')),
          length: (e as SVGPathElement).getTotalLength(),
        })),
      );
      expect(roc.map((r) => [r.series, r.count])).toEqual([
        ['train', data.roc.train.fpr.length],
        ['holdout', data.roc.holdout.fpr.length],
      ]);
      for (const r of roc) expect(r.length, `${m.name} ${r.series} ROC length`).toBeGreaterThan(50);
      // Calibration: one mark per non-empty bin of each file.
      const bins = await page.$eval(`${section} svg[data-chart="calibration-diagram"]`, (e) => ({
        train: e.querySelectorAll('g[data-series="train"] .pt').length,
        holdout: e.querySelectorAll('g[data-series="holdout"] .pt').length,
      }));
      expect(bins.train).toBe(data.calibration.train.filter((b) => b.count > 0).length);
      expect(bins.holdout).toBe(data.calibration.holdout.filter((b) => b.count > 0).length);
      // Probability curves: marks + omitted = kept rows of each file.
      const points = await page.$$eval(`${section} svg[data-chart="probability-curve"]`, (els) =>
        els.map((e) => ({
          train: e.querySelectorAll('g[data-series="train"] .pt').length + Number(e.getAttribute('data-train-omitted')),
          holdout: e.querySelectorAll('g[data-series="holdout"] .pt').length + Number(e.getAttribute('data-holdout-omitted')),
        })),
      );
      for (const p of points) expect(p).toEqual({ train: data.train.shown, holdout: data.holdout.shown });
    }
    await page.close();
  });

  it('writes one screenshot per example classifier for review', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(url, { waitUntil: 'load' });
    for (const [i, m] of result.models.entries()) {
      const file = path.join(shotDir, `classifier-${m.name.replace(/[^A-Za-z0-9._-]+/g, '_')}.png`);
      const shot = await page.locator(`section#model-${i + 1}`).screenshot({ path: file });
      expect(shot.length).toBeGreaterThan(10000);
    }
    await page.close();
  });
});

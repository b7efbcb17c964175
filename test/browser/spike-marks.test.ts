// The spike bars of the fit-curve chart in real headless Chromium (Debian's `chromium`, driven by
// playwright-core): a model of narrow radial bumps fails `swing-spikes`, and its chart draws one
// bar per marked interval, inside the plot area along its top edge, each spanning its interval on
// the x axis, with the legend naming them. A screenshot goes to test-output/screenshots/.
import { existsSync } from 'node:fs';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { formatHtml } from '../../src/report/html.js';
import { summarise, type ModelResult } from '../../src/result/result.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { CHROMIUM, requireTool, skipNote } from '../tools/require-tool.js';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const outDir = path.join(repoRoot, 'test-output', 'browser');
const shotDir = path.join(repoRoot, 'test-output', 'screenshots');
const missing = requireTool(['chromium']);

describe.skipIf(missing !== null)(`spike bars in Chromium${skipNote(missing)}`, () => {
  let browser: Browser;
  let model: ModelResult;
  let url: string;

  beforeAll(async () => {
    const xs = Array.from({ length: 26 }, (_, i) => i * 4);
    const r = createMemoryRepository({
      'models/m.model.yml':
        'version: 1\nname: bumps\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - rbf: { of: x, centers: { from: 0, to: 100, step: 2 }, width: 1 }\nlimits:\n  complexity: off\n',
      'data/train.csv': `x,y\n${xs.map((v, i) => `${v},${20 + 0.1 * v + 2 * Math.sin(v / 15) + ((i * 7) % 5) * 0.1}`).join('\n')}\n`,
      'data/holdout.csv': `x,y\n${xs.map((v) => `${v + 2},${20 + 0.1 * (v + 2) + 2 * Math.sin((v + 2) / 15)}`).join('\n')}\n`,
    });
    const settings = defaultSettings();
    model = await evaluateModel(r, await loadDescriptor(r, 'models/m.model.yml', settings), settings);
    await mkdir(outDir, { recursive: true });
    await mkdir(shotDir, { recursive: true });
    const file = path.join(outDir, 'spike-marks.html');
    await writeFile(file, formatHtml(summarise([model], '0.0.0')));
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
      ],
    });
  });

  afterAll(async () => {
    await browser?.close();
  });

  it('draws one bar per marked interval along the top of the plot, over its interval', async () => {
    const intervals = model.charts?.fit?.spikes?.intervals ?? [];
    expect(intervals.length).toBeGreaterThan(0);
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(url, { waitUntil: 'load' });
    const chart = page.locator('svg[data-chart="fit-curve"]');
    const geometry = await chart.evaluate((svg) => {
      // The axes path runs up the left edge and along the bottom: its box is the plot area's.
      const plot = (svg.querySelector('g.axes path') as SVGPathElement).getBoundingClientRect();
      const bars = Array.from(svg.querySelectorAll('rect.spike'), (e) => {
        const b = e.getBoundingClientRect();
        return { left: b.left, right: b.right, top: b.top, bottom: b.bottom, from: Number(e.getAttribute('data-from')) };
      });
      return { plot: { left: plot.left, right: plot.right, top: plot.top, bottom: plot.bottom }, bars };
    });
    expect(geometry.bars.length).toBe(intervals.length);
    for (const b of geometry.bars) {
      expect(b.left).toBeGreaterThanOrEqual(geometry.plot.left - 0.5);
      expect(b.right).toBeLessThanOrEqual(geometry.plot.right + 0.5);
      expect(b.top).toBeCloseTo(geometry.plot.top, 0);
      expect(b.bottom - b.top).toBeGreaterThan(3);
      expect(b.bottom).toBeLessThan(geometry.plot.bottom);
    }
    // Bars follow the x axis: equal 4-wide intervals give equal widths, in ascending order.
    const widths = geometry.bars.map((b) => b.right - b.left);
    for (const w of widths) expect(w).toBeCloseTo(widths[0], 0);
    const lefts = geometry.bars.map((b) => b.left);
    expect([...lefts].sort((a, b) => a - b)).toEqual(lefts);
    const labels = await chart.locator('g.legend text').allTextContents();
    expect(labels).toContain('spikes (> 1.5x)');
    const shot = path.join(shotDir, 'spike-marks.png');
    await chart.screenshot({ path: shot });
    expect(existsSync(shot)).toBe(true);
    await page.close();
  });
});

/**
 * The HTML report: one self-contained page (inline CSS and SVG, no script, no network; a
 * content security policy forbids any fetch) with the verdict, an overview table of every model
 * and, per model, its checks and charts. Prints one model per page. Every text from the
 * repository is escaped with {@link escapeHtml}; charts come from the pipeline's chart data
 * (`ModelResult.charts`), so nothing here computes a figure.
 */
import { findCheck } from '../checks/index.js';
import { kindLine, kindMark, parametersText } from './model-kind.js';
import { refitCompareLine } from './refit-compare.js';
import { formatNumber } from '../core/format.js';
import type { ChartData } from '../result/chart-types.js';
import { fromJsonNumber, type JsonNumber, type ModelResult, type Result } from '../result/result.js';
import { escapeHtml } from './escape.js';
import { classifierChartNotes, classifierCharts, classifierFacts } from './classifier-html.js';
import { countsText, limitText, verdictHeadline } from './wording.js';
import { coefficientBarsChart } from './svg/coefficient-bars.js';
import { cvCurveChart } from './svg/cv-curve.js';
import { fitCurveChart } from './svg/fit-curve.js';
import { partialCurveChart } from './svg/partial-curve.js';
import { predictedActualChart } from './svg/predicted-actual.js';
import { residualsChart } from './svg/residuals.js';
import { TARGET_SCALE_HEADINGS, targetScaleRows, targetScaleSentence } from './target-scale-text.js';

/** Options of the HTML report. */
export interface HtmlOptions {
  /** Page heading. Default `fitgate report`. */
  title?: string;
  /** A line under the heading, e.g. the commit checked (plain text). Default none. */
  subtitle?: string;
}

const MARK: Record<string, string> = { pass: 'pass', warn: 'WARN', fail: 'FAIL', error: 'ERROR', skipped: 'skipped' };

/** Name of the file `--html DIR` writes into DIR. */
export const HTML_FILE = 'index.html';

const CSS = `
:root{--ink:#1f2328;--muted:#5b636b;--rule:#d8dadc;--paper:#fcfcfa;--card:#ffffff;--pass:#007a5a;--warn:#8a5f00;--fail:#b34700;--error:#7a1f5c}
*{box-sizing:border-box}
html{background:var(--paper);color:var(--ink);font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Noto Sans","Liberation Sans",sans-serif}
body{margin:0 auto;max-width:1200px;padding:28px 24px 48px}
h1{font-size:1.55rem;font-weight:600;margin:0 0 4px}
h2{font-size:1.2rem;font-weight:600;margin:0}
h3{font-size:1rem;font-weight:600;margin:18px 0 8px}
p{margin:6px 0}
.muted{color:var(--muted)}
code{font:0.92em ui-monospace,"SFMono-Regular",Menlo,Consolas,"Liberation Mono",monospace;overflow-wrap:anywhere}
.verdict{font-size:1.05rem;margin:10px 0 22px}
.badge{display:inline-block;min-width:4.2em;text-align:center;font-size:.78rem;font-weight:700;letter-spacing:.04em;padding:1px 7px;border:1.5px solid currentColor;border-radius:3px;vertical-align:.1em}
.badge.pass{color:var(--pass)}.badge.warn{color:var(--warn);border-style:dashed}.badge.fail{color:var(--fail);border-width:2.5px}.badge.error{color:var(--error);border-style:double;border-width:3px}.badge.skipped{color:var(--muted);border-style:dotted}
table{border-collapse:collapse;width:100%;background:var(--card)}
th,td{padding:6px 10px;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}
th{font-size:.82rem;font-weight:600;color:var(--muted);border-bottom:1.5px solid #b9bdc1}
td.num,th.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
.overview a{color:inherit}
section.model{margin-top:34px;padding:20px 22px 22px;background:var(--card);border:1px solid var(--rule);border-radius:6px}
section.model header{display:flex;gap:12px;align-items:baseline;flex-wrap:wrap}
.facts{display:flex;gap:22px;flex-wrap:wrap;margin:8px 0 4px;color:var(--muted);font-size:.92rem}
.facts b{color:var(--ink);font-weight:600}
.checks td.finding{min-width:18em}
.advice{color:var(--muted)}
.charts{display:grid;grid-template-columns:repeat(auto-fill,minmax(460px,1fr));gap:18px 22px;margin-top:10px}
figure{margin:0;padding:10px 10px 6px;border:1px solid var(--rule);border-radius:4px;background:#fff}
figure.wide{grid-column:1/-1}
figure svg{display:block;width:100%;height:auto;font-family:inherit}
figcaption{font-size:.84rem;color:var(--muted);margin-top:4px}
.note{border-left:3px solid var(--rule);padding:2px 10px;color:var(--muted)}
.error-text{border-left:3px solid var(--error);padding:4px 10px}
footer{margin-top:40px;font-size:.82rem;color:var(--muted)}
@media (max-width:560px){.charts{grid-template-columns:1fr}body{padding:14px}}
@media print{
 html{background:#fff;font-size:10pt}
 body{max-width:none;padding:0}
 *{-webkit-print-color-adjust:exact;print-color-adjust:exact}
 section.model{break-before:page;border:none;padding:0;margin-top:0}
 figure{break-inside:avoid}
 tr{break-inside:avoid}
 .charts{grid-template-columns:1fr 1fr}
 .overview a{text-decoration:none}
 footer{display:none}
}
`;

function num(v: JsonNumber | number | null | undefined): string {
  if (v === null || v === undefined) return '–';
  return escapeHtml(formatNumber(fromJsonNumber(v)));
}

function badge(status: string): string {
  return `<span class="badge ${escapeHtml(status)}">${escapeHtml(MARK[status] ?? status)}</span>`;
}

function verdictText(result: Result): string {
  return `${badge(result.verdict)} ${escapeHtml(verdictHeadline(result))} <span class="muted">(${escapeHtml(countsText(result.counts))})</span>`;
}

function overviewRow(m: ModelResult, i: number): string {
  const x = m.metrics;
  const over = m.checks.filter((c) => c.status === 'fail' || c.status === 'warn').map((c) => `<code>${escapeHtml(c.id)}</code>`);
  return (
    `<tr><td>${badge(m.verdict)}</td><td><a href="#model-${i + 1}">${escapeHtml(m.name)}</a>${escapeHtml(kindMark(m))}</td>` +
    `<td class="num">${m.rows.train}</td><td class="num">${m.rows.holdout}</td><td class="num">${escapeHtml(parametersText(m))}</td>` +
    `<td class="num">${num(x?.holdout_rmse)}</td><td class="num">${num(x?.gap_ratio)}</td><td class="num">${num(x?.max_std_coefficient)}</td>` +
    `<td>${m.error ? 'could not be checked' : over.length ? over.join(', ') : '–'}</td></tr>`
  );
}

/** The overview table, one piece per row. */
function* overview(result: Result): Generator<string> {
  yield '<section class="overview" aria-labelledby="overview-title"><h2 id="overview-title">Models</h2>' +
    '<table><thead><tr><th>Status</th><th>Model</th><th class="num">Training rows</th><th class="num">Hold-out rows</th><th class="num">Parameters</th>' +
    '<th class="num">Hold-out RMSE</th><th class="num">Gap ratio</th><th class="num">Max std. coef.</th><th>Over a limit</th></tr></thead>' +
    '<tbody>';
  for (let i = 0; i < result.models.length; i++) yield overviewRow(result.models[i], i);
  yield '</tbody></table></section>';
}

function checksTable(m: ModelResult): string {
  const rows = m.checks.map((c) => {
    const title = findCheck(c.id)?.title ?? c.id;
    const advice = c.advice ? ` <span class="advice">${escapeHtml(c.advice)}</span>` : '';
    const suggestion = c.suggestion
      ? ` <span class="advice">Suggestion (line ${c.suggestion.line}): ${escapeHtml(c.suggestion.text)}</span>`
      : '';
    return (
      `<tr data-check="${escapeHtml(c.id)}" data-status="${escapeHtml(c.status)}"><td>${escapeHtml(title)}<br><code class="muted">${escapeHtml(c.id)}</code></td><td>${badge(c.status)}</td>` +
      `<td class="num">${num(c.value)}</td><td class="num">${escapeHtml(limitText(c))}</td><td class="num">${c.line}</td>` +
      `<td class="finding">${escapeHtml(c.message)}.${advice}${suggestion}</td></tr>`
    );
  });
  return (
    '<table class="checks"><thead><tr><th>Check</th><th>Status</th><th class="num">Value</th><th class="num">Limit</th><th class="num">Line</th><th>Finding</th></tr></thead>' +
    `<tbody>${rows.join('')}</tbody></table>`
  );
}

function figure(svg: string, caption: string, wide = false): string {
  return `<figure${wide ? ' class="wide"' : ''}>${svg}<figcaption>${escapeHtml(caption)}</figcaption></figure>`;
}

/** The charts of one model, in reading order. */
function charts(chart: ChartData, prefix: string): string[] {
  const out: string[] = [];
  // Left without points by the run's chart data: only the sweep and the coefficients.
  const points = chart.no_points === undefined;
  if (points && chart.fit) {
    out.push(
      figure(
        fitCurveChart(chart, chart.fit, { id: `${prefix}-fit` }),
        'The fitted curve over the scanned range (dotted lines: the training range). A curve that leaves the observed band between the samples is chasing noise.',
      ),
    );
  } else if (points) {
    out.push(
      figure(
        predictedActualChart(chart, { id: `${prefix}-pa` }),
        'Predicted against actual values; hold-out points far from the dashed line while training points sit on it show overfitting.',
      ),
    );
  }
  if (points) out.push(figure(residualsChart(chart, { id: `${prefix}-res` }), 'Residuals against fitted values.'));
  chart.partials.forEach((curve, k) => {
    out.push(
      figure(
        partialCurveChart(chart, curve, { id: `${prefix}-partial-${k + 1}` }),
        `Partial curve along ${curve.input}, the other inputs at their training medians.`,
      ),
    );
  });
  if (chart.sweep) {
    out.push(figure(cvCurveChart(chart.sweep, { id: `${prefix}-cv` }), 'Cross-validated error over the complexity sweep.'));
  }
  const bars = coefficientBarsChart(chart.coefficients, { id: `${prefix}-coef` });
  if (bars)
    out.push(
      figure(
        bars,
        'Standardised coefficients: the change in the prediction, in target standard deviations, for one standard deviation of each column.',
      ),
    );
  return out;
}

function modelSection(m: ModelResult, index: number): string {
  const id = `model-${index + 1}`;
  const parts: string[] = [];
  parts.push(
    `<section class="model" id="${id}" data-model="${escapeHtml(m.name)}" data-verdict="${escapeHtml(m.verdict)}" aria-labelledby="${id}-name">`,
    `<header>${badge(m.verdict)}<h2 id="${id}-name">${escapeHtml(m.name)}</h2><code class="muted">${escapeHtml(m.descriptor)}</code></header>`,
  );
  if (m.error) {
    const where = m.error.file ? `${escapeHtml(m.error.file)}${m.error.line ? ` line ${m.error.line}` : ''}: ` : '';
    parts.push(`<p class="error-text">Could not be checked. ${where}${escapeHtml(m.error.message)}</p></section>`);
    return parts.join('');
  }
  const x = m.metrics;
  parts.push(
    `<p class="facts"><span>training rows <b>${m.rows.train}</b></span><span>hold-out rows <b>${m.rows.holdout}</b></span><span>parameters <b>${escapeHtml(parametersText(m))}</b></span>` +
      `<span>training RMSE <b>${num(x?.train_rmse)}</b></span><span>hold-out RMSE <b>${num(x?.holdout_rmse)}</b></span><span>gap ratio <b>${num(x?.gap_ratio)}</b></span></p>`,
  );
  // A classifier's facts are its log-loss, AUC and calibration slope instead.
  if (x?.task === 'classification') parts[parts.length - 1] = classifierFacts(m);
  const kind = kindLine(m);
  if (kind !== null) parts.push(`<p class="note" data-kind="predictions">${escapeHtml(kind)}</p>`);
  const refit = refitCompareLine(m);
  if (refit !== null) parts.push(`<p class="note" data-refit-compare>${escapeHtml(refit)}</p>`);
  const scale = targetScaleSentence(m);
  if (scale !== null) {
    const head = TARGET_SCALE_HEADINGS.map((h, j) => `<th${j > 0 ? ' class="num"' : ''}>${escapeHtml(h)}</th>`).join('');
    const body = targetScaleRows(m)
      .map((row) => `<tr>${row.map((c, j) => `<td${j > 0 ? ' class="num"' : ''}>${escapeHtml(c)}</td>`).join('')}</tr>`)
      .join('');
    parts.push(
      `<p class="note">${escapeHtml(scale)}.</p><table class="target-scale"><thead><tr>${head}</tr></thead><tbody>${body}</tbody></table>`,
    );
  }
  parts.push('<h3>Checks</h3>', checksTable(m));
  if (m.classifier_charts) {
    const list = classifierCharts(m.classifier_charts, id);
    parts.push('<h3>Charts</h3>', classifierChartNotes(m.classifier_charts));
    parts.push(`<div class="charts" data-charts="${list.length}">${list.join('')}</div>`);
  } else if (m.charts) {
    const list = charts(m.charts, id);
    const thinned = [m.charts.train, m.charts.holdout].filter((s) => s.thinned);
    parts.push(`<h3>Charts</h3>`);
    if (m.charts.no_points !== undefined)
      parts.push(`<p class="note" data-no-points>${escapeHtml(`Rows and curves: ${m.charts.no_points}.`)}</p>`);
    else if (thinned.length)
      parts.push(
        `<p class="note">${thinned.map((s) => escapeHtml(`${s === m.charts?.train ? 'Training' : 'Hold-out'} rows: ${s.thinning}.`)).join(' ')}</p>`,
      );
    const leftOut = m.charts.partialsLeftOut ?? 0;
    if (leftOut > 0)
      parts.push(
        `<p class="note">${escapeHtml(`Partial curves of the first ${m.charts.partials.length} inputs; ${leftOut} more left out.`)}</p>`,
      );
    parts.push(`<div class="charts" data-charts="${list.length}">${list.join('')}</div>`);
  } else {
    parts.push('<p class="note">No chart data in this result.</p>');
  }
  parts.push('</section>');
  return parts.join('');
}

/**
 * The HTML page in pieces (the head, each overview row, each model's section, the end), to write
 * one after another: joined, they are {@link formatHtml}'s text. A page of any number of models is
 * written without ever being one string.
 * @param result the run's Result
 * @param options heading text; defaults in {@link HtmlOptions}
 */
export function* htmlReport(result: Result, options: HtmlOptions = {}): Generator<string> {
  const title = options.title ?? 'fitgate report';
  const notes = result.notes.map((n) => `<p class="note">${escapeHtml(n)}</p>`).join('');
  yield [
    '<!DOCTYPE html>',
    '<html lang="en">',
    '<head>',
    '<meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
    '<meta name="color-scheme" content="light">',
    '<link rel="icon" href="data:,">',
    `<title>${escapeHtml(`${title}: ${MARK[result.verdict] ?? result.verdict}`)}</title>`,
    `<style>${CSS}</style>`,
    '</head>',
    `<body data-verdict="${escapeHtml(result.verdict)}">`,
    `<header><h1>${escapeHtml(title)}</h1>${options.subtitle ? `<p class="muted">${escapeHtml(options.subtitle)}</p>` : ''}<p class="verdict">${verdictText(result)}</p>${notes}</header>`,
    '<main>',
    '',
  ].join('\n');
  yield* overview(result);
  yield '\n';
  for (let i = 0; i < result.models.length; i++) yield `${modelSection(result.models[i], i)}\n`;
  yield [
    '</main>',
    `<footer>${escapeHtml(`${result.tool.name} ${result.tool.version}`)}. Training rows are filled circles, hold-out rows hollow squares; dashed lines are fail limits, dotted lines warning limits. Colours from the Okabe–Ito colour-blind-safe set.</footer>`,
    '</body>',
    '</html>',
    '',
  ].join('\n');
}

/**
 * Formats the Result as one self-contained HTML page ({@link htmlReport} joined).
 * @param result the run's Result
 * @param options heading text; defaults in {@link HtmlOptions}
 */
export function formatHtml(result: Result, options: HtmlOptions = {}): string {
  return [...htmlReport(result, options)].join('');
}

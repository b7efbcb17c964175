/**
 * The base commit's curves on a changed model's charts: the fitted curve (one input) and the
 * partial curves (several inputs) of the same model as fitted on the base commit of a pull
 * request, so that a reviewer sees what the change did to the model, not only to its figures.
 */
import type { BaseCurve, ChartData, CurveData } from '../result/chart-types.js';
import type { JsonNumber, ModelResult } from '../result/result.js';

/** True when two lists hold the same values in the same order. */
function same<T>(a: readonly T[], b: readonly T[]): boolean {
  return a.length === b.length && a.every((v, i) => v === b[i]);
}

/** The base curve along the same input as `head`, or undefined when the base has none. */
function baseOf(head: CurveData, base: CurveData | null | undefined, commit: string): BaseCurve | undefined {
  if (!base || base.input !== head.input || base.x.length === 0) return undefined;
  return { commit, x: [...base.x], y: [...base.y] };
}

/**
 * `charts` with the base commit's curves added (`fit.base`, `partials[i].base`, matched by input
 * name), when the model changed: its design columns or coefficients differ from the base's, or
 * a curve does. A model new in the pull request, one that could not be checked on the base, or
 * one whose fit is the same gets no base curve. The head's charts are not modified.
 * @param charts the head model's chart data
 * @param head the head model's design columns and refit coefficients
 * @param baseline the same model on the base commit, or null
 * @param commit full SHA of the base commit
 */
export function withBaseCurves(
  charts: ChartData,
  head: { columns: readonly string[]; coefficients: readonly JsonNumber[] },
  baseline: ModelResult | null,
  commit: string,
): ChartData {
  const base = baseline?.charts;
  if (!base || baseline.verdict === 'error') return charts;
  // Curves are compared only on grids of the same size: a run of over 50 models shrinks each
  // model's curves by the model count (result/chart-types.ts `chartShare`), which a pull request
  // adding models changes; the columns and coefficients are compared whatever the grids.
  const differ = (head: CurveData, other: CurveData): boolean => head.x.length === other.x.length && !same(head.y, other.y);
  const curvesDiffer =
    (charts.fit !== null && base.fit !== null && differ(charts.fit, base.fit)) ||
    charts.partials.some((p) => {
      const b = base.partials.find((q) => q.input === p.input);
      return b !== undefined && differ(p, b);
    });
  const changed = !same(head.columns, baseline.columns) || !same(head.coefficients, baseline.coefficients) || curvesDiffer;
  if (!changed) return charts;
  const fitBase = charts.fit ? baseOf(charts.fit, base.fit, commit) : undefined;
  return {
    ...charts,
    fit: charts.fit && fitBase ? { ...charts.fit, base: fitBase } : charts.fit,
    partials: charts.partials.map((p) => {
      const b = baseOf(
        p,
        base.partials.find((q) => q.input === p.input),
        commit,
      );
      return b ? { ...p, base: b } : p;
    }),
  };
}

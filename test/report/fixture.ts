// An awkward Result for the reporters' golden-string tests: pipes, `<`, `&`, quotes, emoji,
// backticks, NaN and infinity in names, messages and figures.
import type { ChartData } from '../../src/result/chart-types.js';
import { summarise, type CheckResult, type ModelResult, type Result } from '../../src/result/result.js';

/** The awkward text used in names and messages. */
export const AWKWARD = 'a|b <c> & "d" \'e\' 🍎 `f` #g;';

/** Small chart data of one input: 3 training rows, 2 hold-out rows. */
export function oneInputCharts(): ChartData {
  return {
    target: 'temp_c',
    inputs: ['depth_m'],
    train: {
      rows: 3,
      shown: 3,
      thinned: false,
      thinning: '',
      lines: [2, 3, 4],
      x: [[0, 1, 2]],
      actual: [1, 2, 3],
      fitted: [1, 2, 3],
      residual: [0, 0, 0],
    },
    holdout: {
      rows: 2,
      shown: 2,
      thinned: false,
      thinning: '',
      lines: [2, 3],
      x: [[0.5, 1.5]],
      actual: [1.4, 2.7],
      fitted: [1.5, 2.5],
      residual: [-0.1, 0.2],
    },
    fit: {
      input: 'depth_m',
      others: {},
      range: [0, 2],
      x: [0, 0.5, 1, 1.5, 2],
      y: [1, 1.5, 2, 3.5, 3],
      band: [1, 3],
      regions: [{ from: 1.25, to: 1.75, side: 'above' }],
      source: 'swing',
    },
    partials: [],
    sweep: { parameter: 'degree', log: false, settings: [1, 2, 3], cv: [2, 1, 1.5], train: null, chosen: 3, suggested: 2 },
    coefficients: { columns: ['z(depth_m)', AWKWARD], values: [0.5, -30], limit: 25, warn: null },
  };
}

function check(id: string, status: CheckResult['status'], value: CheckResult['value'], message: string, line: number): CheckResult {
  return {
    id,
    code: `${id}/${status}`,
    status,
    value,
    limitKey: 'k',
    limit: 1.5,
    warn: 1.3,
    line,
    message,
    advice: status === 'fail' || status === 'warn' ? `Fix ${AWKWARD}` : '',
  };
}

/** A Result with an awkward failing model, a model with NaN and infinite figures, and a model that could not be checked. */
export function awkwardResult(): Result {
  const failing: ModelResult = {
    name: AWKWARD,
    descriptor: 'models/odd name|<x>.model.yml',
    verdict: 'fail',
    rows: { train: 3, holdout: 2 },
    parameters: 2,
    columns: ['(intercept)', 'z(depth_m)', AWKWARD],
    metrics: null,
    coefficients: [1, 'NaN', 'Infinity'],
    shipped: null,
    checks: [
      check('generalisation-gap', 'fail', 'Infinity', `ratio is ∞ for ${AWKWARD}`, 11),
      check('parameter-ratio', 'warn', 'NaN', 'NaN per row', 9),
      check('coefficient-size', 'pass', 0.5, 'fine', 10),
      check('swing', 'skipped', null, 'could not be computed', 10),
    ],
    error: null,
    charts: oneInputCharts(),
  };
  failing.checks[3].code = 'swing/internal-error';
  const broken: ModelResult = {
    name: 'broken & <bad>',
    descriptor: 'models/broken.model.yml',
    verdict: 'error',
    rows: { train: 0, holdout: 0 },
    parameters: 0,
    columns: [],
    metrics: null,
    coefficients: [],
    shipped: null,
    checks: [],
    error: { message: 'expected a number, got "x<y"', file: 'data/b&d.csv', line: 7, code: 'bad-number' },
  };
  return summarise([failing, broken], '0.0.0-test');
}

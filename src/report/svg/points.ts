/**
 * Point marks of training and hold-out rows. Each series is one `<g data-series>` group whose
 * `data-count` is the number of marks drawn in it, so that tests and readers can count them.
 */
import type { Scale } from './scale.js';
import { HOLDOUT_STYLE, holdoutMark, TRAIN_STYLE, trainMark } from './palette.js';

/** Marks of one series and how many rows had no finite position. */
export interface Marks {
  markup: string;
  drawn: number;
  omitted: number;
}

/**
 * Draws one series.
 * @param series `train` (filled circles) or `holdout` (hollow squares)
 * @param xs x values of the rows (null = not finite)
 * @param ys y values of the rows
 */
export function marks(
  series: 'train' | 'holdout',
  xs: readonly (number | null)[],
  ys: readonly (number | null)[],
  sx: Scale,
  sy: Scale,
): Marks {
  const out: string[] = [];
  let omitted = 0;
  const mark = series === 'train' ? trainMark : holdoutMark;
  for (let i = 0; i < ys.length; i++) {
    const x = xs[i];
    const y = ys[i];
    if (x === null || y === null || x === undefined) {
      omitted++;
      continue;
    }
    out.push(mark(sx(x), sy(y)));
  }
  const style = series === 'train' ? TRAIN_STYLE : HOLDOUT_STYLE;
  return {
    markup: `<g data-series="${series}" data-count="${out.length}" ${style}>${out.join('')}</g>`,
    drawn: out.length,
    omitted,
  };
}

/** `data-*` attributes stating rows, kept points and drawn marks of both series. */
export function pointData(
  train: { rows: number; shown: number },
  holdout: { rows: number; shown: number },
  a: Marks,
  b: Marks,
): Record<string, number> {
  return {
    'train-rows': train.rows,
    'train-shown': train.shown,
    'train-points': a.drawn,
    'train-omitted': a.omitted,
    'holdout-rows': holdout.rows,
    'holdout-shown': holdout.shown,
    'holdout-points': b.drawn,
    'holdout-omitted': b.omitted,
  };
}

/** Sentence on thinning and omitted rows for a chart's description (empty when nothing to say). */
export function pointNote(train: { rows: number; shown: number }, holdout: { rows: number; shown: number }, a: Marks, b: Marks): string {
  const parts: string[] = [];
  if (train.shown < train.rows) parts.push(`${train.shown} of ${train.rows} training rows shown, evenly spaced through the file`);
  if (holdout.shown < holdout.rows) parts.push(`${holdout.shown} of ${holdout.rows} hold-out rows shown, evenly spaced through the file`);
  if (a.omitted + b.omitted > 0) parts.push(`${a.omitted + b.omitted} rows with values that are not finite are not drawn`);
  return parts.length ? ` ${parts.join('; ')}.` : '';
}

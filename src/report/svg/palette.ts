/**
 * Colours and marks of every chart. Colours come from the colour-blind-safe set of Okabe & Ito
 * (Color Universal Design, 2008): blue, vermillion, orange and reddish purple stay apart for
 * readers with any of the common colour-vision deficiencies. No meaning rests on colour alone:
 * training rows are filled circles and hold-out rows hollow squares, the fail limit is dashed and
 * the warning limit dotted, so every chart still reads when printed in greyscale.
 */

/** Chart colours (CSS colour strings). */
export const COLOURS = {
  /** Training rows: blue #0072B2 (dark in greyscale). */
  train: '#0072B2',
  /** Hold-out rows: vermillion #D55E00. */
  holdout: '#D55E00',
  /** Fitted and partial curves: near black. */
  curve: '#1a1a1a',
  /** Observed target band: pale grey-blue fill. */
  band: '#dde6ee',
  /** Band edges. */
  bandEdge: '#7b8a97',
  /** Regions where the curve leaves the band: reddish purple #CC79A7 hatching. */
  region: '#CC79A7',
  /** Fail limit: vermillion, dashed. */
  limit: '#D55E00',
  /** Warning limit: orange #E69F00, dotted. */
  warn: '#B07800',
  /** Grid lines. */
  grid: '#e6e6e6',
  /** Axes and tick labels. */
  axis: '#4d4d4d',
  /** Reference lines (y = x, zero). */
  reference: '#8c8c8c',
} as const;

/** Dash patterns (SVG `stroke-dasharray`). */
export const DASHES = {
  limit: '6 4',
  warn: '2 3',
  reference: '4 4',
  suggested: '6 4',
} as const;

/** Radius of a training point and half side of a hold-out square, in px. */
export const MARK_SIZE = 3.2;

/** A filled circle for a training row at (x, y). */
export function trainMark(x: number, y: number): string {
  return `<circle class="pt" cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${MARK_SIZE}"/>`;
}

/** A hollow square for a hold-out row at (x, y). */
export function holdoutMark(x: number, y: number): string {
  const s = MARK_SIZE;
  return `<rect class="pt" x="${(x - s).toFixed(1)}" y="${(y - s).toFixed(1)}" width="${2 * s}" height="${2 * s}"/>`;
}

/** Group attributes of the training series (filled blue circles). */
export const TRAIN_STYLE = `fill="${COLOURS.train}" fill-opacity="0.85" stroke="#ffffff" stroke-width="0.6"`;

/** Group attributes of the hold-out series (hollow vermillion squares). */
export const HOLDOUT_STYLE = `fill="none" stroke="${COLOURS.holdout}" stroke-width="1.6"`;

/** Legend picture of a training point. */
export const LEGEND_TRAIN = `<circle cx="7" cy="7" r="${MARK_SIZE + 0.4}" fill="${COLOURS.train}"/>`;

/** Legend picture of a hold-out point. */
export const LEGEND_HOLDOUT = `<rect x="3" y="3" width="8" height="8" fill="none" stroke="${COLOURS.holdout}" stroke-width="1.6"/>`;

/** Legend picture of a line in a colour, optionally dashed. */
export function legendLine(colour: string, dash?: string, width = 2): string {
  return `<line x1="0" y1="7" x2="14" y2="7" stroke="${colour}" stroke-width="${width}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
}

/** Legend picture of the observed target band. */
export const LEGEND_BAND = `<rect x="0" y="2" width="14" height="10" fill="${COLOURS.band}" stroke="${COLOURS.bandEdge}" stroke-dasharray="2 2"/>`;

/** Legend picture of a hatched region (uses the chart's pattern `<id>-hatch`). */
export function legendRegion(id: string): string {
  return `<rect x="0" y="1" width="14" height="12" fill="url(#${id}-hatch)" stroke="${COLOURS.region}"/>`;
}

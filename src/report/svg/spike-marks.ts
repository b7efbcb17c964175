/**
 * Spike marks on a curve chart: the intervals between neighbouring training values where the curve
 * varies more than the `swing-spikes` limit allows (chart data `spikes`, run/chart-data.ts), drawn
 * as solid bars along the top edge of the plot area over each interval, so that they read apart
 * from the hatched band regions (which span the whole height) without resting on colour alone.
 */
import { formatNumber } from '../../core/format.js';
import type { SpikeMarks } from '../../result/chart-types.js';
import { px } from './frame.js';
import type { Scale } from './scale.js';

/** Bar colour: Okabe–Ito bluish green #009E73 (apart from the band's and the regions' colours). */
export const SPIKE_COLOUR = '#009E73';

/** Height of a spike bar in px. */
const BAR = 7;

/** Intervals named in the text alternative, at most. */
const NAMED = 5;

/**
 * The bars (a `<g class="spikes">` with one `<rect class="spike">` per interval, each at least
 * 2 px wide), or an empty string when there are none.
 * @param spikes the curve's spike marks (absent: none)
 * @param sx the x scale
 * @param top the plot area's top edge in px
 */
export function spikeBars(spikes: SpikeMarks | undefined, sx: Scale, top: number): string {
  if (spikes === undefined || spikes.intervals.length === 0) return '';
  const bars = spikes.intervals.map((s) => {
    const a = sx(s.from);
    const b = sx(s.to);
    return `<rect class="spike" data-from="${s.from}" data-to="${s.to}" x="${px(a)}" y="${top}" width="${px(Math.max(2, b - a))}" height="${BAR}"/>`;
  });
  return `<g class="spikes" data-count="${spikes.intervals.length}" fill="${SPIKE_COLOUR}">${bars.join('')}</g>`;
}

/** Legend picture of a spike bar. */
export const LEGEND_SPIKE = `<rect x="0" y="0" width="14" height="${BAR}" fill="${SPIKE_COLOUR}"/>`;

/** Legend label of the spike bars. */
export function spikeLegendLabel(spikes: SpikeMarks): string {
  return `spikes (> ${formatNumber(spikes.limit)}x)`;
}

/**
 * One sentence for the chart's text alternative (with a leading space): how many intervals spike
 * and the first few; an empty string when none do or the marks are absent.
 */
export function spikeNote(spikes: SpikeMarks | undefined): string {
  if (spikes === undefined || spikes.intervals.length === 0) return '';
  const count = spikes.intervals.length + (spikes.left_out ?? 0);
  const named = spikes.intervals
    .slice(0, NAMED)
    .map((s) => `${formatNumber(s.from)} to ${formatNumber(s.to)}`)
    .join('; ');
  const more = count > NAMED ? '; …' : '';
  return ` Bars along the top mark ${count} interval${count === 1 ? '' : 's'} between neighbouring training values where the curve varies more than ${formatNumber(spikes.limit)} times what the data allow (${named}${more}).`;
}

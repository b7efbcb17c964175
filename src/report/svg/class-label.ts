/**
 * A class label of a classifier as chart text: labels come from the user's CSV file, so at most
 * {@link CLASS_LABEL_CHARS} characters of one are shown (cut with `…`); plain text, escaped by the
 * frame like every other chart text.
 */

/** Most characters of a label shown in a chart. */
export const CLASS_LABEL_CHARS = 40;

/** The label, cut to {@link CLASS_LABEL_CHARS} characters (by code point) with `…` when longer. */
export function classLabel(label: string): string {
  const chars = Array.from(label);
  return chars.length <= CLASS_LABEL_CHARS ? label : `${chars.slice(0, CLASS_LABEL_CHARS - 1).join('')}…`;
}

/**
 * The job summary and the pull-request comment: both are the Markdown report
 * ({@link formatMarkdown}), cut to what each place accepts. The comment starts with a hidden
 * marker by which the next run finds it again.
 */
import type { Result } from '../result/result.js';
import { formatMarkdown } from './markdown.js';

/** Size cap of the job summary in UTF-8 bytes: under GitHub's 1 MiB (1,048,576 bytes) per step. */
export const SUMMARY_MAX_BYTES = 1_000_000;

/** Size cap of the comment in UTF-8 bytes: under GitHub's 65,536 characters per comment body. */
export const COMMENT_MAX_BYTES = 60_000;

/** The hidden HTML comment that marks fitgate's pull-request comment. */
export const COMMENT_MARKER = '<!-- fitgate-report -->';

/** The job summary's Markdown. */
export function formatSummary(result: Result): string {
  return formatMarkdown(result, { maxBytes: SUMMARY_MAX_BYTES });
}

/** The pull-request comment's Markdown: the marker line, then the same report as the summary, cut to fit a comment. */
export function formatComment(result: Result): string {
  return formatMarkdown(result, { maxBytes: COMMENT_MAX_BYTES, preamble: [COMMENT_MARKER] });
}

/**
 * Writes the file reports a run asked for (HTML page, SARIF log, JUnit XML). Shared by the CLI
 * and the action; the reporters only format, this module only writes, each file through
 * {@link writeFileSafely} (never through a link, atomically), piece by piece (never one string).
 */
import path from 'node:path';
import { errorMessage, InputError } from '../core/errors.js';
import { HTML_FILE, htmlReport } from '../report/html.js';
import { junitReport } from '../report/junit.js';
import { sarifReport } from '../report/sarif.js';
import type { Result } from '../result/result.js';
import { OUTPUT_REFUSED, writeFileSafely } from './safe-write.js';

/** Which file reports to write; null leaves one out. Paths are absolute or relative to the process's folder. */
export interface FileReports {
  /** Folder for the HTML report (`index.html` inside it). */
  html: string | null;
  /** SARIF 2.1.0 log file. */
  sarif: string | null;
  /** JUnit XML file. */
  junit: string | null;
  /** Prefix of descriptor paths in the SARIF log (the repository root relative to the checkout), `''` for none. */
  sarifPrefix: string;
  /** What fails a JUnit test case: fail limits only, or warnings too. */
  failOn: 'fail' | 'warn';
  /**
   * Boundary folders (absolute, existing): a path named inside one must really stay inside it
   * (the action: the workspace; the CLI: the repository root and the working directory).
   */
  within: readonly string[];
  /** Refuse a path named outside every boundary (the action). Default false. */
  insideOnly?: boolean;
  /** Put before `html`, `sarif`, `junit` to name the option in messages: `--` (CLI) or `''` (action inputs). Default `''`. */
  optionPrefix?: string;
}

/** A file report that was not written. */
export interface FileReportFailure {
  /** The option that named it (`--html`, `sarif`). */
  option: string;
  /** True when the target was refused (a link, a folder leading outside): bad input. False: the write failed (a full disk). */
  refused: boolean;
  /** One line: the option, the path and what was expected. */
  message: string;
}

/**
 * Writes every requested file report (missing folders are made, each checked). A report that
 * cannot be written does not stop the others.
 * @returns the reports that were not written, in the order html, sarif, junit; empty when all were
 */
export async function writeFileReports(result: Result, files: FileReports): Promise<FileReportFailure[]> {
  const failures: FileReportFailure[] = [];
  const place = (name: string) => ({
    option: `${files.optionPrefix ?? ''}${name}`,
    within: files.within,
    insideOnly: files.insideOnly ?? false,
  });
  const attempt = (name: string, file: string, pieces: () => Iterable<string>): void => {
    try {
      writeFileSafely(file, pieces(), place(name));
    } catch (error) {
      failures.push({
        option: place(name).option,
        refused: error instanceof InputError && error.code === OUTPUT_REFUSED,
        message: errorMessage(error),
      });
    }
  };
  if (files.html !== null) attempt('html', path.join(files.html, HTML_FILE), () => htmlReport(result));
  if (files.sarif !== null) attempt('sarif', files.sarif, () => sarifReport(result, { pathPrefix: files.sarifPrefix }));
  if (files.junit !== null) attempt('junit', files.junit, () => junitReport(result, { failOn: files.failOn }));
  return failures;
}

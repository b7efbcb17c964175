/**
 * Writes the file reports a run asked for (HTML page, SARIF log, JUnit XML). Shared by the CLI
 * and the action; the reporters only format, this module only writes.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { formatHtml, HTML_FILE } from '../report/html.js';
import { formatJunit } from '../report/junit.js';
import { formatSarif } from '../report/sarif.js';
import type { Result } from '../result/result.js';

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
}

/** Writes every requested file report (folders are created). */
export async function writeFileReports(result: Result, files: FileReports): Promise<void> {
  if (files.html !== null) {
    await mkdir(files.html, { recursive: true });
    await writeFile(path.join(files.html, HTML_FILE), formatHtml(result));
  }
  if (files.sarif !== null) {
    await mkdir(path.dirname(path.resolve(files.sarif)), { recursive: true });
    await writeFile(files.sarif, formatSarif(result, { pathPrefix: files.sarifPrefix }));
  }
  if (files.junit !== null) {
    await mkdir(path.dirname(path.resolve(files.junit)), { recursive: true });
    await writeFile(files.junit, formatJunit(result, { failOn: files.failOn }));
  }
}

/**
 * Writes the file reports a run asked for (HTML page, SARIF log, JUnit XML). Shared by the CLI
 * and the action; the reporters only format, this module only writes, each report piece by piece
 * (report-file.ts: never one string, atomically, never through a link).
 */
import path from 'node:path';
import { HTML_FILE, htmlReport } from '../report/html.js';
import { junitReport } from '../report/junit.js';
import { sarifReport } from '../report/sarif.js';
import type { Result } from '../result/result.js';
import { writeReportFile } from './report-file.js';

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
  if (files.html !== null) writeReportFile(path.join(files.html, HTML_FILE), htmlReport(result), 'html');
  if (files.sarif !== null) writeReportFile(files.sarif, sarifReport(result, { pathPrefix: files.sarifPrefix }), 'sarif');
  if (files.junit !== null) writeReportFile(files.junit, junitReport(result, { failOn: files.failOn }), 'junit');
}

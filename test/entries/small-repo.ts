// Test helper: small invented repositories written into a temporary folder (a greenhouse whose
// vent opening drives the air humidity; all figures made up).
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

/** Rows of `vent_pct,humidity_pct` on a straight line with a small, fixed wobble (no randomness). */
export function lineRows(count: number, offset: number): string {
  const lines = ['vent_pct,humidity_pct'];
  for (let i = 0; i < count; i++) {
    const vent = 5 + ((i * 37 + offset * 11) % 90);
    const wobble = 0.8 * Math.sin(1.7 * i + offset);
    lines.push(`${vent},${(82 - 0.35 * vent + wobble).toFixed(3)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** A straight-line descriptor of the greenhouse data (extra YAML lines appended as given). */
export function lineDescriptor(extra = ''): string {
  return [
    '# Greenhouse humidity against the vent opening.',
    'version: 1',
    'name: greenhouse-humidity',
    'data:',
    '  train: ../data/air-train.csv',
    '  holdout: ../data/air-holdout.csv',
    '  target: humidity_pct',
    'terms:',
    '  - linear: [vent_pct]',
    extra,
  ].join('\n');
}

/** Writes the files (path -> text) into a new temporary folder; returns it and a remover. */
export function writeRepo(files: Record<string, string>): { dir: string; remove: () => void } {
  const dir = mkdtempSync(path.join(tmpdir(), 'fitgate-h9-'));
  for (const [rel, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(dir, rel)), { recursive: true });
    writeFileSync(path.join(dir, rel), text);
  }
  return { dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

/** The greenhouse repository: 15 training rows, 8 hold-out rows, one straight-line model. */
export function greenhouse(descriptorExtra = '', more: Record<string, string> = {}): { dir: string; remove: () => void } {
  return writeRepo({
    'data/air-train.csv': lineRows(15, 0),
    'data/air-holdout.csv': lineRows(8, 3),
    'models/greenhouse.model.yml': lineDescriptor(descriptorExtra),
    ...more,
  });
}

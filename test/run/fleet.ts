// Test helper: a repository of many small models (the example repository's files plus generated
// models, one with a bad descriptor and one with a bad data file), as a map of files.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { repoRoot } from './transpile.js';

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

/** Deterministic pseudo-random numbers in [0, 1) (a linear congruential generator; test data only). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

function csv(rows: number, seed: number): string {
  const r = lcg(seed);
  const lines = ['a,b,y'];
  for (let i = 0; i < rows; i++) {
    const a = r() * 10;
    const b = r() * 4 - 2;
    lines.push(`${a.toFixed(4)},${b.toFixed(4)},${(1 + 0.5 * a - b * b + (r() - 0.5) * 0.3).toFixed(4)}`);
  }
  return `${lines.join('\n')}\n`;
}

/**
 * The files of a repository with `generated` extra models besides the examples.
 * @returns repository-relative path -> text
 */
export function fleetFiles(generated = 9): Record<string, string> {
  const files: Record<string, string> = {};
  const examples = path.join(repoRoot, 'examples');
  for (const file of walk(examples)) {
    const rel = path.relative(examples, file).split(path.sep).join('/');
    if (rel === 'fitgate.yml' || rel.startsWith('models/') || rel.startsWith('data/')) files[rel] = readFileSync(file, 'utf8');
  }
  for (let m = 0; m < generated; m++) {
    const degree = 1 + (m % 4);
    files[`data/gen-${m}-train.csv`] = csv(40 + 7 * m, 100 + m);
    files[`data/gen-${m}-holdout.csv`] = csv(15 + m, 200 + m);
    files[`models/generated/gen-${m}.model.yml`] = [
      'version: 1',
      `name: generated-${m}`,
      'data:',
      `  train: ../../data/gen-${m}-train.csv`,
      `  holdout: ../../data/gen-${m}-holdout.csv`,
      '  target: y',
      'terms:',
      `  - polynomial: { of: a, degree: ${degree} }`,
      '  - linear: [b]',
      'fit:',
      `  ridge: ${m % 2 === 0 ? 0 : 0.5}`,
      '',
    ].join('\n');
  }
  // A descriptor that does not validate, and a model whose data file has a bad cell.
  files['models/generated/broken.model.yml'] = 'version: 1\nname: broken\nterms: 3\n';
  files['data/bad-train.csv'] = 'a,b,y\n1,2,3\n2,oops,4\n3,1,5\n4,2,6\n';
  files['models/generated/bad-data.model.yml'] = [
    'version: 1',
    'name: bad-data',
    'data:',
    '  train: ../../data/bad-train.csv',
    '  holdout: ../../data/gen-0-holdout.csv',
    '  target: y',
    'terms:',
    '  - linear: [a, b]',
    '',
  ].join('\n');
  return files;
}

import { describe, expect, it } from 'vitest';
import { rewriteSetting } from '../../src/action/suggested-line.js';
import { descriptorFromDocument } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { parseYaml } from '../../src/config/yaml-source.js';

const DESCRIPTOR = `version: 1
name: kiln
data:
  train: train.csv
  holdout: holdout.csv
  target: y
terms:
    - polynomial: { of: fuel, degree: 9 }   # was 2 last spring
    - rbf: { of: ambient, centers: { from: 0, to: 10, count: 5 }, width: 0.2 }
fit:
  ridge: 0 # least squares
`;

/** The descriptor with line `at` replaced, loaded as fitgate loads descriptors. */
function loadWith(text: string, at: number, line: string) {
  const lines = text.split('\n');
  lines[at - 1] = line;
  const changed = lines.join('\n');
  return descriptorFromDocument(parseYaml(changed, 'm.model.yml'), 'm.model.yml', defaultSettings());
}

describe('rewriteSetting', () => {
  it('changes only the degree in a flow mapping, keeping indentation, spacing and the comment', () => {
    const r = rewriteSetting(DESCRIPTOR, 8, { key: 'degree', value: 3 });
    expect(r).toEqual({
      line: 8,
      before: '    - polynomial: { of: fuel, degree: 9 }   # was 2 last spring',
      after: '    - polynomial: { of: fuel, degree: 3 }   # was 2 last spring',
    });
    const d = loadWith(DESCRIPTOR, r!.line, r!.after);
    expect(d.terms[0]).toMatchObject({ kind: 'polynomial', degree: 3 });
  });

  it('changes a width next to a nested mapping, and a ridge of 0', () => {
    const w = rewriteSetting(DESCRIPTOR, 9, { key: 'width', value: 1.6 });
    expect(w?.after).toBe('    - rbf: { of: ambient, centers: { from: 0, to: 10, count: 5 }, width: 1.6 }');
    expect(loadWith(DESCRIPTOR, 9, w!.after).terms[1]).toMatchObject({ kind: 'rbf', width: 1.6 });
    const r = rewriteSetting(DESCRIPTOR, 11, { key: 'ridge', value: 0.8 });
    expect(r).toEqual({ line: 11, before: '  ridge: 0 # least squares', after: '  ridge: 0.8 # least squares' });
    expect(loadWith(DESCRIPTOR, 11, r!.after).fit.ridge).toBe(0.8);
    expect(rewriteSetting(DESCRIPTOR, 11, { key: 'ridge', value: 0.0012 })?.after).toBe('  ridge: 0.0012 # least squares');
  });

  it('finds the value on a line below a block-style term, and keeps carriage returns out', () => {
    const text = 'terms:\r\n  - polynomial:\r\n      of: x\r\n      degree: 12\r\n';
    expect(rewriteSetting(text, 2, { key: 'degree', value: 4 })).toEqual({ line: 4, before: '      degree: 12', after: '      degree: 4' });
  });

  it('gives null when the key is not written, not a plain number, ambiguous or the text is not YAML', () => {
    expect(rewriteSetting('fit:\n  intercept: true\nterms:\n  - linear: [x]\n', 1, { key: 'ridge', value: 1 })).toBeNull();
    expect(rewriteSetting('fit:\n  ridge: "0.5"\n', 2, { key: 'ridge', value: 1 })).toBeNull();
    expect(rewriteSetting('fit:\n  ridge: !!float 0.5\n', 2, { key: 'ridge', value: 1 })).toBeNull();
    expect(
      rewriteSetting('terms:\n  - polynomial: { of: x, degree: 2 }\n  - polynomial: { of: z, degree: 5 }\n', 1, {
        key: 'degree',
        value: 3,
      }),
    ).toBeNull();
    expect(rewriteSetting('terms: [\n', 1, { key: 'degree', value: 3 })).toBeNull();
    expect(rewriteSetting(DESCRIPTOR, 8, { key: 'degree', value: Number.NaN })).toBeNull();
  });
});

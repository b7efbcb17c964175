import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { fitModel } from '../../src/run/fit-model.js';

const data = `day,hours,y\n${Array.from({ length: 40 }, (_, i) => `${i},${(i * 0.37) % 9},${(Math.sin((2 * Math.PI * i) / 7) + 0.1 * i).toFixed(6)}`).join('\n')}\n`;

function repo(terms: string) {
  return createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../d.csv\n  holdout: ../d.csv\n  target: y\nterms:\n${terms}`,
    'd.csv': data,
  });
}

async function load(terms: string) {
  const r = repo(terms);
  return loadDescriptor(r, 'models/m.model.yml', defaultSettings());
}

describe('fourier and spline terms in a descriptor', () => {
  it('reads them with their defaults and fits them', async () => {
    const terms =
      '  - fourier: { of: day, period: 7, harmonics: 2 }\n  - spline: { of: hours, knots: { count: 3 } }\n  - spline: { of: hours, knots: [2, 4], natural: true }\n';
    const d = await load(terms);
    expect(d.terms).toEqual([
      { kind: 'fourier', of: 'day', period: 7, harmonics: 2, line: 8 },
      { kind: 'spline', of: 'hours', knots: { kind: 'count', count: 3 }, degree: 3, natural: false, line: 9 },
      { kind: 'spline', of: 'hours', knots: { kind: 'list', values: [2, 4] }, degree: 3, natural: true, line: 10 },
    ]);
    const model = await fitModel(repo(terms), d, defaultSettings());
    // 1 + 4 sin/cos + (3 + 3) B-splines + (2 + 1) natural columns
    expect(model.design.p).toBe(14);
    expect(model.design.columnNames.slice(0, 3)).toEqual(['(intercept)', 'sin(2pi*1*day/7)', 'cos(2pi*1*day/7)']);
  });

  it('a natural spline of degree 2 is an error at its degree', async () => {
    await expect(load('  - spline: { of: hours, knots: [2], degree: 2, natural: true }\n')).rejects.toMatchObject({
      code: 'spline-settings',
      location: { line: 8 },
    });
  });

  it('knots out of order are an error at the knot', async () => {
    await expect(load('  - spline: { of: hours, knots: [4, 2] }\n')).rejects.toMatchObject({
      code: 'spline-settings',
      location: { line: 8 },
    });
  });

  it('a knot outside the training range is an error naming the term line', async () => {
    const terms = '  - spline: { of: hours, knots: [50] }\n';
    const d = await load(terms);
    await expect(fitModel(repo(terms), d, defaultSettings())).rejects.toMatchObject({
      code: 'spline-knots',
      location: { file: 'models/m.model.yml', line: 8 },
    });
  });

  it('a period of 0 is a schema error', async () => {
    await expect(load('  - fourier: { of: day, period: 0, harmonics: 2 }\n')).rejects.toMatchObject({ location: { line: 8 } });
  });
});

describe('input transforms', () => {
  it('a value outside the domain is an error naming file, line, column and value', async () => {
    const terms = '  - polynomial: { of: hours, degree: 2, transform: log }\n';
    const d = await load(terms);
    expect(d.terms[0]).toMatchObject({ kind: 'polynomial', transform: 'log' });
    // hours is 0 on the first data row (line 2 of d.csv)
    await expect(fitModel(repo(terms), d, defaultSettings())).rejects.toMatchObject({
      code: 'transform-domain',
      location: { file: 'd.csv', line: 2, key: 'hours' },
    });
  });

  it('log1p accepts 0 and names its columns', async () => {
    const terms = '  - spline: { of: hours, knots: { count: 2 }, natural: true, transform: log1p }\n';
    const model = await fitModel(repo(terms), await load(terms), defaultSettings());
    expect(model.design.columnNames).toEqual([
      '(intercept)',
      'ns(log1p(hours); u)',
      expect.stringMatching(/^ns\(log1p\(hours\); knot /),
      expect.stringMatching(/^ns\(log1p\(hours\); knot /),
    ]);
    expect(model.design.inputs).toEqual(['hours']);
  });
});

describe('radial term over several inputs', () => {
  it('reads rows, grids and at-samples, and names the centres', async () => {
    const terms =
      '  - rbf: { of: [day, hours], centers: [[1, 2], [30, 7]], width: 0.5 }\n  - rbf: { of: [day, hours], centers: [{ from: 0, to: 39, count: 2 }, { from: 0, to: 8, count: 3 }], width: 1 }\n';
    const d = await load(terms);
    expect(d.terms[0]).toMatchObject({
      kind: 'multi-rbf',
      of: ['day', 'hours'],
      centers: {
        kind: 'rows',
        rows: [
          [1, 2],
          [30, 7],
        ],
      },
    });
    const model = await fitModel(repo(terms), d, defaultSettings());
    expect(model.design.p).toBe(1 + 2 + 6);
    expect(model.design.columnNames[1]).toBe('rbf(day, hours; c=(1, 2))');
  });

  it('a centre row of the wrong length is an error at that row', async () => {
    await expect(load('  - rbf: { of: [day, hours], centers: [[1, 2], [3, 4, 5]], width: 0.5 }\n')).rejects.toMatchObject({
      code: 'rbf-centers',
      location: { line: 8 },
    });
  });

  it('rows of centres for one input are an error', async () => {
    await expect(load('  - rbf: { of: day, centers: [[1, 2]], width: 0.5 }\n')).rejects.toMatchObject({ code: 'rbf-centers' });
  });
});

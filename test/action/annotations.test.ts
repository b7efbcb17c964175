import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import {
  collectAnnotations,
  escapeData,
  escapeProperty,
  formatAnnotations,
  formatCommand,
  inputErrorAnnotation,
} from '../../src/report/annotations.js';
import { neutraliseLogLine } from '../../src/report/runner-commands.js';
import { summarise } from '../../src/result/result.js';
import { awkwardResult, check, model } from './result-fixture.js';

describe('escaping of workflow commands', () => {
  it('percent-encodes %, CR and LF in data, and also : and , in properties (as the toolkit does)', () => {
    expect(escapeData('50% a\r\nb:c,d')).toBe('50%25 a%0D%0Ab:c,d');
    expect(escapeProperty('50% a\r\nb:c,d')).toBe('50%25 a%0D%0Ab%3Ac%2Cd');
    expect(escapeData('%0A')).toBe('%250A');
  });

  it('keeps a name like ::error::x from starting a line', () => {
    const line = formatCommand({ level: 'warning', message: 'x\n::error::x', title: '::error::x', file: 'a\n::error::b' });
    expect(line).toBe('::warning file=a%0A%3A%3Aerror%3A%3Ab,title=%3A%3Aerror%3A%3Ax::x%0A::error::x');
    expect(line.split('\n')).toHaveLength(1);
    expect(neutraliseLogLine('::error::x')).toBe('» ::error::x');
    expect(neutraliseLogLine('  ::error::x')).toBe('»   ::error::x');
    expect(neutraliseLogLine('a\n::error::x')).toBe('a ::error::x');
  });

  it('breaks the older ##[command] form in the file, title and message of its own commands', () => {
    const line = formatCommand({ level: 'error', message: 'x ##[error]forged', title: 'a##[warning]b', file: 'm##[x].yml' });
    expect(line).toBe('::error file=m## [x].yml,title=a## [warning]b::x ## [error]forged');
    expect(line).not.toContain('##[');
  });

  it('leaves out empty properties', () => {
    expect(formatCommand({ level: 'notice', message: 'm' })).toBe('::notice::m');
    expect(formatCommand({ level: 'error', message: 'm', file: 'f', line: 0 })).toBe('::error file=f::m');
  });
});

describe('collectAnnotations', () => {
  it('writes golden lines for awkward content: errors first, then warnings, then notes', () => {
    expect(formatAnnotations(awkwardResult(), { prefix: 'sub/dir' })).toBe(
      [
        '::error file=sub/dir/models/a|b <c> & d 🌡️.model.yml,line=12,title=fitgate generalisation-gap (a|b <c> & d 🌡️)::ratio 100%25 of a, b: c%0Anext line. Use fewer terms.',
        '::error file=sub/dir/data/a%2Cb%3Ac.csv,line=3,title=fitgate could not check %3A%3Aerror%3A%3Ax::bad%0D%0A::warning::injected',
        '::warning file=sub/dir/models/a|b <c> & d 🌡️.model.yml,line=8,title=fitgate parameter-ratio (a|b <c> & d 🌡️)::column `x|y` <big>. Change it.',
        '::notice title=fitgate::base commit abc1234 is not available; fetch it',
        '',
      ].join('\n'),
    );
  });

  it('puts files at the root without a prefix', () => {
    const [first] = collectAnnotations(awkwardResult());
    expect(first.file).toBe('models/a|b <c> & d 🌡️.model.yml');
  });

  it('annotates at most 10 errors and 10 warnings, then one notice counting the rest', () => {
    const models = Array.from({ length: 13 }, (_, i) =>
      model({
        name: `m${String(i).padStart(2, '0')}`,
        verdict: 'fail',
        checks: [
          check({ id: 'generalisation-gap', status: 'fail', line: i + 1 }),
          check({ id: 'parameter-ratio', status: 'warn', line: i + 1 }),
        ],
      }),
    );
    const all = collectAnnotations(summarise(models, '0.1.0'));
    expect(all.map((a) => a.level)).toEqual([...Array(10).fill('error'), ...Array(10).fill('warning'), 'notice']);
    expect(all[9].title).toBe('fitgate generalisation-gap (m09)');
    expect(all[20].message).toBe(
      '6 more findings are not annotated (3 errors, 3 warnings; the runner shows 10 of each per step). The job summary lists every model.',
    );
  });

  it('adds no counting notice when everything fits, and nothing for a passing run', () => {
    const pass = summarise(
      [model({ name: 'ok', verdict: 'pass', checks: [check({ id: 'generalisation-gap', status: 'pass' })] })],
      '0.1.0',
    );
    expect(collectAnnotations(pass)).toEqual([]);
  });
});

describe('inputErrorAnnotation', () => {
  it('points at the file and line, under the working-directory prefix', () => {
    const error = new InputError('schema', 'must be a number, got "x"', { file: 'fitgate.yml', line: 4, key: 'limits.gap_ratio' });
    expect(formatCommand(inputErrorAnnotation(error, 'ml'))).toBe(
      '::error file=ml/fitgate.yml,line=4,title=fitgate could not run::`limits.gap_ratio`: must be a number, got "x"',
    );
  });

  it('has no file when the error has none', () => {
    expect(formatCommand(inputErrorAnnotation(new InputError('input', 'bad')))).toBe('::error title=fitgate could not run::bad');
  });
});

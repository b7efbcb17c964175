import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import conditioning from '../../src/checks/conditioning.js';
import { buildContext, defaultLimits, descriptor, table } from './context.js';

describe('conditioning check (default: warn above 1e8)', () => {
  it('warns on nearly collinear columns, names them and points at their term', () => {
    const a = Array.from({ length: 30 }, (_, i) => i / 29);
    const b = a.map((v, i) => v + 1e-10 * ((i * 7) % 5)); // b = a up to 4e-10
    const c = a.map((_, i) => ((i * 13) % 7) / 7);
    const y = a.map((v, i) => v + c[i]);
    const train = table(['a', 'b', 'c', 'y'], [a, b, c, y]);
    const d = descriptor({
      terms: [
        { kind: 'linear', columns: ['c'] },
        { kind: 'linear', columns: ['a', 'b'] },
      ],
      target: 'y',
      limits: defaultLimits(),
    });
    const { outcome } = runCheck(conditioning, buildContext(d, train, train));
    expect(outcome.status, outcome.message).toBe('warn');
    expect(outcome.line).toBe(11);
    expect(outcome.message).toContain('a, b');
    expect(outcome.detail).toMatchObject({ collinear_term_lines: [11] });
  });

  it('passes a well-conditioned design', () => {
    const x = Array.from({ length: 20 }, (_, i) => i);
    const train = table(['x', 'y'], [x, x.map((v) => 2 * v + (v % 3))]);
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', limits: defaultLimits() });
    const { outcome } = runCheck(conditioning, buildContext(d, train, train));
    expect(outcome.status).toBe('pass');
    expect(outcome.value as number).toBeLessThan(10);
  });
});

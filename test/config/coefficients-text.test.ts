import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { compareCoefficients, shippedCoefficients, withCoefficients, yamlNumber } from '../../src/config/coefficients-text.js';
import { InputError } from '../../src/core/errors.js';

const HEAD = '# kiln\nversion: 1   # first\nname: "kiln"\nterms:\n  - linear: [a, b]   # two\n\n';

describe('withCoefficients', () => {
  it('replaces each number where it stands when the count is the same (comments between items survive)', () => {
    const text = `${HEAD}coefficients: [1.0,   # intercept\n  2.0, 3e0]  # old\nlimits: { gap_ratio: 1.3 }\n`;
    expect(withCoefficients(text, [0.5, -1.25, 1e-7], 'k.yml')).toBe(
      `${HEAD}coefficients: [0.5,   # intercept\n  -1.25, 1e-7]  # old\nlimits: { gap_ratio: 1.3 }\n`,
    );
  });

  it('rewrites a flow list of another length in place', () => {
    const text = `${HEAD}coefficients: [1, 2]  # old\nlimits: {}\n`;
    expect(withCoefficients(text, [1, 2, 3], 'k.yml')).toBe(`${HEAD}coefficients: [1, 2, 3]  # old\nlimits: {}\n`);
  });

  it('rewrites a block list of another length at its indentation, keeping what follows its last item', () => {
    const text = `${HEAD}coefficients:\n  - 1\n  - 2 # last\n\n# tail\nfit: { ridge: 0 }\n`;
    const out = withCoefficients(text, [4, 5, 6], 'k.yml');
    expect(out).toBe(`${HEAD}coefficients:\n  - 4\n  - 5\n  - 6 # last\n\n# tail\nfit: { ridge: 0 }\n`);
    expect(parse(out).coefficients).toEqual([4, 5, 6]);
  });

  it('appends the key when there is none, adding a missing final line break', () => {
    expect(withCoefficients('version: 1\nname: k # c', [1.5, 2], 'k.yml')).toBe('version: 1\nname: k # c\ncoefficients: [1.5, 2]\n');
  });

  it('writes numbers that read back to the same doubles', () => {
    const values = [0.1 + 0.2, -1 / 3, 6.02214076e23, 5e-324, -0];
    expect(parse(withCoefficients('a: 1\n', values, 'k.yml')).coefficients).toEqual(values.map((v) => (Object.is(v, -0) ? 0 : v)));
    expect(() => yamlNumber(Number.NaN)).toThrow(RangeError);
  });

  it('refuses a text that is not one mapping, or coefficients that are not a list', () => {
    expect(() => withCoefficients('- a\n- b\n', [1], 'k.yml')).toThrow(InputError);
    expect(() => withCoefficients('coefficients: 3\n', [1], 'k.yml')).toThrow(/expected `coefficients` to be a list of numbers/);
  });
});

describe('shippedCoefficients and compareCoefficients', () => {
  it('reads the shipped list and says when it is stale', () => {
    expect(shippedCoefficients('coefficients: [1, 2.5]\n')).toEqual([1, 2.5]);
    expect(shippedCoefficients('name: k\n')).toBeNull();
    expect(compareCoefficients(null, [1]).stale).toBe(true);
    expect(compareCoefficients([1], [1, 2]).stale).toBe(true);
    expect(compareCoefficients([1, 2], [1, 2 + 1e-12])).toMatchObject({ stale: false });
    expect(compareCoefficients([1, 2], [1, 2.001])).toMatchObject({ stale: true, at: 1 });
  });
});

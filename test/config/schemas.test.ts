import { describe, expect, it } from 'vitest';
import { LIMIT_KEYS } from '../../src/config/limits.js';
import { descriptorSchema, settingsSchema, validateDescriptorValue, validateSettingsValue } from '../../src/config/schemas.js';

type Json = Record<string, unknown>;

/** Every schema node that describes a property or list item, with its JSON path. */
function propertyNodes(schema: Json, path = '#'): Array<{ path: string; node: Json }> {
  const out: Array<{ path: string; node: Json }> = [];
  const props = schema.properties as Record<string, Json> | undefined;
  for (const [key, node] of Object.entries(props ?? {})) {
    out.push({ path: `${path}/properties/${key}`, node });
    out.push(...propertyNodes(node, `${path}/properties/${key}`));
  }
  if (schema.items && typeof schema.items === 'object') {
    out.push({ path: `${path}/items`, node: schema.items as Json });
    out.push(...propertyNodes(schema.items as Json, `${path}/items`));
  }
  for (const [i, branch] of ((schema.oneOf as Json[] | undefined) ?? []).entries())
    out.push(...propertyNodes(branch, `${path}/oneOf/${i}`));
  for (const [key, node] of Object.entries((schema.$defs as Record<string, Json> | undefined) ?? {}))
    out.push(...propertyNodes(node, `${path}/$defs/${key}`));
  return out;
}

describe('shipped JSON Schemas', () => {
  for (const [name, schema] of [
    ['settings', settingsSchema],
    ['descriptor', descriptorSchema],
  ] as const) {
    it(`${name}: has $id, title, description, and a description on every property`, () => {
      expect(typeof schema.$id).toBe('string');
      expect(typeof schema.title).toBe('string');
      expect(typeof schema.description).toBe('string');
      const missing = propertyNodes(schema as Json)
        .filter(({ node }) => typeof node.description !== 'string' || node.description.length === 0)
        .map((p) => p.path);
      expect(missing, 'properties without a description').toEqual([]);
    });

    it(`${name}: lists exactly the limit keys of LIMIT_KEYS with the same defaults and descriptions`, () => {
      const props = ((schema.$defs as Json).limits as Json).properties as Record<string, Json>;
      expect(Object.keys(props)).toEqual(LIMIT_KEYS.map((k) => k.key));
      for (const { key, defaultSpec, description, direction } of LIMIT_KEYS) {
        const summary = direction === 'below' ? `${description} A floor: the figure fails below its limit.` : description;
        expect({ key, default: props[key].default, description: props[key].description }).toEqual({
          key,
          default: defaultSpec,
          description: summary,
        });
      }
    });
  }

  it('both files define limits identically', () => {
    const defs = (s: Json) => ({ limits: (s.$defs as Json).limits, limit: (s.$defs as Json).limit });
    expect(defs(descriptorSchema as Json)).toEqual(defs(settingsSchema as Json));
  });

  it('accepts the contract examples (contract.md, draft 1)', () => {
    expect(
      validateSettingsValue({
        version: 1,
        models: ['models/**/*.model.yml'],
        limits: { gap_ratio: 1.5, params_per_sample: 0.1, coefficient: 25 },
      }),
    ).toBeNull();
    expect(
      validateDescriptorValue({
        version: 1,
        name: 'kiln-exit-temperature',
        task: 'regression',
        data: { train: 'data/kiln-train.csv', holdout: 'data/kiln-holdout.csv', target: 'exit_temp_c' },
        terms: [
          { polynomial: { of: 'fuel_rate', degree: 3 } },
          { rbf: { of: 'ambient_c', centers: { from: -10, to: 40, count: 6 }, width: 8 } },
          { linear: ['humidity_pct'] },
        ],
        fit: { intercept: true, ridge: 0.5 },
        limits: { gap_ratio: 1.3 },
      }),
    ).toBeNull();
  });
});

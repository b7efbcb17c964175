import { readFileSync } from 'node:fs';
import { describe, it, expect } from 'vitest';
// @ts-expect-error the generator is a plain ES module without types
import { generateAll } from '../tools/gen-validators.mjs';
import { validateDescriptorValue, validateSettingsValue } from '../../src/config/schemas.js';

describe('precompiled schema validators', () => {
  it('the limit-key table, the schemas, the validators and docs/checks.md are what test/tools/gen-validators.mjs generates from the registry now (run it when this fails)', async () => {
    const files = (await generateAll()) as Map<string, string>;
    expect([...files.keys()].sort()).toEqual(
      [
        'README.md',
        'docs/checks.md',
        'src/config/generated/limit-keys.ts',
        'src/config/generated/report-validator.ts',
        'src/config/generated/validators.ts',
        'src/config/schema/descriptor.schema.json',
        'src/config/schema/settings.schema.json',
      ].sort(),
    );
    for (const [rel, fresh] of files) {
      const committed = readFileSync(new URL(`../../${rel}`, import.meta.url), 'utf8');
      expect(committed === fresh, `${rel} is stale: run node test/tools/gen-validators.mjs`).toBe(true);
    }
  });

  it('reject what the schemas reject and accept a minimal valid value', () => {
    expect(validateSettingsValue({ version: 1 })).toBeNull();
    const errors = validateSettingsValue({ version: 1, unknown_key: true });
    expect(errors, 'an unknown key must be reported').not.toBeNull();
    expect(errors?.some((e) => e.keyword === 'additionalProperties')).toBe(true);
    expect(validateDescriptorValue({})).not.toBeNull();
  });
});

import { readFileSync } from 'node:fs';
import { describe, it, expect } from 'vitest';
// @ts-expect-error the generator is a plain ES module without types
import { generate, generateReport } from '../tools/gen-validators.mjs';
import { validateDescriptorValue, validateSettingsValue } from '../../src/config/schemas.js';

describe('precompiled schema validators', () => {
  it('src/config/generated/validators.ts is what test/tools/gen-validators.mjs generates now (run it when this fails)', async () => {
    const committed = readFileSync(new URL('../../src/config/generated/validators.ts', import.meta.url), 'utf8');
    const fresh = (await generate()) as string;
    expect(committed === fresh, 'the generated validators are stale: run node test/tools/gen-validators.mjs').toBe(true);
  });

  it('src/config/generated/report-validator.ts is what test/tools/gen-validators.mjs generates now (run it when this fails)', () => {
    const committed = readFileSync(new URL('../../src/config/generated/report-validator.ts', import.meta.url), 'utf8');
    const fresh = generateReport() as string;
    expect(committed === fresh, 'the generated report validator is stale: run node test/tools/gen-validators.mjs').toBe(true);
  });

  it('reject what the schemas reject and accept a minimal valid value', () => {
    expect(validateSettingsValue({ version: 1 })).toBeNull();
    const errors = validateSettingsValue({ version: 1, unknown_key: true });
    expect(errors, 'an unknown key must be reported').not.toBeNull();
    expect(errors?.some((e) => e.keyword === 'additionalProperties')).toBe(true);
    expect(validateDescriptorValue({})).not.toBeNull();
  });
});

/**
 * The two JSON Schemas (shipped as JSON files beside this module) as validators. They are
 * compiled ahead of time by test/tools/gen-validators.mjs (ajv standalone code, run by
 * `npm run bundle`) into ./generated/validators.ts, with the limit keys of `LIMIT_KEYS` added to
 * their `limits` so that a key added to the table is accepted even before the schema files list
 * it (a test keeps the files in step, another fails when the generated module is stale). No
 * schema is compiled at run time.
 */

import type { AnySchemaObject, ErrorObject } from 'ajv/dist/2020.js';
import descriptorSchemaFile from './schema/descriptor.schema.json' with { type: 'json' };
import settingsSchemaFile from './schema/settings.schema.json' with { type: 'json' };
import { validateDescriptor, validateSettings } from './generated/validators.js';

/** The settings schema as shipped (`settings.schema.json`). */
export const settingsSchema: AnySchemaObject = settingsSchemaFile;
/** The descriptor schema as shipped (`descriptor.schema.json`). */
export const descriptorSchema: AnySchemaObject = descriptorSchemaFile;

/** A compiled validator: null when the value is valid, else ajv's errors. */
export type Validator = (value: unknown) => ErrorObject[] | null;

/** Validates a parsed settings file against `settings.schema.json`. */
export const validateSettingsValue: Validator = (value) => run(validateSettings as Compiled, value);

/** Validates a parsed descriptor against `descriptor.schema.json`. */
export const validateDescriptorValue: Validator = (value) => run(validateDescriptor as Compiled, value);

/** The shape of an ajv standalone validator. */
type Compiled = ((value: unknown) => boolean) & { errors?: ErrorObject[] | null };

function run(validate: Compiled, value: unknown): ErrorObject[] | null {
  return validate(value) ? null : [...(validate.errors ?? [])];
}

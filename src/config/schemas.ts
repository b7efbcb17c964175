/**
 * The two JSON Schemas (shipped as JSON files beside this module) compiled once, with the
 * limit keys of {@link LIMIT_KEYS} added to their `limits` so that a key added to the table
 * is accepted even before the schema files list it (a test keeps the files in step).
 */

import { Ajv2020 } from 'ajv/dist/2020.js';
import type { AnySchemaObject, ErrorObject, ValidateFunction } from 'ajv/dist/2020.js';
import descriptorSchemaFile from './schema/descriptor.schema.json' with { type: 'json' };
import settingsSchemaFile from './schema/settings.schema.json' with { type: 'json' };
import { LIMIT_KEYS } from './limits.js';

/** The settings schema as shipped (`settings.schema.json`). */
export const settingsSchema: AnySchemaObject = settingsSchemaFile;
/** The descriptor schema as shipped (`descriptor.schema.json`). */
export const descriptorSchema: AnySchemaObject = descriptorSchemaFile;

/** A compiled validator: null when the value is valid, else ajv's errors. */
export type Validator = (value: unknown) => ErrorObject[] | null;

let compiled: { settings: ValidateFunction; descriptor: ValidateFunction } | null = null;

function compile(): { settings: ValidateFunction; descriptor: ValidateFunction } {
  if (compiled) return compiled;
  const ajv = new Ajv2020({ allErrors: true, verbose: true, strict: true, logger: false });
  compiled = { settings: ajv.compile(withLimitKeys(settingsSchema)), descriptor: ajv.compile(withLimitKeys(descriptorSchema)) };
  return compiled;
}

/** A copy of `schema` whose `$defs.limits.properties` has every key of {@link LIMIT_KEYS}. */
function withLimitKeys(schema: AnySchemaObject): AnySchemaObject {
  const copy = structuredClone(schema) as AnySchemaObject;
  const properties = (copy.$defs?.limits?.properties ?? {}) as Record<string, unknown>;
  for (const { key, defaultSpec, description } of LIMIT_KEYS) {
    if (!(key in properties)) properties[key] = { $ref: '#/$defs/limit', description, default: defaultSpec };
  }
  return copy;
}

/** Validates a parsed settings file against `settings.schema.json`. */
export const validateSettingsValue: Validator = (value) => {
  const validate = compile().settings;
  return validate(value) ? null : [...(validate.errors ?? [])];
};

/** Validates a parsed descriptor against `descriptor.schema.json`. */
export const validateDescriptorValue: Validator = (value) => {
  const validate = compile().descriptor;
  return validate(value) ? null : [...(validate.errors ?? [])];
};

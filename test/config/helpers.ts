/** Shared helpers of the config tests: assert an InputError's code and location, not its wording. */
import { expect } from 'vitest';
import { InputError, type ErrorLocation } from '../../src/core/errors.js';

/** What an InputError must carry; `message` matches a fragment when given. */
export interface ExpectedError extends ErrorLocation {
  code: string;
  message?: RegExp;
}

/** Runs `action` and asserts it throws an InputError with the given code and location fields. */
export async function expectInputError(action: () => unknown, expected: ExpectedError): Promise<InputError> {
  let thrown: unknown = null;
  try {
    await action();
  } catch (error) {
    thrown = error;
  }
  expect(thrown, `expected InputError ${JSON.stringify(expected)}, got nothing thrown`).not.toBeNull();
  if (!(thrown instanceof InputError)) throw new Error(`expected InputError ${JSON.stringify(expected)}, got ${String(thrown)}`);
  const actual = { code: thrown.code, ...thrown.location };
  const { message, ...fields } = expected;
  const picked = Object.fromEntries(Object.keys(fields).map((k) => [k, (actual as Record<string, unknown>)[k]]));
  expect(picked, `InputError fields; full error: ${thrown.describe()} [${thrown.code}]`).toEqual(fields);
  if (message) expect(thrown.message).toMatch(message);
  return thrown;
}

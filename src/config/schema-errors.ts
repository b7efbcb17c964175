/**
 * Turns ajv's validation errors into the one most useful {@link InputError}: the first problem
 * in document order (and within it the deepest), with the file, line, column, key path, the
 * bad value (quoted, cut) and what the schema expected.
 */

import type { ErrorObject } from 'ajv/dist/2020.js';
import { InputError, quoteValue, clip } from '../core/errors.js';
import { nearestWord } from '../core/nearest.js';
import { maxOf } from '../core/extremes.js';
import type { Position } from './types.js';
import type { YamlDocument } from './yaml-source.js';

/** Code of every schema violation. */
export const SCHEMA_ERROR_CODE = 'schema';

/** A key path inside a YAML document: map keys and list indexes. */
export type KeyPath = (string | number)[];

/** One problem found, ready to be reported. */
interface Issue {
  /** Path of the node the problem is about (for unknown or missing keys: that key). */
  path: KeyPath;
  /** Point at the key (unknown keys, missing keys point at their parent) or at the value. */
  pointAt: 'key' | 'value' | 'parent';
  message: string;
}

/**
 * Formats a key path as written in messages: `terms[1].rbf.width`.
 *
 * @param path map keys and list indexes; the empty path gives the empty string
 */
export function formatKeyPath(path: KeyPath): string {
  let out = '';
  for (const segment of path) {
    if (typeof segment === 'number') out += `[${segment}]`;
    else out += out === '' ? segment : `.${segment}`;
  }
  return out;
}

/**
 * An InputError at a key path of a parsed document.
 *
 * @param doc the parsed document (for positions)
 * @param file repository-relative path
 * @param code stable error code
 * @param path key path the problem is about
 * @param message what is wrong and what was expected
 * @param pointAt `value` (default) points at the value, `key` at the key, `parent` at the parent's key
 */
export function errorAt(
  doc: YamlDocument,
  file: string,
  code: string,
  path: KeyPath,
  message: string,
  pointAt: 'key' | 'value' | 'parent' = 'value',
): InputError {
  const position = locate(doc, path, pointAt);
  const key = formatKeyPath(path);
  return new InputError(code, message, { file, ...(position ?? {}), ...(key !== '' ? { key } : {}) });
}

/** Quotes a user value for a message; non-finite numbers as YAML writes them. */
export function showValue(value: unknown): string {
  if (typeof value === 'number' && !Number.isFinite(value)) return Number.isNaN(value) ? '.nan' : value > 0 ? '.inf' : '-.inf';
  if (value instanceof Uint8Array) return 'binary data';
  if (value === null) return 'nothing (null)';
  return quoteValue(value);
}

/**
 * The single most specific InputError for a failed validation.
 *
 * @param errors ajv errors (compiled with `allErrors` and `verbose`)
 * @param doc the parsed document the errors are about
 * @param file repository-relative path
 */
export function schemaError(errors: ErrorObject[], doc: YamlDocument, file: string): InputError {
  const issues = resolveAlternatives(errors).flatMap((e) => toIssue(e, doc.value));
  if (issues.length === 0) return new InputError(SCHEMA_ERROR_CODE, 'does not match its schema', { file });

  // First in document order; within its subtree, the deepest.
  const placed = issues.map((issue, index) => ({ issue, index, at: locate(doc, issue.path, issue.pointAt) ?? { line: 0, column: 0 } }));
  placed.sort((a, b) => a.at.line - b.at.line || a.at.column - b.at.column || a.index - b.index);
  const first = placed[0];
  let chosen = first;
  for (const candidate of placed) {
    if (isPrefix(first.issue.path, candidate.issue.path) && candidate.issue.path.length > chosen.issue.path.length) chosen = candidate;
  }
  const { issue } = chosen;
  return errorAt(doc, file, SCHEMA_ERROR_CODE, issue.path, issue.message, issue.pointAt);
}

function isPrefix(prefix: KeyPath, path: KeyPath): boolean {
  return prefix.length <= path.length && prefix.every((s, i) => s === path[i]);
}

function locate(doc: YamlDocument, path: KeyPath, pointAt: 'key' | 'value' | 'parent'): Position | null {
  let target = pointAt === 'parent' ? path.slice(0, -1) : path;
  let position = pointAt === 'value' ? doc.valuePositionOf(target) : doc.positionOf(target);
  while (position === null && target.length > 0) {
    target = target.slice(0, -1);
    position = doc.positionOf(target);
  }
  return position;
}

/** Replaces each failed oneOf/anyOf and its branch errors by the errors of the branch the user meant, or one "expected one of" error. */
function resolveAlternatives(errors: ErrorObject[]): ErrorObject[] {
  const alternatives = errors
    .filter((e) => e.keyword === 'oneOf' || e.keyword === 'anyOf')
    .sort((a, b) => a.schemaPath.length - b.schemaPath.length);
  if (alternatives.length === 0) return errors;
  const outer = alternatives[0];
  const prefix = `${outer.schemaPath}/`;
  const inside = errors.filter((e) => e.schemaPath.startsWith(prefix));
  const rest = errors.filter((e) => e !== outer && !e.schemaPath.startsWith(prefix));

  const branches = new Map<number, ErrorObject[]>();
  for (const e of inside) {
    const index = Number.parseInt(e.schemaPath.slice(prefix.length), 10);
    branches.set(index, [...(branches.get(index) ?? []), e]);
  }
  const matchingType = [...branches.entries()].filter(
    ([, list]) =>
      !list.some((e) => e.instancePath === outer.instancePath && (e.keyword === 'type' || e.keyword === 'const' || e.keyword === 'enum')),
  );
  const score = (list: ErrorObject[]): [number, number] => [maxOf(list.map((e) => effectiveDepth(e))), -list.length];
  let best: ErrorObject[] | null = null;
  let tie = false;
  for (const [, list] of matchingType) {
    if (best === null) {
      best = list;
      continue;
    }
    const [d1, n1] = score(list);
    const [d0, n0] = score(best);
    if (d1 > d0 || (d1 === d0 && n1 > n0)) {
      best = list;
      tie = false;
    } else if (d1 === d0 && n1 === n0) {
      tie = true;
    }
  }
  const chosen: ErrorObject[] = best !== null && !tie ? best : [alternativesError(outer)];
  return resolveAlternatives([...rest, ...chosen]);
}

/** A stand-in error listing the forms of a failed oneOf/anyOf. */
function alternativesError(outer: ErrorObject): ErrorObject {
  const forms = Array.isArray(outer.schema) ? (outer.schema as Array<{ title?: string }>).map((s) => s.title ?? 'another form') : [];
  return { ...outer, keyword: 'x-alternatives', params: { forms } };
}

function effectiveDepth(e: ErrorObject): number {
  const depth = e.instancePath === '' ? 0 : e.instancePath.split('/').length - 1;
  return e.keyword === 'required' || e.keyword === 'additionalProperties' || e.keyword === 'propertyNames' ? depth + 1 : depth;
}

/** JSON pointer to a key path; numbers where the data there is a list. */
function pointerToPath(pointer: string, root: unknown): KeyPath {
  if (pointer === '') return [];
  const path: KeyPath = [];
  let node: unknown = root;
  for (const raw of pointer.slice(1).split('/')) {
    const segment = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    if (Array.isArray(node)) {
      const index = Number(segment);
      path.push(index);
      node = node[index];
    } else {
      path.push(segment);
      node = node !== null && typeof node === 'object' ? (node as Record<string, unknown>)[segment] : undefined;
    }
  }
  return path;
}

const TYPE_WORDS: Record<string, string> = {
  number: 'a number',
  integer: 'an integer',
  string: 'text',
  object: 'a mapping (key: value)',
  array: 'a list',
  boolean: 'true or false',
  null: 'nothing',
};

const PATTERN_WORDS: Record<string, string> = {
  '^[A-Za-z0-9._-]+$': 'only letters, digits, `-`, `_` or `.`',
};

function orList(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`;
}

interface SchemaLike {
  type?: string | string[];
  properties?: Record<string, unknown>;
  propertyNames?: { enum?: unknown[] };
  maxProperties?: number;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  title?: string;
  required?: string[];
}

function toIssue(e: ErrorObject, root: unknown): Issue[] {
  const path = pointerToPath(e.instancePath, root);
  const parent = (e.parentSchema ?? {}) as SchemaLike;
  const got = `got ${showValue(e.data)}`;
  const params = e.params as Record<string, unknown>;
  const keys = Object.keys(parent.properties ?? {});
  const isTerm = Array.isArray(parent.propertyNames?.enum) && parent.maxProperties === 1;
  const kinds = (parent.propertyNames?.enum ?? []).map(String);

  switch (e.keyword) {
    case 'type': {
      const types = (Array.isArray(params.type) ? params.type : String(params.type).split(',')) as string[];
      let expected = orList(types.map((t) => TYPE_WORDS[t] ?? t));
      if (typeof e.data === 'number' && !Number.isFinite(e.data)) expected = `a finite ${types.includes('integer') ? 'integer' : 'number'}`;
      if (types.includes('object') && isTerm) expected = `a mapping with one key, the term kind (${orList(kinds)})`;
      else if (types.includes('object') && keys.length > 0) expected += ` with keys among: ${keys.join(', ')}`;
      // YAML reads 2, true or 1.5 unquoted as a number or a boolean: text that looks like one needs quotes.
      const quote =
        types.length === 1 && types[0] === 'string' && (typeof e.data === 'number' || typeof e.data === 'boolean')
          ? ` (write it in quotes, "${String(e.data)}", for the text)`
          : '';
      return [{ path, pointAt: 'value', message: `expected ${expected}, ${got}${quote}` }];
    }
    case 'enum':
      if ((e as ErrorObject & { propertyName?: string }).propertyName !== undefined) return []; // reported by propertyNames
      return [
        { path, pointAt: 'value', message: `expected one of: ${(params.allowedValues as unknown[]).map(String).join(', ')}, ${got}` },
      ];
    case 'const':
      return [{ path, pointAt: 'value', message: `expected \`${clip(String(params.allowedValue))}\`, ${got}` }];
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum':
      return [{ path, pointAt: 'value', message: `expected ${boundsText(parent)}, ${got}` }];
    case 'multipleOf':
      return [{ path, pointAt: 'value', message: `expected a multiple of ${String(params.multipleOf)}, ${got}` }];
    case 'minLength':
      return [
        {
          path,
          pointAt: 'value',
          message: `expected ${params.limit === 1 ? 'non-empty text' : `text of at least ${String(params.limit)} characters`}, ${got}`,
        },
      ];
    case 'maxLength':
      return [
        {
          path,
          pointAt: 'value',
          message: `expected text of at most ${String(params.limit)} characters, got ${String(e.data).length} characters`,
        },
      ];
    case 'pattern': {
      const pattern = String(params.pattern);
      return [{ path, pointAt: 'value', message: `expected ${PATTERN_WORDS[pattern] ?? `text matching ${pattern}`}, ${got}` }];
    }
    case 'minItems':
      return [
        {
          path,
          pointAt: 'value',
          message: `expected ${params.limit === 1 ? 'a non-empty list' : `a list of at least ${String(params.limit)} items`}, ${got}`,
        },
      ];
    case 'maxItems':
      return [
        {
          path,
          pointAt: 'value',
          message: `expected a list of at most ${String(params.limit)} items, got ${Array.isArray(e.data) ? e.data.length : '?'} items`,
        },
      ];
    case 'required': {
      const missing = String(params.missingProperty);
      // A key present but not allowed that is a near miss of the missing one is the likely typo.
      const present =
        e.data !== null && typeof e.data === 'object' && !Array.isArray(e.data) ? Object.keys(e.data).filter((k) => !keys.includes(k)) : [];
      const typo = present.find((k) => nearestWord(k, [missing]) === missing);
      const hint = typo !== undefined ? ` (did you mean \`${missing}\` instead of ${quoteValue(typo, 40)}?)` : '';
      return [
        {
          path: [...path, missing],
          pointAt: 'parent',
          message: `missing key \`${clip(missing)}\`${hint}; required keys: ${(parent.required ?? [missing]).join(', ')}`,
        },
      ];
    }
    case 'additionalProperties': {
      const extra = String(params.additionalProperty);
      const near = nearestWord(extra, keys);
      const hint = near !== null ? ` (did you mean \`${near}\`?)` : '';
      return [
        { path: [...path, extra], pointAt: 'key', message: `unknown key \`${clip(extra)}\`${hint}; expected one of: ${keys.join(', ')}` },
      ];
    }
    case 'propertyNames': {
      const name = String(params.propertyName);
      const what = isTerm ? 'term kind' : 'key';
      return [
        { path: [...path, name], pointAt: 'key', message: `unknown ${what} \`${clip(name)}\`; expected one of: ${kinds.join(', ')}` },
      ];
    }
    case 'minProperties':
    case 'maxProperties': {
      const present = e.data !== null && typeof e.data === 'object' ? Object.keys(e.data) : [];
      if (isTerm) {
        const has = present.length === 0 ? 'no key' : `${present.length} keys (${present.join(', ')})`;
        return [{ path, pointAt: 'value', message: `a term has exactly one key, the term kind (${orList(kinds)}); got ${has}` }];
      }
      return [{ path, pointAt: 'value', message: `expected at least one of: ${keys.join(', ')}, ${got}` }];
    }
    case 'x-alternatives':
      return [{ path, pointAt: 'value', message: `expected one of: ${orList(params.forms as string[])}, ${got}` }];
    case 'oneOf':
      return [{ path, pointAt: 'value', message: `matches more than one form; ${got}` }];
    default:
      return [{ path, pointAt: 'value', message: `${e.message ?? 'is not valid'}, ${got}` }];
  }
}

function boundsText(schema: SchemaLike): string {
  const what = schema.type === 'integer' ? 'an integer' : 'a number';
  const parts: string[] = [];
  if (schema.minimum !== undefined && schema.maximum !== undefined) return `${what} from ${schema.minimum} to ${schema.maximum}`;
  if (schema.minimum !== undefined) parts.push(`>= ${schema.minimum}`);
  if (schema.exclusiveMinimum !== undefined) parts.push(`> ${schema.exclusiveMinimum}`);
  if (schema.maximum !== undefined) parts.push(`<= ${schema.maximum}`);
  if (schema.exclusiveMaximum !== undefined) parts.push(`< ${schema.exclusiveMaximum}`);
  return `${what} ${parts.join(' and ')}`;
}

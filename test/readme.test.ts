// Keeps the README in step with the code: every check in the registry has a `### <id>` entry,
// every limit key and every descriptor/settings key of the JSON Schemas is named, and every
// action input appears in the inputs table.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { CHECKS } from '../src/checks/index.js';
import { LIMIT_KEYS } from '../src/config/limits.js';

const read = (file: string) => readFileSync(fileURLToPath(new URL(`../${file}`, import.meta.url)), 'utf8');
const readme = read('README.md');

function schemaKeys(schema: Record<string, unknown>, prefix = ''): string[] {
  const props = (schema.properties ?? {}) as Record<string, Record<string, unknown>>;
  // Leaves only: an object key is documented through its own keys (`data.train`, `fit.ridge`).
  return Object.entries(props).flatMap(([k, v]) => (v.type === 'object' && k !== 'limits' ? schemaKeys(v, `${prefix}${k}.`) : [prefix + k]));
}

describe('README', () => {
  it('has one `### <id>` entry per registered check in the Checks section, and no other entry there', () => {
    const headings = [...readme.matchAll(/^### ([a-z][a-z0-9-]*)$/gm)].map((m) => m[1]);
    for (const c of CHECKS) expect(headings, `README entry for ${c.id}`).toContain(c.id);
    const checks = readme.slice(readme.indexOf('## Checks'), readme.indexOf('## Command line'));
    const entries = [...checks.matchAll(/^### (\S+)$/gm)].map((m) => m[1]);
    expect(entries.sort()).toEqual(CHECKS.map((c) => c.id).sort());
  });

  it('names every limit key with its check in the checks table', () => {
    for (const { key } of LIMIT_KEYS) {
      const row = readme.split('\n').find((l) => l.startsWith('| `') && l.includes(`| \`${key}\` |`));
      expect(row, `checks table row for limit ${key}`).toBeDefined();
    }
  });

  it('documents every key of the settings and descriptor schemas', () => {
    for (const file of ['src/config/schema/settings.schema.json', 'src/config/schema/descriptor.schema.json']) {
      for (const key of schemaKeys(JSON.parse(read(file)) as Record<string, unknown>)) {
        expect(readme, `README mentions \`${key}\` of ${file}`).toContain(`\`${key}\``);
      }
    }
  });

  it('lists every action input and output', () => {
    const action = parse(read('action.yml')) as { inputs: Record<string, unknown>; outputs: Record<string, unknown> };
    for (const name of [...Object.keys(action.inputs), ...Object.keys(action.outputs)]) {
      expect(readme, `README table row for ${name}`).toMatch(new RegExp(`^\\| \`${name}\` \\|`, 'm'));
    }
  });

  it('has the two quick-start commands, and .ci/run runs the same test command', () => {
    const quick = readme.slice(readme.indexOf('## Quick start'), readme.indexOf('## Contents'));
    const commands = [...quick.matchAll(/```sh\n(.+)\n```/g)].map((m) => m[1]);
    expect(commands).toEqual(['npm ci && npm run demo', 'npm ci && npm test']);
    expect(read('.ci/run')).toContain('npm test --');
  });

  it('keeps the Cautions section', () => {
    const cautions = readme.slice(readme.indexOf('## Cautions'));
    expect(cautions).toContain('no proof that a model is fit for its use');
    expect(cautions).toContain('truly held out');
    expect(cautions).toContain('domain review');
  });
});

// Keeps the README and docs/ in step with the code: every check in the registry has a `### <id>`
// entry in docs/checks.md, every limit key is in the README's checks table, every key of the JSON
// Schemas and every action input and output is in docs/configuration.md, and every relative link
// of the documents points at a file and heading that exist.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { CHECKS } from '../src/checks/index.js';
import { LIMIT_KEYS } from '../src/config/limits.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const read = (file: string) => readFileSync(path.join(root, file), 'utf8');
const readme = read('README.md');

/** The text of a Markdown document from the heading `heading` to the next heading of the same level. */
function section(markdown: string, heading: string): string {
  const level = /^#+/.exec(heading)?.[0] ?? '';
  const start = markdown.indexOf(`\n${heading}\n`);
  if (start < 0) return '';
  const next = markdown.indexOf(`\n${level} `, start + heading.length + 1);
  return markdown.slice(start, next < 0 ? undefined : next);
}

function schemaKeys(schema: Record<string, unknown>, prefix = ''): string[] {
  const props = (schema.properties ?? {}) as Record<string, Record<string, unknown>>;
  // Leaves only: an object key is documented through its own keys (`data.train`, `fit.ridge`).
  return Object.entries(props).flatMap(([k, v]) =>
    v.type === 'object' && k !== 'limits' ? schemaKeys(v, `${prefix}${k}.`) : [prefix + k],
  );
}

/** GitHub's anchor for a heading: lower case, punctuation dropped, spaces as hyphens. */
function anchor(heading: string): string {
  return heading
    .trim()
    .toLowerCase()
    .replace(/[^\p{L}\p{N}\s_-]/gu, '')
    .replace(/ /g, '-');
}

/** The anchors of a Markdown document's headings (outside fenced blocks). */
function anchors(markdown: string): Set<string> {
  const out = new Set<string>();
  let fenced = false;
  for (const line of markdown.split('\n')) {
    if (line.startsWith('```')) fenced = !fenced;
    else if (!fenced && /^#{1,6} /.test(line)) out.add(anchor(line.replace(/^#+ /, '')));
  }
  return out;
}

describe('docs/checks.md', () => {
  const checks = read('docs/checks.md');

  it('has one `### <id>` entry per registered check, and no other entry', () => {
    const entries = [...checks.matchAll(/^### (\S+)$/gm)].map((m) => m[1]);
    expect(entries.sort()).toEqual(CHECKS.map((c) => c.id).sort());
  });
});

describe('README', () => {
  it('names every limit key with its check in the checks table', () => {
    const table = section(readme, '## Checks');
    for (const { key } of LIMIT_KEYS) {
      const row = table.split('\n').find((l) => l.startsWith('| `') && l.includes(`| \`${key}\` |`));
      expect(row, `checks table row for limit ${key}`).toBeDefined();
    }
    for (const c of CHECKS) expect(table, `checks table row for ${c.id}`).toContain(`| \`${c.id}\` | \`${c.limitKey}\` |`);
  });

  it('has the two quick-start commands, and .ci/run runs the same test command', () => {
    const quick = section(readme, '## Quick start');
    const commands = [...quick.matchAll(/```sh\n(.+)\n```/g)].map((m) => m[1]);
    expect(commands).toEqual(['npm ci && npm run demo', 'npm ci && npm test']);
    expect(read('.ci/run')).toContain('npm test --');
  });

  it('shows how to use it on your own repository: the workflow step and the command line, installed or through npx', () => {
    const use = section(readme, '## Use it on your repository');
    // Current major versions as of this writing: actions/checkout v7 (github.com/actions/checkout/releases,
    // v7.0.0 in July 2026) and actions/upload-artifact v7 (github.com/actions/upload-artifact, README
    // examples at v7 since pull request #796, April 2026).
    expect(use).toContain('uses: actions/checkout@v7');
    expect(use).toContain('uses: actions/upload-artifact@v7');
    expect(use).toContain('npx fitgate check');
    expect(use).toContain('npx fitgate init ');
    expect(use).toContain('npm install --global fitgate');
  });

  it('keeps the Cautions section', () => {
    const cautions = section(readme, '## Cautions');
    expect(cautions).toContain('no proof that a model is fit for its use');
    expect(cautions).toContain('truly held out');
    expect(cautions).toContain('domain review');
  });

  it('stays under 250 lines', () => {
    expect(readme.split('\n').length).toBeLessThan(250);
  });
});

describe('docs/configuration.md', () => {
  const configuration = read('docs/configuration.md');

  it('documents every key of the settings and descriptor schemas', () => {
    for (const file of ['src/config/schema/settings.schema.json', 'src/config/schema/descriptor.schema.json']) {
      for (const key of schemaKeys(JSON.parse(read(file)) as Record<string, unknown>)) {
        expect(configuration, `docs/configuration.md mentions \`${key}\` of ${file}`).toContain(`\`${key}\``);
      }
    }
  });

  it('lists every action input and output', () => {
    const action = parse(read('action.yml')) as { inputs: Record<string, unknown>; outputs: Record<string, unknown> };
    for (const name of [...Object.keys(action.inputs), ...Object.keys(action.outputs)]) {
      expect(configuration, `docs/configuration.md table row for ${name}`).toMatch(new RegExp(`^\\| \`${name}\` \\|`, 'm'));
    }
  });
});

describe('links between the documents', () => {
  const documents = [
    'README.md',
    'DEVELOPERS.md',
    ...readdirSync(path.join(root, 'docs'))
      .filter((f) => f.endsWith('.md'))
      .map((f) => `docs/${f}`),
  ];

  it.each(documents)('every relative link of %s points at a file and heading that exist', (document) => {
    const text = read(document);
    const links = [...text.matchAll(/\]\(([^)\s]+)\)/g)].map((m) => m[1]).filter((l) => !/^[a-z]+:/.test(l));
    for (const link of links) {
      const [file, hash] = link.split('#');
      const target = file === '' ? document : path.posix.join(path.posix.dirname(document), file);
      expect(existsSync(path.join(root, target)), `${document}: link ${link} names a missing file`).toBe(true);
      if (hash !== undefined) expect(anchors(read(target)).has(hash), `${document}: link ${link} names a missing heading`).toBe(true);
    }
  });

  it('computes anchors as GitHub does', () => {
    expect(anchor('Why `pull_request` and not `pull_request_target`')).toBe('why-pull_request-and-not-pull_request_target');
    expect(anchor('Scale: many models, sharding, big files')).toBe('scale-many-models-sharding-big-files');
    expect([...anchors('# A\n```\n# not a heading\n```\n## B c\n')]).toEqual(['a', 'b-c']);
  });
});

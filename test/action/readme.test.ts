/**
 * Keeps the documents in step: the README's workflow example is examples/workflows/fitgate.yml,
 * and action.yml declares exactly the inputs src/inputs.ts reads and the outputs main sets.
 */
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { OUTPUTS } from '../../src/action/outcome.js';
import { INPUT_DEFAULTS } from '../../src/entries/inputs.js';

const root = new URL('../../', import.meta.url);
const read = (file: string): string => readFileSync(fileURLToPath(new URL(file, root)), 'utf8');

/** The first fenced `yaml` block under the heading `heading` (any level) of a Markdown text. */
function yamlBlockUnder(markdown: string, heading: string): string | null {
  const lines = markdown.split('\n');
  const start = lines.findIndex((l) => /^#{1,6} /.test(l) && l.replace(/^#+ /, '').trim() === heading);
  if (start < 0) return null;
  let open = -1;
  for (let i = start + 1; i < lines.length; i++) {
    if (open < 0 && /^#{1,6} /.test(lines[i])) return null;
    if (open < 0 && /^```ya?ml\s*$/.test(lines[i])) open = i;
    else if (open >= 0 && /^```\s*$/.test(lines[i])) return `${lines.slice(open + 1, i).join('\n')}\n`;
  }
  return null;
}

describe('README "In a workflow"', () => {
  it('shows exactly examples/workflows/fitgate.yml', () => {
    expect(existsSync(fileURLToPath(new URL('README.md', root))), 'README.md is missing').toBe(true);
    const block = yamlBlockUnder(read('README.md'), 'In a workflow');
    expect(block, 'README.md has no ```yaml block under a heading "In a workflow"').not.toBeNull();
    expect(block).toBe(read('examples/workflows/fitgate.yml'));
  });

  it('finds the block under the heading and nowhere else', () => {
    const md = '# T\n\n```yaml\nno: 1\n```\n\n## Use it in a workflow\n\ntext\n\n```yaml\nyes: 1\n```\n\n## Next\n\n```yaml\nno: 2\n```\n';
    expect(yamlBlockUnder(md, 'Use it in a workflow')).toBe('yes: 1\n');
    expect(yamlBlockUnder('## Use it in a workflow\n\n## Other\n```yaml\nx: 1\n```\n', 'Use it in a workflow')).toBeNull();
  });
});

describe('action.yml', () => {
  const action = parse(read('action.yml')) as {
    runs: { using: string; main: string };
    inputs: Record<string, { description: string; default?: string }>;
    outputs: Record<string, { description: string }>;
  };

  it('runs the bundle on node24', () => {
    expect(action.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
  });

  it('declares the inputs src/inputs.ts reads, with the same defaults and a description each', () => {
    expect(Object.keys(action.inputs).sort()).toEqual(Object.keys(INPUT_DEFAULTS).sort());
    for (const [name, spec] of Object.entries(action.inputs)) {
      expect(spec.description.length, `description of ${name}`).toBeGreaterThan(20);
      // biome-ignore lint/suspicious/noTemplateCurlyInString: the workflow expression is the expected text
      const expected = name === 'github-token' ? '${{ github.token }}' : INPUT_DEFAULTS[name as keyof typeof INPUT_DEFAULTS];
      expect(String(spec.default), `default of ${name}`).toBe(expected);
    }
  });

  it('declares the outputs main sets, with a description each', () => {
    expect(Object.keys(action.outputs).sort()).toEqual(Object.values(OUTPUTS).sort());
    for (const [name, spec] of Object.entries(action.outputs))
      expect(spec.description.length, `description of ${name}`).toBeGreaterThan(20);
  });

  it('is used by the example workflow with the everyday inputs, on pull_request and never pull_request_target', () => {
    const text = read('examples/workflows/fitgate.yml');
    const workflow = parse(text) as {
      on: Record<string, unknown>;
      permissions: Record<string, string>;
      jobs: Record<string, { steps: { uses?: string; with?: Record<string, unknown> }[] }>;
    };
    expect(text).not.toContain('pull_request_target');
    expect(Object.keys(workflow.on)).toContain('pull_request');
    expect(workflow.permissions).toEqual({ contents: 'read', 'pull-requests': 'write' });
    const steps = Object.values(workflow.jobs).flatMap((j) => j.steps);
    const step = steps.find((s) => s.uses?.endsWith('/fitgate@v1'));
    // The everyday inputs; sarif, junit and shard have their own examples in docs/reports.md and docs/scale.md.
    const everyday = Object.keys(INPUT_DEFAULTS).filter((k) => !['github-token', 'sarif', 'junit', 'shard'].includes(k));
    expect(Object.keys(step?.with ?? {}).sort()).toEqual(everyday.sort());
    expect(steps.find((s) => s.uses?.startsWith('actions/checkout@'))?.with?.['fetch-depth']).toBe(2);
  });
});

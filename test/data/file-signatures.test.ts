// A data file that is not UTF-8 text is refused with what its first bytes say it is and what to do
// (data/file-signatures.ts). The gzip, bzip2, xz and ZIP signatures are checked against files
// written by Python's standard library (gzip, bz2, lzma, zipfile modules), the others by the
// signatures their formats specify (sources in data/file-signatures.ts).
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { FILE_SIGNATURES, SIGNATURE_BYTES, signatureOf } from '../../src/data/file-signatures.js';
import { PYTHON3, requireTool, skipNote } from '../tools/require-tool.js';
import { memoryRepo } from './memory-repo.js';
import { outcome } from './outcome.js';

const FILE = 'data/train.csv';
const CSV = 'x,y\n1,2\n3,4\n';

/** The csv-encoding error both CSV paths give for `bytes` (they must agree). */
async function refusal(bytes: Uint8Array): Promise<{ code: string; line?: number; message: string }> {
  const fast = await outcome(memoryRepo({ [FILE]: bytes }), FILE, { columns: ['x'] });
  const general = await outcome(memoryRepo({ [FILE]: bytes }), FILE, { columns: ['x'], general: true });
  expect(fast).toEqual(general);
  if (fast.ok) throw new Error('expected the file to be refused');
  return fast;
}

const python = requireTool(['python3']);

describe(`files written by other compressors and archivers${skipNote(python)}`, () => {
  it.skipIf(python !== null)('are named in the error with what to do, on both CSV paths', async () => {
    // Each writer's output, as hex: the same CSV text through Python's own modules.
    const script = `
import bz2, gzip, io, lzma, sys, zipfile
text = sys.stdin.buffer.read()
z = io.BytesIO()
with zipfile.ZipFile(z, 'w', zipfile.ZIP_DEFLATED) as archive:
    archive.writestr('train.csv', text)
for name, data in (('gzip', gzip.compress(text)), ('bzip2', bz2.compress(text)), ('xz', lzma.compress(text)), ('zip', z.getvalue())):
    print(name, data.hex())
`;
    const run = spawnSync(PYTHON3, ['-c', script], { input: CSV, encoding: 'utf8', env: { PATH: '/usr/bin:/bin' }, timeout: 60_000 });
    expect(run.status, run.stderr).toBe(0);
    const written = new Map(
      run.stdout
        .trim()
        .split('\n')
        .map((line) => line.split(' ') as [string, string]),
    );
    const expected: Record<string, RegExp> = {
      gzip: /looks like gzip-compressed data; .*name ending in `\.gz`/,
      bzip2: /looks like bzip2-compressed data; .*decompress it, or compress it with gzip/,
      xz: /looks like xz-compressed data; .*decompress it, or compress it with gzip/,
      zip: /looks like a ZIP archive \(an \.xlsx or \.ods workbook is one\); .*extract the CSV file/,
    };
    expect([...written.keys()].sort()).toEqual(Object.keys(expected).sort());
    for (const [name, hex] of written) {
      const bytes = Uint8Array.from(Buffer.from(hex, 'hex'));
      expect(signatureOf(bytes.subarray(0, SIGNATURE_BYTES)), name).not.toBeNull();
      const error = await refusal(bytes);
      expect(error, name).toMatchObject({ code: 'csv-encoding', line: 1 });
      expect(error.message, name).toMatch(expected[name]);
    }
  });
});

describe('file signatures', () => {
  it('every signature is recognised at the start of a file and names itself in the error', async () => {
    for (const signature of FILE_SIGNATURES) {
      // The signature, then bytes that are not UTF-8 (0xff never is), then a line of text.
      const bytes = Uint8Array.from([...signature.magic, 0xff, 0x0a, 0x31, 0x0a]);
      expect(signatureOf(bytes)).toBe(signature);
      const error = await refusal(bytes);
      expect(error.code).toBe('csv-encoding');
      expect(error.message).toContain(`the file looks like ${signature.what}; expected a UTF-8 CSV file (${signature.advice})`);
    }
  });

  it('a file whose bad bytes come later, without a known start, gets the plain message', async () => {
    const bytes = Uint8Array.from([...Buffer.from('x,note\n1,ok\n2,'), 0xe9, 0x0a]);
    const error = await refusal(bytes);
    expect(error).toMatchObject({ code: 'csv-encoding', line: 3 });
    expect(error.message).not.toContain('looks like');
    expect(signatureOf(Buffer.from(CSV))).toBeNull();
  });

  it('a known start does not refuse a file that is UTF-8 text after all (PAR1 or BZh as a header)', async () => {
    for (const header of ['PAR1,x\n', 'BZh9,x\n']) {
      const result = await outcome(memoryRepo({ [FILE]: `${header}1,2\n` }), FILE, { columns: ['x'] });
      expect(result.ok, header).toBe(true);
    }
  });
});

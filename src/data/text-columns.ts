/**
 * Text columns of a CSV file (category levels), read apart from the numeric columns: the numeric
 * readers (table.ts) refuse text, so a model's category inputs are left out of their request and
 * read here, with the same rules for records (the separator set or detected from the header line
 * as the numeric readers detect it, `"` quotes, a byte-order mark dropped, white space around a
 * field trimmed, lines holding only white space skipped). A level is the cell's text as written
 * (trimmed): `07` and `7` are two levels, never numbers.
 */
import { parse } from 'csv-parse/sync';
import { InputError } from '../core/errors.js';
import type { RepoReader } from '../repo/types.js';
import { type Separator, separatorOfHeader } from './csv-format.js';
import { openDataFile } from './gzip-stream.js';

/** Text cells of the requested columns and the 1-based line of each row. */
export interface TextColumns {
  columns: Map<string, string[]>;
  lines: Int32Array;
}

/**
 * Reads the named columns as text.
 * @param maxBytes size cap of the file and of its decompressed bytes (the caller's; the numeric read of the same file checks it first)
 * @param separator the descriptor's `data.separator`: `auto` (default) detects it from the first line that is not blank ({@link separatorOfHeader})
 * @throws InputError `csv-missing-column` (naming the columns that exist), `csv-syntax`, `file-too-large`
 */
export async function readTextColumns(
  repo: RepoReader,
  path: string,
  names: readonly string[],
  maxBytes: number,
  separator: Separator | 'auto' = 'auto',
): Promise<TextColumns> {
  const size = await repo.size(path);
  if (size > maxBytes) throw new InputError('file-too-large', `${path} is ${size} bytes; the cap is ${maxBytes}`, { file: path });
  // Through the same door as the numeric read: decompressed when `.gz`, the decompressed bytes held to the cap.
  const pieces: Uint8Array[] = [];
  for await (const piece of openDataFile(repo, path, maxBytes)) pieces.push(piece);
  const text = new TextDecoder('utf-8').decode(Buffer.concat(pieces));
  const delimiter = separator === 'auto' ? separatorOfHeader(headerLineOf(text)) : separator;
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, {
      bom: true,
      delimiter,
      trim: true,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
    }) as unknown as {
      record: string[];
      info: { lines: number };
    }[];
  } catch (error) {
    throw new InputError(
      'csv-syntax',
      `${path} could not be read as CSV: ${error instanceof Error ? error.message.slice(0, 200) : String(error)}`,
      { file: path },
    );
  }
  const kept = records.filter((r) => r.record.some((cell) => cell !== ''));
  if (kept.length === 0) throw new InputError('csv-empty', `${path} has no header row`, { file: path });
  const header = kept[0].record;
  const index = names.map((name) => {
    const k = header.indexOf(name);
    if (k < 0)
      throw new InputError('csv-missing-column', `${path} has no column \`${name}\`; its columns are ${header.slice(0, 20).join(', ')}`, {
        file: path,
        line: kept[0].info.lines,
        key: name,
      });
    return k;
  });
  const rows = kept.slice(1);
  const columns = new Map<string, string[]>(names.map((name, j) => [name, rows.map((r) => r.record[index[j]] ?? '')]));
  return { columns, lines: Int32Array.from(rows, (r) => r.info.lines) };
}

/** The first line of `text` that holds more than white space (the header), without its line end. */
function headerLineOf(text: string): string {
  for (const line of text.split('\n', 1000)) if (line.trim() !== '') return line.replace(/\r$/, '');
  return '';
}

/**
 * A CSV table of numbers written to --out in pieces: the head (comment line and header) as text,
 * escaped like any text the CLI writes, then the number rows as the CSV writer's own bytes, chunk
 * by chunk, and a newline. The file never needs the table as one string (docs/speed.md, "CSV
 * writing"). The bytes are those of the table's text; the rows hold only digits, signs, points,
 * exponents, commas and newlines, which escaping leaves as they are.
 */
import { csvNumberRowsBytes } from '../eval/machineText';
import type { CsvNumberTable } from '../render/csv';
import { escapeControls } from './escape';
import type { OutputPieces } from './output';

const NEWLINE = new Uint8Array([10]);

export function csvTablePieces(t: CsvNumberTable): OutputPieces {
  return (put) => {
    put(Buffer.from(escapeControls(t.head), 'utf8'));
    if (t.rows.length === 0) return;
    csvNumberRowsBytes(t.rows, put);
    put(NEWLINE);
  };
}

import Papa from 'papaparse';
import { textTableNumber } from './textTableNumber';

export interface TextTableRow {
  /** 1-based line number in the input text. */
  line: number;
  fields: string[];
}

export interface TextTable {
  delimiter: '\t' | ';' | ',' | '|' | 'whitespace';
  /** First data row when it is not numeric (a header), else null. */
  header: TextTableRow | null;
  rows: TextTableRow[];
}

const DECIMAL_COMMA = /^[+-]?\d*,\d+([eE][+-]?\d+)?$/;

/**
 * Splits delimited text into rows of fields with their line numbers, using papaparse for the
 * quoting rules. The delimiter is the one of tab, semicolon, comma, pipe found on most of the
 * first 50 data lines (ties in that order), else runs of spaces. A comma inside a number ("7,26") is read as a
 * decimal comma when the delimiter is not a comma (European spreadsheet exports use ";" then).
 * Blank lines and lines starting with "#" are skipped.
 */
export function textTableRead(text: string): TextTable {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const dataLines: number[] = [];
  lines.forEach((l, i) => {
    const t = l.trim();
    if (t !== '' && !t.startsWith('#')) dataLines.push(i);
  });
  const probe = dataLines.slice(0, 50).map((i) => lines[i]);
  // The delimiter found on most lines wins; ties go to the earlier one, so "7,26;100" reads as ";".
  let delimiter: TextTable['delimiter'] = 'whitespace';
  let best = 0;
  for (const d of ['\t', ';', ',', '|'] as const) {
    const count = probe.filter((l) => l.includes(d)).length;
    if (count > best) {
      best = count;
      delimiter = d;
    }
  }
  const rows: TextTableRow[] = [];
  if (dataLines.length > 0) {
    const body = dataLines.map((i) => (delimiter === 'whitespace' ? lines[i].trim().split(/\s+/).join('\t') : lines[i])).join('\n');
    const parsed = Papa.parse<string[]>(body, { delimiter: delimiter === 'whitespace' ? '\t' : delimiter, newline: '\n', skipEmptyLines: false });
    // One papaparse row per data line unless a quoted field spans lines; keep line numbers honest then.
    const aligned = parsed.data.length === dataLines.length;
    parsed.data.forEach((fields, r) => {
      const cleaned = fields.map((f) => {
        const t = f.trim();
        return delimiter !== ',' && DECIMAL_COMMA.test(t) ? t.replace(',', '.') : t;
      });
      rows.push({ line: aligned ? dataLines[r] + 1 : dataLines[Math.min(r, dataLines.length - 1)] + 1, fields: cleaned });
    });
  }
  let header: TextTableRow | null = null;
  if (rows.length > 0 && rows[0].fields.every((f) => textTableNumber(f) === null)) header = rows.shift() ?? null;
  return { delimiter, header, rows };
}

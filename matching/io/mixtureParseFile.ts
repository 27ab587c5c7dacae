import type { Mixture } from '../../shared/mixture';
import { InputError } from './InputError';
import { fileNameParts, isJcampFile } from './fileNameParts';
import type { MixtureMeta } from './mixtureMetaParse';
import { peakListParseText } from './peakListParseText';
import { spectrumParseCsv } from './spectrumParseCsv';
import { spectrumParseJcamp } from './spectrumParseJcamp';
import { textTableNumber } from './textTableNumber';
import { textTableRead } from './textTableRead';

const TEXT_EXT = new Set(['csv', 'tsv', 'txt', 'tab', 'dat', '']);
/** A table longer than this with a monotonic first column is read as a spectrum (peak lists are shorter). */
const SPECTRUM_MIN_POINTS = 1000;

/**
 * Reads a mixture file, choosing the reader by content first and extension second: "##" at the
 * start means JCAMP-DX; delimited text is a peak list unless meta.kind says "spectrum", or it has
 * no peak-list column names (width, height, integral) and ≥ 1000 rows with a monotonic first column.
 */
export function mixtureParseFile(fileName: string, content: string, meta: MixtureMeta = {}): Mixture {
  if (typeof content !== 'string') throw new TypeError('file content must be a string');
  const { base, ext } = fileNameParts(fileName);
  const withName = { name: base.replace(/\.[^.]*$/, '') || 'mixture', ...meta };
  if (isJcampFile(ext, content)) return spectrumParseJcamp(content, withName);
  if (!TEXT_EXT.has(ext)) {
    throw new InputError(base, [{ field: 'file', message: `unsupported file type ".${ext}" (use .csv, .tsv, .txt, .jdx or .dx)` }]);
  }
  const kind = meta.kind ?? guessKind(content);
  return kind === 'spectrum' ? spectrumParseCsv(content, withName) : peakListParseText(content, withName);
}

function guessKind(content: string): 'peaks' | 'spectrum' {
  const table = textTableRead(content);
  if (table.header && table.header.fields.some((f) => /width|fwhm|height|integral|area/i.test(f))) return 'peaks';
  if (table.rows.length < SPECTRUM_MIN_POINTS) return 'peaks';
  let dir = 0;
  let prev: number | null = null;
  for (const r of table.rows) {
    const x = textTableNumber(r.fields[0] ?? '');
    if (x === null) return 'peaks';
    if (prev !== null) {
      const d = Math.sign(x - prev);
      if (d === 0 || (dir !== 0 && d !== dir)) return 'peaks';
      dir = d;
    }
    prev = x;
  }
  return 'spectrum';
}

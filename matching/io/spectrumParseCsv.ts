import type { InputIssue } from '../../shared/inputIssue';
import { SpectrumMixtureSchema, type SpectrumMixture } from '../../shared/mixture';
import { InputError } from './InputError';
import { mixtureMetaParse, type MixtureMeta } from './mixtureMetaParse';
import { textCommentMeta } from './textCommentMeta';
import { textTableNumber } from './textTableNumber';
import { textTableRead } from './textTableRead';

const X_NAMES = /^(ppm|shift|δ|delta|x|chemical shift)$/;
const Y_NAMES = /^(intensity|y|i|int|amplitude|signal|real)$/;

/**
 * Reads a two-column spectrum (ppm, intensity) from delimited text; a header may name the columns
 * in either order. The ppm axis must be strictly monotonic (either direction). Every bad line is
 * reported; nothing is returned on error.
 */
export function spectrumParseCsv(text: string, meta: MixtureMeta = {}): SpectrumMixture {
  if (typeof text !== 'string') throw new TypeError('spectrum text must be a string');
  const { meta: given, issues } = mixtureMetaParse(meta);
  const m: MixtureMeta = { ...textCommentMeta(text), ...(Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined)) as MixtureMeta) };
  if (issues.length > 0) throw new InputError('spectrum metadata', issues);
  if (m.mhz === undefined) throw new InputError('spectrum metadata', [{ field: 'mhz', message: 'spectrometer frequency (MHz) is required' }]);
  const table = textTableRead(text);
  const problems: InputIssue[] = [];
  let xi = 0;
  let yi = 1;
  if (table.header) {
    const names = table.header.fields.map((f) => f.toLowerCase().split(/[([/]/)[0].trim());
    const x = names.findIndex((n) => X_NAMES.test(n));
    const y = names.findIndex((n) => Y_NAMES.test(n));
    if (x < 0) problems.push({ line: table.header.line, field: 'ppm', message: 'no ppm column in the header (name it ppm, shift or δ)' });
    if (y < 0) problems.push({ line: table.header.line, field: 'intensity', message: 'no intensity column in the header (name it intensity or y)' });
    xi = x;
    yi = y;
  }
  const width = table.header ? table.header.fields.length : 2;
  if (table.rows.length < 5 && problems.length === 0) problems.push({ message: `a spectrum needs at least 5 points, got ${table.rows.length}` });
  if (problems.length > 0) throw new InputError('spectrum', problems);
  const ppm: number[] = [];
  const intensity: number[] = [];
  let direction = 0;
  for (const row of table.rows) {
    if (row.fields.length !== width) {
      problems.push({ line: row.line, message: `expected ${width} fields, got ${row.fields.length}` });
      continue;
    }
    const x = textTableNumber(row.fields[xi]);
    const y = textTableNumber(row.fields[yi]);
    if (x === null) problems.push({ line: row.line, field: 'ppm', message: `ppm "${row.fields[xi]}" is not a number` });
    if (y === null) problems.push({ line: row.line, field: 'intensity', message: `intensity "${row.fields[yi]}" is not a number` });
    if (x === null || y === null) continue;
    if (ppm.length > 0) {
      const d = Math.sign(x - ppm[ppm.length - 1]);
      if (d === 0 || (direction !== 0 && d !== direction)) {
        problems.push({ line: row.line, field: 'ppm', message: `ppm axis must be strictly monotonic (${x} after ${ppm[ppm.length - 1]})` });
        continue;
      }
      direction = d;
    }
    ppm.push(x);
    intensity.push(y);
  }
  if (problems.length > 0) throw new InputError('spectrum', problems);
  const parsed = SpectrumMixtureSchema.safeParse({ ...m, kind: 'spectrum', ppm, intensity });
  if (!parsed.success) throw new InputError('spectrum', parsed.error.issues.map((i) => ({ field: i.path.join('.'), message: i.message })));
  return parsed.data;
}

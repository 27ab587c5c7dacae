import type { InputIssue } from '../../shared/inputIssue';
import { PeakListMixtureSchema, type PeakListMixture } from '../../shared/mixture';
import { USUAL_SHIFT_RANGE_PPM } from '../../shared/nucleus';
import { LINE_WIDTH_HZ_RANGE } from '../../shared/spectrometer';
import { InputError } from './InputError';
import { mixtureMetaParse, type MixtureMeta } from './mixtureMetaParse';
import { textCommentMeta } from './textCommentMeta';
import { textTableNumber } from './textTableNumber';
import { textTableRead } from './textTableRead';

type Column = 'shift' | 'intensity' | 'width';

const COLUMN_NAMES: Record<Column, RegExp> = {
  shift: /^(shift|δ|delta|ppm|chemical shift|cs|position|x)$/,
  intensity: /^(intensity|height|int|amplitude|integral|area|y|i)$/,
  width: /^(width|fwhm|linewidth|line width|lw|w)$/,
};

/** "Shift (ppm)" → "shift", "width [Hz]" → "width", "δ/ppm" → "δ". */
function headerName(raw: string): string {
  return raw.toLowerCase().split(/[([/]/)[0].trim().replace(/\s+/g, ' ');
}

/**
 * Reads a peak list from CSV/TSV text or pasted text. With a header the columns may come in any
 * order (shift/δ/ppm, intensity/height/integral/area, width/fwhm in Hz; other columns are
 * ignored); without one they are shift, intensity[, width Hz]. Every bad line is reported with its
 * number; on any problem an InputError is thrown and nothing is returned. Solvent, MHz and reference
 * stated in leading "#" comments are used unless meta gives them (textCommentMeta).
 */
export function peakListParseText(text: string, meta: MixtureMeta = {}): PeakListMixture {
  if (typeof text !== 'string') throw new TypeError('peak list text must be a string');
  const { meta: given, issues } = mixtureMetaParse(meta);
  const m: MixtureMeta = { ...textCommentMeta(text), ...(Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined)) as MixtureMeta) };
  if (issues.length > 0) throw new InputError('peak list metadata', issues);
  if (m.mhz === undefined) throw new InputError('peak list metadata', [{ field: 'mhz', message: 'spectrometer frequency (MHz) is required' }]);
  const nucleus = m.nucleus ?? '1H';
  const table = textTableRead(text);
  const problems: InputIssue[] = [];
  const col: Partial<Record<Column, number>> = {};
  let intensityKind = m.intensityKind;
  let width = 0;
  if (table.header) {
    const h = table.header;
    width = h.fields.length;
    h.fields.forEach((raw, i) => {
      const name = headerName(raw);
      const which = (Object.keys(COLUMN_NAMES) as Column[]).find((c) => COLUMN_NAMES[c].test(name));
      if (!which) return;
      if (col[which] !== undefined) problems.push({ line: h.line, field: which, message: `two ${which} columns ("${h.fields[col[which]!]}" and "${raw}")` });
      else col[which] = i;
      if (which === 'intensity' && intensityKind === undefined && /^(integral|area)$/.test(name)) intensityKind = 'integral';
    });
    if (col.shift === undefined) problems.push({ line: h.line, field: 'shift', message: 'no shift column in the header (name it shift, δ or ppm)' });
    if (col.intensity === undefined) problems.push({ line: h.line, field: 'intensity', message: 'no intensity column in the header (name it intensity, height, integral or area)' });
  } else if (table.rows.length > 0) {
    width = table.rows[0].fields.length;
    if (width < 2 || width > 3) {
      problems.push({ line: table.rows[0].line, message: `expected 2 or 3 columns (shift, intensity[, width Hz]) when there is no header, got ${width}` });
    } else {
      col.shift = 0;
      col.intensity = 1;
      if (width === 3) col.width = 2;
    }
  }
  if (table.rows.length === 0 && problems.length === 0) problems.push({ message: 'no peaks found (the text is empty or has only a header)' });
  if (problems.length > 0) throw new InputError('peak list', problems);

  const [lo, hi] = USUAL_SHIFT_RANGE_PPM[nucleus];
  const peaks: PeakListMixture['peaks'] = [];
  for (const row of table.rows) {
    const before = problems.length;
    if (row.fields.length !== width) {
      problems.push({ line: row.line, message: `expected ${width} fields, got ${row.fields.length}` });
      continue;
    }
    const read = (c: Column): number | null => {
      const raw = row.fields[col[c]!];
      const v = textTableNumber(raw);
      if (v === null) problems.push({ line: row.line, field: c, message: raw === '' ? `${c} is empty` : `${c} "${raw}" is not a number` });
      return v;
    };
    const shift = read('shift');
    const intensity = read('intensity');
    const w = col.width !== undefined && row.fields[col.width] !== '' ? read('width') : undefined;
    if (shift !== null && (shift < lo || shift > hi)) problems.push({ line: row.line, field: 'shift', message: `shift ${shift} ppm is outside the usual ${nucleus} range (${lo} to ${hi} ppm)` });
    if (intensity !== null && intensity < 0) problems.push({ line: row.line, field: 'intensity', message: `intensity must be ≥ 0, got ${intensity}` });
    if (w !== undefined && w !== null && !(w >= LINE_WIDTH_HZ_RANGE[0] && w <= LINE_WIDTH_HZ_RANGE[1])) problems.push({ line: row.line, field: 'width', message: `width must be between ${LINE_WIDTH_HZ_RANGE[0]} and ${LINE_WIDTH_HZ_RANGE[1]} Hz, got ${w}` });
    if (problems.length === before) peaks.push({ shift: shift!, intensity: intensity!, ...(w !== undefined && w !== null ? { widthHz: w } : {}) });
  }
  if (problems.length > 0) throw new InputError('peak list', problems);
  const parsed = PeakListMixtureSchema.safeParse({ ...m, kind: 'peaks', nucleus, intensityKind: intensityKind ?? 'height', peaks });
  if (!parsed.success) throw new InputError('peak list', parsed.error.issues.map((i) => ({ field: i.path.join('.'), message: i.message })));
  return parsed.data;
}

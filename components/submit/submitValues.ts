import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Solvent } from '../../shared/solvent';
import type { SubmissionCreateInput } from '../../shared/api/submissions';

export interface SignalRow {
  nucleus: '1H' | '13C';
  shift: string;
  multiplicity: string;
  j: string;
  nuclei: string;
  label: string;
  exchangeable: boolean;
}

/** What the submit form edits: text as typed; `submissionBody` turns it into the shared shape. */
export interface SubmitValues {
  kind: 'new' | 'change';
  baseRevision: number | null;
  id: string;
  name: string;
  synonyms: string;
  formula: string;
  smiles: string;
  solvent: Solvent;
  mhz: string;
  source: string;
  notes: string;
  note: string;
  signals: SignalRow[];
}

export const EMPTY_SIGNAL: SignalRow = { nucleus: '1H', shift: '', multiplicity: 's', j: '', nuclei: '1', label: '', exchangeable: false };

export const EMPTY_VALUES: SubmitValues = {
  kind: 'new',
  baseRevision: null,
  id: '',
  name: '',
  synonyms: '',
  formula: '',
  smiles: '',
  solvent: 'CDCl3',
  mhz: '400',
  source: '',
  notes: '',
  note: '',
  signals: [{ ...EMPTY_SIGNAL }],
};

/** A number when the text is one; otherwise the text itself, so the schema names the field. */
function num(s: string): number | string {
  const t = s.trim().replace(',', '.');
  if (t === '') return '';
  const v = Number(t);
  return Number.isFinite(v) ? v : s;
}

export function entryIdFor(name: string, solvent: string): string {
  const slug = name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 50);
  return `user:${slug || 'entry'}:${solvent}`;
}

/** The proposed entry as raw data (not yet validated). */
export function valuesToEntry(v: SubmitValues): Record<string, unknown> {
  const signals = v.signals.map((s) =>
    s.nucleus === '1H'
      ? {
          nucleus: '1H',
          shift: num(s.shift),
          multiplicity: s.multiplicity.trim(),
          j: s.j.split(/[,;\s]+/).filter(Boolean).map(num),
          nuclei: num(s.nuclei),
          ...(s.label.trim() ? { label: s.label.trim() } : {}),
          ...(s.exchangeable ? { exchangeable: true } : {}),
        }
      : { nucleus: '13C', shift: num(s.shift), nuclei: num(s.nuclei || '1'), ...(s.label.trim() ? { label: s.label.trim() } : {}) },
  );
  return {
    id: v.id.trim() || entryIdFor(v.name, v.solvent),
    name: v.name.trim(),
    synonyms: v.synonyms.split(/[;\n]/).map((x) => x.trim()).filter(Boolean),
    formula: v.formula.trim(),
    ...(v.smiles.trim() ? { smiles: v.smiles.trim() } : {}),
    category: 'user',
    source: v.source.trim(),
    solvent: v.solvent,
    mhz: num(v.mhz),
    signals,
    ...(v.notes.trim() ? { notes: v.notes.trim() } : {}),
  };
}

export function submissionBody(v: SubmitValues): SubmissionCreateInput {
  return {
    kind: v.kind,
    ...(v.kind === 'change' && v.baseRevision ? { baseRevision: v.baseRevision } : {}),
    entry: valuesToEntry(v) as SubmissionCreateInput['entry'],
    ...(v.note.trim() ? { note: v.note.trim() } : {}),
  };
}

/** Start a change from an existing entry. */
export function entryToValues(e: LibraryEntry): SubmitValues {
  return {
    kind: 'change',
    baseRevision: e.revision ?? 1,
    id: e.id,
    name: e.name,
    synonyms: e.synonyms.join('; '),
    formula: e.formula,
    smiles: e.smiles ?? '',
    solvent: e.solvent,
    mhz: String(e.mhz),
    source: e.source,
    notes: e.notes ?? '',
    note: '',
    signals: e.signals.map((s) =>
      s.nucleus === '1H'
        ? { nucleus: '1H', shift: String(s.shift), multiplicity: s.multiplicity, j: s.j.join(', '), nuclei: String(s.nuclei), label: s.label ?? '', exchangeable: !!s.exchangeable }
        : { nucleus: '13C', shift: String(s.shift), multiplicity: '', j: '', nuclei: String(s.nuclei), label: s.label ?? '', exchangeable: false },
    ),
  };
}

/** Maps a schema path of the body (entry.signals.2.shift) onto the form's field (signals.2.shift). */
export function bodyPathToField(path: PropertyKey[]): string {
  const p = path.map(String);
  if (p[0] === 'entry') p.shift();
  if (p[0] === 'signals' && p[2] === 'j') return `signals.${p[1]}.j`;
  if (p[0] === 'mhz' || p[0] === 'name' || p[0] === 'formula' || p[0] === 'source' || p[0] === 'id' || p[0] === 'smiles' || p[0] === 'solvent') return p[0];
  return p.slice(0, 3).join('.') || 'root';
}

import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import type { CurationChecks, CurationProblem, SimilarEntry } from '../../shared/api/submissions';
import { entryCheckFormula, entryCheckMultiplicity, entryCheckShiftRange, libraryFindNearDuplicates } from '../../matching/library';
import { entryToLines } from '../../matching/multiplets';
import { screenMixture } from '../../matching/screen';
import { nameKey, type LibrarySnapshot } from './librarySnapshot';

/** Above these a similar entry becomes a problem the curator must look at. */
const NAME_PROBLEM = 0.9;
const PEAK_PROBLEM = 0.9;
const MAX_SIMILAR = 5;

/**
 * The automatic curation checks of one proposed entry against the current library: nuclei against
 * the formula (openchemlib reads formula/SMILES inside the engine check), shifts in the usual range,
 * multiplicity against J, near duplicates in the same solvent, names alike (fuse.js) and peak
 * lists alike (the engine's screening score of each existing entry against the proposal's
 * simulated lines). For a change, the entry it replaces is not its own duplicate.
 */
export function curationChecks(entry: EntryBody, library: LibrarySnapshot, now = new Date()): CurationChecks {
  const problems: CurationProblem[] = [];
  for (const p of [...entryCheckFormula(entry), ...entryCheckShiftRange(entry), ...entryCheckMultiplicity(entry)]) {
    problems.push({ check: p.check, field: p.field, message: p.message });
  }

  const others = library.entries.filter((e) => e.id !== entry.id);
  const sameSolvent = others.filter((e) => e.solvent === entry.solvent);
  for (const pair of libraryFindNearDuplicates([entry, ...sameSolvent])) {
    if (pair.a !== entry.id && pair.b !== entry.id) continue;
    const other = pair.a === entry.id ? pair.b : pair.a;
    problems.push({ check: 'nearDuplicate', field: 'signals', message: `every 1H signal lies within ${pair.maxShiftDifference} ppm of "${other}" in ${pair.solvent}, with the same nuclei ratios` });
  }

  const similar = new Map<string, SimilarEntry>();
  const touch = (e: EntryBody): SimilarEntry => {
    let s = similar.get(e.id);
    if (!s) {
      s = { entryId: e.id, name: e.name, revision: e.revision ?? 1, solvent: e.solvent, nameScore: null, peakScore: null };
      similar.set(e.id, s);
    }
    return s;
  };
  for (const query of [entry.name, ...(entry.synonyms ?? [])]) {
    const key = nameKey(query);
    if (!key) continue;
    for (const hit of library.fuse.search(key, { limit: 10 })) {
      if (hit.item.entry.id === entry.id) continue;
      const score = round3(1 - (hit.score ?? 1));
      const s = touch(hit.item.entry);
      s.nameScore = Math.max(s.nameScore ?? 0, score);
    }
  }
  for (const [id, score] of peakSimilarity(entry, others)) touch(library.byId.get(id)!).peakScore = score;

  const ranked = [...similar.values()].sort(
    (a, b) => Math.max(b.nameScore ?? 0, b.peakScore ?? 0) - Math.max(a.nameScore ?? 0, a.peakScore ?? 0) || a.entryId.localeCompare(b.entryId),
  );
  for (const s of ranked) {
    if ((s.nameScore ?? 0) >= NAME_PROBLEM) problems.push({ check: 'similarName', field: 'name', message: `name is very close to "${s.name}" (${s.entryId}), similarity ${s.nameScore}` });
    if ((s.peakScore ?? 0) >= PEAK_PROBLEM && s.solvent === entry.solvent) {
      problems.push({ check: 'similarPeaks', field: 'signals', message: `peak list matches "${s.name}" (${s.entryId}) in ${s.solvent} with screening score ${s.peakScore}` });
    }
  }
  const top = ranked.slice(0, MAX_SIMILAR);
  return { checkedAt: now.toISOString(), problems, similar: top, nearestEntryId: top[0]?.entryId ?? null };
}

/** Screening score of each existing entry against the proposal's own simulated lines. */
function peakSimilarity(entry: EntryBody, others: EntryBody[]): Map<string, number> {
  const out = new Map<string, number>();
  if (others.length === 0) return out;
  const nucleus = entry.signals.some((s) => s.nucleus === '1H') ? '1H' : '13C';
  const lines = entryToLines(entry, nucleus, entry.mhz);
  if (lines.length === 0) return out;
  const mixture: Mixture = {
    kind: 'peaks',
    name: entry.name,
    nucleus,
    solvent: entry.solvent,
    mhz: entry.mhz,
    reference: 'none',
    intensityKind: 'integral',
    peaks: lines.map((l) => ({ shift: l.shift, intensity: l.area })),
  };
  // The proposal's own peaks are all signal: no solvent or reference exclusion.
  const result = screenMixture(mixture, others, { excludeSolvent: false, excludeReference: false, minScore: 0.5, maxCandidates: MAX_SIMILAR * 2 });
  for (const c of result.candidates) out.set(c.entryId, round3(c.score));
  return out;
}

const round3 = (x: number) => Math.round(x * 1000) / 1000;

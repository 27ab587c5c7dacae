import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { multipletToLines } from '../../../matching/multiplets/multipletToLines';
import { screenMixture } from '../../../matching/screen';
import { CAUTION_TEXT } from '../../../shared/caution';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import type { PeakListMixture } from '../../../shared/mixture';
import { ScreenResultSchema, type ScreenResult } from '../../../shared/screening';
import type { Solvent } from '../../../shared/solvent';
import { screenAllPairs } from '../../../scripts/bench/lib/screenAllPairs';
import { tableLibrary, tableMixture } from '../../fixtures/screen/contaminantTable';
import { seededRandom } from '../../fixtures/screen/random';

const split = (s: LibraryEntry['signals'][number], mhz: number) => (s.nucleus === '1H' ? multipletToLines(s, mhz) : [{ shift: s.shift, area: s.nuclei }]);

const empty: PeakListMixture = { kind: 'peaks', name: 'empty', nucleus: '1H', solvent: 'CDCl3', mhz: 600, reference: 'TMS', intensityKind: 'integral', peaks: [] };

function entry(id: string, signals: Array<Partial<LibraryEntry['signals'][number]> & { shift: number; nuclei: number }>, category: LibraryEntry['category'] = 'demo'): LibraryEntry {
  return {
    id,
    name: id,
    synonyms: [],
    formula: 'C1',
    category,
    source: 'invented test entry',
    solvent: 'CDCl3',
    mhz: 400,
    signals: signals.map((s) => ({ nucleus: '1H', multiplicity: 's', j: [], ...s }) as LibraryEntry['signals'][number]),
  };
}

/** Components present must all be reported; an absent compound may appear only when flagged (shadowed, or grouped with a present one). */
function expectFound(r: ScreenResult, present: string[]) {
  const names = r.candidates.map((c) => c.name);
  for (const p of present) expect(names, `${p} in ${r.mixtureName}`).toContain(p);
  for (const c of r.candidates.filter((x) => !present.includes(x.name))) {
    const group = r.ambiguityGroups.find((g) => g.id === c.ambiguityGroup);
    const groupedWithPresent = group?.members.some((id) => present.includes(r.candidates.find((x) => x.entryId === id)!.name)) ?? false;
    expect(c.shadowedBy.length > 0 || groupedWithPresent, `${c.name} (absent, score ${c.score.toFixed(2)}) reported without a flag`).toBe(true);
  }
  const lastPresent = Math.max(...present.map((p) => names.indexOf(p)));
  const firstUnflaggedAbsent = r.candidates.findIndex((c) => !present.includes(c.name) && c.shadowedBy.length === 0 && c.ambiguityGroup === null);
  if (firstUnflaggedAbsent >= 0) expect(lastPresent).toBeLessThan(firstUnflaggedAbsent);
}

describe('screenMixture: edge cases', () => {
  it('returns no candidates for an empty library or an empty peak list', () => {
    const lib = tableLibrary('CDCl3');
    const r = screenMixture(empty, lib);
    expect(r.candidates).toEqual([]);
    expect(r.caution).toBe(CAUTION_TEXT);
    expect(screenMixture({ ...empty, peaks: [{ shift: 2.17, intensity: 1 }] }, []).candidates).toEqual([]);
  });

  it('checks its options', () => {
    expect(() => screenMixture(empty, [], { tolerancePpm: 0 })).toThrow('tolerancePpm must be a positive number, got 0');
    expect(() => screenMixture(empty, [], { minScore: 2 })).toThrow('minScore must be between 0 and 1, got 2');
    expect(() => screenMixture(empty, [], { maxCandidates: 0 })).toThrow('maxCandidates must be a positive integer, got 0');
    expect(() => screenMixture({ ...empty, kind: 'other' } as never, [])).toThrow('mixture must be a peak list or a spectrum (kind "peaks" or "spectrum")');
  });

  it('produces a result that satisfies the shared schema', () => {
    const r = screenMixture(tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }], split), tableLibrary('CDCl3'));
    expect(() => ScreenResultSchema.parse(r)).not.toThrow();
  });
});

// Oracle: Gottlieb et al., J. Org. Chem. 1997, 62, 7512, Table 1 and Fulmer et al., Organometallics
// 2010, 29, 2176, Table 1 (copy in tests/fixtures/screen): mixtures of the listed compounds, with
// the published shifts and nuclei counts, must give back the compounds they were made of.
const MIXTURES: Array<[Solvent, string[]]> = [
  ['CDCl3', ['ethyl acetate', 'toluene']],
  ['CDCl3', ['diethyl ether', 'acetone', 'dichloromethane']],
  ['CDCl3', ['triethylamine', 'methanol', '1,4-dioxane']],
  ['CDCl3', ['ethanol', 'tert-butyl methyl ether', 'cyclohexane', 'nitromethane']],
  ['DMSO-d6', ['ethyl acetate', 'N,N-dimethylformamide', '2-propanol']],
  ['D2O', ['ethanol', 'acetone', 'methanol']],
  ['CD3OD', ['diethyl ether', 'pyridine', 'acetic acid']],
  ['C6D6', ['n-hexane', 'dimethyl sulfoxide', 'triethylamine']],
];

describe('screenMixture: mixtures built from the published contaminant table', () => {
  it.each(MIXTURES)('in %s finds %j', (solvent, present) => {
    const lib = tableLibrary(solvent);
    const r = screenMixture(tableMixture(solvent, present.map((name, i) => ({ name, amount: 1 + 0.7 * i })), split), lib);
    expectFound(r, present);
    for (const p of present) expect(r.candidates.find((c) => c.name === p)!.score).toBeGreaterThan(0.85);
  });

  it('ethyl acetate + toluene in CDCl3: exactly the two, plus tert-butyl alcohol marked as shadowed by ethyl acetate', () => {
    // tert-butyl alcohol CH3 1.28 (Gottlieb 1997) lies 0.008 ppm from a line of the ethyl acetate triplet at 600 MHz.
    const r = screenMixture(tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }, { name: 'toluene', amount: 2 }], split), tableLibrary('CDCl3'));
    expect(r.candidates.map((c) => c.name)).toEqual(['ethyl acetate', 'toluene', 'tert-butyl alcohol']);
    expect(r.candidates[2].shadowedBy).toEqual(['contam-ethyl-acetate-cdcl3']);
    expect(r.candidates.every((c) => c.contaminant)).toBe(true);
    // toluene CH(3,5) 7.25 sits under residual CHCl3 7.26: set aside, not held against toluene
    const toluene = r.candidates[1];
    expect(toluene.unmatched).toEqual([expect.objectContaining({ shift: 7.25, hidden: true })]);
    expect(toluene.explainedShare).toBe(1);
    expect(r.peaksExcluded.filter((p) => p.reason === 'solvent').map((p) => p.shift.toFixed(2))).toContain('7.25');
  });

  it('reports evidence per multiplet: peaks, Δδ, lines and the 3:2:3 intensity per nucleus of ethyl acetate', () => {
    const r = screenMixture(tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }], split), tableLibrary('CDCl3'));
    const c = r.candidates[0];
    expect(c.name).toBe('ethyl acetate');
    const q = c.evidence.find((e) => e.shift === 4.12)!;
    expect([q.linesMatched, q.linesExpected, q.peakIndices.length]).toEqual([4, 4, 4]);
    // quartet lines at 4.12 ± 3.5 and ± 10.5 Hz at 600 MHz (first order, formulas.md (c)), each matched to its own peak
    expect(q.linePpm).toEqual([-10.5, -3.5, 3.5, 10.5].map((o) => expect.closeTo(4.12 + o / 600, 9)));
    q.peakIndices.forEach((p, k) => expect(r.peaksUsed[p].shift).toBeCloseTo(q.linePpm[k], 9));
    expect(q.deltaPpm).toBeCloseTo(0, 10);
    for (const e of c.evidence) {
      expect(e.intensity / e.nuclei).toBeCloseTo(100, 8);
      expect(e.ratio).toBeCloseTo(1, 10);
    }
    expect(c.intensityCv).toBeCloseTo(0, 10);
  });

  // ±0.01 ppm is the precision of the two-decimal tables (tolerances.md 4.1, common practice).
  it.each(MIXTURES)('in %s still finds %j with ±0.01 ppm jitter, 5 percent intensity noise and 40 unrelated peaks (5 seeds)', (solvent, present) => {
    const lib = tableLibrary(solvent);
    for (let seed = 1; seed <= 5; seed++) {
      const rand = seededRandom(seed * 97 + solvent.length);
      const m = tableMixture(solvent, present.map((name, i) => ({ name, amount: 1 + 0.7 * i })), split, { jitterPpm: 0.01, intensityNoise: 0.05, extraPeaks: 40, rand });
      const r = screenMixture(m, lib);
      expectFound(r, present);
      expect(r.unexplainedPeaks.length + r.peaksExcluded.length).toBeGreaterThanOrEqual(40);
    }
  });

  it.each(MIXTURES)('in %s finds %j from a centres-only peak list', (solvent, present) => {
    const lib = tableLibrary(solvent);
    const rand = seededRandom(5);
    const r = screenMixture(tableMixture(solvent, present.map((name, i) => ({ name, amount: 1 + 0.7 * i })), split, { centresOnly: true, jitterPpm: 0.01, intensityNoise: 0.05, rand }), lib);
    expectFound(r, present);
  });

  // Benzene 7.15 in C6D6 lies under residual C6D5H 7.16 (Gottlieb 1997): nothing left to judge it by.
  it('does not claim a compound whose every signal is under the solvent', () => {
    const r = screenMixture(tableMixture('C6D6', [{ name: 'benzene', amount: 1 }], split), tableLibrary('C6D6'));
    expect(r.candidates).toEqual([]);
    expect(r.peaksExcluded.every((p) => p.reason === 'solvent')).toBe(true);
  });

  it('does not report an absent compound that shares no signal', () => {
    const r = screenMixture(tableMixture('CDCl3', [{ name: 'nitromethane', amount: 1 }], split), tableLibrary('CDCl3'));
    expect(r.candidates.map((c) => c.name)).toEqual(['nitromethane']);
  });
});

describe('screenMixture: ambiguity', () => {
  // Two entries that are one 6H singlet at the acetone shift (2.17, Gottlieb 1997) cannot be told apart.
  it('groups indistinguishable entries and names every member', () => {
    const lib = [entry('acetone-a', [{ shift: 2.17, nuclei: 6 }]), entry('ketone-b', [{ shift: 2.175, nuclei: 6 }]), entry('other', [{ shift: 5.3, nuclei: 2 }])];
    const r = screenMixture({ ...empty, peaks: [{ shift: 2.17, intensity: 6 }] }, lib);
    expect(r.ambiguityGroups).toEqual([{ id: 'G1', members: ['acetone-a', 'ketone-b'], peakIndices: [0] }]);
    expect(r.candidates.map((c) => c.ambiguityGroup)).toEqual(['G1', 'G1']);
    expect(r.candidates.every((c) => c.shadowedBy.length === 0)).toBe(true);
  });

  it('marks an entry whose only signal is a line of another candidate multiplet as shadowed', () => {
    // ethyl-like triplet at 1.26 (J 7 Hz) and an invented singlet at 1.272, on a line of the triplet at 600 MHz
    const lib = [entry('ethyl', [{ shift: 1.26, multiplicity: 't', j: [7], nuclei: 3 }, { shift: 4.12, multiplicity: 'q', j: [7], nuclei: 2 }]), entry('singlet', [{ shift: 1.272, nuclei: 3 }])];
    const m = tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }], split);
    const r = screenMixture(m, lib);
    expect(r.candidates.map((c) => c.entryId)).toEqual(['ethyl', 'singlet']);
    expect(r.candidates[1].shadowedBy).toEqual(['ethyl']);
    expect(r.candidates[0].shadowedBy).toEqual([]);
  });
});

describe('screenMixture: marked near duplicates', () => {
  // Invented pair of diastereomers, 0.01–0.03 ppm apart (the library marks them nearDuplicateOf).
  const threo = { ...entry('threo', [{ shift: 0.88, nuclei: 3, multiplicity: 't', j: [7.4] }, { shift: 4.02, nuclei: 1, multiplicity: 'd', j: [4] }]), nearDuplicateOf: ['erythro'] };
  const erythro = { ...entry('erythro', [{ shift: 0.89, nuclei: 3, multiplicity: 't', j: [7.4] }, { shift: 4.05, nuclei: 1, multiplicity: 'd', j: [4.4] }]), nearDuplicateOf: ['threo'] };
  const peaks = threo.signals.flatMap((s) => split(s, 400).map((l) => ({ shift: l.shift, intensity: l.area })));
  const m: PeakListMixture = { ...empty, mhz: 400, peaks };

  it('reports both in one ambiguity group instead of one shadowing the other', () => {
    const r = screenMixture(m, [threo, erythro]);
    expect(r.candidates.map((c) => c.entryId)).toEqual(['threo', 'erythro']);
    expect(r.ambiguityGroups).toHaveLength(1);
    expect(r.ambiguityGroups[0].members).toEqual(['threo', 'erythro']);
    expect(r.candidates.every((c) => c.ambiguityGroup === 'G1' && c.shadowedBy.length === 0)).toBe(true);
  });

  it('does not group the same two entries when they are not marked', () => {
    const r = screenMixture(m, [{ ...threo, nearDuplicateOf: undefined }, { ...erythro, nearDuplicateOf: undefined }]);
    expect(r.ambiguityGroups).toEqual([]);
    expect(r.candidates.find((c) => c.entryId === 'erythro')?.shadowedBy).toEqual(['threo']);
  });
});

describe('screenMixture: signals', () => {
  // Gottlieb 1997 Table 1, CDCl3: ethanol CH3 1.25 t, CH2 3.72 q, OH 1.32 (exchangeable).
  it('does not penalise a missing exchangeable OH', () => {
    const lib = tableLibrary('CDCl3');
    const ethanol = lib.find((e) => e.name === 'ethanol')!;
    const noOh = { ...ethanol, signals: ethanol.signals.filter((s) => !(s.nucleus === '1H' && s.exchangeable)) };
    const m = tableMixture('CDCl3', [{ name: 'ethanol', amount: 1 }], split);
    const withoutOhPeak = { ...m, peaks: m.peaks.filter((p) => Math.abs(p.shift - 1.32) > 0.005) };
    const c = screenMixture(withoutOhPeak, [ethanol]).candidates[0];
    expect(c.explainedShare).toBe(1);
    expect(c.unmatched).toEqual([expect.objectContaining({ label: 'OH', exchangeable: true })]);
    expect(screenMixture(withoutOhPeak, [noOh]).candidates[0].score).toBeCloseTo(c.score, 12);
  });

  it('skips retired entries unless asked', () => {
    const lib = [{ ...entry('old', [{ shift: 2.17, nuclei: 6 }]), retired: true }];
    const m = { ...empty, peaks: [{ shift: 2.17, intensity: 6 }] };
    expect(screenMixture(m, lib).candidates).toEqual([]);
    expect(screenMixture(m, lib, { includeRetired: true }).candidates).toHaveLength(1);
  });

  it('screens 13C with the 13C default tolerance (0.5 ppm) and ignores 1H-only entries', () => {
    const c13: LibraryEntry = { ...entry('ethanol-13c', []), signals: [{ nucleus: '13C', shift: 58.28, nuclei: 1, carbonType: 'CH2' }, { nucleus: '13C', shift: 18.41, nuclei: 1, carbonType: 'CH3' }] };
    const m: PeakListMixture = { ...empty, nucleus: '13C', peaks: [{ shift: 58.5, intensity: 1 }, { shift: 18.2, intensity: 1 }, { shift: 77.16, intensity: 5 }] };
    const r = screenMixture(m, [c13, entry('h-only', [{ shift: 58.4, nuclei: 1 }])]);
    expect(r.tolerancePpm).toBe(0.5);
    expect(r.candidates.map((c) => c.entryId)).toEqual(['ethanol-13c']);
    expect(r.entriesScreened).toBe(1);
    expect(r.peaksExcluded.map((p) => p.reason)).toEqual(['solvent']); // CDCl3 77.16 (from memory)
  });

  it('caps the report at maxCandidates', () => {
    const r = screenMixture(tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }, { name: 'toluene', amount: 1 }], split), tableLibrary('CDCl3'), { maxCandidates: 1 });
    expect(r.candidates.map((c) => c.name)).toEqual(['ethyl acetate']);
    expect(r.candidatesAboveThreshold).toBe(3); // ethyl acetate, toluene, tert-butyl alcohol (shadowed)
  });

  it('reports at most 100 candidates by default and says how many reached the threshold', () => {
    const lib = Array.from({ length: 150 }, (_, i) => entry(`s${i}`, [{ shift: 2.17, nuclei: 3 }]));
    const r = screenMixture({ ...empty, peaks: [{ shift: 2.17, intensity: 3 }] }, lib);
    expect(r.candidates).toHaveLength(100);
    expect(r.candidatesAboveThreshold).toBe(150);
    expect(r.ambiguityGroups).toHaveLength(1);
    expect(r.ambiguityGroups[0].members).toHaveLength(100);
  });
});

describe('screenMixture: properties', () => {
  const lib = tableLibrary('CDCl3');
  const base = tableMixture('CDCl3', [{ name: 'ethyl acetate', amount: 1 }, { name: 'diethyl ether', amount: 0.5 }, { name: 'acetone', amount: 2 }], split, { jitterPpm: 0.008, intensityNoise: 0.05, extraPeaks: 10, rand: seededRandom(42) });
  const reference = screenMixture(base, lib);

  it('scaling every intensity does not change the ranking or the scores', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e4, noNaN: true }), (k) => {
        const r = screenMixture({ ...base, peaks: base.peaks.map((p) => ({ ...p, intensity: p.intensity * k })) }, lib);
        expect(r.candidates.map((c) => c.entryId)).toEqual(reference.candidates.map((c) => c.entryId));
        r.candidates.forEach((c, i) => expect(c.score).toBeCloseTo(reference.candidates[i].score, 9));
      }),
      { numRuns: 40 },
    );
  });

  it('peak order in the input does not matter', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(), { minLength: base.peaks.length, maxLength: base.peaks.length }), (keys) => {
        const shuffled = base.peaks.map((p, i) => [keys[i], i, p] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]).map((x) => x[2]);
        expect(screenMixture({ ...base, peaks: shuffled }, lib).candidates.map((c) => [c.entryId, c.score])).toEqual(reference.candidates.map((c) => [c.entryId, c.score]));
      }),
      { numRuns: 20 },
    );
  });

  // The shift index must change the cost, never the answer: compare with the plain all-pairs
  // implementation on random libraries and mixtures.
  it('gives the same result as the all-pairs implementation', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), (seed) => {
        const rand = seededRandom(seed);
        const entries: LibraryEntry[] = Array.from({ length: 60 }, (_, i) =>
          entry(
            `e${i}`,
            Array.from({ length: 1 + Math.floor(rand() * 4) }, () => {
              const kind = rand();
              if (kind < 0.4) return { shift: 0.5 + rand() * 8, nuclei: 1 + Math.floor(rand() * 3) };
              if (kind < 0.6) return { shift: 0.5 + rand() * 8, nuclei: 1 + Math.floor(rand() * 2), multiplicity: 'm' };
              return { shift: 0.5 + rand() * 8, nuclei: 2, multiplicity: kind < 0.8 ? 't' : 'q', j: [5 + rand() * 3] };
            }),
          ),
        );
        const picked = entries.filter(() => rand() < 0.15);
        const peaks = picked.flatMap((e) => e.signals.flatMap((s) => split(s, 500).map((l) => ({ shift: l.shift + (rand() - 0.5) * 0.01, intensity: l.area * (0.9 + rand() * 0.2) }))));
        for (let k = 0; k < 30; k++) peaks.push({ shift: 0.5 + rand() * 8, intensity: rand() });
        const m: PeakListMixture = { ...empty, solvent: 'other', mhz: rand() < 0.5 ? 500 : 80, peaks };
        // the whole result: candidates, evidence, groups, shadowing, peaks
        expect(screenMixture(m, entries, { minScore: 0.3 })).toEqual(screenAllPairs(m, entries, { minScore: 0.3 }));
      }),
      { numRuns: 25 },
    );
  });
});

describe('screenMixture: solvent of the entries', () => {
  // Acetone: 2.17 in CDCl3, 2.09 in DMSO-d6 (Gottlieb 1997 Table 1) — entries are solvent-specific.
  it('screens a CDCl3 mixture against CDCl3 entries only, unless anySolvent', () => {
    const lib = [...tableLibrary('CDCl3'), ...tableLibrary('DMSO-d6')];
    const m = { ...empty, peaks: [{ shift: 2.09, intensity: 6 }] };
    expect(screenMixture(m, lib).candidates.some((c) => c.entryId === 'contam-acetone-dmso-d6')).toBe(false);
    expect(screenMixture(m, lib, { anySolvent: true }).candidates.some((c) => c.entryId === 'contam-acetone-dmso-d6')).toBe(true);
    expect(screenMixture({ ...m, solvent: 'DMSO-d6' }, lib).candidates.map((c) => c.entryId)).toContain('contam-acetone-dmso-d6');
  });
});

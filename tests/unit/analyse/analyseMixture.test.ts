// Mixtures synthesised from the published contaminant table (Gottlieb, Kotlyar & Nudelman,
// J. Org. Chem. 1997, 62, 7512, Table 1; Fulmer et al., Organometallics 2010, 29, 2176, Table 1;
// CDCl3 column), analysed end to end.
import { describe, expect, it } from 'vitest';
import { analysisReportTable } from '../../../cli/commands/analyse';
import { analyseMixture } from '../../../matching/analyse/analyseMixture';
import { libraryToDecoys } from '../../../matching/confidence/libraryToDecoys';
import { AnalysisReportSchema } from '../../../shared/analysis';
import { CAUTION_TEXT } from '../../../shared/caution';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import { contaminantLibrary, synthPeaks, synthSpectrum } from '../fit/contaminantLibrary';

const lib = contaminantLibrary();
const get = (id: string) => lib.find((e) => e.id === id)!;
const truth: Record<string, number> = { ethanol: 2, 'ethyl-acetate': 1, acetone: 0.5, 'diethyl-ether': 0.8, triethylamine: 0.3, '2-propanol': 0.4 };
const parts = Object.entries(truth).map(([id, amount]) => ({ entry: get(id), amount }));
const T = 120000;

describe('analyseMixture', () => {
  it('refuses an empty library and an unknown standard', () => {
    expect(() => analyseMixture(synthPeaks(parts), [])).toThrow('the library is empty: nothing to analyse against');
    expect(() => analyseMixture(synthPeaks(parts), lib, { standard: { entryId: 'nope', concentrationMM: 1 } })).toThrow('internal standard "nope" is not in the library');
    expect(() => analyseMixture(synthPeaks(parts), lib, { decoySets: 0 })).toThrow(/^analysis option decoySets:/);
  });

  it('recovers the composition of a peak list and gives multiplet-confirmed compounds small q-values', () => {
    const r = analyseMixture(synthPeaks(parts), lib);
    expect(r.caution).toBe(CAUTION_TEXT);
    // The report is the shape shared/analysis.ts declares (no NaN, no missing fields).
    expect(AnalysisReportSchema.safeParse(JSON.parse(JSON.stringify(r))).success).toBe(true);
    expect(r.fit.components.map((c) => c.entryId).sort()).toEqual(Object.keys(truth).sort());
    for (const c of r.fit.components) expect(c.amountPerNucleus).toBeCloseTo(truth[c.entryId], 2);
    const q = new Map(r.qValues.map((x) => [x.entryId, x.qValue]));
    for (const id of ['ethanol', 'ethyl-acetate', 'diethyl-ether', 'triethylamine', '2-propanol']) expect(q.get(id), id).toBeLessThanOrEqual(0.05);
    // acetone is one singlet: any unrelated peak could explain it, so its q-value is not small.
    expect(q.get('acetone')).toBe(1);
    const total = r.amounts.reduce((s, a) => s + a.moleFraction, 0);
    expect(total).toBeCloseTo(1, 10);
    expect(r.amounts.find((a) => a.entryId === 'ethanol')!.moleFraction).toBeCloseTo(2 / 5, 3);
  }, T);

  it('does not give a small q-value to a candidate supported only by one singlet an unrelated peak explains', () => {
    // Benzene (7.36 ppm singlet, Gottlieb 1997) is in the mixture but not in the library; an entry
    // with one singlet near it is all the library offers there.
    const lookalike: LibraryEntry = { ...get('acetone'), id: 'lookalike', name: 'lookalike', signals: [{ nucleus: '1H', shift: 7.37, multiplicity: 's', j: [], nuclei: 1 }] };
    const library = [...lib.filter((e) => e.id !== 'benzene'), lookalike];
    const r = analyseMixture(synthPeaks([...parts, { entry: get('benzene'), amount: 0.5 }]), library);
    expect(r.fit.components.some((c) => c.entryId === 'lookalike')).toBe(true);
    expect(r.qValues.find((x) => x.entryId === 'lookalike')!.qValue).toBeGreaterThanOrEqual(0.5);
  }, T);

  it('does not give a small q-value to a candidate whose signals another candidate’s multiplets already explain', () => {
    // A doublet on the inner lines of ethyl acetate's OCH2 quartet (4.12 ppm, J 7 Hz) and a singlet
    // on its CH3CO singlet (2.05 ppm): everything it could explain, ethyl acetate explains.
    const impostor: LibraryEntry = {
      ...get('ethyl-acetate'), id: 'impostor', name: 'impostor',
      signals: [
        { nucleus: '1H', shift: 4.12, multiplicity: 'd', j: [7], nuclei: 2 },
        { nucleus: '1H', shift: 2.05, multiplicity: 's', j: [], nuclei: 3 },
      ],
    };
    const r = analyseMixture(synthPeaks(parts), [...lib, impostor]);
    const q = r.qValues.find((x) => x.entryId === 'impostor');
    if (q) expect(q.qValue).toBeGreaterThanOrEqual(0.5);
    else expect(r.fit.rejected.some((x) => x.entryId === 'impostor') || !r.screenedCandidates.includes('impostor')).toBe(true);
    expect(r.qValues.find((x) => x.entryId === 'ethyl-acetate')!.qValue).toBeLessThanOrEqual(0.05);
  }, T);

  it('with a library of only decoys, reports no small q-values (calibration sanity)', () => {
    // Ten libraries of random patterns (each entry's multiplets moved at random): every compound the
    // analysis reports is false, so none may pass a 5 % FDR cut, and typical q-values are large.
    const qs: number[] = [];
    for (let seed = 1; seed <= 10; seed++) {
      const fakes = libraryToDecoys(lib, { sets: 1, seed, range: [-0.5, 9.5], mhz: 600.13 })[0].map((e) => ({ ...e, id: `fake-${e.id.split('.').pop()}` }));
      const r = analyseMixture(synthPeaks(parts), fakes, { seed: seed + 100 });
      for (const q of r.qValues) {
        expect(q.qValue, `${seed} ${q.entryId}`).toBeGreaterThan(0.05);
        qs.push(q.qValue);
      }
    }
    qs.sort((a, b) => a - b);
    expect(qs.length).toBeGreaterThan(3);
    expect(qs[qs.length >> 1]).toBeGreaterThanOrEqual(0.5);
  }, T);

  it('warns when two fitted compounds are near-duplicates in the library', () => {
    // An invented isomer of ethanol with its multiplets moved (3.60 q, 1.31 t), marked as close to it.
    const e = get('ethanol');
    const twin: LibraryEntry = { ...e, id: 'ethanol-twin', name: 'ethanol twin', nearDuplicateOf: ['ethanol'], signals: e.signals.map((sg) => ({ ...sg, shift: sg.shift > 2 ? 3.6 : 1.31 })) };
    const r = analyseMixture(synthPeaks([...parts, { entry: twin, amount: 0.7 }]), [...lib, twin], { decoySets: 2 });
    expect(r.fit.components.map((c) => c.entryId)).toEqual(expect.arrayContaining(['ethanol', 'ethanol-twin']));
    // Every line of each is resolved from the other's at 600 MHz: the data tells them apart.
    expect(r.warnings).toContain('ethanol, ethanol twin look alike (library near duplicates or one screening ambiguity group); the fit told them apart by at least two resolved lines of each that no other fitted compound shares');
    expect(r.indistinguishable).toEqual([]);
    for (const id of ['ethanol', 'ethanol-twin']) expect(r.amounts.find((a) => a.entryId === id)!.identifiable, id).toBe(true);
  }, T);

  it('reports look-alikes the data cannot tell apart as one set with their combined amount, each not identifiable', () => {
    // The twin is ethanol's quartet and triplet on the same shifts plus one singlet of its own:
    // its only evidence of its own is one line, which any unrelated peak could give, and every
    // line of ethanol is one of the twin's too.
    const e = get('ethanol');
    const twin: LibraryEntry = { ...e, id: 'ethanol-twin', name: 'ethanol twin', nearDuplicateOf: ['ethanol'], signals: [...e.signals, { nucleus: '1H', shift: 6.4, multiplicity: 's', j: [], nuclei: 1 }] };
    const r = analyseMixture(synthPeaks([...parts, { entry: twin, amount: 0.5 }]), [...lib, twin], { decoySets: 4 });
    expect(AnalysisReportSchema.safeParse(JSON.parse(JSON.stringify(r))).success).toBe(true);
    const fitted = new Map(r.fit.components.map((c) => [c.entryId, c]));
    expect([...fitted.keys()]).toEqual(expect.arrayContaining(['ethanol', 'ethanol-twin']));
    expect(r.indistinguishable).toHaveLength(1);
    const set = r.indistinguishable![0];
    expect(set.id).toBe('S1');
    expect(set.members).toEqual(['ethanol', 'ethanol-twin']);
    expect(set.message).toBe('ethanol, ethanol twin cannot be told apart by this data: ethanol, ethanol twin show fewer than two resolved lines that no other fitted compound shares. Their combined amount is reported; how the fit splits it between them is not a measurement.');
    expect(r.warnings).toContain(set.message);
    // The combined amount is what was put in: 2 + 0.5 per nucleus (mole ratio).
    expect(set.amountPerNucleus).toBeCloseTo(fitted.get('ethanol')!.amountPerNucleus + fitted.get('ethanol-twin')!.amountPerNucleus, 12);
    expect(Math.abs(set.amountPerNucleus / 2.5 - 1)).toBeLessThan(0.02);
    const rows = r.amounts.filter((a) => set.members.includes(a.entryId));
    expect(set.moleFraction).toBeCloseTo(rows[0].moleFraction + rows[1].moleFraction, 12);
    for (const a of rows) {
      expect(a.identifiable, a.entryId).toBe(false);
      expect(a.indistinguishableSet, a.entryId).toBe('S1');
      expect(fitted.get(a.entryId)!.identifiable, a.entryId).toBe(false);
    }
    for (const a of r.amounts.filter((x) => !set.members.includes(x.entryId))) expect(a.identifiable, a.entryId).toBe(true);
    // Scored on its own lines only (one singlet): no small q-value on ethanol's signals.
    expect(r.qValues.find((x) => x.entryId === 'ethanol-twin')!.qValue).toBe(1);
    const table = analysisReportTable(r);
    expect(table).toContain(`Set S1 (ethanol + ethanol-twin): combined mole fraction ${set.moleFraction.toFixed(3)}`);
    expect(table.split('\n').find((l) => l.startsWith('ethanol-twin'))).toContain('own amount not identifiable (set S1)');
  }, T);

  it('gives concentrations through a named internal standard and warns when its nuclei differ', () => {
    const withStd = [...parts, { entry: get('1-4-dioxane'), amount: 0.25 }];
    const r = analyseMixture(synthPeaks(withStd), lib, { standard: { entryId: '1-4-dioxane', concentrationMM: 2, nuclei: 4 }, decoySets: 2 });
    expect(r.warnings).toContain('internal standard "1-4-dioxane": 4 nuclei given, its fitted signals hold 8; the given count is used');
    // c_A = (I_A/I_S)(N_S/N_A)c_S with I_S over 8 nuclei counted as 4: ethanol (10/2)(4/5)·2 mM = 8 mM.
    expect(r.amounts.find((a) => a.entryId === 'ethanol')!.concentrationMM).toBeCloseTo(8, 3);
  }, T);

  it('fits a named internal standard whose only line sits on an analyte’s line, and warns that concentrations rest on a shared signal', () => {
    // An invented standard: one 3H singlet on the centre line of ethanol's CH3 triplet (1.25 ppm,
    // Gottlieb 1997 Table 1). In a picked list nothing tells its part of that peak from ethanol's.
    const std: LibraryEntry = { id: 'demo.std-on-ethanol', name: 'demo standard', synonyms: [], formula: 'C2H6O', category: 'reference', source: 'invented for tests', solvent: 'CDCl3', mhz: 300, signals: [{ nucleus: '1H', shift: get('ethanol').signals.find((g) => g.nucleus === '1H' && g.multiplicity === 't')!.shift, multiplicity: 's', j: [], nuclei: 3 }] };
    const r = analyseMixture(synthPeaks([...parts, { entry: std, amount: 0.3 }]), [...lib, std], { standard: { entryId: std.id, concentrationMM: 1 }, decoySets: 2 });
    const fitted = r.fit.components.find((c) => c.entryId === std.id);
    expect(fitted?.distinctLines).toBe(0);
    expect(r.warnings).toContain(`internal standard "${std.id}": none of its lines stands a linewidth clear of another fitted compound's lines, so its integral, and every concentration from it, rests on a shared signal`);
    expect(r.amounts.find((a) => a.entryId === 'ethanol')!.concentrationMM).not.toBeNull();
  }, T);

  it('analyses a spectrum end to end', () => {
    const four = { ethanol: 2, 'ethyl-acetate': 1, acetone: 0.5, 'diethyl-ether': 0.8 };
    const mix = synthSpectrum(Object.entries(four).map(([id, amount]) => ({ entry: get(id), amount })), { noise: 0.01, points: 32768 });
    const r = analyseMixture(mix, lib, { decoySets: 5 });
    expect(r.fit.kind).toBe('spectrum');
    expect(AnalysisReportSchema.safeParse(JSON.parse(JSON.stringify(r))).success).toBe(true);
    for (const [id, amount] of Object.entries(four)) {
      const c = r.fit.components.find((x) => x.entryId === id);
      expect(c, id).toBeDefined();
      expect(Math.abs(c!.amountPerNucleus / amount - 1), id).toBeLessThan(0.05);
    }
  }, T);

  it('passes the screen\'s crowding warning on to the report, and gives none for a sparse mixture', () => {
    expect(analyseMixture(synthPeaks(parts), lib).warnings.some((w) => w.startsWith('crowded mixture'))).toBe(false);
    // A line every 0.02 ppm over 0.5–10 ppm: every ±0.03 ppm window holds a peak by chance.
    const comb = { ...synthPeaks(parts), name: 'comb', peaks: Array.from({ length: 476 }, (_, i) => ({ shift: 0.5 + i * 0.02, intensity: 1, widthHz: 1 })) };
    const r = analyseMixture(comb, lib, { decoySets: 1 });
    expect(r.warnings.find((w) => w.startsWith('crowded mixture'))).toMatch(/^crowded mixture for ±0.03 ppm: \d+ % of library signal windows hold a mixture peak/);
  }, T);
});

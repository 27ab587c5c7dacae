// Mixtures synthesised from the published contaminant table (Gottlieb, Kotlyar & Nudelman,
// J. Org. Chem. 1997, 62, 7512, Table 1; Fulmer et al., Organometallics 2010, 29, 2176, Table 1;
// CDCl3 column) with known amounts per nucleus; lines drawn independently of the engine
// (Pascal intensities, formulas.md (c); Lorentzian of ml-peak-shape-generator, formulas.md (a)).
import { describe, expect, it } from 'vitest';
import { fitMixture } from '../../../matching/fit/fitMixture';
import { FitResultSchema } from '../../../shared/analysis';
import type { Mixture } from '../../../shared/mixture';
import { contaminantLibrary, synthPeaks, synthSpectrum } from './contaminantLibrary';

const lib = contaminantLibrary();
const get = (id: string) => {
  const e = lib.find((x) => x.id === id);
  if (!e) throw new Error(`no ${id}`);
  return e;
};
const truth = { ethanol: 2, 'ethyl-acetate': 1, acetone: 0.5, 'diethyl-ether': 0.8 };
const parts = Object.entries(truth).map(([id, amount]) => ({ entry: get(id), amount }));
const offsets = { ethanol: 0.01, 'diethyl-ether': -0.015 };
const T = 120000; // spectra of up to 65 536 points: allow slow CI machines
const absent = lib.filter((e) => !(e.id in truth)).map((e) => e.id);

function expectRecovered(mix: Mixture, tolerance: number) {
  const r = fitMixture(mix, lib);
  for (const [id, amount] of Object.entries(truth)) {
    const c = r.components.find((x) => x.entryId === id);
    expect(c, id).toBeDefined();
    expect(Math.abs(c!.amountPerNucleus - amount) / amount, id).toBeLessThan(tolerance);
  }
  for (const id of absent) {
    const c = r.components.find((x) => x.entryId === id);
    // An absent compound is rejected, or keeps an amount near zero (< 2 % of the smallest true one).
    if (c) expect(c.amountPerNucleus, id).toBeLessThan(0.02 * 0.5);
  }
  return r;
}

describe('fitMixture', () => {
  it('rejects a candidate listed twice and a bad option, naming them', () => {
    const mix = synthPeaks(parts);
    expect(() => fitMixture(mix, [get('acetone'), get('acetone')])).toThrow('candidate "acetone" is listed twice');
    expect(() => fitMixture(mix, [get('acetone')], { minShare: 2 })).toThrow(/^fit option minShare:/);
  }, T);
  it('rejects a spectrum whose ppm axis is not monotonic, naming the point', () => {
    const mix = synthSpectrum(parts, { points: 2000 });
    if (mix.kind !== 'spectrum') throw new Error('spectrum expected');
    mix.ppm[10] = mix.ppm[8];
    expect(() => fitMixture(mix, lib)).toThrow('mixture ppm axis must be strictly monotonic (at point 10)');
  }, T);
  it('with no candidates, leaves the whole mixture as residual (R² = 0)', () => {
    const mix = synthSpectrum(parts, { points: 2048 });
    const r = fitMixture(mix, [], { linewidthHz: 1 });
    expect(r.components).toEqual([]);
    expect(r.rSquared).toBe(0);
    expect(r.residual).toEqual(r.mixtureCurve);
    expect(FitResultSchema.safeParse(r).success).toBe(true);
  }, T);
  it('fits a 13C peak list: one line per carbon signal, widths in Hz at the 13C frequency', () => {
    // 13C shifts of ethanol (18.4, 58.3) and ethyl acetate (14.2, 21.0, 60.5, 171.1) are from memory;
    // they only need to be distinct for this check.
    const c13 = (id: string, shifts: number[]) => ({ ...get(id), signals: shifts.map((shift) => ({ nucleus: '13C' as const, shift, nuclei: 1 })) });
    const etoh = c13('ethanol', [18.4, 58.3]);
    const etoac = c13('ethyl-acetate', [14.2, 21.0, 60.5, 171.1]);
    const w13 = 1.5 / (600.13 * 0.2514502); // 1.5 Hz at the 13C frequency (Harris et al. 2001 Ξ)
    const peaks = [
      ...[18.4, 58.3].map((x) => ({ shift: x + 0.2, intensity: (2 * 3) / (Math.PI * w13), widthHz: 1.5 })),
      ...[14.2, 21.0, 60.5, 171.1].map((x) => ({ shift: x - 0.1, intensity: (2 * 1.2) / (Math.PI * w13), widthHz: 1.5 })),
    ];
    const mix: Mixture = { kind: 'peaks', name: 'c13', nucleus: '13C', solvent: 'CDCl3', mhz: 600.13, reference: 'TMS', intensityKind: 'height', peaks };
    const r = fitMixture(mix, [etoh, etoac, get('acetone')]);
    expect(r.components.find((c) => c.entryId === 'ethanol')!.amountPerNucleus).toBeCloseTo(3, 3);
    expect(r.components.find((c) => c.entryId === 'ethanol')!.shiftOffsetPpm).toBeCloseTo(0.2, 4);
    expect(r.components.find((c) => c.entryId === 'ethyl-acetate')!.amountPerNucleus).toBeCloseTo(1.2, 3);
    expect(r.rejected.find((x) => x.entryId === 'acetone')?.reason).toBe('no-lines');
  }, T);
  it('reports a candidate without lines in the nucleus as rejected', () => {
    const r = fitMixture({ ...synthPeaks(parts), nucleus: '13C' }, [get('acetone')]);
    expect(r.rejected).toEqual([{ entryId: 'acetone', name: 'acetone', reason: 'no-lines', message: 'no 13C signals to simulate', share: 0 }]);
  }, T);

  it('recovers amounts within 2 % from a noise-free spectrum, with shift offsets and an estimated linewidth', () => {
    const r = expectRecovered(synthSpectrum(parts, { offsets }), 0.02);
    expect(r.linewidthSource).toBe('mixture');
    expect(r.linewidthHz).toBeCloseTo(1, 2);
    expect(r.rSquared).toBeGreaterThan(0.999);
    expect(r.components.find((c) => c.entryId === 'ethanol')!.shiftOffsetPpm).toBeCloseTo(0.01, 3);
    expect(r.components.find((c) => c.entryId === 'diethyl-ether')!.shiftOffsetPpm).toBeCloseTo(-0.015, 3);
    expect(r.fittedSum.length).toBe(r.axis.length);
    expect(r.residual.length).toBe(r.axis.length);
    expect(r.unexplainedPeaks).toEqual([]);
  }, T);
  it('recovers amounts within 10 % from a spectrum with 5 % noise (σ = 5 % of the tallest point)', () => {
    // 65 536 points over 10 ppm at 600 MHz = 0.09 Hz/point, finer than the ≤ 0.4 Hz/point that
    // BIPM ISRD-03 (Westwood et al., Rapport BIPM-2018/05) asks for quantitative spectra.
    for (const seed of [1, 2, 3]) expectRecovered(synthSpectrum(parts, { offsets, noise: 0.05, seed, points: 65536 }), 0.1);
  }, T);
  it('recovers amounts within 2 % from a peak list with closed-form overlaps', () => {
    const r = expectRecovered(synthPeaks(parts, { offsets }), 0.02);
    expect(r.kind).toBe('peaks');
    expect(r.rSquared).toBeGreaterThan(0.999);
  }, T);
  it('gives the same amounts for a descending ppm axis, with curves in the input order', () => {
    const mix = synthSpectrum(parts, { offsets, points: 8192 });
    if (mix.kind !== 'spectrum') throw new Error('spectrum expected');
    const down: Mixture = { ...mix, ppm: [...mix.ppm].reverse(), intensity: [...mix.intensity].reverse() };
    const a = fitMixture(mix, lib, { linewidthHz: 1 });
    const b = fitMixture(down, lib, { linewidthHz: 1 });
    expect(b.axis[0]).toBe(down.ppm[0]);
    for (const c of a.components) expect(b.components.find((x) => x.entryId === c.entryId)!.amountPerNucleus).toBeCloseTo(c.amountPerNucleus, 8);
  }, T);
  it('counts as distinct only the supported lines no other fitted candidate has a line within a linewidth of', () => {
    // An invented look-alike: ethanol's quartet on the same shifts plus one singlet of its own.
    const e = get('ethanol');
    const quartet = e.signals.find((sg) => sg.nucleus === '1H' && sg.multiplicity === 'q')!;
    const copy = { ...e, id: 'copy', name: 'copy', signals: [quartet, { nucleus: '1H' as const, shift: 6.4, multiplicity: 's', j: [], nuclei: 1 }] };
    const r = fitMixture(synthPeaks([{ entry: e, amount: 2 }, { entry: copy, amount: 0.5 }]), [e, copy]);
    expect(FitResultSchema.safeParse(r).success).toBe(true);
    const byId = new Map(r.components.map((c) => [c.entryId, c]));
    // ethanol keeps its triplet (three resolved lines); the copy keeps only its singlet.
    expect(byId.get('ethanol')!.distinctLines).toBe(3);
    expect(byId.get('copy')!.distinctLines).toBe(1);
    expect(byId.get('copy')!.resolvedLines).toBe(5);
    // Alone, every supported line is distinct.
    const alone = fitMixture(synthPeaks([{ entry: e, amount: 2 }]), [e]).components[0];
    expect(alone.distinctLines).toBe(alone.resolvedLines);
  }, T);
  describe('an own line (ownLineRequired)', () => {
    // Ethanol (Gottlieb 1997 Table 1, CDCl3: 1.25 t, 3.72 q) as a picked list whose quartet came out
    // 30 % too tall (merged lines and baseline picked with it: the misfit a real list has), and an
    // invented "shadow" entry that is ethanol's quartet alone: all its lines sit on ethanol's.
    const e = get('ethanol');
    const quartet = e.signals.find((sg) => sg.nucleus === '1H' && sg.multiplicity === 'q')!;
    const shadow = { ...e, id: 'shadow', name: 'shadow', signals: [quartet] };
    const misfit = (mix: Mixture): Mixture => (mix.kind === 'peaks' ? { ...mix, peaks: mix.peaks.map((p) => (Math.abs(p.shift - quartet.shift) < 0.05 ? { ...p, intensity: 1.3 * p.intensity } : p)) } : mix);
    const list = misfit(synthPeaks([{ entry: e, amount: 2 }]));

    it('on a peak list, rejects a candidate whose every supported line lies on another compound’s lines, and refits', () => {
      const loose = fitMixture(list, [e, shadow], { ownLineRequired: false });
      expect(loose.components.find((c) => c.entryId === 'shadow')?.amountPerNucleus ?? 0).toBeGreaterThan(0.1);
      const r = fitMixture(list, [e, shadow]);
      expect(r.components.map((c) => c.entryId)).toEqual(['ethanol']);
      const why = r.rejected.find((x) => x.entryId === 'shadow')!;
      expect(why.reason).toBe('no-own-line');
      expect(why.message).toMatch(/no evidence of its own \(it may still be present, hidden under them\)$/);
      expect(why.share).toBeGreaterThan(0);
      expect(FitResultSchema.safeParse(r).success).toBe(true);
    }, T);

    it('keeps a candidate whose lines are shared only with a fitted look-alike (the pair is reported as one set)', () => {
      const r = fitMixture(list, [e, shadow], { lookAlikes: [['ethanol', 'shadow']] });
      expect(r.components.map((c) => c.entryId).sort()).toEqual(['ethanol', 'shadow']);
    }, T);

    it('never rejects a candidate named in keepIds (a named internal standard)', () => {
      const r = fitMixture(list, [e, shadow], { keepIds: ['shadow'] });
      expect(r.components.map((c) => c.entryId).sort()).toEqual(['ethanol', 'shadow']);
      expect(r.components.find((c) => c.entryId === 'shadow')!.distinctLines).toBe(0);
    }, T);

    it('keeps a candidate with one line of its own beside shared ones', () => {
      const withOwn = { ...shadow, id: 'own', name: 'own', signals: [quartet, { nucleus: '1H' as const, shift: 6.4, multiplicity: 's', j: [], nuclei: 1 }] };
      const mix = misfit(synthPeaks([{ entry: e, amount: 2 }, { entry: withOwn, amount: 0.5 }]));
      const r = fitMixture(mix, [e, withOwn]);
      expect(r.components.map((c) => c.entryId).sort()).toEqual(['ethanol', 'own']);
    }, T);

    it('is off by default for a spectrum, where intensity beyond another compound’s pattern is evidence', () => {
      const spec = synthSpectrum([{ entry: e, amount: 2 }, { entry: shadow, amount: 0.6 }], { points: 8192 });
      const r = fitMixture(spec, [e, shadow], { linewidthHz: 1 });
      const c = r.components.find((x) => x.entryId === 'shadow');
      expect(c).toBeDefined();
      expect(Math.abs(c!.amountPerNucleus - 0.6) / 0.6).toBeLessThan(0.05);
      expect(c!.distinctLines).toBe(0);
    }, T);
  });
  it('lists a mixture peak no candidate explains', () => {
    const mix = synthSpectrum([...parts, { entry: get('benzene'), amount: 0.3 }], { points: 8192 });
    const r = fitMixture(mix, lib.filter((e) => e.id !== 'benzene'), { linewidthHz: 1 });
    expect(r.unexplainedPeaks.length).toBe(1);
    expect(r.unexplainedPeaks[0].shift).toBeCloseTo(7.36, 3); // benzene in CDCl3, Gottlieb 1997 Table 1
  }, T);
  it('with minCoverage, rejects a candidate whose other signals are missing', () => {
    // Only the 9H singlet of tert-butyl methyl ether (1.19 ppm) is in the mixture, not its OCH3
    // (3.22 ppm; Gottlieb 1997 Table 1): 9 of 12 nuclei supported.
    const mtbe = get('tert-butyl-methyl-ether');
    const half = { ...mtbe, signals: [mtbe.signals[0]] };
    const mix = synthPeaks([...parts, { entry: half, amount: 0.5 }]);
    const loose = fitMixture(mix, lib);
    expect(loose.components.find((c) => c.entryId === mtbe.id)!.coverage).toBeCloseTo(0.75, 2);
    const strict = fitMixture(mix, lib, { minCoverage: 0.8 });
    expect(strict.rejected.find((x) => x.entryId === mtbe.id)).toMatchObject({
      reason: 'missing-signals',
      message: 'the mixture supports only 75 % of its nuclei, below the 80 % needed',
    });
    expect(strict.components.some((c) => c.entryId === mtbe.id)).toBe(false);
  }, T);
  it('rejects a candidate below the settable share, with the reason', () => {
    const r = fitMixture(synthPeaks([...parts, { entry: get('methanol'), amount: 0.02 }]), lib, { minShare: 0.01 });
    const m = r.rejected.find((x) => x.entryId === 'methanol');
    expect(m?.reason).toBe('below-share');
    expect(m?.message).toMatch(/below the 1\.0 % threshold$/);
  }, T);
  it('gives uncertainties of the size of the scatter over noise realisations', () => {
    const est: number[] = [];
    const unc: number[] = [];
    for (let seed = 11; seed < 19; seed++) {
      const r = fitMixture(synthSpectrum(parts, { offsets, noise: 0.02, seed, points: 8192 }), lib, { linewidthHz: 1 });
      const c = r.components.find((x) => x.entryId === 'acetone')!;
      est.push(c.amountPerNucleus);
      unc.push(c.amountUncertainty!);
    }
    const mean = est.reduce((s, v) => s + v, 0) / est.length;
    const sd = Math.sqrt(est.reduce((s, v) => s + (v - mean) ** 2, 0) / (est.length - 1));
    const u = unc.reduce((s, v) => s + v, 0) / unc.length;
    expect(u / sd).toBeGreaterThan(0.4);
    expect(u / sd).toBeLessThan(2.5);
  }, T);
  it('flags a compound whose tallest line is below S/N 10 (ICH Q2(R1) quantitation limit, common practice)', () => {
    const weak = [...parts, { entry: get('dichloromethane'), amount: 0.2 }];
    const r = fitMixture(synthSpectrum(weak, { noise: 0.02, seed: 5, points: 8192 }), lib, { linewidthHz: 1, minShare: 0 });
    const c = r.components.find((x) => x.entryId === 'dichloromethane');
    expect(c).toBeDefined();
    expect(c!.snr).toBeLessThan(10);
    expect(c!.belowQuantitationLimit).toBe(true);
    expect(r.components.find((x) => x.entryId === 'acetone')!.belowQuantitationLimit).toBe(false);
  }, T);
});

// Whatever the shared schemas accept, the engine answers: generated entries and mixtures with
// values at and beyond every stated bound (denormal frequencies, huge couplings, shifts at the
// ±1000 ppm limit, zero intensities) either fail schema validation with a named field or run
// through screening and the overlay fit without an exception. A property test at the server's
// write routes found the first counterexample (a 5e-324 MHz entry reached the engine).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseMixture } from '../../../matching/analyse';
import { entryToLines } from '../../../matching/multiplets';
import { screenMixture } from '../../../matching/screen';
import { AnalysisReportSchema } from '../../../shared/analysis';
import { LibraryEntrySchema, type LibraryEntry } from '../../../shared/libraryEntry';
import { MixtureSchema, type Mixture } from '../../../shared/mixture';

const RUNS = Number(process.env.PROPERTY_RUNS ?? 60);
const TIMEOUT = Math.max(20_000, RUNS * 80);

/** Ordinary values, the schema bounds, and anything a double can hold. */
const edgy = (ordinary: fc.Arbitrary<number>, bounds: number[]) =>
  fc.oneof({ weight: 4, arbitrary: ordinary }, { weight: 2, arbitrary: fc.constantFrom(...bounds) }, { weight: 1, arbitrary: fc.double() });

const mhz = edgy(fc.double({ min: 10, max: 2000, noNaN: true }), [5e-324, 1e-300, 0.5, 9.999, 10, 2000, 2000.1, 1e308]);
const shift = edgy(fc.double({ min: -1, max: 12, noNaN: true }), [-1000, 1000, -1000.0001, 1e308, -1e308, 0, -0]);
const coupling = edgy(fc.double({ min: 0.5, max: 20, noNaN: true }), [5e-324, 1000, 1000.5, 1e300]);
const multiplicityWithJ = fc.oneof(
  fc.constant({ multiplicity: 's', n: 0 }),
  fc.constant({ multiplicity: 'br s', n: 0 }),
  fc.constant({ multiplicity: 'm', n: 0 }),
  fc.constant({ multiplicity: 'd', n: 1 }),
  fc.constant({ multiplicity: 'sept', n: 1 }),
  fc.constant({ multiplicity: 'ddd', n: 3 }),
);
const signal1H = fc
  .tuple(shift, multiplicityWithJ, fc.array(coupling, { minLength: 3, maxLength: 3 }), fc.integer({ min: 1, max: 12 }), fc.boolean())
  .map(([s, m, j, nuclei, exchangeable]) => ({ nucleus: '1H', shift: s, multiplicity: m.multiplicity, j: j.slice(0, m.n), nuclei, ...(exchangeable ? { exchangeable } : {}) }));
const signal13C = fc.tuple(edgy(fc.double({ min: 0, max: 220, noNaN: true }), [-1000, 1000, 1e308]), fc.integer({ min: 1, max: 3 })).map(([s, nuclei]) => ({ nucleus: '13C', shift: s, nuclei }));
const entryInput = (i: number) =>
  fc.record({ mhz, signals: fc.array(fc.oneof({ weight: 4, arbitrary: signal1H }, { weight: 1, arbitrary: signal13C }), { minLength: 1, maxLength: 5 }) }).map((r) => ({
    id: `demo.gen-${i}`,
    name: `Generated demo ${i}`,
    formula: 'C2H6O',
    category: 'demo',
    source: 'generated for tests',
    solvent: 'CDCl3',
    ...r,
  }));

const peak = fc.record({
  shift,
  intensity: edgy(fc.double({ min: 0, max: 100, noNaN: true }), [0, 5e-324, 1e308]),
  widthHz: fc.option(edgy(fc.double({ min: 0.3, max: 5, noNaN: true }), [5e-324, 1e308]), { nil: undefined }),
});
const mixtureInput = fc.record({ mhz, nucleus: fc.constantFrom('1H', '13C'), peaks: fc.array(peak, { minLength: 0, maxLength: 40 }) }).map((r) => ({
  kind: 'peaks',
  name: 'generated',
  solvent: 'CDCl3',
  reference: 'TMS',
  ...r,
  peaks: r.peaks.map((p) => (p.widthHz === undefined ? { shift: p.shift, intensity: p.intensity } : p)),
}));

/** What analyseMixture may say of valid but unusable input (shown to the user as is). */
const WHOLE_INPUT_REFUSALS = [/^the mixture has no peaks to analyse$/, /^no library entry is recorded in /];

/** A spectrum: an even axis (either direction, any span the schema allows) or a shuffled one, and intensities with spikes. */
const spectrumInput = fc
  .record({
    mhz,
    from: edgy(fc.double({ min: -2, max: 2, noNaN: true }), [-1000, 0, 1000]),
    span: edgy(fc.double({ min: 1, max: 15, noNaN: true }), [5e-324, 1e-9, 2000, -10]),
    points: fc.integer({ min: 2, max: 600 }),
    shuffled: fc.boolean(),
    peaks: fc.array(fc.record({ at: fc.double({ min: 0, max: 1, noNaN: true }), height: edgy(fc.double({ min: 0, max: 100, noNaN: true }), [1e100, 5e-324, -1e100]) }), { maxLength: 8 }),
    noise: fc.double({ min: 0, max: 1, noNaN: true }),
  })
  .map((r) => {
    const ppm = Array.from({ length: r.points }, (_, i) => r.from + (r.span * i) / (r.points - 1));
    if (r.shuffled && r.points > 2) [ppm[0], ppm[1]] = [ppm[1], ppm[0]];
    const intensity = ppm.map((_, i) => r.noise * Math.sin(i * 12.9898) + r.peaks.reduce((s, p) => s + (Math.round(p.at * (r.points - 1)) === i ? p.height : 0), 0));
    return { kind: 'spectrum', name: 'generated', solvent: 'CDCl3', reference: 'TMS', nucleus: '1H', mhz: r.mhz, ppm, intensity };
  });

function accepted<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } } }, v: unknown): T | null {
  const r = schema.safeParse(v);
  if (r.success) return r.data;
  // A refusal must say where: every issue carries a field path and a message.
  for (const issue of r.error.issues) {
    expect(issue.path.length, JSON.stringify(issue)).toBeGreaterThan(0);
    expect(issue.message.length).toBeGreaterThan(0);
  }
  return null;
}

describe('the engine on anything the schemas accept', () => {
  /** Whatever passes the schemas is analysed, or refused as a whole; the report keeps its own schema. */
  const analysesCleanly = (entries: unknown[], mix: unknown) => {
    const library = entries.map((e) => accepted<LibraryEntry>(LibraryEntrySchema, e)).filter((e): e is LibraryEntry => e !== null);
    const mixture = accepted<Mixture>(MixtureSchema, mix);
    fc.pre(library.length > 0 && mixture !== null);
    let report;
    try {
      report = analyseMixture(mixture!, library);
    } catch (e) {
      // Refusals about the input as a whole are answers too; anything else is a bug.
      if (WHOLE_INPUT_REFUSALS.some((m) => m.test((e as Error).message))) return;
      throw e;
    }
    // Every number finite, every share in [0, 1].
    const check = AnalysisReportSchema.safeParse(report);
    expect(check.success, check.success ? '' : JSON.stringify(check.error.issues.slice(0, 3))).toBe(true);
  };

  it('when entries and a peak-list mixture pass their schemas, then screening and the fit return a result', () => {
    fc.assert(fc.property(fc.tuple(entryInput(0), entryInput(1), entryInput(2)), mixtureInput, analysesCleanly), { numRuns: RUNS });
  }, TIMEOUT);

  it('when entries and a spectrum pass their schemas, then peak picking, screening and the fit return a result', () => {
    fc.assert(fc.property(fc.tuple(entryInput(0), entryInput(1), entryInput(2)), spectrumInput, analysesCleanly), { numRuns: RUNS });
  }, TIMEOUT);

  it("when an entry passes its schema, then its own simulated lines screen against the others (the curation check's path)", () => {
    fc.assert(
      fc.property(fc.tuple(entryInput(0), entryInput(1), entryInput(2)), (inputs) => {
        const [entry, ...others] = inputs.map((e) => accepted<LibraryEntry>(LibraryEntrySchema, e));
        fc.pre(entry !== null);
        const nucleus = entry!.signals.some((s) => s.nucleus === '1H') ? '1H' : '13C';
        const lines = entryToLines(entry!, nucleus, entry!.mhz);
        for (const l of lines) expect(Number.isFinite(l.shift) && Number.isFinite(l.area), JSON.stringify(l)).toBe(true);
        const rest = others.filter((e): e is LibraryEntry => e !== null);
        fc.pre(lines.length > 0 && rest.length > 0);
        const mixture: Mixture = { kind: 'peaks', name: entry!.name, nucleus, solvent: entry!.solvent, mhz: entry!.mhz, reference: 'none', intensityKind: 'integral', peaks: lines.map((l) => ({ shift: l.shift, intensity: l.area })) };
        const r = screenMixture(mixture, rest, { excludeSolvent: false, excludeReference: false, minScore: 0.5 });
        for (const c of r.candidates) expect(c.score).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);

  it('when the frequency is the 5e-324 MHz the server property test found, then the entry schema refuses it by field', () => {
    const r = LibraryEntrySchema.safeParse({ id: 'demo.x', name: 'x', formula: 'C2H6O', category: 'demo', source: 's', solvent: 'CDCl3', mhz: 5e-324, signals: [{ nucleus: '1H', shift: 1.22, multiplicity: 't', j: [7], nuclei: 3 }] });
    expect(r.success).toBe(false);
    expect(r.error!.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['mhz', 'spectrometer frequency must be at least 10 MHz (the 1H frequency, e.g. 60 or 400)']]);
  });
});

import { AnalysisOptionsSchema, type AnalysisOptions, type AnalysisReport, type FitComponent, type IndistinguishableSet } from '../../shared/analysis';
import { CAUTION_TEXT } from '../../shared/caution';
import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import { componentEvidenceScore } from '../confidence/componentEvidenceScore';
import { libraryToDecoys } from '../confidence/libraryToDecoys';
import { scoresToQValues } from '../confidence/scoresToQValues';
import { fitMixture } from '../fit/fitMixture';
import { amountsCombineSet } from '../quant/amountsCombineSet';
import { fitToAmounts } from '../quant/fitToAmounts';
import { fitToPurity } from '../quant/fitToPurity';
import { screenMixture } from '../screen/screenMixture';
import { componentsFindIndistinguishable } from './componentsFindIndistinguishable';

/** Shift range of the mixture, ppm: the spectrum axis, or the peaks' span widened by the window. */
function mixtureRange(mixture: Mixture, tolerance: number): [number, number] {
  const xs = mixture.kind === 'spectrum' ? mixture.ppm : mixture.peaks.map((p) => p.shift);
  if (xs.length === 0) throw new RangeError('the mixture has no peaks to analyse');
  let lo = Infinity;
  let hi = -Infinity;
  for (const x of xs) { lo = Math.min(lo, x); hi = Math.max(hi, x); }
  if (mixture.kind === 'peaks') { lo -= tolerance; hi += tolerance; }
  if (hi - lo < 1) { const mid = (lo + hi) / 2; lo = mid - 0.5; hi = mid + 0.5; }
  return [lo, hi];
}

/** Screen the library, fit the screened candidates (plus a named standard), and score the fit. */
function screenAndFit(mixture: Mixture, entries: LibraryEntry[], options: AnalysisOptions, forced: string[], linewidthHz?: number, curves = true, cutoff?: number) {
  const screen = screenMixture(mixture, entries, options.screen ?? {});
  const byId = new Map(entries.map((e) => [e.id, e]));
  const ids = [...new Set([...screen.candidates.map((c) => c.entryId), ...forced.filter((id) => byId.has(id))])];
  // Look-alikes among the candidates (screening ambiguity groups, library near duplicates) are
  // reported together when the fit cannot tell them apart, so it keeps both.
  const lookAlikes: string[][] = screen.ambiguityGroups.map((g) => g.members);
  for (const id of ids) for (const other of byId.get(id)!.nearDuplicateOf ?? []) lookAlikes.push([id, other]);
  const fit = fitMixture(mixture, ids.map((id) => byId.get(id)!), {
    tolerancePpm: screen.tolerancePpm,
    lookAlikes,
    // A named internal standard is fitted even when its signal is shared (a warning says so).
    keepIds: forced,
    ...options.fit,
    ...(linewidthHz !== undefined ? { linewidthHz } : {}),
    ...(cutoff !== undefined && options.fit?.cutoff === undefined ? { cutoff } : {}),
    curves,
  });
  return { screen, ids, fit };
}

const score = (c: FitComponent) => componentEvidenceScore(c);

/**
 * Decoy fits evaluate spectrum columns down to 1e-6 of a line's height instead of the fit's 1e-9:
 * amounts move by ~1e-4 relative, far below what changes an evidence score, and a 65k-point
 * spectrum's twenty decoy fits take a third less time (q-values of all 15 demo files unchanged).
 * Set FitOptions.cutoff to fit decoys and targets at one precision.
 */
const DECOY_CUTOFF = 1e-6;

/**
 * The whole analysis: screening → overlay fit → amounts (mole fractions, and concentrations with
 * an internal standard) → target–decoy q-values. Decoy libraries (options.decoySets, default 20;
 * seeded by options.seed, default 1) are screened and fitted exactly like the library, with the
 * linewidth the target fit found; every entry that is not fitted scores 0. Only entries of the
 * mixture's solvent are used unless options.anySolvent; shift-reference entries (category
 * "reference") stay out of the mole fractions. Fitted look-alikes (library near duplicates, or one
 * screening ambiguity group) that the data does not tell apart are reported as one set with a
 * combined amount; their members are flagged not identifiable and scored on their own lines only.
 */
export function analyseMixture(mixture: Mixture, library: LibraryEntry[], options: AnalysisOptions = {}): AnalysisReport {
  const parsed = AnalysisOptionsSchema.safeParse(options);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new RangeError(`analysis option ${issue.path.join('.') || '(root)'}: ${issue.message}`);
  }
  const opts = parsed.data;
  if (!Array.isArray(library) || library.length === 0) throw new RangeError('the library is empty: nothing to analyse against');
  const warnings: string[] = [];
  // A library is solvent-specific (shifts move by up to several ppm between solvents: Gottlieb 1997, Fulmer 2010).
  if (!opts.anySolvent && mixture.solvent !== 'other') {
    const same = library.filter((e) => e.solvent === mixture.solvent || e.solvent === 'other');
    if (same.length < library.length) warnings.push(`${library.length - same.length} entries recorded in other solvents than ${mixture.solvent} were left out`);
    if (same.length === 0) throw new RangeError(`no library entry is recorded in ${mixture.solvent} (or "other")`);
    library = same;
  }
  const standard = opts.standard;
  const standardEntry = standard ? library.find((e) => e.id === standard.entryId) : undefined;
  if (standard && !standardEntry) throw new RangeError(`internal standard "${standard.entryId}" is not in the library`);

  const targets = screenAndFit(mixture, library, opts, standard ? [standard.entryId] : []);
  const { fit, screen } = targets;
  if (standard && standardEntry && !screen.candidates.some((c) => c.entryId === standard.entryId)) {
    warnings.push(`internal standard "${standard.entryId}" did not pass screening; it was fitted anyway`);
  }
  if (standard?.nuclei !== undefined && standardEntry) {
    const own = fit.components.find((c) => c.entryId === standard.entryId)?.nuclei;
    if (own !== undefined && own !== standard.nuclei) {
      warnings.push(`internal standard "${standard.entryId}": ${standard.nuclei} nuclei given, its fitted signals hold ${own}; the given count is used`);
    }
  }
  if (fit.linewidthSource === 'default') warnings.push(`linewidth unknown: ${fit.linewidthHz} Hz assumed`);
  const stdFit = standard ? fit.components.find((c) => c.entryId === standard.entryId) : undefined;
  if (stdFit && stdFit.distinctLines === 0) {
    warnings.push(`internal standard "${standard!.entryId}": none of its lines stands a linewidth clear of another fitted compound's lines, so its integral, and every concentration from it, rests on a shared signal`);
  }
  // Look-alikes: library near duplicates and screening ambiguity groups, among the fitted.
  const fittedIds = new Set(fit.components.map((c) => c.entryId));
  const related: string[][] = screen.ambiguityGroups.map((g) => g.members);
  for (const e of library) if (fittedIds.has(e.id)) for (const other of e.nearDuplicateOf ?? []) related.push([e.id, other]);
  const relatedSets = componentsFindIndistinguishable(fit.components, related);
  const blurred = relatedSets.filter((r) => !r.identifiable);
  const setOf = new Map<string, string>();
  blurred.forEach((r, k) => r.members.forEach((id) => setOf.set(id, `S${k + 1}`)));
  const nameOf = new Map(fit.components.map((c) => [c.entryId, c.name]));
  const names = (ids: string[]) => ids.map((id) => nameOf.get(id) ?? id).join(', ');
  for (const r of relatedSets.filter((x) => x.identifiable)) {
    warnings.push(`${names(r.members)} look alike (library near duplicates or one screening ambiguity group); the fit told them apart by at least two resolved lines of each that no other fitted compound shares`);
  }
  if (fit.unexplainedPeaks.length > 0) warnings.push(`${fit.unexplainedPeaks.length} mixture peak(s) not explained by any fitted compound`);
  for (const g of screen.ambiguityGroups) warnings.push(`screening could not tell apart: ${g.members.join(', ')}`);
  if (screen.crowding.warning) warnings.push(screen.crowding.warning);
  const references = library.filter((e) => e.category === 'reference' && e.id !== standard?.entryId).map((e) => e.id);
  const amounts = fitToAmounts(fit, standard, { excludeFromFractions: references }).map((a) =>
    setOf.has(a.entryId) ? { ...a, identifiable: false, indistinguishableSet: setOf.get(a.entryId)! } : { ...a, identifiable: true },
  );
  fit.components = fit.components.map((c) => ({ ...c, identifiable: !setOf.has(c.entryId) }));
  const indistinguishable: IndistinguishableSet[] = blurred.map((r, k) => {
    const message =
      `${names(r.members)} cannot be told apart by this data: ${names(r.lacking)} ${r.lacking.length > 1 ? 'show' : 'shows'} fewer than two resolved lines that no other fitted compound shares. ` +
      'Their combined amount is reported; how the fit splits it between them is not a measurement.';
    warnings.push(message);
    return { id: `S${k + 1}`, members: r.members, message, ...amountsCombineSet(r.members, fit.components, amounts) };
  });
  if (opts.purity && !standard) throw new RangeError('a purity assay needs an internal standard (options.standard)');
  const purity = opts.purity && standard ? fitToPurity(fit, standard, opts.purity, library) : null;

  const sets = opts.decoySets ?? 20;
  const range = mixtureRange(mixture, screen.tolerancePpm);
  const decoyLibraries = libraryToDecoys(library, { sets, seed: opts.seed ?? 1, range, mhz: mixture.mhz });
  const decoyScores: number[] = [];
  for (const decoys of decoyLibraries) {
    const run = screenAndFit(mixture, decoys, opts, [], fit.linewidthHz, false, DECOY_CUTOFF);
    const scored = new Map(run.fit.components.map((c) => [c.entryId, score(c)]));
    for (const d of decoys) decoyScores.push(scored.get(d.id) ?? 0);
  }
  // A member of an indistinguishable set is scored on the lines no other fitted compound shares:
  // support it has only through its look-alike's (or anyone's) signals earns it no confidence.
  const fitted = new Map(
    fit.components.map((c) => [c.entryId, score(setOf.has(c.entryId) ? { ...c, resolvedLines: Math.min(c.resolvedLines, c.distinctLines ?? c.resolvedLines) } : c)]),
  );
  const q = scoresToQValues(library.map((e) => ({ id: e.id, score: fitted.get(e.id) ?? 0 })), decoyScores, sets);
  const qValues = fit.components.map((c) => ({ entryId: c.entryId, score: fitted.get(c.entryId)!, qValue: q.get(c.entryId)! }));

  return {
    mixtureName: mixture.name,
    nucleus: mixture.nucleus,
    screenedCandidates: targets.ids,
    fit,
    amounts,
    purity,
    qValues,
    decoySets: sets,
    warnings,
    indistinguishable,
    caution: CAUTION_TEXT,
  };
}

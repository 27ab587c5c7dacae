export interface SignalMatchSummary {
  nuclei: number;
  /** Optional signals (OH/NH, or hidden by an excluded solvent region): they count only when found. */
  exchangeable: boolean;
  matched: boolean;
  /** Observed − expected shift of the matched signal, ppm (ignored when not matched). */
  deltaPpm: number;
  /** Matched intensity of the whole multiplet (ignored when not matched). */
  intensity: number;
}

export interface EntryScoreOptions {
  /** Shift window half-width, ppm (the Gaussian's width is tied to it). */
  tolerancePpm: number;
  /** Coefficient of variation at which the intensity factor falls to e^(−1/2). Default 1. */
  cvScale?: number;
}

export interface EntryScore {
  score: number;
  explainedShare: number;
  shiftFactor: number;
  intensityFactor: number;
  /** null with fewer than two matched signals. */
  intensityCv: number | null;
}

/**
 * Score of one library entry against a mixture, in [0, 1]:
 *
 *   score = E² · G · C
 *
 * E (explained share) = (n_req,matched + n_opt,matched) / (n_req + n_opt,matched), with n the
 *   number of nuclei: required signals all count, optional ones (exchangeable OH/NH, or lying in
 *   an excluded solvent/water/reference region) only when found, so a missing OH or a signal under
 *   CHCl3 costs nothing. An entry made only of optional signals treats them as required.
 *   E enters squared: a multiplet that should be visible but is missing is strong evidence
 *   against the compound, stronger than its share of nuclei (E = 2/3 gives 0.44, E = 1/2 gives 0.25),
 *   so an absent compound that merely shares one multiplet with a present one stays low.
 * G (shift agreement) = Σ_matched n_s · exp(−(Δδ_s / tol)²) / Σ_matched n_s: a Gaussian in Δδ/tolerance
 *   (σ = tol/√2) instead of an in/out step: 1 at Δδ = 0, 0.78 at half the tolerance, 0.37 at the
 *   window edge. A whole compound moved by 2/3 of the window (a pH or referencing offset) keeps 0.64.
 * C (intensity consistency) = exp(−½ (CV / cvScale)²), CV = population standard deviation / mean of
 *   r_s = I_s / n_s over matched signals (I_s = matched intensity of multiplet s). A compound's
 *   signals scale with their nuclei (3H methyl : 2H methylene = 3:2), so r_s should be constant;
 *   C = 1 with fewer than two matched signals (nothing to compare). cvScale defaults to 1: in real
 *   mixtures a multiplet shared with another compound, or two lines merged into one picked peak,
 *   inflates single signals, so the check is kept as a graded penalty (CV 0.2 costs 2 %, CV 0.5
 *   costs 12 %, CV 1 costs 39 %) rather than a veto.
 */
export function entryScore(signals: readonly SignalMatchSummary[], options: EntryScoreOptions): EntryScore {
  const tol = options.tolerancePpm;
  const cvScale = options.cvScale ?? 1;
  if (!(tol > 0)) throw new RangeError(`tolerancePpm must be positive, got ${tol}`);
  if (!(cvScale > 0)) throw new RangeError(`cvScale must be positive, got ${cvScale}`);
  if (signals.length === 0) throw new RangeError('an entry needs at least one signal to be scored');
  const allExchangeable = signals.every((s) => s.exchangeable);
  let required = 0;
  let matchedNuclei = 0;
  let extra = 0;
  let gSum = 0;
  const ratios: number[] = [];
  for (const s of signals) {
    if (!(s.nuclei > 0)) throw new RangeError(`nuclei must be positive, got ${s.nuclei}`);
    const req = !s.exchangeable || allExchangeable;
    if (req) required += s.nuclei;
    if (!s.matched) continue;
    if (!Number.isFinite(s.deltaPpm) || !(s.intensity >= 0)) throw new RangeError('a matched signal needs a finite deltaPpm and intensity ≥ 0');
    matchedNuclei += s.nuclei;
    if (!req) extra += s.nuclei;
    const z = s.deltaPpm / tol;
    gSum += s.nuclei * Math.exp(-z * z);
    ratios.push(s.intensity / s.nuclei);
  }
  if (matchedNuclei === 0) return { score: 0, explainedShare: 0, shiftFactor: 0, intensityFactor: 0, intensityCv: null };
  const explainedShare = matchedNuclei / (required + extra);
  const shiftFactor = gSum / matchedNuclei;
  let intensityCv: number | null = null;
  let intensityFactor = 1;
  if (ratios.length >= 2) {
    const mean = ratios.reduce((a, b) => a + b, 0) / ratios.length;
    if (mean > 0) {
      const variance = ratios.reduce((a, r) => a + (r - mean) ** 2, 0) / ratios.length;
      intensityCv = Math.sqrt(variance) / mean;
    } else intensityCv = 0; // all zero intensities: nothing inconsistent to see
    intensityFactor = Math.exp(-0.5 * (intensityCv / cvScale) ** 2);
  }
  const score = Math.min(1, Math.max(0, explainedShare * explainedShare * shiftFactor * intensityFactor));
  return { score, explainedShare, shiftFactor, intensityFactor, intensityCv };
}

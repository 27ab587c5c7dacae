import { FitOptionsSchema, type FitComponent, type FitOptions, type FitResult, type RejectedCandidate } from '../../shared/analysis';
import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import { DEFAULT_TOLERANCE_PPM } from '../../shared/nucleus';
import { mixtureEstimateLinewidth } from '../lineshape/mixtureEstimateLinewidth';
import { nucleusFrequency } from '../lineshape/nucleusFrequency';
import { entryToLines, type EntryLine } from '../multiplets/entryToLines';
import { fitDesignPeaks } from './fitDesignPeaks';
import { fitDesignSpectrum } from './fitDesignSpectrum';
import { fitCoverage } from './fitCoverage';
import { fitEvidence } from './fitEvidence';
import { fitOwnLines } from './fitOwnLines';
import { fitNormalEquations } from './fitNormalEquations';
import { fitSearchOffsets } from './fitSearchOffsets';
import { shiftLines, toPlainArray, type FitDesign, type FitLine } from './fitTypes';
import { intensityNoiseLevel } from './intensityNoiseLevel';
import { nnlsSolve } from './nnlsSolve';
import { spdSolve } from './spdSolve';
import { fitUnexplainedPeaks } from './fitUnexplainedPeaks';
import { linewidthRefine } from './linewidthRefine';

/** Quantitation limit S/N = 10 (ICH Q2(R1), signal-to-noise approach; common practice). */
export const QUANTITATION_SNR = 10;
/** Detection limit S/N = 3 (ICH Q2(R1), signal-to-noise approach; common practice). */
export const DETECTION_SNR = 3;
/** Line tails kept while locating offsets and the linewidth (relative to the line height). */
const SEARCH_DESIGN_CUTOFF = 1e-5;

/** Height of the tallest single line per unit amount: a unit-area Lorentzian peaks at 2/(π·Γ). */
function tallest(lines: FitLine[]): number {
  let h = 0;
  for (const l of lines) h = Math.max(h, (2 * l.a) / (Math.PI * l.w));
  return h;
}

interface Prepared {
  axis: Float64Array;
  y: Float64Array;
  reversed: boolean;
  /** RMS noise of y (intensityNoiseLevel), measured once. */
  noise: number;
}

/**
 * The checked ascending axis and its noise, per spectrum object: an analysis fits the same
 * spectrum once for the library and once per decoy library. The engine never changes a mixture
 * it is given, so the object is the key (a changed spectrum is a new object).
 */
const preparedSpectra = new WeakMap<object, Prepared>();
function prepareSpectrumOnce(mixture: Extract<Mixture, { kind: 'spectrum' }>): Prepared {
  let p = preparedSpectra.get(mixture);
  if (!p) preparedSpectra.set(mixture, (p = prepareSpectrum(mixture.ppm, mixture.intensity)));
  return p;
}

function prepareSpectrum(ppm: number[], intensity: number[]): Prepared {
  const n = ppm.length;
  if (n !== intensity.length) throw new RangeError(`mixture ppm has ${n} points but intensity has ${intensity.length}`);
  const reversed = n > 1 && ppm[n - 1] < ppm[0];
  const axis = new Float64Array(reversed ? [...ppm].reverse() : ppm);
  const y = new Float64Array(reversed ? [...intensity].reverse() : intensity);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(axis[i]) || !Number.isFinite(y[i])) throw new RangeError(`mixture point ${reversed ? n - 1 - i : i} is not a finite number`);
    if (i > 0 && !(axis[i] > axis[i - 1])) throw new RangeError(`mixture ppm axis must be strictly monotonic (at point ${reversed ? n - 1 - i : i})`);
  }
  return { axis, y, reversed, noise: intensityNoiseLevel(y) };
}

/**
 * Confirms candidates by fitting the mixture as a non-negative combination of their simulated
 * Lorentzian spectra (NNLS, Lawson & Hanson 1974), each candidate shifted by one common offset
 * inside ±tolerance. Works on a spectrum (sparse columns on the grid) and on a peak list (closed
 * form Lorentzian overlaps, no grid). Amounts are per nucleus, so they compare as mole ratios.
 */
export function fitMixture(mixture: Mixture, candidates: LibraryEntry[], options: FitOptions = {}): FitResult {
  const parsed = FitOptionsSchema.safeParse(options);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new RangeError(`fit option ${issue.path.join('.') || '(root)'}: ${issue.message}`);
  }
  const nucleus = mixture.nucleus;
  const {
    tolerancePpm = DEFAULT_TOLERANCE_PPM[nucleus],
    refineShifts = true,
    minShare = 0.002,
    cutoff = 1e-9,
    unexplainedFraction = 0.5,
    includeExchangeable = false,
    curves: withCurves = true,
    componentCurves = true,
    minCoverage = 0,
    ownLineRequired = mixture.kind === 'peaks',
    lookAlikes = [],
    keepIds = [],
  } = parsed.data;
  const freq = nucleusFrequency(nucleus, mixture.mhz);
  const estimate = parsed.data.linewidthHz === undefined ? mixtureEstimateLinewidth(mixture) : null;
  let linewidthHz = parsed.data.linewidthHz ?? estimate!.widthHz;
  const linewidthSource = parsed.data.linewidthHz !== undefined ? 'option' : estimate!.source;

  const rejected: RejectedCandidate[] = [];
  const kept: { entry: LibraryEntry; raw: EntryLine[]; nuclei: number }[] = [];
  const seen = new Set<string>();
  for (const entry of candidates) {
    if (seen.has(entry.id)) throw new RangeError(`candidate "${entry.id}" is listed twice`);
    seen.add(entry.id);
    const raw = entryToLines(entry, nucleus, mixture.mhz).filter((l) => {
      const sig = entry.signals[l.signal];
      return includeExchangeable || !(sig.nucleus === '1H' && sig.exchangeable);
    });
    if (raw.length === 0) {
      rejected.push({ entryId: entry.id, name: entry.name, reason: 'no-lines', message: `no ${nucleus} signals to simulate`, share: 0 });
      continue;
    }
    kept.push({ entry, raw, nuclei: raw.reduce((s, l) => s + l.area, 0) });
  }
  // Lines at a given mixture linewidth; a line the entry marks broader keeps its own width.
  const linesAt = (widthHz: number): FitLine[][] =>
    kept.map((k) => k.raw.map((l) => ({ x: l.shift, a: l.area, w: Math.max(l.widthHz ?? widthHz, widthHz) / freq })));
  const signalsOf = (lines: FitLine[][]): FitLine[][][] =>
    kept.map((k, i) => {
      const bySignal = new Map<number, FitLine[]>();
      k.raw.forEach((l, p) => bySignal.set(l.signal, [...(bySignal.get(l.signal) ?? []), lines[i][p]]));
      return [...bySignal.values()];
    });

  let design: FitDesign;
  let prepared: Prepared | null = null;
  let noise: number | null = parsed.data.noiseLevel ?? null;
  if (mixture.kind === 'spectrum') {
    prepared = prepareSpectrumOnce(mixture);
    design = fitDesignSpectrum(prepared.axis, prepared.y, cutoff);
    if (noise === null) noise = prepared.noise;
  } else {
    const peaks = mixture.peaks.map((p, i) => {
      if (!Number.isFinite(p.shift) || !Number.isFinite(p.intensity) || p.intensity < 0) throw new RangeError(`mixture peak ${i + 1} needs a finite shift and a non-negative intensity`);
      const w = (p.widthHz ?? linewidthHz) / freq;
      // A height H of a Lorentzian of width Γ carries the area π·H·Γ/2.
      const a = mixture.intensityKind === 'integral' ? p.intensity : (Math.PI * p.intensity * w) / 2;
      return { x: p.shift, a, w };
    });
    let lo = Infinity;
    let hi = -Infinity;
    for (const k of kept) for (const l of k.raw) { lo = Math.min(lo, l.shift); hi = Math.max(hi, l.shift); }
    if (!Number.isFinite(lo)) { lo = 0; hi = 0; }
    design = fitDesignPeaks(peaks, [lo - tolerancePpm, hi + tolerancePpm], tolerancePpm);
  }

  // A peak list without a noise level: its smallest height is the detection floor it was picked at.
  const smallestPeak =
    mixture.kind === 'peaks' && mixture.intensityKind === 'height' && mixture.peaks.length > 0
      ? mixture.peaks.reduce((m, p) => Math.min(m, p.intensity), Infinity)
      : null;
  let offsets = new Array<number>(kept.length).fill(0);
  let base = linesAt(linewidthHz);
  let current = base;
  // Offsets and the linewidth are located on a design with shorter line tails (cheaper); the
  // amounts reported come from the exact design.
  let roughDesign: FitDesign | null = null;
  const rough = (): FitDesign => {
    roughDesign ??= prepared ? fitDesignSpectrum(prepared.axis, prepared.y, Math.max(cutoff, SEARCH_DESIGN_CUTOFF)) : design;
    return roughDesign;
  };
  const search = (rounds: number) => {
    if (!refineShifts || tolerancePpm <= 0 || kept.length === 0) return;
    const minW = Math.min(...base.flatMap((k) => k.map((l) => l.w)));
    const gridStep = prepared ? (prepared.axis[prepared.axis.length - 1] - prepared.axis[0]) / (prepared.axis.length - 1) : 0;
    const step = Math.max(minW / 4, gridStep / 2, tolerancePpm / 400);
    const found = fitSearchOffsets(rough(), base, tolerancePpm, step, rounds);
    offsets = found.offsets;
    current = found.lines;
  };

  // Solve, reject zero or negligible candidates, and solve again without them.
  let c: Float64Array = new Float64Array(0);
  let G: Float64Array[] = [];
  let h: Float64Array = new Float64Array(0);
  const solveAndReject = (on: FitDesign, record: RejectedCandidate[] | null, excluded: Set<number> = new Set()): number[] => {
    let act = kept.map((_, i) => i).filter((i) => !excluded.has(i));
    // Normal equations of every candidate once; each pass takes the rows of those still in.
    const all = fitNormalEquations(on, current);
    for (let pass = 0; pass < 5; pass++) {
      G = act.map((i) => Float64Array.from(act, (k) => all.G[i][k]));
      h = Float64Array.from(act, (i) => all.h[i]);
      c = nnlsSolve(G, h).x;
      const drop: number[] = [];
      const explained = act.reduce((sum, i, a) => sum + c[a] * on.modelIntensity(current[i]), 0);
      const total = Math.max(on.totalIntensity, explained);
      act.forEach((i, a) => {
        const share = total > 0 ? Math.min(1, (c[a] * on.modelIntensity(current[i])) / total) : 0;
        const ratio = noise !== null && noise > 0 ? (c[a] * tallest(current[i])) / noise : null;
    // A noise level so small that the ratio overflows means "noise unknown" for the report.
    const snr = ratio !== null && Number.isFinite(ratio) ? ratio : null;
        const { entry } = kept[i];
        const reject = (reason: RejectedCandidate['reason'], message: string) => {
          record?.push({ entryId: entry.id, name: entry.name, reason, message, share });
          drop.push(i);
        };
        if (!(c[a] > 0)) reject('zero-amount', 'the fit drove its amount to zero');
        else if (share < minShare) {
          reject('below-share', `explains ${(share * 100).toPrecision(2)} % of the mixture intensity, below the ${(minShare * 100).toPrecision(2)} % threshold`);
        } else if (snr !== null && snr < DETECTION_SNR) {
          reject('below-detection', `its tallest fitted line has S/N ${snr.toFixed(1)}, below the detection limit ${DETECTION_SNR}`);
        } else if (snr === null && smallestPeak !== null && c[a] * tallest(current[i]) < 0.5 * smallestPeak) {
          // Half the smallest listed peak leaves room for the fit's own error on a peak at the floor.
          reject('below-detection', 'its tallest fitted line is below half the smallest peak of the list, so it could not have been picked');
        }
      });
      if (drop.length === 0) break;
      act = act.filter((i) => !drop.includes(i));
    }
    return act;
  };

  search(3);
  // A spectrum without a stated linewidth: refine the common width by golden-section search of
  // the residual, with only the candidates that survive a first solve (spurious ones fitting
  // noise would pull the width down), then re-search offsets.
  if (mixture.kind === 'spectrum' && parsed.data.linewidthHz === undefined && kept.length > 0) {
    const r = rough();
    const survivors = solveAndReject(r, null);
    if (survivors.length > 0) {
      const sseAt = (widthHz: number) => {
        const all = linesAt(widthHz);
        const lines = survivors.map((i) => shiftLines(all[i], offsets[i]));
        const ne = fitNormalEquations(r, lines);
        const x = nnlsSolve(ne.G, ne.h).x;
        let v = r.yy;
        for (let a = 0; a < x.length; a++) {
          v -= 2 * ne.h[a] * x[a];
          for (let b = 0; b < x.length; b++) v += x[a] * ne.G[a][b] * x[b];
        }
        return v;
      };
      linewidthHz = linewidthRefine(sseAt, linewidthHz);
      base = linesAt(linewidthHz);
      current = base.map((l, i) => shiftLines(l, offsets[i]));
      search(2);
    }
  }
  // A compound that is there shows its signals: one whose non-exchangeable nuclei the mixture
  // supports less than minCoverage is dropped (worst first, one at a time) and the rest refitted.
  // Off by default: picked peak lists lose weak and merged lines, and true compounds then fall
  // below 0.5 (counting supported lines instead fails the same way).
  // And it shows one line of its own (ownLineRequired): a candidate all of whose supported lines
  // lie within a linewidth of other fitted compounds' lines only takes up what their model leaves
  // over; on a picked peak list that is misfit, not evidence. The smallest such candidate is
  // dropped first and the rest refitted, until every one left has an own line. Lines shared only
  // with a fitted look-alike count as its own: the report names such a pair as one set instead.
  const excluded = new Set<number>();
  const missing: RejectedCandidate[] = [];
  let fitRejections: RejectedCandidate[] = [];
  let active: number[] = [];
  const lookAlikeOf = new Map<string, Set<string>>();
  for (const set of lookAlikes) for (const id of set) for (const other of set) if (other !== id) lookAlikeOf.set(id, (lookAlikeOf.get(id) ?? new Set()).add(other));
  for (let round = 0; round <= kept.length; round++) {
    fitRejections = [];
    active = solveAndReject(design, fitRejections, excluded);
    if (active.length === 0) break;
    const cur = active.map((i) => current[i]);
    if (minCoverage > 0) {
      const sigs = signalsOf(current);
      let worst = -1;
      let worstCoverage = Infinity;
      active.forEach((i, a) => {
        const cov = fitCoverage(rough(), c, cur, sigs[i], a);
        if (cov < worstCoverage) {
          worstCoverage = cov;
          worst = a;
        }
      });
      if (worstCoverage < minCoverage) {
        const i = active[worst];
        excluded.add(i);
        missing.push({
          entryId: kept[i].entry.id,
          name: kept[i].entry.name,
          reason: 'missing-signals',
          message: `the mixture supports only ${(worstCoverage * 100).toFixed(0)} % of its nuclei, below the ${(minCoverage * 100).toFixed(0)} % needed`,
          share: 0,
        });
        continue;
      }
    }
    if (ownLineRequired && active.length > 1) {
      let weakest = -1;
      let weakestAmount = Infinity;
      const keep = new Set(keepIds);
      active.forEach((i, a) => {
        if (keep.has(kept[i].entry.id)) return;
        const alike = lookAlikeOf.get(kept[i].entry.id);
        const ignore = new Set<number>();
        if (alike) active.forEach((k, b) => alike.has(kept[k].entry.id) && ignore.add(b));
        if (fitOwnLines(design, c, cur, a, ignore).distinctLines > 0) return;
        const amount = c[a] * design.modelIntensity(cur[a]);
        if (amount < weakestAmount) {
          weakestAmount = amount;
          weakest = a;
        }
      });
      if (weakest >= 0) {
        const i = active[weakest];
        const explained = active.reduce((sum, k, a) => sum + c[a] * design.modelIntensity(current[k]), 0);
        excluded.add(i);
        missing.push({
          entryId: kept[i].entry.id,
          name: kept[i].entry.name,
          reason: 'no-own-line',
          message: 'none of its lines stands a linewidth clear of the other fitted compounds’ lines with the mixture behind it: the data give it no evidence of its own (it may still be present, hidden under them)',
          share: Math.min(1, weakestAmount / Math.max(design.totalIntensity, explained)),
        });
        continue;
      }
    }
    break;
  }
  rejected.push(...missing, ...fitRejections);

  const n = design.axis.length;
  const fitted = new Float64Array(n);
  for (let a = 0; a < active.length; a++) design.addCurve(current[active[a]], c[a], fitted);
  const residual = new Float64Array(n);
  let sseGrid = 0;
  for (let p = 0; p < n; p++) {
    residual[p] = design.mixtureCurve[p] - fitted[p];
    sseGrid += residual[p] * residual[p];
  }
  let sse = design.yy;
  for (let a = 0; a < c.length; a++) {
    sse -= 2 * h[a] * c[a];
    for (let b = 0; b < c.length; b++) sse += c[a] * G[a][b] * c[b];
  }
  if (design.kind === 'spectrum') sse = sseGrid;
  const rSquared = design.yy > 0 ? 1 - Math.max(0, sse) / design.yy : 0;

  // Covariance σ²(G_PP)⁻¹ on the passive set; σ² from the residual with its degrees of freedom.
  const dof = design.residualSamples - active.length - (refineShifts ? active.length : 0);
  const sigma2 = dof > 0 ? sseGrid / dof : NaN;
  const variances = new Float64Array(active.length).fill(NaN);
  if (Number.isFinite(sigma2)) {
    for (let a = 0; a < active.length; a++) {
      const e = new Float64Array(active.length);
      e[a] = 1;
      const col = spdSolve(G, e);
      if (col) variances[a] = sigma2 * design.gridScale * col[a];
    }
  }

  const totalExplained = Math.max(design.totalIntensity, active.reduce((sum, i, a) => sum + c[a] * design.modelIntensity(current[i]), 0));
  const allSignals = signalsOf(current);
  const activeSignals = active.map((i) => allSignals[i]);
  const activeLines = active.map((k) => current[k]);
  const reversed = prepared?.reversed ?? false;
  // One scratch curve and one scratch "mixture minus the others" for all components: only the
  // points where a component's lines are not negligible are written, and each curve becomes a
  // plain array (the JSON shape) in a single indexed pass.
  const own = new Float64Array(n);
  const rest = mixture.kind === 'spectrum' ? new Float64Array(n) : null;
  const components: FitComponent[] = active.map((i, a) => {
    const { entry, nuclei } = kept[i];
    own.fill(0);
    design.addCurve(current[i], c[a], own);
    if (rest) for (let p = 0; p < n; p++) rest[p] = residual[p] + own[p];
    const ev = fitEvidence(design, G, h, c, activeLines, activeSignals, a, rough(), rest ?? undefined);
    const ratio = noise !== null && noise > 0 ? (c[a] * tallest(current[i])) / noise : null;
    // A noise level so small that the ratio overflows means "noise unknown" for the report.
    const snr = ratio !== null && Number.isFinite(ratio) ? ratio : null;
    const share = totalExplained > 0 ? Math.min(1, (c[a] * design.modelIntensity(current[i])) / totalExplained) : 0;
    return {
      entryId: entry.id,
      name: entry.name,
      amountPerNucleus: c[a],
      amountUncertainty: Number.isFinite(variances[a]) && variances[a] >= 0 ? Math.sqrt(variances[a]) : null,
      integral: c[a] * nuclei,
      nuclei: Math.round(nuclei),
      share,
      shiftOffsetPpm: offsets[i],
      uniqueness: ev.uniqueness,
      coverage: ev.coverage,
      resolvedLines: ev.resolvedLines,
      distinctLines: ev.distinctLines,
      snr,
      belowQuantitationLimit: snr !== null && snr < QUANTITATION_SNR,
      lines: current[i].map((l) => ({ shift: l.x, area: c[a] * l.a, widthPpm: l.w })),
      curve: withCurves && componentCurves ? toPlainArray(own, reversed) : [],
    };
  });

  const unexplainedPeaks = fitUnexplainedPeaks(mixture, design, active.map((i) => current[i]), c, fitted, {
    noise,
    fraction: unexplainedFraction,
    apartPpm: (2 * linewidthHz) / freq,
  });

  const out = (v: Float64Array) => (withCurves ? toPlainArray(v, reversed) : []);
  return {
    kind: mixture.kind,
    linewidthHz,
    linewidthSource,
    noiseLevel: noise,
    components,
    rejected,
    axis: out(design.axis),
    mixtureCurve: out(design.mixtureCurve),
    fittedSum: out(fitted),
    residual: out(residual),
    rSquared,
    unexplainedPeaks,
  };
}

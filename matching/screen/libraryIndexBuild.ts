import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Nucleus } from '../../shared/nucleus';
import type { Solvent } from '../../shared/solvent';
import type { MultipletLines } from '../score/multipletsMatchPeaks';
import { signalToMultipletLines } from '../score/signalToMultipletLines';

/**
 * A library flattened into typed arrays and binned by shift, for one nucleus and one spectrometer
 * frequency (line positions in ppm depend on MHz). Signals are stored in every bin their line
 * extent [lo, hi] overlaps, so a peak at δ with tolerance t only visits the bins covering
 * [δ − t, δ + t]: the cost of a lookup follows the library's local density, not its size.
 */
export interface LibraryIndex {
  nucleus: Nucleus;
  mhz: number;
  entries: LibraryEntry[];
  /** Signals of entry e are sigStart[e] … sigStart[e+1]−1. */
  sigStart: Int32Array;
  sigEntry: Int32Array;
  /** Position of the signal in entry.signals. */
  sigSource: Int32Array;
  sigNuclei: Float64Array;
  sigExchangeable: Uint8Array;
  sigShift: Float64Array;
  /** Half extent of an unresolved multiplet at this frequency, ppm (0 for resolved ones and 13C). */
  sigHalf: Float64Array;
  /** Extent of each signal's lines, ppm, widened by the half extent of an unresolved multiplet. */
  sigLo: Float64Array;
  sigHi: Float64Array;
  /** Lines of signal s are lineStart[s] … lineStart[s+1]−1. */
  lineStart: Int32Array;
  linePpm: Float64Array;
  lineWeight: Float64Array;
  /** Per signal, its lines as multipletsMatchPeaks takes them (built once, shared by every run). */
  sigLines: MultipletLines[];
  /** Nuclei of the signals that must be found (all, when an entry is only exchangeable signals). */
  entryRequired: Float64Array;
  binWidth: number;
  binOrigin: number;
  binStart: Int32Array;
  binSignals: Int32Array;
  /** Scratch for a screening run (the index is reused across runs; runs are not concurrent in JS). */
  scratch: { stamp: Int32Array; run: number; hitRequired: Float64Array; hitExchangeable: Float64Array; stats: { touched: number; survived: number } };
}

export interface LibraryIndexOptions {
  /** Index retired entries too. Default false. */
  includeRetired?: boolean;
  /** Keep only entries recorded in this solvent (and those recorded as "other"). Default: all. */
  solvent?: Solvent;
  /** Bin width, ppm. Default 0.01 (1H), 0.1 (13C). */
  binWidthPpm?: number;
}

/** Builds the shift index of the entries' signals of one nucleus; entries without such signals are left out. */
export function libraryIndexBuild(entries: readonly LibraryEntry[], nucleus: Nucleus, mhz: number, options: LibraryIndexOptions = {}): LibraryIndex {
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  const binWidth = options.binWidthPpm ?? (nucleus === '13C' ? 0.1 : 0.01);
  if (!(binWidth > 0)) throw new RangeError(`binWidthPpm must be positive, got ${binWidth}`);
  const kept: LibraryEntry[] = [];
  const sigs: Array<{ e: number; src: number; n: number; x: boolean; shift: number; ppm: ArrayLike<number>; w: ArrayLike<number>; h: number; lines: MultipletLines }> = [];
  const sigStartList: number[] = [];
  for (const entry of entries) {
    if (entry.retired && !options.includeRetired) continue;
    if (options.solvent !== undefined && entry.solvent !== options.solvent && entry.solvent !== 'other') continue;
    const mine = entry.signals.map((s, i) => [s, i] as const).filter(([s]) => s.nucleus === nucleus);
    if (mine.length === 0) continue;
    const e = kept.length;
    kept.push(entry);
    sigStartList.push(sigs.length);
    for (const [s, i] of mine) {
      // Line positions and binomial weights from the multiplet simulation (first order).
      const lines = signalToMultipletLines(s, mhz);
      sigs.push({ e, src: i, n: s.nuclei, x: s.nucleus === '1H' && s.exchangeable === true, shift: s.shift, ppm: lines.ppm, w: lines.weight, h: lines.halfExtentPpm ?? 0, lines });
    }
  }
  sigStartList.push(sigs.length);
  const S = sigs.length;
  const sigEntry = new Int32Array(S);
  const sigSource = new Int32Array(S);
  const sigNuclei = new Float64Array(S);
  const sigExchangeable = new Uint8Array(S);
  const sigShift = new Float64Array(S);
  const sigHalf = new Float64Array(S);
  const sigLo = new Float64Array(S);
  const sigHi = new Float64Array(S);
  const lineStart = new Int32Array(S + 1);
  let L = 0;
  for (const s of sigs) L += s.ppm.length;
  const linePpm = new Float64Array(L);
  const lineWeight = new Float64Array(L);
  const entryRequired = new Float64Array(kept.length);
  let l = 0;
  let minShift = Infinity;
  let maxShift = -Infinity;
  sigs.forEach((s, k) => {
    sigEntry[k] = s.e;
    sigSource[k] = s.src;
    sigNuclei[k] = s.n;
    sigExchangeable[k] = s.x ? 1 : 0;
    sigShift[k] = s.shift;
    sigHalf[k] = s.h;
    lineStart[k] = l;
    for (let i = 0; i < s.ppm.length; i++, l++) {
      linePpm[l] = s.ppm[i];
      lineWeight[l] = s.w[i];
    }
    sigLo[k] = Math.min(s.shift, s.ppm[0]) - s.h;
    sigHi[k] = Math.max(s.shift, s.ppm[s.ppm.length - 1]) + s.h;
    minShift = Math.min(minShift, sigLo[k]);
    maxShift = Math.max(maxShift, sigHi[k]);
  });
  lineStart[S] = l;
  // The matcher's view of each signal is the simulation itself (no subarray views: 50k of them cost more than the copy).
  const sigLines: MultipletLines[] = sigs.map((s) => s.lines);
  for (let e = 0; e < kept.length; e++) {
    let req = 0;
    let all = 0;
    for (let k = sigStartList[e]; k < sigStartList[e + 1]; k++) {
      all += sigNuclei[k];
      if (!sigExchangeable[k]) req += sigNuclei[k];
    }
    entryRequired[e] = req > 0 ? req : all;
    // An entry made only of exchangeable signals must find them: mark them required.
    if (req === 0) for (let k = sigStartList[e]; k < sigStartList[e + 1]; k++) sigExchangeable[k] = 0;
  }
  // Bins: counting pass, then fill (CSR layout, no per-bin arrays).
  const binOrigin = S > 0 ? Math.floor(minShift / binWidth) * binWidth : 0;
  const nBins = S > 0 ? Math.floor((maxShift - binOrigin) / binWidth) + 1 : 0;
  const binStart = new Int32Array(nBins + 1);
  const binOf = (v: number) => Math.min(nBins - 1, Math.max(0, Math.floor((v - binOrigin) / binWidth)));
  for (let k = 0; k < S; k++) for (let b = binOf(sigLo[k]); b <= binOf(sigHi[k]); b++) binStart[b + 1]++;
  for (let b = 0; b < nBins; b++) binStart[b + 1] += binStart[b];
  const fill = binStart.slice(0, nBins);
  const binSignals = new Int32Array(nBins > 0 ? binStart[nBins] : 0);
  for (let k = 0; k < S; k++) for (let b = binOf(sigLo[k]); b <= binOf(sigHi[k]); b++) binSignals[fill[b]++] = k;
  return {
    nucleus,
    mhz,
    entries: kept,
    sigStart: Int32Array.from(sigStartList),
    sigEntry,
    sigSource,
    sigNuclei,
    sigExchangeable,
    sigShift,
    sigHalf,
    sigLo,
    sigHi,
    lineStart,
    linePpm,
    lineWeight,
    sigLines,
    entryRequired,
    binWidth,
    binOrigin,
    binStart,
    binSignals,
    scratch: { stamp: new Int32Array(S), run: 0, hitRequired: new Float64Array(kept.length), hitExchangeable: new Float64Array(kept.length), stats: { touched: 0, survived: 0 } },
  };
}

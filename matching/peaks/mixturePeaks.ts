import type { Mixture } from '../../shared/mixture';
import { DEFAULT_TOLERANCE_PPM } from '../../shared/nucleus';
import type { ExcludedPeak, UsedPeak } from '../../shared/screening';
import { solventExclusionRegions } from '../solvent/solventExclusionRegions';
import { spectrumPickPeaks, type PickPeaksResult } from '../spectrum/spectrumPickPeaks';

/**
 * Picked peaks per spectrum object and S/N threshold. An analysis screens the same spectrum once
 * for the library and once per decoy library; picking is the same every time. The engine never
 * changes a mixture it is given, so the object is the key (a changed spectrum is a new object).
 */
const picked = new WeakMap<object, Map<number, PickPeaksResult>>();
function pickOnce(mixture: Extract<Mixture, { kind: 'spectrum' }>, snrThreshold: number): PickPeaksResult {
  let bySnr = picked.get(mixture);
  if (!bySnr) picked.set(mixture, (bySnr = new Map()));
  let r = bySnr.get(snrThreshold);
  if (!r) bySnr.set(snrThreshold, (r = spectrumPickPeaks(mixture, { snrThreshold })));
  return r;
}

export interface MixturePeaksOptions {
  /** Window half-width, ppm, also used around solvent signals and the reference. Default DEFAULT_TOLERANCE_PPM[nucleus]. */
  tolerancePpm?: number;
  /** Drop peaks in residual-solvent and water regions of mixture.solvent. Default true. */
  excludeSolvent?: boolean;
  /** Half-width of water regions, ppm. Default: see solventExclusionRegions. */
  waterHalfWidthPpm?: number;
  /** Drop the peak closest to 0 ppm (within tolerance) when the mixture names a reference. Default true. */
  excludeReference?: boolean;
  /** Minimum S/N for picked spectrum peaks. Default 3 (ICH Q2(R1); common practice). */
  snrThreshold?: number;
}

export interface MixturePeakSet {
  /** Peaks to match, ascending shift; `index` is the position in this array. */
  used: UsedPeak[];
  excluded: ExcludedPeak[];
  /** Shift intervals set aside (solvent, water, reference): library signals inside them cannot be judged. */
  regions: Array<{ from: number; to: number; kind: 'solvent' | 'water' | 'reference'; label: string }>;
  /** Noise σ of a spectrum; null for a peak list. */
  noise: number | null;
}

/**
 * The peaks a screening works on. A peak list is taken as it is (S/N unknown; heights with widths
 * are turned into areas, see below); a spectrum is
 * peak-picked with an S/N threshold and its peaks carry S/N and integrals (the intensity used for
 * matching is the integral, which scales with nuclei; height does only at equal widths).
 * Then the reference peak and the solvent/water regions are set aside, each with its reason.
 */
export function mixturePeaks(mixture: Mixture, options: MixturePeaksOptions = {}): MixturePeakSet {
  const tol = options.tolerancePpm ?? DEFAULT_TOLERANCE_PPM[mixture.nucleus];
  const excludeSolvent = options.excludeSolvent ?? true;
  const excludeReference = options.excludeReference ?? true;
  const snrThreshold = options.snrThreshold ?? 3;
  if (!(tol > 0)) throw new RangeError(`tolerancePpm must be positive, got ${tol}`);

  type Raw = { sourceIndex: number; shift: number; intensity: number; widthHz?: number; snr: number | null; integral?: number };
  const raw: Raw[] = [];
  const excluded: ExcludedPeak[] = [];
  let noise: number | null = null;
  if (mixture.kind === 'peaks') {
    // Heights scale with nuclei only at equal widths (a broad multiplet is low but large). When the
    // list gives widths, a height becomes the Lorentzian area π·H·Γ/2 (formulas.md (a)); peaks
    // without a width get the median width of those that have one.
    const widths = mixture.peaks.map((p) => p.widthHz).filter((w): w is number => w !== undefined && w > 0).sort((a, b) => a - b);
    const toArea = mixture.intensityKind === 'height' && widths.length > 0;
    const medianWidth = widths.length > 0 ? widths[widths.length >> 1] : 1;
    mixture.peaks.forEach((p, i) => {
      if (!Number.isFinite(p.shift) || !Number.isFinite(p.intensity) || p.intensity < 0) {
        throw new RangeError(`peak ${i + 1}: shift and intensity must be finite, intensity ≥ 0`);
      }
      const intensity = toArea ? (Math.PI / 2) * p.intensity * (p.widthHz ?? medianWidth) : p.intensity;
      raw.push({ sourceIndex: i, shift: p.shift, intensity, widthHz: p.widthHz, snr: null });
    });
  } else {
    const pick = pickOnce(mixture, snrThreshold);
    noise = pick.noise;
    pick.peaks.forEach((p, i) =>
      raw.push({ sourceIndex: i, shift: p.shift, intensity: Math.max(p.integral, 0), widthHz: p.widthHz, snr: p.snr, integral: p.integral }),
    );
    pick.belowThreshold.forEach((p, i) =>
      excluded.push({
        sourceIndex: pick.peaks.length + i,
        shift: p.shift,
        intensity: p.height,
        snr: p.snr,
        reason: 'below-snr',
        detail: `S/N ${p.snr.toFixed(1)} < ${snrThreshold}`,
      }),
    );
  }
  raw.sort((a, b) => a.shift - b.shift || a.sourceIndex - b.sourceIndex);

  let referenceAt = -1;
  if (excludeReference && mixture.reference !== 'none') {
    for (let i = 0; i < raw.length; i++) {
      if (Math.abs(raw[i].shift) <= tol && (referenceAt < 0 || Math.abs(raw[i].shift) < Math.abs(raw[referenceAt].shift))) referenceAt = i;
    }
  }
  const regions = excludeSolvent
    ? solventExclusionRegions(mixture.solvent, mixture.nucleus, { mhz: mixture.mhz, halfWidthPpm: tol, waterHalfWidthPpm: options.waterHalfWidthPpm })
    : [];
  const masked: MixturePeakSet['regions'] = [...regions];
  if (referenceAt >= 0) masked.push({ from: raw[referenceAt].shift - tol, to: raw[referenceAt].shift + tol, kind: 'reference', label: `${mixture.reference} reference signal` });
  const used: UsedPeak[] = [];
  raw.forEach((p, i) => {
    if (i === referenceAt) {
      excluded.push({ sourceIndex: p.sourceIndex, shift: p.shift, intensity: p.intensity, snr: p.snr, reason: 'reference', detail: `${mixture.reference} reference signal` });
      return;
    }
    const region = regions.find((r) => p.shift >= r.from && p.shift <= r.to);
    if (region) {
      excluded.push({ sourceIndex: p.sourceIndex, shift: p.shift, intensity: p.intensity, snr: p.snr, reason: region.kind, detail: region.label });
      return;
    }
    const u: UsedPeak = { index: used.length, sourceIndex: p.sourceIndex, shift: p.shift, intensity: p.intensity, snr: p.snr };
    if (p.widthHz !== undefined) u.widthHz = p.widthHz;
    if (p.integral !== undefined) u.integral = p.integral;
    used.push(u);
  });
  excluded.sort((a, b) => a.shift - b.shift);
  return { used, excluded, regions: masked, noise };
}

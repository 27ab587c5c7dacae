import { DEFAULT_TOLERANCE_PPM, type Nucleus } from '../../shared/nucleus';
import type { Solvent } from '../../shared/solvent';
import { SOLVENT_RESIDUAL_SIGNALS } from './solventResidualSignals';

/** 13C frequency over 1H frequency on the unified scale, Ξ(13C)/100 (Harris et al., Pure Appl. Chem. 2001, 73, 1795). */
const XI_13C = 0.2514502;

export interface ExclusionRegionOptions {
  /** Spectrometer 1H frequency, MHz; sets the width of deuterium-split multiplets. Default 400. */
  mhz?: number;
  /** Half-width added around each residual solvent multiplet, ppm. Default DEFAULT_TOLERANCE_PPM[nucleus]. */
  halfWidthPpm?: number;
  /**
   * Half-width around water signals, ppm. Water moves with concentration and temperature
   * (Gottlieb 1997), so its window is wider. Default 0.05 (1H), 0.5 (13C) — common practice.
   */
  waterHalfWidthPpm?: number;
}

export interface ExclusionRegion {
  from: number;
  to: number;
  kind: 'solvent' | 'water';
  /** e.g. "residual CHCl3 7.26 ppm (Gottlieb 1997; Fulmer 2010, Table 1)" */
  label: string;
}

/**
 * Shift intervals to leave out of matching for a deuterated solvent: its residual protio signal
 * (a 2nD+1-line multiplet from coupling to D, spin 1) and water. An empty list for "other".
 */
export function solventExclusionRegions(solvent: Solvent, nucleus: Nucleus, options: ExclusionRegionOptions = {}): ExclusionRegion[] {
  const mhz = options.mhz ?? 400;
  const half = options.halfWidthPpm ?? DEFAULT_TOLERANCE_PPM[nucleus];
  const waterHalf = options.waterHalfWidthPpm ?? (nucleus === '13C' ? 0.5 : 0.05);
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  if (!(half >= 0)) throw new RangeError(`halfWidthPpm must be ≥ 0, got ${half}`);
  if (!(waterHalf >= 0)) throw new RangeError(`waterHalfWidthPpm must be ≥ 0, got ${waterHalf}`);
  const observeMhz = nucleus === '13C' ? mhz * XI_13C : mhz;
  return SOLVENT_RESIDUAL_SIGNALS.filter((r) => r.solvent === solvent && r.nucleus === nucleus).map((r) => {
    // Outermost line of a 2n+1 multiplet sits n·J from the centre.
    const spread = (r.deuteriumNeighbours * r.jHz) / observeMhz;
    const w = spread + (r.kind === 'water' ? Math.max(waterHalf, half) : half);
    return { from: r.shift - w, to: r.shift + w, kind: r.kind, label: `${r.what} ${r.shift.toFixed(2)} ppm (${r.source})` };
  });
}

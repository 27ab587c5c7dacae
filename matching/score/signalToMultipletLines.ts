import type { Signal } from '../../shared/libraryEntry';
import { multiplicityNeighbours } from '../../shared/multiplicity';
import { multipletToLines } from '../multiplets/multipletToLines';
import type { MultipletLines } from './multipletsMatchPeaks';

/**
 * Full extent assumed for an unresolved 1H multiplet ("m", "br", "br m"), Hz, when the entry
 * gives no wider widthHz. Such a multiplet is a proton coupled to several neighbours with
 * unrecorded couplings; two to four vicinal/geminal couplings of about 5–8 Hz add up to roughly
 * 15–30 Hz (common practice, values from memory), so 20 Hz. In ppm it grows as the field falls:
 * ±0.017 ppm at 600 MHz, ±0.125 ppm at 80 MHz, which is why a bench-top spectrum's merged
 * multiplet must be looked for that far from its centre.
 */
export const UNRESOLVED_MULTIPLET_EXTENT_HZ = 20;

/**
 * A library signal as the matcher takes it at the mixture's frequency `mhz`: first-order line
 * positions (ppm) and weights (summing to 1) from multipletToLines; a 13C signal is one line; an
 * unresolved 1H multiplet is one line at its centre with halfExtentPpm = max(extent, widthHz) / 2 / mhz.
 */
export function signalToMultipletLines(signal: Signal, mhz: number): MultipletLines {
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  if (signal.nucleus !== '1H') return { centre: signal.shift, ppm: Float64Array.of(signal.shift), weight: Float64Array.of(1), nuclei: signal.nuclei };
  const sim = multipletToLines(signal, mhz);
  const lines: MultipletLines = { centre: signal.shift, ppm: Float64Array.from(sim, (l) => l.shift), weight: Float64Array.from(sim, (l) => l.area / signal.nuclei), nuclei: signal.nuclei };
  if (multiplicityNeighbours(signal.multiplicity) === null) {
    lines.halfExtentPpm = Math.max(UNRESOLVED_MULTIPLET_EXTENT_HZ, signal.widthHz ?? 0) / 2 / mhz;
  }
  return lines;
}

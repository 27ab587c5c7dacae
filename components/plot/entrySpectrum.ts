import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Nucleus } from '../../shared/nucleus';
import { entryToLines } from '../../matching/multiplets';
import { lorentzianUnitArea } from '../../matching/lineshape';

/** 13C frequency per 1H MHz (γ13C/γ1H), common practice. */
const C13_PER_H1 = 0.2515;

/**
 * A drawable spectrum of one entry: its first-order lines (engine) as Lorentzians of `widthHz`
 * on a grid fine enough for that width (5 points per FWHM), only near the lines.
 */
export function entrySpectrum(entry: LibraryEntry, nucleus: Nucleus, widthHz = 1.2): { x: number[]; y: number[] } {
  const mhz = entry.mhz;
  const lines = entryToLines(entry, nucleus, mhz);
  if (lines.length === 0) return { x: [], y: [] };
  const freq = nucleus === '1H' ? mhz : mhz * C13_PER_H1;
  const shifts = lines.map((l) => l.shift);
  const lo = Math.min(...shifts) - 0.15;
  const hi = Math.max(...shifts) + 0.15;
  const minW = Math.min(widthHz, ...lines.map((l) => l.widthHz ?? widthHz)) / freq;
  const step = Math.max(minW / 5, (hi - lo) / 20000);
  const x: number[] = [];
  const y: number[] = [];
  for (let v = lo; v <= hi; v += step) {
    let s = 0;
    for (const l of lines) {
      const w = (l.widthHz ?? widthHz) / freq;
      const d = v - l.shift;
      if (Math.abs(d) < 60 * w) s += l.area * lorentzianUnitArea(d, w);
    }
    x.push(v);
    y.push(s);
  }
  return { x, y };
}

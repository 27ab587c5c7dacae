import type { Signal1H } from '../../shared/libraryEntry';
import { multiplicityNeighbours } from '../../shared/multiplicity';

/** One simulated line: centre (ppm), area (in nuclei) and, for broad signals, its own FWHM (Hz). */
export interface SimLine {
  shift: number;
  area: number;
  widthHz?: number;
}

/**
 * Width given to an unresolved multiplet ("m", "br", "br m") drawn as one line, Hz. A first-order
 * pattern cannot be built without couplings, so the whole multiplet becomes one broad Lorentzian
 * with the signal's area; 10 Hz is a typical spread of a small unresolved multiplet (from memory).
 */
export const UNRESOLVED_MULTIPLET_WIDTH_HZ = 10;
/** Width given to a line marked broad ("br s", "br t") when the entry states none, Hz (from memory). */
export const BROAD_LINE_WIDTH_HZ = 5;

function binomialRow(n: number): number[] {
  const row = [1];
  for (let k = 1; k <= n; k++) row.push((row[k - 1] * (n - k + 1)) / k);
  return row;
}

/**
 * First-order lines of a 1H multiplet at spectrometer frequency `mhz` (MHz). Each splitting by n
 * equivalent neighbours with coupling J (Hz) replaces every line by n+1 lines at
 * (k − n/2)·J, k = 0…n, with binomial intensities C(n,k) (Pascal's triangle); several splittings
 * (dd, dt, td…) apply one after another, so intensities multiply. The areas sum to the signal's
 * nuclei count. Strong coupling (Δν/J not large) is out of scope.
 */
export function multipletToLines(signal: Signal1H, mhz: number): SimLine[] {
  if (!Number.isFinite(mhz) || mhz <= 0) throw new RangeError(`mhz must be a positive number, got ${mhz}`);
  if (!Number.isFinite(signal.shift)) throw new RangeError(`signal shift must be finite, got ${signal.shift}`);
  if (!Number.isInteger(signal.nuclei) || signal.nuclei <= 0) throw new RangeError(`signal nuclei must be a positive integer, got ${signal.nuclei}`);
  const neighbours = multiplicityNeighbours(signal.multiplicity);
  const broad = signal.multiplicity.trim().toLowerCase().startsWith('br');
  if (neighbours === null) {
    return [{ shift: signal.shift, area: signal.nuclei, widthHz: signal.widthHz ?? UNRESOLVED_MULTIPLET_WIDTH_HZ }];
  }
  const j = signal.j ?? [];
  if (j.length !== neighbours.length) {
    throw new RangeError(`multiplicity "${signal.multiplicity}" needs ${neighbours.length} coupling constant(s), got ${j.length}`);
  }
  let lines: { hz: number; w: number }[] = [{ hz: 0, w: 1 }];
  neighbours.forEach((n, i) => {
    const row = binomialRow(n);
    const next: { hz: number; w: number }[] = [];
    for (const line of lines) row.forEach((c, k) => next.push({ hz: line.hz + (k - n / 2) * j[i], w: line.w * c }));
    lines = next;
  });
  // Coinciding lines (e.g. a tt with J1 = 2·J2) are merged so a pattern is never counted twice.
  lines.sort((a, b) => a.hz - b.hz);
  const merged: { hz: number; w: number }[] = [];
  for (const line of lines) {
    const last = merged[merged.length - 1];
    if (last && Math.abs(last.hz - line.hz) < 1e-9) last.w += line.w;
    else merged.push({ ...line });
  }
  const total = merged.reduce((s, l) => s + l.w, 0);
  const width = signal.widthHz ?? (broad ? BROAD_LINE_WIDTH_HZ : undefined);
  return merged.map((l) => {
    const out: SimLine = { shift: signal.shift + l.hz / mhz, area: (signal.nuclei * l.w) / total };
    if (width !== undefined) out.widthHz = width;
    return out;
  });
}

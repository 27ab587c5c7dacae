/**
 * Converts a shift difference in ppm to Hz at the given spectrometer frequency:
 * Δν[Hz] = Δδ[ppm] × ν_ref[MHz] (IUPAC definition of δ as a ratio to ν_ref).
 */
export function ppmToHz(ppm: number, mhz: number): number {
  if (!Number.isFinite(ppm)) throw new RangeError(`ppm must be a finite number, got ${ppm}`);
  if (!Number.isFinite(mhz) || mhz <= 0) throw new RangeError(`spectrometer frequency must be a positive number of MHz, got ${mhz}`);
  return ppm * mhz;
}

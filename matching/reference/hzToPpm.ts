/** Converts a frequency difference in Hz to ppm: Δδ[ppm] = Δν[Hz] / ν_ref[MHz]. */
export function hzToPpm(hz: number, mhz: number): number {
  if (!Number.isFinite(hz)) throw new RangeError(`Hz must be a finite number, got ${hz}`);
  if (!Number.isFinite(mhz) || mhz <= 0) throw new RangeError(`spectrometer frequency must be a positive number of MHz, got ${mhz}`);
  return hz / mhz;
}

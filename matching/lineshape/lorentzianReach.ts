/**
 * Distance from the centre beyond which a Lorentzian of width `fwhm` stays below `cutoff` × its
 * height: from Γ²/(4x² + Γ²) = cutoff, x = (Γ/2)·√(1/cutoff − 1).
 */
export function lorentzianReach(fwhm: number, cutoff: number): number {
  if (!(fwhm > 0)) throw new RangeError(`fwhm must be positive, got ${fwhm}`);
  if (!(cutoff > 0 && cutoff < 1)) throw new RangeError(`cutoff must be in (0, 1), got ${cutoff}`);
  return (fwhm / 2) * Math.sqrt(1 / cutoff - 1);
}

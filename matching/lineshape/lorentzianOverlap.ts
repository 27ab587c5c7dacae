/**
 * ∫ L1(x) · L2(x − d) dx for two unit-area Lorentzians of widths fwhm1 and fwhm2 whose centres are
 * d apart. The convolution (and the correlation) of two Lorentzians is a Lorentzian whose FWHM is
 * the sum of the two, so the overlap is a unit-area Lorentzian of width fwhm1 + fwhm2 taken at d.
 * This closed form lets a peak-list fit build its normal equations without any grid.
 */
export function lorentzianOverlap(d: number, fwhm1: number, fwhm2: number): number {
  const g = fwhm1 + fwhm2;
  return (2 * g) / (Math.PI * (4 * d * d + g * g));
}

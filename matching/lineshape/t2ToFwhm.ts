/** Linewidth (FWHM, Hz) of a Lorentzian line with transverse relaxation time T2* (s): Γ = 1/(π·T2*). */
export function t2ToFwhm(t2Seconds: number): number {
  if (!(t2Seconds > 0) || !Number.isFinite(t2Seconds)) throw new RangeError(`T2* must be a positive number of seconds, got ${t2Seconds}`);
  return 1 / (Math.PI * t2Seconds);
}

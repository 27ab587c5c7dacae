import { calculateLorentzianHeight, lorentzianFct } from 'ml-peak-shape-generator';

/**
 * Lorentzian of unit area and full width at half maximum `fwhm`, at distance `x` from its centre
 * (same unit for x and fwhm): (2/(π·Γ)) · Γ²/(4x² + Γ²). The shape comes from
 * ml-peak-shape-generator (height 1 at the centre), scaled so the area is 1.
 */
export function lorentzianUnitArea(x: number, fwhm: number): number {
  return lorentzianFct(x, fwhm) * calculateLorentzianHeight({ fwhm, area: 1 });
}

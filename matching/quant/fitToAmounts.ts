import type { AmountResult, FitResult, InternalStandard } from '../../shared/analysis';
import { qnmrConcentration } from './qnmrConcentration';

export interface FitToAmountsOptions {
  /** Entry ids kept out of the mole fractions, e.g. shift references (default none). */
  excludeFromFractions?: string[];
}

/**
 * Amounts from a fit: mole fractions among the fitted compounds (amounts per nucleus are mole
 * ratios; the internal standard is left out of the fractions), and with an internal standard the
 * concentration of each compound by the qNMR equation c_A = (I_A/I_S)(N_S/N_A)c_S. Uncertainties
 * propagate the fit's standard uncertainties to first order, neglecting their correlations.
 */
export function fitToAmounts(fit: FitResult, standard?: InternalStandard, options: FitToAmountsOptions = {}): AmountResult[] {
  const leaveOut = new Set(options.excludeFromFractions ?? []);
  const std = standard ? fit.components.find((c) => c.entryId === standard.entryId) : undefined;
  if (standard && !std) {
    const why = fit.rejected.find((r) => r.entryId === standard.entryId);
    throw new RangeError(`internal standard "${standard.entryId}" was not fitted in the mixture${why ? ` (${why.message})` : ''}`);
  }
  const analytes = fit.components.filter((c) => c !== std && !leaveOut.has(c.entryId));
  const total = analytes.reduce((s, c) => s + c.amountPerNucleus, 0);
  const nucleiS = standard?.nuclei ?? std?.nuclei;
  return fit.components.map((c) => {
    const isStandard = c === std;
    const inFractions = analytes.includes(c);
    let moleFraction = 0;
    let moleFractionUncertainty: number | null = null;
    if (inFractions && total > 0) {
      moleFraction = c.amountPerNucleus / total;
      if (analytes.every((a) => a.amountUncertainty !== null)) {
        // ∂x_i/∂a_j = (δ_ij·S − a_i)/S² = (δ_ij − x_i)/S; σ_j/S is formed first so that no
        // power of S under- or overflows whatever the intensity unit.
        let v = 0;
        for (const a of analytes) {
          const t = ((a === c ? 1 : 0) - moleFraction) * (a.amountUncertainty! / total);
          v += t * t;
        }
        moleFractionUncertainty = Math.sqrt(v);
      }
    }
    let concentrationMM: number | null = null;
    let concentrationUncertaintyMM: number | null = null;
    if (isStandard && standard) {
      concentrationMM = standard.concentrationMM;
    } else if (std && standard && nucleiS !== undefined && std.integral > 0) {
      concentrationMM = qnmrConcentration({
        integralRatio: c.integral / std.integral,
        nucleiAnalyte: c.nuclei,
        nucleiStandard: nucleiS,
        concentrationStandard: standard.concentrationMM,
      });
      if (c.amountUncertainty !== null && std.amountUncertainty !== null && c.amountPerNucleus > 0) {
        const rel = Math.hypot(c.amountUncertainty / c.amountPerNucleus, std.amountUncertainty / std.amountPerNucleus);
        concentrationUncertaintyMM = concentrationMM * rel;
      }
    }
    return {
      entryId: c.entryId,
      name: c.name,
      moleFraction,
      inFractions,
      moleFractionUncertainty,
      concentrationMM,
      concentrationUncertaintyMM,
      snr: c.snr,
      belowQuantitationLimit: c.belowQuantitationLimit,
      isStandard,
    };
  });
}

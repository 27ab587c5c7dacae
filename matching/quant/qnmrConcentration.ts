export interface QnmrConcentrationInput {
  /** I_A / I_S: integral of the analyte's quantified signal over the standard's. */
  integralRatio: number;
  /** N_A, N_S: nuclei behind each integral. */
  nucleiAnalyte: number;
  nucleiStandard: number;
  /** c_S: concentration of the internal standard (any unit; the result has the same unit). */
  concentrationStandard: number;
}

function positive(name: string, v: number): void {
  if (!Number.isFinite(v) || v <= 0) throw new RangeError(`${name} must be a positive number, got ${v}`);
}

/**
 * qNMR internal-standard equation, amount form: c_A = (I_A/I_S)·(N_S/N_A)·c_S (same solution
 * volume; follows from I ∝ N·n, BIPM ISRD-03, Westwood et al., Rapport BIPM-2018/05, eq. 1).
 */
export function qnmrConcentration(input: QnmrConcentrationInput): number {
  const { integralRatio, nucleiAnalyte, nucleiStandard, concentrationStandard } = input;
  if (!Number.isFinite(integralRatio) || integralRatio < 0) throw new RangeError(`integralRatio must be a non-negative number, got ${integralRatio}`);
  positive('nucleiAnalyte', nucleiAnalyte);
  positive('nucleiStandard', nucleiStandard);
  positive('concentrationStandard', concentrationStandard);
  return integralRatio * (nucleiStandard / nucleiAnalyte) * concentrationStandard;
}

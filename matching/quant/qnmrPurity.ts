export interface QnmrPurityInput {
  /** I_A / I_S */
  integralRatio: number;
  nucleiAnalyte: number;
  nucleiStandard: number;
  /** M_A, M_S in g/mol */
  molarMassAnalyte: number;
  molarMassStandard: number;
  /** m_A, m_S weighed masses (same unit) */
  massAnalyte: number;
  massStandard: number;
  /** w_S: mass-fraction purity of the standard (0–1) */
  purityStandard: number;
}

/**
 * Mass-fraction purity by qNMR with an internal standard (BIPM ISRD-03, Westwood et al., Rapport
 * BIPM-2018/05, eq. 1; same structure in Pauli et al., J. Med. Chem. 2014, 57, 9220):
 * w_A = (I_A/I_S)·(N_S/N_A)·(M_A/M_S)·(m_S/m_A)·w_S.
 */
export function qnmrPurity(input: QnmrPurityInput): number {
  for (const [k, v] of Object.entries(input)) {
    if (!Number.isFinite(v) || v <= 0) throw new RangeError(`${k} must be a positive number, got ${v}`);
  }
  if (input.purityStandard > 1) throw new RangeError(`purityStandard is a mass fraction (0–1), got ${input.purityStandard}`);
  const { integralRatio, nucleiAnalyte, nucleiStandard, molarMassAnalyte, molarMassStandard, massAnalyte, massStandard, purityStandard } = input;
  return integralRatio * (nucleiStandard / nucleiAnalyte) * (molarMassAnalyte / molarMassStandard) * (massStandard / massAnalyte) * purityStandard;
}

import type { FitResult, InternalStandard, PurityInput, PurityResult } from '../../shared/analysis';
import type { LibraryEntry } from '../../shared/libraryEntry';
import { formulaMolarMass } from './formulaMolarMass';
import { qnmrPurity } from './qnmrPurity';

function molarMass(entry: LibraryEntry): number {
  try {
    return formulaMolarMass(entry.formula);
  } catch (e) {
    throw new RangeError(`entry "${entry.id}": ${(e as Error).message}`, { cause: e });
  }
}

/**
 * Mass-fraction purity of one fitted analyte against the fitted internal standard (BIPM ISRD-03,
 * Westwood et al., Rapport BIPM-2018/05, eq. 1), molar masses from the entries' formulas. The
 * uncertainty carries the fit's part only (the two integrals, correlation neglected).
 */
export function fitToPurity(fit: FitResult, standard: InternalStandard, input: PurityInput, entries: LibraryEntry[]): PurityResult {
  const find = (id: string, what: string) => {
    const c = fit.components.find((x) => x.entryId === id);
    if (!c) throw new RangeError(`${what} "${id}" was not fitted in the mixture, so its purity cannot be computed`);
    const e = entries.find((x) => x.id === id);
    if (!e) throw new RangeError(`${what} "${id}" is not in the library`);
    return { c, e };
  };
  const a = find(input.entryId, 'analyte');
  const s = find(standard.entryId, 'internal standard');
  const molarMassAnalyte = molarMass(a.e);
  const molarMassStandard = molarMass(s.e);
  const massFraction = qnmrPurity({
    integralRatio: a.c.integral / s.c.integral,
    nucleiAnalyte: a.c.nuclei,
    nucleiStandard: standard.nuclei ?? s.c.nuclei,
    molarMassAnalyte,
    molarMassStandard,
    massAnalyte: input.analyteMassMg,
    massStandard: input.standardMassMg,
    purityStandard: input.standardPurity,
  });
  const ua = a.c.amountUncertainty;
  const us = s.c.amountUncertainty;
  const uncertainty = ua !== null && us !== null ? massFraction * Math.hypot(ua / a.c.amountPerNucleus, us / s.c.amountPerNucleus) : null;
  return { entryId: input.entryId, massFraction, uncertainty, molarMassAnalyte, molarMassStandard };
}

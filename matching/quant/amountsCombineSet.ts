import type { AmountResult, FitComponent } from '../../shared/analysis';

export interface CombinedAmount {
  amountPerNucleus: number;
  amountUncertainty: number | null;
  moleFraction: number;
  moleFractionUncertainty: number | null;
  concentrationMM: number | null;
  concentrationUncertaintyMM: number | null;
}

const quadrature = (xs: (number | null)[]): number | null => (xs.every((x) => x !== null) ? Math.hypot(...(xs as number[])) : null);

/**
 * Combined amount of compounds the data cannot tell apart: sums of their amounts per nucleus
 * (mole ratios), mole fractions and qNMR concentrations. Uncertainties add in quadrature; the
 * members' correlation is left out, and for look-alikes it is negative (what one gains the other
 * loses), so the stated uncertainty of the sum errs on the large side.
 */
export function amountsCombineSet(members: readonly string[], components: readonly FitComponent[], amounts: readonly AmountResult[]): CombinedAmount {
  if (members.length === 0) throw new RangeError('a combined amount needs at least one member');
  const comps = members.map((id) => {
    const c = components.find((x) => x.entryId === id);
    if (!c) throw new RangeError(`"${id}" is not a fitted component`);
    return c;
  });
  const rows = members.map((id) => {
    const a = amounts.find((x) => x.entryId === id);
    if (!a) throw new RangeError(`"${id}" has no amount row`);
    return a;
  });
  const withConc = rows.every((r) => r.concentrationMM !== null);
  return {
    amountPerNucleus: comps.reduce((s, c) => s + c.amountPerNucleus, 0),
    amountUncertainty: quadrature(comps.map((c) => c.amountUncertainty)),
    moleFraction: Math.min(1, rows.reduce((s, r) => s + r.moleFraction, 0)),
    moleFractionUncertainty: quadrature(rows.map((r) => r.moleFractionUncertainty)),
    concentrationMM: withConc ? rows.reduce((s, r) => s + r.concentrationMM!, 0) : null,
    concentrationUncertaintyMM: withConc ? quadrature(rows.map((r) => r.concentrationUncertaintyMM)) : null,
  };
}

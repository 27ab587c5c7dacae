import type { Mixture } from '../../shared/mixture';
import type { ShiftReference } from '../../shared/solvent';
import { mixtureReferenceFind, type ReferenceFindOptions } from './mixtureReferenceFind';

/**
 * Shifts a mixture so that its reference compound's signal (TMS, DSS or TSP, all defined as
 * 0.00 ppm; IUPAC 2001 recommendations) sits at 0.00. Returns a new mixture; the input is not
 * changed. Throws RangeError when no peak lies within the search window around 0.
 */
export function mixtureReference<M extends Mixture>(mixture: M, reference?: ShiftReference, options: ReferenceFindOptions = {}): M {
  const ref = reference ?? mixture.reference;
  if (ref === 'none') throw new RangeError('cannot reference a mixture without a reference compound (reference is "none")');
  const found = mixtureReferenceFind(mixture, options);
  if (found === null) {
    const w = options.windowPpm ?? (mixture.nucleus === '13C' ? 2 : 0.2);
    throw new RangeError(`no ${ref} reference peak found within ±${w} ppm of 0`);
  }
  const offset = found;
  if (mixture.kind === 'peaks') {
    return { ...mixture, reference: ref, peaks: mixture.peaks.map((p) => ({ ...p, shift: p.shift - offset })) } as M;
  }
  return { ...mixture, reference: ref, ppm: mixture.ppm.map((x) => x - offset) } as M;
}

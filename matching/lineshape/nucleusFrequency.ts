import type { Nucleus } from '../../shared/nucleus';

/**
 * Unified-scale frequency ratios Ξ/100 (R. K. Harris et al., Pure Appl. Chem. 2001, 73, 1795, Table 1):
 * the reference frequency of a nucleus when 1H of TMS resonates at 1 MHz.
 */
const XI: Record<Nucleus, number> = { '1H': 1, '13C': 0.2514502 };

/** Spectrometer frequency (MHz) of `nucleus` on a magnet whose 1H frequency is `mhz`. */
export function nucleusFrequency(nucleus: Nucleus, mhz: number): number {
  if (!Number.isFinite(mhz) || mhz <= 0) throw new RangeError(`mhz must be a positive number, got ${mhz}`);
  return XI[nucleus] * mhz;
}

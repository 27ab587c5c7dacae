import { z } from 'zod';

/** Observed nucleus. 2D experiments (HSQC) will be added as pairs later; nothing assumes 1H. */
export const NucleusSchema = z.enum(['1H', '13C']);
export type Nucleus = z.infer<typeof NucleusSchema>;

/** Default matching tolerance per nucleus, in ppm (common practice; see README "Screening"). */
export const DEFAULT_TOLERANCE_PPM: Record<Nucleus, number> = { '1H': 0.03, '13C': 0.5 };

/** Usual shift ranges, ppm, used by the soundness checks (common practice, from memory). */
export const USUAL_SHIFT_RANGE_PPM: Record<Nucleus, readonly [number, number]> = {
  '1H': [-1, 16],
  '13C': [-10, 230],
};

/**
 * Hard limit on any stated shift, ppm. Diamagnetic 1H and 13C shifts stay well inside ±400 ppm
 * (common practice); anything beyond ±1000 is a unit mix-up (Hz for ppm), not a shift.
 */
export const SHIFT_LIMIT_PPM = 1000;
export const ShiftPpmSchema = z
  .number()
  .finite()
  .min(-SHIFT_LIMIT_PPM, `a shift must lie within ±${SHIFT_LIMIT_PPM} ppm (is it in Hz?)`)
  .max(SHIFT_LIMIT_PPM, `a shift must lie within ±${SHIFT_LIMIT_PPM} ppm (is it in Hz?)`);

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

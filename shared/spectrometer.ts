import { z } from 'zod';

/**
 * Spectrometer 1H frequency, MHz. Bench-top instruments start near 40 MHz and the highest fields
 * in service are near 1.2 GHz (common practice); the bounds leave room either side, and the lower
 * one keeps Hz → ppm conversions (J / MHz) finite for every coupling an entry may state.
 */
export const SPECTROMETER_MHZ_RANGE = [10, 2000] as const;

export const SpectrometerMhzSchema = z
  .number()
  .finite()
  .min(SPECTROMETER_MHZ_RANGE[0], `spectrometer frequency must be at least ${SPECTROMETER_MHZ_RANGE[0]} MHz (the 1H frequency, e.g. 60 or 400)`)
  .max(SPECTROMETER_MHZ_RANGE[1], `spectrometer frequency must be at most ${SPECTROMETER_MHZ_RANGE[1]} MHz (the 1H frequency, e.g. 60 or 400)`);

/** Largest coupling constant an entry may state, Hz (1H–1H couplings stay under 20 Hz; 1H–31P can reach ~700 Hz; common practice). */
export const MAX_COUPLING_HZ = 1000;

/**
 * A line's full width at half height, Hz. Solution lines are about 0.5–2 Hz and broad humps reach
 * hundreds (common practice); below 0.01 Hz a Lorentzian is narrower than any digitised axis.
 */
export const LINE_WIDTH_HZ_RANGE = [0.01, 1000] as const;
export const LineWidthHzSchema = z
  .number()
  .finite()
  .min(LINE_WIDTH_HZ_RANGE[0], `a line width must be at least ${LINE_WIDTH_HZ_RANGE[0]} Hz`)
  .max(LINE_WIDTH_HZ_RANGE[1], `a line width must be at most ${LINE_WIDTH_HZ_RANGE[1]} Hz`);

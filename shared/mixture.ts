import { z } from 'zod';
import { NucleusSchema, ShiftPpmSchema } from './nucleus';
import { ShiftReferenceSchema, SolventSchema } from './solvent';
import { LineWidthHzSchema, SpectrometerMhzSchema } from './spectrometer';

export const IntensityKindSchema = z.enum(['height', 'integral']);
export type IntensityKind = z.infer<typeof IntensityKindSchema>;

/**
 * Intensities are in any unit, but squares of their sums must stay finite in the fit: beyond
 * 1e100 a value is a unit or file error, not a measurement.
 */
export const MAX_INTENSITY = 1e100;
const intensityValue = z.number().finite().min(-MAX_INTENSITY, 'an intensity must be at least -1e100').max(MAX_INTENSITY, 'an intensity must be at most 1e100');

/** One observed peak of a mixture peak list. */
export const MixturePeakSchema = z.object({
  shift: ShiftPpmSchema.describe('δ, ppm'),
  intensity: intensityValue.nonnegative(),
  widthHz: LineWidthHzSchema.optional().describe('FWHM, Hz'),
});
export type MixturePeak = z.infer<typeof MixturePeakSchema>;

const mixtureCommon = {
  id: z.string().optional(),
  name: z.string().trim().min(1).default('mixture'),
  nucleus: NucleusSchema.default('1H'),
  solvent: SolventSchema.default('other'),
  mhz: SpectrometerMhzSchema.describe('spectrometer 1H frequency, MHz'),
  reference: ShiftReferenceSchema.default('TMS'),
  demo: z.boolean().optional().describe('true for invented demo data'),
};

export const PeakListMixtureSchema = z.object({
  kind: z.literal('peaks'),
  ...mixtureCommon,
  intensityKind: IntensityKindSchema.default('height'),
  peaks: z.array(MixturePeakSchema),
});
export type PeakListMixture = z.infer<typeof PeakListMixtureSchema>;

/** Fewest points a spectrum may have: peak picking needs a neighbourhood and a noise estimate. */
export const MIN_SPECTRUM_POINTS = 5;

export const SpectrumMixtureSchema = z
  .object({
    kind: z.literal('spectrum'),
    ...mixtureCommon,
    ppm: z.array(ShiftPpmSchema).min(MIN_SPECTRUM_POINTS, `a spectrum needs at least ${MIN_SPECTRUM_POINTS} points`),
    intensity: z.array(intensityValue).min(MIN_SPECTRUM_POINTS, `a spectrum needs at least ${MIN_SPECTRUM_POINTS} points`),
  })
  .superRefine((s, ctx) => {
    if (s.ppm.length !== s.intensity.length) ctx.addIssue({ code: 'custom', message: 'ppm and intensity must have the same length', path: ['intensity'] });
    const dir = Math.sign(s.ppm[1] - s.ppm[0]);
    for (let i = 1; i < s.ppm.length; i++) {
      const step = s.ppm[i] - s.ppm[i - 1];
      if (dir === 0 || Math.sign(step) !== dir) {
        ctx.addIssue({ code: 'custom', message: `the ppm axis must be strictly monotonic (point ${i}: ${s.ppm[i]} after ${s.ppm[i - 1]})`, path: ['ppm', i] });
        return;
      }
    }
  });
export type SpectrumMixture = z.infer<typeof SpectrumMixtureSchema>;

export const MixtureSchema = z.discriminatedUnion('kind', [PeakListMixtureSchema, SpectrumMixtureSchema]);
export type Mixture = z.infer<typeof MixtureSchema>;

import { z } from 'zod';
import { NucleusSchema } from './nucleus';
import { ShiftReferenceSchema, SolventSchema } from './solvent';

export const IntensityKindSchema = z.enum(['height', 'integral']);
export type IntensityKind = z.infer<typeof IntensityKindSchema>;

/** One observed peak of a mixture peak list. */
export const MixturePeakSchema = z.object({
  shift: z.number().finite().describe('δ, ppm'),
  intensity: z.number().finite().nonnegative(),
  widthHz: z.number().finite().positive().optional().describe('FWHM, Hz'),
});
export type MixturePeak = z.infer<typeof MixturePeakSchema>;

const mixtureCommon = {
  id: z.string().optional(),
  name: z.string().trim().min(1).default('mixture'),
  nucleus: NucleusSchema.default('1H'),
  solvent: SolventSchema.default('other'),
  mhz: z.number().positive().max(2000).describe('spectrometer 1H frequency, MHz'),
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

export const SpectrumMixtureSchema = z
  .object({
    kind: z.literal('spectrum'),
    ...mixtureCommon,
    ppm: z.array(z.number().finite()).min(2),
    intensity: z.array(z.number().finite()).min(2),
  })
  .refine((s) => s.ppm.length === s.intensity.length, { message: 'ppm and intensity must have the same length', path: ['intensity'] });
export type SpectrumMixture = z.infer<typeof SpectrumMixtureSchema>;

export const MixtureSchema = z.discriminatedUnion('kind', [PeakListMixtureSchema, SpectrumMixtureSchema]);
export type Mixture = z.infer<typeof MixtureSchema>;

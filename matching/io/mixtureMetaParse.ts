import { z } from 'zod';
import type { InputIssue } from '../../shared/inputIssue';
import { IntensityKindSchema } from '../../shared/mixture';
import { NucleusSchema } from '../../shared/nucleus';
import { ShiftReferenceSchema, SolventSchema } from '../../shared/solvent';
import { SpectrometerMhzSchema } from '../../shared/spectrometer';

/** What an importer is told about a mixture besides its data (a file may also say some of it). */
export const MixtureMetaSchema = z.object({
  id: z.string().optional(),
  name: z.string().trim().min(1).optional(),
  nucleus: NucleusSchema.optional(),
  solvent: SolventSchema.optional(),
  mhz: SpectrometerMhzSchema.optional(),
  reference: ShiftReferenceSchema.optional(),
  intensityKind: IntensityKindSchema.optional(),
  demo: z.boolean().optional(),
  /** Force the reading of a delimited text file as a peak list or a spectrum. */
  kind: z.enum(['peaks', 'spectrum']).optional(),
});
export type MixtureMeta = z.infer<typeof MixtureMetaSchema>;

/** Validates importer metadata; problems come back as InputIssues (field = the key). */
export function mixtureMetaParse(meta: unknown): { meta: MixtureMeta; issues: InputIssue[] } {
  const r = MixtureMetaSchema.safeParse(meta ?? {});
  if (r.success) return { meta: r.data, issues: [] };
  return { meta: {}, issues: r.error.issues.map((i) => ({ field: i.path.join('.') || 'meta', message: i.message })) };
}

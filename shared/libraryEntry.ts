import { z } from 'zod';
import { multiplicityNeighbours, MultiplicitySchema } from './multiplicity';
import { SolventSchema } from './solvent';
import { ShiftPpmSchema } from './nucleus';
import { LineWidthHzSchema, MAX_COUPLING_HZ, SpectrometerMhzSchema } from './spectrometer';

/** One 1H multiplet: centre shift, first-order multiplicity, couplings (Hz), nuclei count. */
export const Signal1HSchema = z
  .object({
    nucleus: z.literal('1H'),
    shift: ShiftPpmSchema.describe('centre chemical shift δ, ppm'),
    multiplicity: MultiplicitySchema,
    j: z.array(z.number().finite().positive().max(MAX_COUPLING_HZ, `a coupling constant must be at most ${MAX_COUPLING_HZ} Hz`)).default([]).describe('coupling constants, Hz, one per splitting letter'),
    nuclei: z.number().int().positive().describe('number of equivalent nuclei in the signal'),
    label: z.string().max(40).optional().describe('group label, e.g. "CH3"'),
    exchangeable: z.boolean().optional().describe('OH/NH: position varies, may be absent'),
    widthHz: LineWidthHzSchema.max(100, 'a natural line width must be at most 100 Hz').optional().describe('natural line width (FWHM) if known, Hz'),
  })
  .superRefine((s, ctx) => {
    let neighbours: number[] | null;
    try {
      neighbours = multiplicityNeighbours(s.multiplicity);
    } catch {
      return; // reported by MultiplicitySchema
    }
    if (neighbours !== null && neighbours.length !== s.j.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['j'],
        message: `multiplicity "${s.multiplicity}" needs ${neighbours.length} coupling constant(s), got ${s.j.length}`,
      });
    }
  });
export type Signal1H = z.infer<typeof Signal1HSchema>;

export const CarbonTypeSchema = z.enum(['C', 'CH', 'CH2', 'CH3']);
export type CarbonType = z.infer<typeof CarbonTypeSchema>;

/** One 13C signal (proton-decoupled): shift and optional carbon type as DEPT gives it. */
export const Signal13CSchema = z.object({
  nucleus: z.literal('13C'),
  shift: ShiftPpmSchema.describe('chemical shift δ, ppm'),
  carbonType: CarbonTypeSchema.optional(),
  nuclei: z.number().int().positive().default(1).describe('number of equivalent carbons'),
  label: z.string().max(40).optional(),
});
export type Signal13C = z.infer<typeof Signal13CSchema>;

export const SignalSchema = z.discriminatedUnion('nucleus', [Signal1HSchema, Signal13CSchema]);
export type Signal = z.infer<typeof SignalSchema>;

export const EntryCategorySchema = z.enum(['demo', 'contaminant', 'reference', 'user']);
export type EntryCategory = z.infer<typeof EntryCategorySchema>;

/** A reference-library compound entry. `id` is stable across revisions. */
export const LibraryEntrySchema = z.object({
  id: z.string().trim().min(1).max(80).regex(/^[A-Za-z0-9._:-]+$/, 'id may hold letters, digits and . _ : - only'),
  name: z.string().trim().min(1).max(200),
  synonyms: z.array(z.string().trim().min(1)).default([]),
  formula: z.string().trim().min(1).max(100).describe('molecular formula, Hill order, e.g. C2H6O'),
  smiles: z.string().trim().min(1).optional(),
  category: EntryCategorySchema,
  source: z.string().trim().min(1).describe('citation (author, journal, year, table) or submitter'),
  solvent: SolventSchema,
  mhz: SpectrometerMhzSchema.describe('spectrometer 1H frequency the data were recorded at, MHz'),
  temperatureC: z.number().min(-150).max(200).optional(),
  pH: z.number().min(-2).max(16).optional(),
  signals: z.array(SignalSchema).min(1, 'an entry needs at least one signal'),
  nearDuplicateOf: z.array(z.string()).optional().describe('ids of entries this one is knowingly close to'),
  studentWork: z.boolean().optional(),
  notes: z.string().optional(),
  revision: z.number().int().positive().optional(),
  retired: z.boolean().optional(),
});
export type LibraryEntry = z.infer<typeof LibraryEntrySchema>;
export type LibraryEntryInput = z.input<typeof LibraryEntrySchema>;

/** The library exchange file: import/export, CLI, server seed. */
export const LIBRARY_FORMAT = 'tessera-library' as const;
export const LIBRARY_FORMAT_VERSION = 1 as const;
export const LibraryFileSchema = z.object({
  format: z.literal(LIBRARY_FORMAT),
  version: z.literal(LIBRARY_FORMAT_VERSION),
  title: z.string().optional(),
  entries: z.array(LibraryEntrySchema),
});
export type LibraryFile = z.infer<typeof LibraryFileSchema>;

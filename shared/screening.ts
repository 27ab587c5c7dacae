import { z } from 'zod';
import { EntryCategorySchema } from './libraryEntry';
import { NucleusSchema } from './nucleus';

/**
 * Options of a screening run. Every field is optional; defaults are applied by the engine when it
 * unpacks them (see matching/screen/screenMixture.ts), so a stored options object stays small.
 */
export const ScreenOptionsSchema = z.object({
  tolerancePpm: z.number().positive().max(10).optional().describe('shift window half-width, ppm; default DEFAULT_TOLERANCE_PPM[nucleus]'),
  excludeSolvent: z.boolean().optional().describe('drop peaks inside residual-solvent and water regions; default true'),
  waterHalfWidthPpm: z.number().positive().max(2).optional().describe('half-width of the water region, ppm; default 0.05 (1H), 0.5 (13C)'),
  excludeReference: z.boolean().optional().describe('drop the reference peak at 0 ppm (when the mixture names one); default true'),
  minScore: z.number().min(0).max(1).optional().describe('candidates below this score are not reported; default 0.5'),
  snrThreshold: z.number().positive().optional().describe('minimum S/N for a picked spectrum peak; default 3 (ICH Q2(R1) common practice)'),
  includeRetired: z.boolean().optional().describe('screen retired entries too; default false'),
  anySolvent: z.boolean().optional().describe('also screen entries recorded in another solvent; default false (shifts move with the solvent)'),
  maxCandidates: z.number().int().positive().optional().describe('report at most this many candidates (best first); default 100'),
});
export type ScreenOptions = z.infer<typeof ScreenOptionsSchema>;

export const ExclusionReasonSchema = z.enum(['solvent', 'water', 'reference', 'below-snr']);
export type ExclusionReason = z.infer<typeof ExclusionReasonSchema>;

/** A mixture peak the screening used. `index` is its position in ScreenResult.peaksUsed (sorted by shift). */
export const UsedPeakSchema = z.object({
  index: z.number().int().nonnegative(),
  sourceIndex: z.number().int().nonnegative().describe('position in the original peak list, or in the picked peak list of a spectrum'),
  shift: z.number().finite(),
  intensity: z.number().finite().nonnegative(),
  widthHz: z.number().finite().positive().optional(),
  snr: z.number().finite().nullable().describe('signal-to-noise ratio; null for a peak list without noise information'),
  integral: z.number().finite().optional(),
});
export type UsedPeak = z.infer<typeof UsedPeakSchema>;

export const ExcludedPeakSchema = z.object({
  sourceIndex: z.number().int().nonnegative(),
  shift: z.number().finite(),
  intensity: z.number().finite(),
  snr: z.number().finite().nullable(),
  reason: ExclusionReasonSchema,
  detail: z.string().describe('e.g. "residual CHCl3 7.26 ppm (Gottlieb 1997)"'),
});
export type ExcludedPeak = z.infer<typeof ExcludedPeakSchema>;

/** How one library multiplet was explained by mixture peaks. */
export const SignalEvidenceSchema = z.object({
  signalIndex: z.number().int().nonnegative().describe('position in entry.signals'),
  label: z.string().optional(),
  shift: z.number().finite().describe('library centre shift, ppm'),
  multiplicity: z.string().optional(),
  nuclei: z.number().int().positive(),
  exchangeable: z.boolean(),
  hidden: z.boolean().describe('inside an excluded region: optional, like an exchangeable signal'),
  peakIndices: z.array(z.number().int().nonnegative()).describe('indices into ScreenResult.peaksUsed'),
  linePpm: z.array(z.number().finite()).describe('for each of peakIndices, the first-order line position (ppm, at the mixture MHz) it was matched to'),
  linesMatched: z.number().int().nonnegative(),
  linesExpected: z.number().int().positive(),
  deltaPpm: z.number().finite().describe('mean signed (observed − expected) over matched lines, ppm'),
  intensity: z.number().finite().nonnegative().describe('summed matched intensity, corrected for missing lines'),
  intensityPerNucleus: z.number().finite().nonnegative(),
  ratio: z.number().finite().nonnegative().describe('intensityPerNucleus divided by the entry median; 1 = consistent'),
});
export type SignalEvidence = z.infer<typeof SignalEvidenceSchema>;

export const UnmatchedSignalSchema = z.object({
  signalIndex: z.number().int().nonnegative(),
  label: z.string().optional(),
  shift: z.number().finite(),
  multiplicity: z.string().optional(),
  nuclei: z.number().int().positive(),
  exchangeable: z.boolean().describe('true: optional signal, not penalised'),
  hidden: z.boolean().describe('true: inside an excluded solvent/water/reference region, not penalised'),
});
export type UnmatchedSignal = z.infer<typeof UnmatchedSignalSchema>;

export const ScreenCandidateSchema = z.object({
  rank: z.number().int().positive(),
  entryId: z.string(),
  name: z.string(),
  category: EntryCategorySchema,
  contaminant: z.boolean().describe('true for solvent/impurity entries, so a screen can flag them'),
  score: z.number().min(0).max(1),
  explainedShare: z.number().min(0).max(1).describe('share of the entry nuclei explained (exchangeable ones optional)'),
  shiftFactor: z.number().min(0).max(1),
  intensityFactor: z.number().min(0).max(1),
  intensityCv: z.number().nonnegative().nullable().describe('coefficient of variation of intensity per nucleus; null with < 2 matched signals'),
  evidence: z.array(SignalEvidenceSchema),
  unmatched: z.array(UnmatchedSignalSchema),
  ambiguityGroup: z.string().nullable().describe('id of the group of indistinguishable candidates, or null'),
  shadowedBy: z.array(z.string()).describe('candidate entry ids whose matched peaks include every peak this one matched'),
});
export type ScreenCandidate = z.infer<typeof ScreenCandidateSchema>;

export const AmbiguityGroupSchema = z.object({
  id: z.string(),
  members: z.array(z.string()).min(2),
  peakIndices: z.array(z.number().int().nonnegative()).describe('the mixture peaks they all explain'),
});
export type AmbiguityGroup = z.infer<typeof AmbiguityGroupSchema>;

export const ScreenCrowdingSchema = z
  .object({
    windowHitShare: z.number().min(0).max(1).describe('share of library signal windows (lines ± tolerance, displaced by ±20 tolerances so present compounds do not count) that hold a mixture peak'),
    entriesAllHitShare: z.number().min(0).max(1).describe('share of library entries with a mixture peak in every required signal window: what a random entry gets by chance'),
    entriesSampled: z.number().int().nonnegative().describe('library entries the two shares were measured on (up to 500, evenly spaced)'),
    warning: z.string().nullable().describe('set when the mixture is crowded for this tolerance (windowHitShare ≥ 0.4)'),
  })
  .describe('how crowded the mixture is for the tolerance, seen from the library');
export type ScreenCrowding = z.infer<typeof ScreenCrowdingSchema>;

export const ScreenResultSchema = z.object({
  mixtureName: z.string(),
  nucleus: NucleusSchema,
  mhz: z.number().positive(),
  tolerancePpm: z.number().positive(),
  minScore: z.number().min(0).max(1),
  noise: z.number().finite().nullable().describe('noise standard deviation of a spectrum; null for a peak list'),
  entriesScreened: z.number().int().nonnegative(),
  candidates: z.array(ScreenCandidateSchema),
  candidatesAboveThreshold: z.number().int().nonnegative().describe('how many entries reached minScore; more than candidates.length when maxCandidates cut the list'),
  ambiguityGroups: z.array(AmbiguityGroupSchema),
  peaksUsed: z.array(UsedPeakSchema),
  peaksExcluded: z.array(ExcludedPeakSchema),
  unexplainedPeaks: z.array(z.number().int().nonnegative()).describe('indices of used peaks no reported candidate explains'),
  crowding: ScreenCrowdingSchema,
  caution: z.string(),
});
export type ScreenResult = z.infer<typeof ScreenResultSchema>;

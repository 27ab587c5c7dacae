import { z } from 'zod';
import { ScreenOptionsSchema } from './screening';
import { LineWidthHzSchema } from './spectrometer';

const finite = z.number().finite();

/** Options of the overlay fit. Defaults are applied by the engine when it unpacks them. */
export const FitOptionsSchema = z.object({
  linewidthHz: LineWidthHzSchema.optional().describe('FWHM of every simulated line, Hz; default: estimated from the mixture'),
  tolerancePpm: z.number().nonnegative().max(1).optional().describe('largest common shift offset per candidate, ppm; default DEFAULT_TOLERANCE_PPM of the nucleus'),
  refineShifts: z.boolean().optional().describe('search a common shift offset per candidate (default true)'),
  minShare: z.number().min(0).max(1).optional().describe('candidates explaining less than this share of the mixture intensity are rejected (default 0.002)'),
  cutoff: z.number().positive().max(0.1).optional().describe('a spectrum column is evaluated where a line exceeds cutoff × its height (default 1e-9: Lorentzian tails are long; larger values trade precision for speed)'),
  noiseLevel: z.number().positive().optional().describe('RMS noise of the mixture intensities; default: estimated (spectra) or unknown (peak lists)'),
  unexplainedFraction: z.number().min(0).max(1).optional().describe('a mixture peak is unexplained when the fit reaches less than this fraction of it (default 0.5)'),
  minCoverage: z.number().min(0).max(1).optional().describe('candidates whose nuclei the mixture supports less than this share of are rejected (default 0: off — on picked peak lists a true compound can fall below 0.5)'),
  ownLineRequired: z.boolean().optional().describe('reject a candidate with no supported line at least a linewidth from every other fitted line (default: true for peak lists, false for spectra — a picked list keeps no line shapes, so intensity under another compound\'s line is no evidence there)'),
  keepIds: z.array(z.string()).optional().describe('entry ids the own-line rule never rejects, e.g. a named internal standard (its amount is then reported even when its signal is shared)'),
  lookAlikes: z.array(z.array(z.string())).optional().describe('sets of entry ids said to be alike (near duplicates, screening ambiguity groups): a member sharing its lines with a fitted member of its set is kept and reported with it, not rejected for want of an own line'),
  curves: z.boolean().optional().describe('return the axis and curves (default true; false leaves them empty, e.g. for decoy fits)'),
  componentCurves: z.boolean().optional().describe('with curves, also return each component’s contribution curve on the axis (default true; false leaves FitComponent.curve empty — FitComponent.lines gives the same curve through fittedLinesCurve, without storing one number per point per compound)'),
  includeExchangeable: z.boolean().optional().describe('simulate OH/NH signals marked exchangeable too (default false: their position and width vary)'),
});
export type FitOptions = z.infer<typeof FitOptionsSchema>;

export const RejectionReasonSchema = z.enum(['zero-amount', 'below-share', 'below-detection', 'missing-signals', 'no-own-line', 'no-lines']);
export type RejectionReason = z.infer<typeof RejectionReasonSchema>;

/** One fitted Lorentzian line of a component: its contribution is area · (w/2π) / ((δ − shift)² + (w/2)²). */
export const FittedLineSchema = z.object({
  shift: finite.describe('line centre with the component’s shift offset, ppm'),
  area: finite.nonnegative().describe('fitted area of the line, mixture intensity × ppm'),
  widthPpm: finite.positive().describe('full width at half height, ppm'),
});
export type FittedLine = z.infer<typeof FittedLineSchema>;

/** One candidate kept by the fit. Amounts are per nucleus, so they compare as mole ratios. */
export const FitComponentSchema = z.object({
  entryId: z.string(),
  name: z.string(),
  amountPerNucleus: finite.nonnegative().describe('fitted integral per nucleus, mixture intensity × ppm'),
  amountUncertainty: finite.nonnegative().nullable().describe('standard uncertainty of amountPerNucleus from σ²(AᵀA)⁻¹; null if undetermined'),
  integral: finite.nonnegative().describe('fitted integral of all the candidate’s lines'),
  nuclei: z.number().int().positive().describe('nuclei of the candidate’s signals in this nucleus'),
  share: finite.min(0).max(1).describe('share of the mixture intensity the candidate explains'),
  shiftOffsetPpm: finite.describe('common shift offset applied to all its signals, ppm'),
  uniqueness: finite.min(0).max(1).describe('share of its contribution no other candidate can take over'),
  coverage: finite.min(0).max(1).describe('nuclei-weighted share of its signals the mixture supports'),
  resolvedLines: finite.nonnegative().describe('supported lines separated by at least one linewidth'),
  distinctLines: finite.nonnegative().optional().describe('resolved lines that are also at least one linewidth from every line of the other fitted candidates: evidence no other candidate shares'),
  snr: finite.nonnegative().nullable().describe('height of its tallest fitted line / RMS noise; null when the noise is unknown'),
  belowQuantitationLimit: z.boolean().describe('true when snr < 10 (ICH Q2(R1) quantitation limit, common practice)'),
  identifiable: z.boolean().optional().describe('false when the compound is in an AnalysisReport.indistinguishable set: this data fixes only the set’s combined amount, not this compound’s own; absent from a bare fit'),
  lines: z.array(FittedLineSchema).optional().describe('its fitted lines (absent from reports stored before they were added): the contribution curve, exactly, at any resolution'),
  curve: z.array(finite).describe('contribution on FitResult.axis; empty when the fit was asked for no component curves'),
});
export type FitComponent = z.infer<typeof FitComponentSchema>;

export const RejectedCandidateSchema = z.object({
  entryId: z.string(),
  name: z.string(),
  reason: RejectionReasonSchema,
  message: z.string(),
  share: finite.min(0).max(1),
});
export type RejectedCandidate = z.infer<typeof RejectedCandidateSchema>;

export const UnexplainedPeakSchema = z.object({ shift: finite, intensity: finite, fitted: finite });
export type UnexplainedPeak = z.infer<typeof UnexplainedPeakSchema>;

export const FitResultSchema = z.object({
  kind: z.enum(['spectrum', 'peaks']),
  linewidthHz: finite.positive(),
  linewidthSource: z.enum(['option', 'mixture', 'default']),
  noiseLevel: finite.nonnegative().nullable(),
  components: z.array(FitComponentSchema),
  rejected: z.array(RejectedCandidateSchema),
  axis: z.array(finite).describe('ppm axis of the curves'),
  mixtureCurve: z.array(finite),
  fittedSum: z.array(finite),
  residual: z.array(finite),
  rSquared: finite.describe('uncentred: 1 − ‖y − ŷ‖²/‖y‖²'),
  unexplainedPeaks: z.array(UnexplainedPeakSchema),
});
export type FitResult = z.infer<typeof FitResultSchema>;

/** The internal standard named by the user: an entry fitted in the mixture, its concentration and nuclei. */
export const InternalStandardSchema = z.object({
  entryId: z.string().min(1),
  concentrationMM: z.number().finite().positive().describe('concentration of the standard in the sample, mmol/L'),
  nuclei: z.number().int().positive().optional().describe('nuclei behind the standard’s fitted integral; default: its entry’s nuclei'),
});
export type InternalStandard = z.infer<typeof InternalStandardSchema>;

/** Weighed masses for a qNMR purity assay of one analyte against the internal standard. */
export const PurityInputSchema = z.object({
  entryId: z.string().min(1).describe('the analyte whose purity is assayed'),
  analyteMassMg: z.number().finite().positive(),
  standardMassMg: z.number().finite().positive(),
  standardPurity: z.number().finite().positive().max(1).describe('mass fraction of the standard, 0–1'),
});
export type PurityInput = z.infer<typeof PurityInputSchema>;

export const PurityResultSchema = z.object({
  entryId: z.string(),
  massFraction: finite.nonnegative().describe('w_A by BIPM ISRD-03 eq. 1'),
  uncertainty: finite.nonnegative().nullable().describe('from the fit only (weighing and molar-mass uncertainties not included)'),
  molarMassAnalyte: finite.positive(),
  molarMassStandard: finite.positive(),
});
export type PurityResult = z.infer<typeof PurityResultSchema>;

export const AmountResultSchema = z.object({
  entryId: z.string(),
  name: z.string(),
  moleFraction: finite.min(0).max(1).describe('among the fitted compounds in the fractions (0 for those left out)'),
  inFractions: z.boolean().describe('false for the internal standard and shift-reference compounds'),
  moleFractionUncertainty: finite.nonnegative().nullable(),
  concentrationMM: finite.nonnegative().nullable().describe('qNMR internal-standard equation; null without a standard'),
  concentrationUncertaintyMM: finite.nonnegative().nullable(),
  snr: finite.nonnegative().nullable(),
  belowQuantitationLimit: z.boolean(),
  isStandard: z.boolean(),
  identifiable: z.boolean().optional().describe('false when the compound is in an AnalysisReport.indistinguishable set: its own moleFraction and concentration are how the fit happened to split the set’s amount, not a measurement; read the set’s combined amount instead'),
  indistinguishableSet: z.string().optional().describe('id of the AnalysisReport.indistinguishable set it belongs to'),
});
export type AmountResult = z.infer<typeof AmountResultSchema>;

export const QValueSchema = z.object({
  entryId: z.string(),
  score: finite.min(0),
  qValue: finite.min(0).max(1),
});
export type QValue = z.infer<typeof QValueSchema>;

/**
 * Fitted compounds this data cannot tell apart (library near duplicates, or members of one
 * screening ambiguity group, at least one of them without two resolved lines of its own): only
 * their combined amount is determined.
 */
export const IndistinguishableSetSchema = z.object({
  id: z.string().describe('S1, S2, … in order of the set’s largest member'),
  members: z.array(z.string()).min(2).describe('entry ids, largest amount first'),
  message: z.string().describe('plain-language statement for the report'),
  amountPerNucleus: finite.nonnegative().describe('sum of the members’ fitted amounts per nucleus'),
  amountUncertainty: finite.nonnegative().nullable().describe('members’ uncertainties added in quadrature (their correlation, negative for look-alikes, is neglected, so this errs on the large side)'),
  moleFraction: finite.min(0).max(1).describe('sum of the members’ mole fractions'),
  moleFractionUncertainty: finite.nonnegative().nullable(),
  concentrationMM: finite.nonnegative().nullable().describe('sum of the members’ qNMR concentrations; null without a standard'),
  concentrationUncertaintyMM: finite.nonnegative().nullable(),
});
export type IndistinguishableSet = z.infer<typeof IndistinguishableSetSchema>;

export const AnalysisOptionsSchema = z.object({
  screen: ScreenOptionsSchema.optional(),
  fit: FitOptionsSchema.optional(),
  standard: InternalStandardSchema.optional(),
  purity: PurityInputSchema.optional(),
  decoySets: z.number().int().min(1).max(200).optional().describe('decoy copies of the library (default 20)'),
  seed: z.number().int().optional().describe('seed of the decoy generator (default 1)'),
  anySolvent: z.boolean().optional().describe('use entries of every solvent (default false: only the mixture’s solvent, and "other")'),
});
export type AnalysisOptions = z.infer<typeof AnalysisOptionsSchema>;

export const AnalysisReportSchema = z.object({
  mixtureName: z.string(),
  nucleus: z.enum(['1H', '13C']),
  screenedCandidates: z.array(z.string()).describe('entry ids kept by screening and passed to the fit'),
  fit: FitResultSchema,
  amounts: z.array(AmountResultSchema),
  purity: PurityResultSchema.nullable(),
  qValues: z.array(QValueSchema),
  decoySets: z.number().int().positive(),
  warnings: z.array(z.string()),
  indistinguishable: z.array(IndistinguishableSetSchema).optional().describe('sets of fitted compounds this data cannot tell apart, with their combined amounts'),
  caution: z.string(),
});
export type AnalysisReport = z.infer<typeof AnalysisReportSchema>;

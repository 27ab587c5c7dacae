import type { LibraryEntry } from '../shared/libraryEntry';
import { MixtureSchema, type Mixture } from '../shared/mixture';
import type { ScreenResult } from '../shared/screening';
import { InputError, mixtureParseFile } from '../matching/io';
import type { StoredAnalysis } from '../localdb/analyses';
import { engineAnalyse, engineScreen } from './engine';
import { newId } from './ids';
import type { AnalysisInput } from './analysisStages';

export { STAGE_TEXT, type AnalysisInput, type AnalysisStage } from './analysisStages';

export function analysisMixture(input: AnalysisInput): Mixture {
  const s = input.settings;
  if (/\.json$/i.test(input.fileName)) return mixtureFromJson(input);
  return mixtureParseFile(input.fileName, input.content, {
    // An undefined key would override the name the reader takes from the file name.
    ...(input.name ? { name: input.name } : {}),
    ...(input.demo ? { demo: true } : {}),
    nucleus: s.nucleus,
    solvent: s.solvent,
    mhz: s.mhz,
  });
}

/**
 * Entries recorded in the mixture's solvent: shifts move with the solvent, so an entry measured
 * in another one would match by accident. "other" keeps the whole library.
 */
export function librarySameSolvent(library: LibraryEntry[], solvent: AnalysisInput['settings']['solvent']): LibraryEntry[] {
  return solvent === 'other' ? library : library.filter((e) => e.solvent === solvent);
}

/**
 * One analysis as steps that each run synchronously (the engine is synchronous); the caller runs
 * them in a web worker or, where there is none, yields to the UI between them.
 */
export interface AnalysisSteps {
  read(): void;
  screen(): void;
  analyse(): StoredAnalysis;
}

export function analysisSteps(input: AnalysisInput, fullLibrary: LibraryEntry[]): AnalysisSteps {
  const library = librarySameSolvent(fullLibrary, input.settings.solvent);
  if (library.length === 0) throw new Error(`The library on this device has no entries recorded in ${input.settings.solvent}; choose another solvent or sync.`);
  let mixture: Mixture | null = null;
  let screen: ScreenResult | null = null;
  return {
    read: () => {
      mixture = analysisMixture(input);
    },
    screen: () => {
      screen = engineScreen(mixture!, library, { tolerancePpm: input.settings.tolerancePpm });
    },
    analyse: () => {
      const std = input.settings.standard;
      const report = engineAnalyse(mixture!, library, {
        screen: { tolerancePpm: input.settings.tolerancePpm },
        // Component curves are drawn from their fitted lines (client/fittedLinesCurve): a stored
        // analysis of a 16k-point spectrum shrinks from ~4.8 MB to ~1.2 MB.
        fit: { componentCurves: false },
        ...(std ? { standard: { entryId: std.entryId, concentrationMM: std.concentrationMM } } : {}),
      });
      return {
        id: newId(),
        name: mixture!.name,
        createdAt: new Date().toISOString(),
        demo: !!mixture!.demo,
        settings: input.settings,
        mixture: mixture!,
        screen: screen!,
        report,
        libraryCount: library.length,
      };
    },
  };
}

/** A mixture saved as JSON (demo mixtures, exports); the form's settings win over the file's. */
function mixtureFromJson(input: AnalysisInput): Mixture {
  let raw: unknown;
  try {
    raw = JSON.parse(input.content);
  } catch (err) {
    throw new InputError(input.fileName, [{ field: 'file', message: `not valid JSON (${err instanceof Error ? err.message : 'parse error'})` }]);
  }
  const r = MixtureSchema.safeParse(raw);
  if (!r.success) throw new InputError(input.fileName, r.error.issues.slice(0, 10).map((i) => ({ field: i.path.join('.') || 'file', message: i.message })));
  const s = input.settings;
  return { ...r.data, name: input.name ?? r.data.name, nucleus: s.nucleus, solvent: s.solvent, mhz: s.mhz, demo: input.demo || r.data.demo };
}

import { SolventSchema, type Solvent } from '../shared/solvent';
import { DEMO_MIXTURE_FILES } from './demoMixtureFiles';

export interface DemoMixture {
  key: string;
  title: string;
  description?: string;
  /** A picked peak list (bundled) or a JCAMP-DX spectrum (fetched on demand: about 0.5 MB for all four). */
  kind: 'peaks' | 'spectrum';
  fileName: string;
  /** The file's text for a peak list; null for a spectrum until demoMixtureContent fetches it. */
  content: string | null;
  solvent: Solvent;
  mhz: number;
  standard: { entryId: string; concentrationMM: number } | null;
}

/**
 * The shipped demo mixtures (invented demo data): each as its picked peak list, and as its
 * spectrum where the demo set has one, to analyse on the device.
 */
export const DEMO_MIXTURES: DemoMixture[] = DEMO_MIXTURE_FILES.flatMap((d) => {
  const common = {
    description: d.description,
    solvent: SolventSchema.catch('other').parse(d.solvent),
    mhz: d.mhz,
    standard: d.standard ? { entryId: d.standard.entryId, concentrationMM: d.standard.concentrationMM } : null,
  };
  const peaks: DemoMixture = { ...common, key: d.id, title: d.title, kind: 'peaks', fileName: d.fileName, content: d.content };
  return d.spectrumFileName ? [peaks, { ...common, key: `${d.id}-spectrum`, title: `${d.title} (spectrum)`, kind: 'spectrum', fileName: d.spectrumFileName, content: null }] : [peaks];
});

/** The file's text: peak lists are in the bundle; spectra come in a chunk of their own, on first use. */
export async function demoMixtureContent(d: DemoMixture): Promise<string> {
  if (d.content !== null) return d.content;
  const { DEMO_SPECTRUM_FILES } = await import('./demoSpectrumFiles');
  const text = DEMO_SPECTRUM_FILES[d.fileName];
  if (text === undefined) throw new Error(`demo spectrum ${d.fileName} is not in this build`);
  return text;
}

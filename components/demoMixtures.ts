import { SolventSchema, type Solvent } from '../shared/solvent';
import { DEMO_MIXTURE_FILES } from './demoMixtureFiles';

export interface DemoMixture {
  key: string;
  title: string;
  description?: string;
  fileName: string;
  content: string;
  solvent: Solvent;
  mhz: number;
  standard: { entryId: string; concentrationMM: number } | null;
}

/** The shipped demo mixtures (invented demo data), as peak-list files to analyse on the device. */
export const DEMO_MIXTURES: DemoMixture[] = DEMO_MIXTURE_FILES.map((d) => ({
  key: d.id,
  title: d.title,
  description: d.description,
  fileName: d.fileName,
  content: d.content,
  solvent: SolventSchema.catch('other').parse(d.solvent),
  mhz: d.mhz,
  standard: d.standard ? { entryId: d.standard.entryId, concentrationMM: d.standard.concentrationMM } : null,
}));

// End-to-end check on the invented demo mixtures (library-data/demo-mixtures, simulated from the
// demo library with known composition; manifest.json lists what each one contains). The oracle is
// the simulation recipe, not a published table: this checks that screening gets back what was put in.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { mixtureParseFile } from '../../../matching/io';
import { screenMixture } from '../../../matching/screen';
import { LibraryFileSchema, type LibraryEntry } from '../../../shared/libraryEntry';

const DATA = path.join(__dirname, '../../../library-data');
const read = (f: string) => readFileSync(path.join(DATA, f), 'utf8');
const library: LibraryEntry[] = ['demo-entries.json', 'contaminants.json'].flatMap((f) => LibraryFileSchema.parse(JSON.parse(read(f))).entries);

interface DemoMixture {
  id: string;
  files: { peaks?: string; spectrum?: string };
  solvent: LibraryEntry['solvent'];
  reference: 'TMS' | 'DSS' | 'TSP' | 'none';
  mhz: number;
  components: Array<{ entryId: string; role: string }>;
}
const manifest = JSON.parse(read('demo-mixtures/manifest.json')) as { mixtures: DemoMixture[] };
const runs = manifest.mixtures.flatMap((m) =>
  (['peaks', 'spectrum'] as const).filter((k) => m.files[k]).map((k) => ({ m, file: m.files[k]! })),
);

describe('screening the demo mixtures', () => {
  it('finds at least 90 % of the analytes and internal standards put into them', () => {
    let wanted = 0;
    let found = 0;
    for (const { m, file } of runs) {
      const mixture = mixtureParseFile(file, read(`demo-mixtures/${file}`), { mhz: m.mhz, solvent: m.solvent, reference: m.reference });
      const r = screenMixture(mixture, library);
      const got = new Set(r.candidates.map((c) => c.entryId));
      for (const c of m.components.filter((x) => x.role === 'analyte' || x.role === 'internal-standard')) {
        wanted++;
        if (got.has(c.entryId)) found++;
      }
    }
    expect(wanted).toBeGreaterThan(20);
    expect(found / wanted).toBeGreaterThanOrEqual(0.9);
  });

  it('reports no demo compound for the blank control', () => {
    const control = manifest.mixtures.find((m) => m.components.every((c) => c.role !== 'analyte'));
    expect(control).toBeDefined();
    const file = control!.files.peaks ?? control!.files.spectrum!;
    const r = screenMixture(mixtureParseFile(file, read(`demo-mixtures/${file}`), { mhz: control!.mhz, solvent: control!.solvent, reference: control!.reference }), library);
    expect(r.candidates.filter((c) => c.category === 'demo')).toEqual([]);
  });
});

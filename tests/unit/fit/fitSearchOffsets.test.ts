// The offset search on a spectrum grid keeps one residual up to date instead of rebuilding "what
// the others leave" for every candidate; both must find the same offsets. Mixtures from the
// published contaminant table (Gottlieb, Kotlyar & Nudelman, J. Org. Chem. 1997, 62, 7512,
// Table 1, CDCl3), moved by known offsets.
import { describe, expect, it } from 'vitest';
import { fitDesignSpectrum } from '../../../matching/fit/fitDesignSpectrum';
import { fitSearchOffsets } from '../../../matching/fit/fitSearchOffsets';
import type { FitDesign, FitLine } from '../../../matching/fit/fitTypes';
import { entryToLines } from '../../../matching/multiplets/entryToLines';
import { contaminantLibrary, synthSpectrum } from './contaminantLibrary';

const lib = contaminantLibrary();
const ids = ['ethanol', 'ethyl-acetate', 'acetone', 'diethyl-ether'];
const entries = ids.map((id) => lib.find((e) => e.id === id)!);
const offsets: Record<string, number> = { ethanol: 0.012, 'ethyl-acetate': -0.008, acetone: 0, 'diethyl-ether': 0.02 };

describe('fitSearchOffsets', () => {
  const mhz = 600.13;
  const mix = synthSpectrum(entries.map((entry, k) => ({ entry, amount: 1 + k / 2 })), { offsets, points: 16384 });
  if (mix.kind !== 'spectrum') throw new Error('spectrum expected');
  const asc = mix.ppm[0] < mix.ppm[mix.ppm.length - 1];
  const axis = new Float64Array(asc ? mix.ppm : [...mix.ppm].reverse());
  const y = new Float64Array(asc ? mix.intensity : [...mix.intensity].reverse());
  const base: FitLine[][] = entries.map((e) => entryToLines(e, '1H', mhz).map((l) => ({ x: l.shift, a: l.area, w: 1 / mhz })));

  it('finds each compound’s offset (within a tenth of a linewidth)', () => {
    const r = fitSearchOffsets(fitDesignSpectrum(axis, y, 1e-5), base, 0.03, 0.25 / mhz, 3);
    ids.forEach((id, k) => expect(Math.abs(r.offsets[k] - offsets[id]), id).toBeLessThan(0.1 / mhz));
  });

  it('keeping one residual up to date finds the same offsets as rebuilding it for every candidate', () => {
    const design = fitDesignSpectrum(axis, y, 1e-5);
    const rebuild: FitDesign = { ...design, profileOn: undefined };
    const a = fitSearchOffsets(design, base, 0.03, 0.25 / mhz, 3);
    const b = fitSearchOffsets(rebuild, base, 0.03, 0.25 / mhz, 3);
    a.offsets.forEach((d, k) => expect(d).toBeCloseTo(b.offsets[k], 12));
  });
});

// Component curves drawn from fitted lines must be the fit's own contribution curves. The mixtures
// are synthesised from the published contaminant table (Gottlieb, Kotlyar & Nudelman, J. Org.
// Chem. 1997, 62, 7512, Table 1, CDCl3 column; via tests/unit/fit/contaminantLibrary).
import { describe, expect, it } from 'vitest';
import { fittedLinesCurve } from '../../../client/fittedLinesCurve';
import { fitMixture } from '../../../matching/fit/fitMixture';
import type { Mixture } from '../../../shared/mixture';
import { contaminantLibrary, synthPeaks, synthSpectrum } from '../fit/contaminantLibrary';

const lib = contaminantLibrary();
const get = (id: string) => lib.find((e) => e.id === id)!;
const parts = [{ entry: get('ethanol'), amount: 2 }, { entry: get('ethyl-acetate'), amount: 1 }, { entry: get('acetone'), amount: 0.5 }];
const candidates = [get('ethanol'), get('ethyl-acetate'), get('acetone')];

function expectSameCurves(mix: Mixture, relTol: number) {
  const r = fitMixture(mix, candidates, { linewidthHz: 1 });
  expect(r.components.length).toBe(3);
  for (const c of r.components) {
    expect(c.lines!.length).toBeGreaterThan(0);
    const drawn = fittedLinesCurve(c.lines!, r.axis);
    const top = Math.max(...c.curve);
    let worst = 0;
    for (let i = 0; i < drawn.length; i++) worst = Math.max(worst, Math.abs(drawn[i] - c.curve[i]));
    expect(worst / top, c.entryId).toBeLessThan(relTol);
    // The lines carry the component's whole fitted integral.
    expect(c.lines!.reduce((s, l) => s + l.area, 0)).toBeCloseTo(c.integral, 9);
  }
  const bare = fitMixture(mix, candidates, { linewidthHz: 1, componentCurves: false });
  expect(bare.components.every((c) => c.curve.length === 0 && c.lines!.length > 0)).toBe(true);
  expect(bare.fittedSum).toEqual(r.fittedSum);
}

describe('fittedLinesCurve', () => {
  it('redraws a spectrum fit’s component curves (either axis direction) to 1e-8 of their height', () => {
    const spec = synthSpectrum(parts, { points: 8192 });
    expectSameCurves(spec, 1e-8);
    if (spec.kind !== 'spectrum') throw new Error('spectrum expected');
    expectSameCurves({ ...spec, ppm: [...spec.ppm].reverse(), intensity: [...spec.intensity].reverse() }, 1e-8);
  });

  it('redraws a peak-list fit’s component curves (the fit cuts each line’s display tails at 1e-6 of its height; several add up)', () => {
    expectSameCurves(synthPeaks(parts), 1e-5);
  });

  it('is a Lorentzian of the given area and width: height 2A/(πw) at the centre, half of it at ±w/2', () => {
    const [centre, half] = fittedLinesCurve([{ shift: 1, area: 3, widthPpm: 0.01 }], [1, 1.005]);
    expect(centre).toBeCloseTo((2 * 3) / (Math.PI * 0.01), 9);
    expect(half / centre).toBeCloseTo(0.5, 12);
  });
});

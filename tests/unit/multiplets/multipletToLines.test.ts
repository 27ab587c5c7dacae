import { describe, expect, it } from 'vitest';
import type { Signal1H } from '../../../shared/libraryEntry';
import { BROAD_LINE_WIDTH_HZ, multipletToLines, UNRESOLVED_MULTIPLET_WIDTH_HZ } from '../../../matching/multiplets/multipletToLines';

const sig = (multiplicity: string, j: number[], nuclei = 1, shift = 2): Signal1H => ({ nucleus: '1H', shift, multiplicity, j, nuclei });
const hz = (lines: { shift: number }[], mhz: number, centre: number) => lines.map((l) => (l.shift - centre) * mhz);

describe('multipletToLines', () => {
  it('rejects a non-positive spectrometer frequency', () => {
    expect(() => multipletToLines(sig('s', []), 0)).toThrow('mhz must be a positive number, got 0');
  });
  it('rejects a coupling count that does not fit the multiplicity', () => {
    expect(() => multipletToLines(sig('dd', [7]), 600)).toThrow('multiplicity "dd" needs 2 coupling constant(s), got 1');
  });
  it('gives a singlet one line carrying all nuclei', () => {
    expect(multipletToLines(sig('s', [], 6, 2.17), 600)).toEqual([{ shift: 2.17, area: 6 }]);
  });
  it('draws an unresolved multiplet as one broad line (documented width)', () => {
    expect(multipletToLines(sig('m', [], 4, 3.65), 600)).toEqual([{ shift: 3.65, area: 4, widthHz: UNRESOLVED_MULTIPLET_WIDTH_HZ }]);
    expect(multipletToLines({ ...sig('br s', [], 1), widthHz: 12 }, 600)[0].widthHz).toBe(12);
    expect(multipletToLines(sig('br s', [], 1), 600)[0].widthHz).toBe(BROAD_LINE_WIDTH_HZ);
  });

  // Pascal's-triangle intensities and offsets for J = 7.0 Hz, formulas.md (c)
  // (Silverstein, Webster & Kiemle 2005 ch. 3; Friebolin 2010 ch. 4 — standard rules, common practice).
  const table: [string, number[], number[]][] = [
    ['d', [1, 1], [-3.5, 3.5]],
    ['t', [1, 2, 1], [-7, 0, 7]],
    ['q', [1, 3, 3, 1], [-10.5, -3.5, 3.5, 10.5]],
    ['quint', [1, 4, 6, 4, 1], [-14, -7, 0, 7, 14]],
    ['sext', [1, 5, 10, 10, 5, 1], [-17.5, -10.5, -3.5, 3.5, 10.5, 17.5]],
    ['sept', [1, 6, 15, 20, 15, 6, 1], [-21, -14, -7, 0, 7, 14, 21]],
  ];
  for (const [m, intensities, offsets] of table) {
    for (const mhz of [400.13, 600.13]) {
      it(`gives ${m} binomial intensities ${intensities.join(':')} and offsets in Hz at ${mhz} MHz`, () => {
        const lines = multipletToLines(sig(m, [7], 2), mhz);
        const total = intensities.reduce((a, b) => a + b, 0);
        expect(lines.map((l) => l.area)).toEqual(intensities.map((c) => expect.closeTo((2 * c) / total, 12)));
        hz(lines, mhz, 2).forEach((v, i) => expect(v).toBeCloseTo(offsets[i], 9));
      });
    }
  }
  it('places the outer lines of a septet at 1/64 of the intensity (formulas.md (c))', () => {
    expect(multipletToLines(sig('sept', [6], 1), 600)[0].area).toBeCloseTo(1 / 64, 12);
  });
  it('splits a doublet of doublets into 1193, 1197, 1203, 1207 Hz (formulas.md (c), worked)', () => {
    const lines = multipletToLines(sig('dd', [10, 4], 1, 2), 600);
    hz(lines, 600, 0).forEach((v, i) => expect(v).toBeCloseTo([1193, 1197, 1203, 1207][i], 9));
    expect(lines.map((l) => l.area)).toEqual([0.25, 0.25, 0.25, 0.25]);
  });
  it('splits a triplet of doublets 1:1:2:2:1:1 at 1192…1208 Hz (formulas.md (c), worked)', () => {
    const lines = multipletToLines(sig('td', [7, 2], 8, 2), 600);
    hz(lines, 600, 0).forEach((v, i) => expect(v).toBeCloseTo([1192, 1194, 1199, 1201, 1206, 1208][i], 9));
    expect(lines.map((l) => l.area)).toEqual([1, 1, 2, 2, 1, 1]);
  });
  it('gives the td offsets in ppm at 600.13 MHz (formulas.md (c): ±0.0016663, ±0.0099978, ±0.0133304)', () => {
    const lines = multipletToLines(sig('td', [7, 2], 8, 0), 600.13);
    const expected = [-0.0133304, -0.0099978, -0.0016663, 0.0016663, 0.0099978, 0.0133304];
    lines.forEach((l, i) => expect(l.shift).toBeCloseTo(expected[i], 7));
  });
  it('places the ethyl acetate CH2 quartet at 4.1025…4.1375 ppm at 600.13 MHz (formulas.md (c); Gottlieb 1997)', () => {
    const lines = multipletToLines(sig('q', [7], 2, 4.12), 600.13);
    lines.forEach((l, i) => expect(l.shift).toBeCloseTo([4.1025, 4.1142, 4.1258, 4.1375][i], 4));
  });
  it('merges coinciding lines of a tt with J1 = 2·J2 and keeps the nuclei count', () => {
    const lines = multipletToLines(sig('tt', [4, 2], 1), 500);
    expect(lines.length).toBe(7);
    expect(lines.reduce((s, l) => s + l.area, 0)).toBeCloseTo(1, 12);
  });
});

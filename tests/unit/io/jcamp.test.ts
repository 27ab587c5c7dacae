import { convert } from 'jcampconverter';
import { describe, expect, it } from 'vitest';
import { InputError, spectrumParseJcamp, spectrumToJcamp } from '../../../matching/io';
import type { SpectrumMixture } from '../../../shared/mixture';
import { synthSpectrum } from '../../fixtures/screen/synthSpectrum';

const spectrum: SpectrumMixture = {
  ...synthSpectrum(
    [
      { shift: 2.17, height: 600 }, // acetone in CDCl3, Gottlieb 1997 Table 1
      { shift: 1.26, height: 90 },
    ],
    { from: 0.5, to: 3, hzPerPoint: 0.5, mhz: 600.13, widthHz: 1, solvent: 'CDCl3', name: 'round trip' },
  ),
  demo: true,
};

describe('spectrumToJcamp / spectrumParseJcamp', () => {
  it('rejects arrays of different length', () => {
    expect(() => spectrumToJcamp({ ...spectrum, intensity: [1, 2] })).toThrow(/a spectrum needs matching ppm and intensity arrays/);
  });

  it('writes JCAMP-DX 5.01 with X++(Y..Y) compressed-free AFFN lines of ≤ 80 characters', () => {
    const text = spectrumToJcamp(spectrum);
    expect(text.startsWith('##TITLE=round trip\n##JCAMP-DX=5.01\n')).toBe(true);
    expect(text).toContain('##XYDATA=(X++(Y..Y))');
    expect(text.trimEnd().endsWith('##END=')).toBe(true);
    expect(text.split('\n').every((l) => l.length <= 80)).toBe(true);
  });

  // The reader of record is jcampconverter (an independent implementation of the IUPAC standard).
  it('is read by jcampconverter with the same axis and intensities', () => {
    const parsed = convert(spectrumToJcamp(spectrum)).flatten[0].spectra[0];
    expect(parsed.data.x.length).toBe(spectrum.ppm.length);
    // jcampconverter turns HZ into PPM itself through .OBSERVE FREQUENCY
    expect(parsed.xUnits).toBe('PPM');
    expect(parsed.data.x[0]).toBeCloseTo(spectrum.ppm[0], 8);
    const maxY = Math.max(...spectrum.intensity);
    parsed.data.y.forEach((y: number, i: number) => expect(Math.abs(y - spectrum.intensity[i])).toBeLessThan(maxY * 2e-9));
  });

  it('round-trips through our own reader, metadata included', () => {
    const back = spectrumParseJcamp(spectrumToJcamp(spectrum));
    expect(back).toMatchObject({ kind: 'spectrum', name: 'round trip', nucleus: '1H', solvent: 'CDCl3', mhz: 600.13, reference: 'TMS', demo: true });
    back.ppm.forEach((p, i) => expect(p).toBeCloseTo(spectrum.ppm[i], 8));
  });

  it('writes an uneven axis as XYPOINTS (which jcampconverter 12 does not read) and reads it back itself', () => {
    const uneven: SpectrumMixture = { ...spectrum, ppm: [1, 1.1, 1.3, 1.35, 2, 2.5], intensity: [0, 5, 10, 4, 1, 0] };
    const text = spectrumToJcamp(uneven);
    expect(text).toContain('##XYPOINTS=(XY..XY)');
    const back = spectrumParseJcamp(text);
    expect(back.ppm.map((p) => Number(p.toFixed(6)))).toEqual(uneven.ppm);
    expect(back.intensity).toEqual(uneven.intensity);
  });

  it('says what is wrong with a file that is not JCAMP-DX', () => {
    expect(() => spectrumParseJcamp('ppm,intensity\n1,2')).toThrow(InputError);
    expect(() => spectrumParseJcamp('ppm,intensity\n1,2')).toThrow('JCAMP-DX: line 1: not a JCAMP-DX file: it must start with a ##LABEL= line such as ##TITLE=');
  });

  it('rejects a file without data and unsupported X units', () => {
    expect(() => spectrumParseJcamp('##TITLE=x\n##JCAMP-DX=5.01\n##END=')).toThrow('JCAMP-DX: XYDATA: no spectrum data (XYDATA or XYPOINTS with at least 5 points) found');
    const seconds = spectrumToJcamp(spectrum).replace('##XUNITS=HZ', '##XUNITS=SECONDS');
    expect(() => spectrumParseJcamp(seconds)).toThrow('JCAMP-DX: XUNITS: X units "SECONDS" are not supported (PPM or HZ)');
  });
});

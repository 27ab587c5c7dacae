import { describe, expect, it } from 'vitest';
import { InputError, peakListParseText } from '../../../matching/io';

function issuesOf(fn: () => unknown) {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return { message: (e as InputError).message, issues: (e as InputError).issues };
  }
  throw new Error('expected an InputError');
}

const meta = { mhz: 400, solvent: 'CDCl3' as const };

describe('peakListParseText', () => {
  it('rejects empty text and a header without rows', () => {
    expect(issuesOf(() => peakListParseText('', meta)).message).toBe('peak list: no peaks found (the text is empty or has only a header)');
    expect(issuesOf(() => peakListParseText('shift,intensity\n', meta)).message).toBe('peak list: no peaks found (the text is empty or has only a header)');
  });

  it('needs the spectrometer frequency', () => {
    expect(issuesOf(() => peakListParseText('1,2', {})).issues).toEqual([{ field: 'mhz', message: 'spectrometer frequency (MHz) is required' }]);
  });

  it('reports bad metadata by field', () => {
    expect(issuesOf(() => peakListParseText('1,2', { mhz: 400, solvent: 'CCl4' as never })).issues[0].field).toBe('solvent');
  });

  it('reads comma-separated shift,intensity without a header', () => {
    const m = peakListParseText('7.26,100\n2.17,600\n', meta);
    expect(m.peaks).toEqual([
      { shift: 7.26, intensity: 100 },
      { shift: 2.17, intensity: 600 },
    ]);
    expect(m).toMatchObject({ kind: 'peaks', nucleus: '1H', solvent: 'CDCl3', mhz: 400, intensityKind: 'height' });
  });

  it('accepts a decimal comma with semicolons, and a width column', () => {
    const m = peakListParseText('7,26;100;1,2\r\n2,17;600,5;0,9\r\n', meta);
    expect(m.peaks).toEqual([
      { shift: 7.26, intensity: 100, widthHz: 1.2 },
      { shift: 2.17, intensity: 600.5, widthHz: 0.9 },
    ]);
  });

  it('reads tab- and space-separated text, skipping comments and blank lines', () => {
    expect(peakListParseText('# exported\n\n1.26\t3\n\n4.12\t2\n', meta).peaks.map((p) => p.shift)).toEqual([1.26, 4.12]);
    expect(peakListParseText('  1.26   3 \n4.12 2\n', meta).peaks.map((p) => p.intensity)).toEqual([3, 2]);
  });

  it('takes headed columns in any order, ignores unknown ones and reads an integral column as integrals', () => {
    const m = peakListParseText('label;Integral;Width (Hz);δ (ppm)\nCH3;3,0;1,0;1,26\nCH2;2,0;1,1;4,12\n', meta);
    expect(m.peaks).toEqual([
      { shift: 1.26, intensity: 3, widthHz: 1 },
      { shift: 4.12, intensity: 2, widthHz: 1.1 },
    ]);
    expect(m.intensityKind).toBe('integral');
  });

  it('names a missing column in the header', () => {
    expect(issuesOf(() => peakListParseText('ppm,label\n1,a\n', meta)).issues).toEqual([
      { line: 1, field: 'intensity', message: 'no intensity column in the header (name it intensity, height, integral or area)' },
    ]);
  });

  it('reports every bad line with its number and returns nothing', () => {
    const text = ['shift,intensity', '1.26,3', 'abc,2', '', '4.12,-1', '2.0', '30,1', '3.5,'].join('\n');
    const { message, issues } = issuesOf(() => peakListParseText(text, meta));
    expect(issues).toEqual([
      { line: 3, field: 'shift', message: 'shift "abc" is not a number' },
      { line: 5, field: 'intensity', message: 'intensity must be ≥ 0, got -1' },
      { line: 6, message: 'expected 2 fields, got 1' },
      { line: 7, field: 'shift', message: 'shift 30 ppm is outside the usual 1H range (-1 to 16 ppm)' },
      { line: 8, field: 'intensity', message: 'intensity is empty' },
    ]);
    expect(message).toBe(
      'peak list has 5 problems: line 3: shift "abc" is not a number; line 5: intensity must be ≥ 0, got -1; line 6: expected 2 fields, got 1; line 7: shift 30 ppm is outside the usual 1H range (-1 to 16 ppm); line 8: intensity is empty',
    );
  });

  it('does not read a first line with a typo as a header', () => {
    expect(issuesOf(() => peakListParseText('7.2x,100\n2.17,600', meta)).issues).toEqual([{ line: 1, field: 'shift', message: 'shift "7.2x" is not a number' }]);
  });

  it('asks for a header when more than three unnamed columns come', () => {
    expect(issuesOf(() => peakListParseText('1,2,3,4\n', meta)).issues).toEqual([{ line: 1, message: 'expected 2 or 3 columns (shift, intensity[, width Hz]) when there is no header, got 4' }]);
  });

  it('uses the 13C range for 13C lists', () => {
    expect(peakListParseText('77.16,1\n206.3,2', { ...meta, nucleus: '13C' }).peaks).toHaveLength(2);
  });
});

describe('peakListParseText: metadata in comments', () => {
  it('reads solvent, MHz and reference from leading # lines; explicit metadata wins', () => {
    const text = '# demo list\n# solvent DMSO-d6, 600.13 MHz, reference TMS\nshift,intensity\n2.09,6\n';
    expect(peakListParseText(text)).toMatchObject({ solvent: 'DMSO-d6', mhz: 600.13, reference: 'TMS' });
    expect(peakListParseText(text, { mhz: 400, solvent: 'CDCl3' })).toMatchObject({ solvent: 'CDCl3', mhz: 400 });
  });

  it('ignores comments after the data starts and unknown solvent names', () => {
    expect(() => peakListParseText('2.09,6\n# 600 MHz\n')).toThrow('peak list metadata: mhz: spectrometer frequency (MHz) is required');
    expect(peakListParseText('# solvent CCl4 at 300 MHz\n2.09,6\n').solvent).toBe('other');
  });
});

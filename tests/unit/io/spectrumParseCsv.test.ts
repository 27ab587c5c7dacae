import { describe, expect, it } from 'vitest';
import { InputError, mixtureParseFile, spectrumParseCsv } from '../../../matching/io';

const meta = { mhz: 400 };
const rows = (n: number, sep = ',') => Array.from({ length: n }, (_, i) => `${(10 - i * 0.005).toFixed(4)}${sep}${i % 7}`).join('\n');

describe('spectrumParseCsv', () => {
  it('needs five points', () => {
    expect(() => spectrumParseCsv('1,2\n2,3', meta)).toThrow('spectrum: a spectrum needs at least 5 points, got 2');
  });

  it('reads a headed spectrum with the columns in either order', () => {
    const s = spectrumParseCsv(`intensity;ppm\n${rows(6, ';').split('\n').map((l) => l.split(';').reverse().join(';')).join('\n')}`, meta);
    expect(s.ppm[0]).toBe(10);
    expect(s.intensity.slice(0, 3)).toEqual([0, 1, 2]);
  });

  it('reports a non-monotonic axis by line', () => {
    const err = (() => {
      try {
        spectrumParseCsv('1,0\n2,0\n3,0\n2.5,0\n4,0\n5,0', meta);
      } catch (e) {
        return e as InputError;
      }
    })();
    expect(err?.issues).toEqual([{ line: 4, field: 'ppm', message: 'ppm axis must be strictly monotonic (2.5 after 3)' }]);
  });
});

describe('mixtureParseFile', () => {
  it('refuses an unknown file type by name', () => {
    expect(() => mixtureParseFile('data.xlsx', 'x', meta)).toThrow('data.xlsx: file: unsupported file type ".xlsx" (use .csv, .tsv, .txt, .jdx or .dx)');
  });

  it('reads a short table as a peak list and names the mixture after the file', () => {
    const m = mixtureParseFile('/tmp/crude extract.csv', '1.26,3\n4.12,2', meta);
    expect(m.kind).toBe('peaks');
    expect(m.name).toBe('crude extract');
  });

  it('reads a long monotonic two-column table as a spectrum, unless told otherwise', () => {
    expect(mixtureParseFile('s.csv', rows(1200), meta).kind).toBe('spectrum');
    expect(mixtureParseFile('s.csv', rows(1200), { ...meta, kind: 'peaks' }).kind).toBe('peaks');
  });

  it('reads JCAMP-DX by content whatever the extension', () => {
    expect(() => mixtureParseFile('x.txt', '##TITLE=x\n##END=', meta)).toThrow('JCAMP-DX: XYDATA: no spectrum data (XYDATA or XYPOINTS with at least 5 points) found');
  });
});

// What a file states, read from its header alone, must be what the full readers take from it:
// the shipped demo files (JCAMP-DX 5.01 as written by spectrumToJcamp, and commented peak lists),
// 13C JCAMP-DX (the 1H frequency from .OBSERVE FREQUENCY / Ξ(13C), Harris et al., Pure Appl. Chem.
// 2001, 73, 1795), and hand-written headers with the label spellings the JCAMP-DX standard treats
// as equal (case, spaces, dashes and underlines ignored; McDonald & Wilks, Appl. Spectrosc. 1988,
// recalled from memory).
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { mixtureFileStates, mixtureParseFile, spectrumToJcamp } from '../../../matching/io';

const DIR = path.join(__dirname, '../../../library-data/demo-mixtures');

describe('mixtureFileStates', () => {
  it.each(fs.readdirSync(DIR).filter((f) => /\.(csv|jdx)$/.test(f)))('reads from the header of %s what the full reader takes from the file', (file) => {
    const text = fs.readFileSync(path.join(DIR, file), 'utf8');
    const stated = mixtureFileStates(file, text);
    expect(stated.mhz, 'every demo file states its frequency').toBeGreaterThan(0);
    const full = mixtureParseFile(file, text, {});
    for (const k of ['nucleus', 'solvent', 'mhz', 'reference'] as const) if (stated[k] !== undefined) expect(stated[k], k).toBe(full[k]);
    expect(stated.solvent).toBeDefined();
  });

  it('reads a 13C JCAMP-DX file written by spectrumToJcamp back to its 1H frequency', () => {
    const text = spectrumToJcamp({ kind: 'spectrum', name: 'c', nucleus: '13C', solvent: 'DMSO-d6', mhz: 500.13, reference: 'TMS', ppm: [200, 150, 100, 50, 0], intensity: [0, 1, 5, 1, 0] });
    const stated = mixtureFileStates('c.jdx', text);
    const full = mixtureParseFile('c.jdx', text);
    expect(stated).toEqual({ nucleus: full.nucleus, solvent: full.solvent, mhz: full.mhz, reference: full.reference });
    expect(stated.nucleus).toBe('13C');
    expect(stated.mhz).toBeCloseTo(500.13, 6);
  });

  it('takes a header written by hand, with any label spelling, and ignores what follows the data', () => {
    const text = ['##TITLE= sample', '##JCAMP-DX= 5.01', '##DATA TYPE= NMR SPECTRUM', '##.Observe_Frequency= 300.13 $$ MHz', '##.OBSERVE NUCLEUS= ^1H', '##.solvent name= chloroform-d', '##XUNITS= PPM', '##YUNITS= ARBITRARY UNITS', '##XYPOINTS=(XY..XY)', '5,1', '##.SOLVENT NAME= D2O', '##END='].join('\n');
    expect(mixtureFileStates('x.dx', text)).toEqual({ nucleus: '1H', solvent: 'CDCl3', mhz: 300.13 });
  });

  it('reads "#" comments of a text file, and leaves out what is not stated', () => {
    expect(mixtureFileStates('a.csv', '# solvent D2O, 600 MHz, reference DSS\nshift,intensity\n1,2\n')).toEqual({ solvent: 'D2O', mhz: 600, reference: 'DSS' });
    expect(mixtureFileStates('a.csv', 'shift,intensity\n1,2\n')).toEqual({});
    expect(mixtureFileStates('a.jdx', '##TITLE= bare\n##XYDATA=(X++(Y..Y))\n')).toEqual({});
  });
});

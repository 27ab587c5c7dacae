import type { SpectrumMixture } from '../../shared/mixture';

import { XI_13C } from './jcampHeaderMeta';

function num(v: number, digits = 10): string {
  return Number(v.toPrecision(digits)).toString();
}

/**
 * Writes a 1D spectrum as JCAMP-DX 5.01 (IUPAC; McDonald & Wilks 1988, NMR: Davies & Lampen 1993).
 * X is written in Hz (XUNITS=HZ, the NMR convention) with .OBSERVE FREQUENCY so ppm = Hz / MHz.
 * An equally spaced axis goes out as XYDATA=(X++(Y..Y)) in AFFN with integer Y scaled by YFACTOR
 * (9 significant digits); an uneven axis as XYPOINTS=(XY..XY). Reference, solvent and the demo
 * mark travel in user labels (##$TESSERA …) so a read-back restores the mixture.
 */
export function spectrumToJcamp(spectrum: SpectrumMixture): string {
  const n = spectrum.ppm.length;
  if (n < 2 || n !== spectrum.intensity.length) throw new RangeError(`a spectrum needs matching ppm and intensity arrays of ≥ 2 points, got ${n} and ${spectrum.intensity.length}`);
  if (!(spectrum.mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${spectrum.mhz}`);
  const obs = spectrum.nucleus === '13C' ? spectrum.mhz * XI_13C : spectrum.mhz;
  const x = spectrum.ppm.map((p) => p * obs);
  const y = spectrum.intensity;
  for (let i = 0; i < n; i++) if (!Number.isFinite(x[i]) || !Number.isFinite(y[i])) throw new RangeError(`point ${i} is not finite`);
  const step = (x[n - 1] - x[0]) / (n - 1);
  const even = step !== 0 && x.every((v, i) => Math.abs(v - (x[0] + i * step)) <= Math.abs(step) * 1e-6);
  const maxAbs = y.reduce((a, v) => Math.max(a, Math.abs(v)), 0);
  const yFactor = maxAbs > 0 ? maxAbs / 1e9 : 1;
  const title = spectrum.name.replace(/[\r\n]+/g, ' ');
  const out: string[] = [
    `##TITLE=${title}`,
    '##JCAMP-DX=5.01',
    '##DATA TYPE=NMR SPECTRUM',
    `##DATA CLASS=${even ? 'XYDATA' : 'XYPOINTS'}`,
    '##ORIGIN=Tessera',
    '##OWNER=',
    `##.OBSERVE FREQUENCY=${num(obs)}`,
    `##.OBSERVE NUCLEUS=^${spectrum.nucleus}`,
    `##.SOLVENT NAME=${spectrum.solvent}`,
    `##$TESSERA REFERENCE=${spectrum.reference}`,
    `##$TESSERA SPECTROMETER MHZ=${num(spectrum.mhz)}`,
    ...(spectrum.demo ? ['##$TESSERA DEMO=true'] : []),
    '##XUNITS=HZ',
    '##YUNITS=ARBITRARY UNITS',
    `##NPOINTS=${n}`,
    `##FIRSTX=${num(x[0])}`,
    `##LASTX=${num(x[n - 1])}`,
  ];
  if (even) {
    out.push('##XFACTOR=1', `##YFACTOR=${num(yFactor, 12)}`, `##DELTAX=${num(step)}`, `##FIRSTY=${num(y[0])}`, '##XYDATA=(X++(Y..Y))');
    let i = 0;
    while (i < n) {
      let line = num(x[0] + i * step);
      while (i < n) {
        const v = ` ${Math.round(y[i] / yFactor)}`;
        if (line.length + v.length > 80 && line.includes(' ')) break;
        line += v;
        i++;
      }
      out.push(line);
    }
  } else {
    out.push('##XFACTOR=1', '##YFACTOR=1', '##XYPOINTS=(XY..XY)');
    for (let i = 0; i < n; i++) out.push(`${num(x[i])}, ${num(y[i], 12)}`);
  }
  out.push('##END=');
  return `${out.join('\n')}\n`;
}

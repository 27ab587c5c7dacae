import type { Nucleus } from '../../shared/nucleus';
import type { ShiftReference, Solvent } from '../../shared/solvent';

/** Ξ(13C)/100: the 13C frequency of a spectrometer over its 1H frequency (Harris et al., Pure Appl. Chem. 2001, 73, 1795). */
export const XI_13C = 0.2514502;

/** Names a JCAMP-DX .SOLVENT NAME may give, and the solvent each means. */
export const JCAMP_SOLVENT_NAMES: Array<[RegExp, Solvent]> = [
  [/^(cdcl3|chloroform(-d)?)$/i, 'CDCl3'],
  [/^(acetone(-d6)?|\(cd3\)2co)$/i, 'acetone-d6'],
  [/^(dmso(-d6)?|\(cd3\)2so)$/i, 'DMSO-d6'],
  [/^(c6d6|benzene(-d6)?)$/i, 'C6D6'],
  [/^(cd3cn|acetonitrile(-d3)?)$/i, 'CD3CN'],
  [/^(cd3od|methanol(-d4)?|meod)$/i, 'CD3OD'],
  [/^(d2o|h2o\+d2o|water)$/i, 'D2O'],
];

export interface FileStatedMeta {
  nucleus?: Nucleus;
  solvent?: Solvent;
  mhz?: number;
  reference?: ShiftReference;
}

/** What a JCAMP-DX header says: nucleus, solvent and 1H frequency as spectrumParseJcamp reads them. */
function jcampHeaderValues(labels: { nucleus?: string; solvent?: string; observeMhz?: number; statedMhz?: number; reference?: string }): FileStatedMeta {
  const out: FileStatedMeta = {};
  const nucleusText = labels.nucleus?.replace(/^\^/, '');
  if (nucleusText === '1H' || nucleusText === '13C') out.nucleus = nucleusText;
  const solvent = labels.solvent === undefined ? undefined : JCAMP_SOLVENT_NAMES.find(([re]) => re.test(labels.solvent!))?.[1];
  if (solvent) out.solvent = solvent;
  if (labels.statedMhz !== undefined && Number.isFinite(labels.statedMhz) && labels.statedMhz > 0) out.mhz = labels.statedMhz;
  else if (labels.observeMhz !== undefined && labels.observeMhz > 0) out.mhz = (out.nucleus ?? '1H') === '13C' ? labels.observeMhz / XI_13C : labels.observeMhz;
  const r = labels.reference;
  if (r === 'TMS' || r === 'DSS' || r === 'TSP' || r === 'none') out.reference = r;
  return out;
}

/** A JCAMP-DX label as the standard compares them: case, spaces, dashes, slashes and underlines ignored. */
const labelKey = (label: string) => label.toUpperCase().replace(/[\s\-/_]/g, '');
const DATA_LABELS = new Set(['XYDATA', 'PEAKTABLE', 'XYPOINTS', 'DATATABLE', 'NTUPLES', 'END']);

/**
 * Nucleus, solvent, frequency and reference stated in the header of JCAMP-DX text, read from its
 * ##LABEL= lines up to the first data block without converting the data (the IUPAC JCAMP-DX
 * standard, McDonald & Wilks, Appl. Spectrosc. 1988, 42, 151, and its NMR labels, Davies & Lampen,
 * Appl. Spectrosc. 1993, 47, 1093: citations recalled from memory). Used to fill in a form from a
 * chosen file before the engine is loaded.
 */
export function jcampHeaderMeta(jcamp: string): FileStatedMeta {
  const labels: Record<string, string> = {};
  for (const raw of jcamp.split(/\r\n|\n|\r/)) {
    const m = /^\s*##([^=]*)=(.*)$/.exec(raw);
    if (!m) continue;
    const key = labelKey(m[1]);
    if (DATA_LABELS.has(key)) break;
    const value = m[2].replace(/\$\$.*$/, '').trim();
    if (!(key in labels)) labels[key] = value;
  }
  const num = (v: string | undefined) => (v === undefined || v === '' ? undefined : Number(v));
  return jcampHeaderValues({
    nucleus: labels['.OBSERVENUCLEUS'],
    solvent: labels['.SOLVENTNAME'],
    observeMhz: num(labels['.OBSERVEFREQUENCY']),
    statedMhz: num(labels['$TESSERASPECTROMETERMHZ']),
    reference: labels['$TESSERAREFERENCE'],
  });
}

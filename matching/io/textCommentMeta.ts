import type { ShiftReference, Solvent } from '../../shared/solvent';
import { SolventSchema } from '../../shared/solvent';

export interface CommentMeta {
  solvent?: Solvent;
  mhz?: number;
  reference?: Exclude<ShiftReference, 'none'>;
}

/**
 * Acquisition facts stated in the "#" comment lines at the top of a text file, e.g.
 * "# solvent CDCl3, 400 MHz, reference TMS": "solvent <name>", "<number> MHz", "reference
 * TMS|DSS|TSP". Only the comments before the first data line are read; whatever is not stated (or
 * not recognised) is left out, and importer metadata always wins over it.
 */
export function textCommentMeta(text: string): CommentMeta {
  const out: CommentMeta = {};
  for (const raw of text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/)) {
    const line = raw.trim();
    if (line === '') continue;
    if (!line.startsWith('#')) break;
    const solvent = /\bsolvent\s*[:=]?\s*([A-Za-z0-9-]+)/i.exec(line)?.[1];
    const known = solvent && SolventSchema.options.find((s) => s.toLowerCase() === solvent.toLowerCase());
    if (known && out.solvent === undefined) out.solvent = known;
    const mhz = /(\d+(?:\.\d+)?)\s*MHz\b/i.exec(line)?.[1];
    if (mhz !== undefined && out.mhz === undefined && Number(mhz) > 0 && Number(mhz) <= 2000) out.mhz = Number(mhz);
    const ref = /\breference\s*[:=]?\s*(TMS|DSS|TSP)\b/i.exec(line)?.[1];
    if (ref && out.reference === undefined) out.reference = ref.toUpperCase() as CommentMeta['reference'];
  }
  return out;
}

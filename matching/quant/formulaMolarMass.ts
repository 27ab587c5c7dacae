import { Molecule } from 'openchemlib';

const weights = new Map<string, number>();

/** Standard atomic weight of an element as openchemlib tabulates it (one bracket atom, no H). */
function elementWeight(symbol: string): number | null {
  const hit = weights.get(symbol);
  if (hit !== undefined) return hit;
  try {
    const f = Molecule.fromSmiles(`[${symbol}]`).getMolecularFormula();
    if (f.formula !== symbol || !(f.relativeWeight > 0)) return null;
    weights.set(symbol, f.relativeWeight);
    return f.relativeWeight;
  } catch {
    return null;
  }
}

/**
 * Molar mass (g/mol) of a molecular formula such as "C7H6O2" or "CH2Cl2", from openchemlib's
 * standard atomic weights. Element symbols with optional counts only (no brackets or hydrates).
 */
export function formulaMolarMass(formula: string): number {
  if (typeof formula !== 'string' || formula.trim() === '') throw new RangeError('formula must be a non-empty string');
  const f = formula.trim();
  const token = /([A-Z][a-z]?)(\d*)/y;
  let pos = 0;
  let mass = 0;
  while (pos < f.length) {
    token.lastIndex = pos;
    const m = token.exec(f);
    if (!m) throw new RangeError(`formula "${f}": unexpected "${f[pos]}" at position ${pos + 1} (element symbols and counts only)`);
    const w = elementWeight(m[1]);
    if (w === null) throw new RangeError(`formula "${f}": unknown element "${m[1]}" at position ${pos + 1}`);
    const count = m[2] === '' ? 1 : Number(m[2]);
    if (count === 0) throw new RangeError(`formula "${f}": count 0 for "${m[1]}" at position ${pos + 1}`);
    mass += w * count;
    pos = token.lastIndex;
  }
  return mass;
}

import { Molecule } from 'openchemlib';

/**
 * Element counts of a molecular formula written as element symbols with optional counts
 * ("C2H6O", "C3HD5O", "C6H15NaO3SSi"). D and T stand for 2H and 3H and are kept apart from H,
 * because only protium gives a 1H signal. Element symbols are checked against openchemlib's table.
 * Throws RangeError naming the position of anything else (brackets, charges, hydrates are not
 * accepted: write the neutral molecule or salt in full).
 */
export function formulaParse(formula: string): Record<string, number> {
  if (typeof formula !== 'string') throw new TypeError('formula must be a string');
  const text = formula.trim();
  if (text.length === 0) throw new RangeError('formula is empty');
  const counts: Record<string, number> = {};
  const token = /([A-Z][a-z]?)(\d*)/y;
  let pos = 0;
  while (pos < text.length) {
    token.lastIndex = pos;
    const m = token.exec(text);
    if (!m) throw new RangeError(`formula "${text}": unexpected "${text[pos]}" at position ${pos + 1}`);
    const [whole, symbol, digits] = m;
    if (symbol !== 'D' && symbol !== 'T' && Molecule.getAtomicNoFromLabel(symbol) === 0) {
      throw new RangeError(`formula "${text}": unknown element "${symbol}" at position ${pos + 1}`);
    }
    const n = digits === '' ? 1 : Number(digits);
    if (n === 0) throw new RangeError(`formula "${text}": count 0 for "${symbol}" at position ${pos + 1}`);
    counts[symbol] = (counts[symbol] ?? 0) + n;
    pos += whole.length;
  }
  return counts;
}

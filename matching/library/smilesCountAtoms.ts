import { Molecule } from 'openchemlib';

export interface SmilesAtomCounts {
  /** Element counts as openchemlib reports the molecular formula; D for 2H, T for 3H. */
  elements: Record<string, number>;
  /** Formula text as openchemlib writes it. */
  formula: string;
  /** Protium (1H) atoms, explicit and implicit. */
  protium: number;
  /** Protium on N, O or S: the hydrogens a protic deuterated solvent exchanges (common practice). */
  exchangeable: number;
}

const HETERO_EXCHANGING = new Set([7, 8, 16]);
// Parsing a SMILES costs about 1.5 ms; the server checks every submission against the whole
// library, so results are kept (bounded) — same input, same output, so callers stay pure.
const cache = new Map<string, SmilesAtomCounts>();
const CACHE_LIMIT = 5000;

function isProtium(mol: Molecule, atom: number): boolean {
  const mass = mol.getAtomMass(atom);
  return mol.getAtomicNo(atom) === 1 && mass !== 2 && mass !== 3;
}

/** Atom counts of a SMILES string, read with openchemlib. Throws RangeError on an unreadable SMILES. */
export function smilesCountAtoms(smiles: string): SmilesAtomCounts {
  if (typeof smiles !== 'string' || smiles.trim() === '') throw new TypeError('smiles must be a non-empty string');
  const key = smiles.trim();
  const hit = cache.get(key);
  if (hit) return hit;
  let mol: Molecule;
  try {
    mol = Molecule.fromSmiles(key);
  } catch (e) {
    const why = String((e as Error).message ?? e).replace(/^Class\$\S+:\s*/, '');
    throw new RangeError(`smiles "${key}" cannot be read: ${why}`, { cause: e });
  }
  const formula = mol.getMolecularFormula().formula;
  let protium = 0;
  let exchangeable = 0;
  for (let i = 0; i < mol.getAllAtoms(); i++) {
    if (mol.getAtomicNo(i) === 1) {
      if (isProtium(mol, i)) protium += 1;
      continue;
    }
    const implicit = mol.getImplicitHydrogens(i);
    protium += implicit;
    if (!HETERO_EXCHANGING.has(mol.getAtomicNo(i))) continue;
    let onAtom = implicit;
    for (let j = 0; j < mol.getAllConnAtoms(i); j++) if (isProtium(mol, mol.getConnAtom(i, j))) onAtom += 1;
    exchangeable += onAtom;
  }
  const elements: Record<string, number> = {};
  for (const m of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) elements[m[1]] = (elements[m[1]] ?? 0) + (m[2] === '' ? 1 : Number(m[2]));
  const result: SmilesAtomCounts = { elements, formula, protium, exchangeable };
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, result);
  return result;
}

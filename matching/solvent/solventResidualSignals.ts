import type { Nucleus } from '../../shared/nucleus';
import type { Solvent } from '../../shared/solvent';

export interface ResidualSignal {
  solvent: Exclude<Solvent, 'other'>;
  nucleus: Nucleus;
  kind: 'solvent' | 'water';
  what: string;
  shift: number;
  /** Splitting by deuterium (spin 1): number of D neighbours giving 2n+1 lines, and J(X,D) in Hz. */
  deuteriumNeighbours: number;
  jHz: number;
  source: string;
}

/**
 * Residual solvent and water signals of the common deuterated solvents.
 * 1H rows: H. E. Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512–7515, Table 1, and
 * G. R. Fulmer et al., Organometallics 2010, 29, 2176–2179, Table 1 (shifts as printed, TMS = 0,
 * D2O against DSS). The H–D couplings of the CHD2 quintets are recalled values (from memory).
 * 13C rows: residual solvent carbons, Fulmer 2010 Table 2 (values from memory, not checked against
 * the printed table), J(C,D) from memory.
 */
export const SOLVENT_RESIDUAL_SIGNALS: readonly ResidualSignal[] = [
  // 1H residual solvent
  { solvent: 'CDCl3', nucleus: '1H', kind: 'solvent', what: 'residual CHCl3', shift: 7.26, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'acetone-d6', nucleus: '1H', kind: 'solvent', what: 'residual CHD2COCD3', shift: 2.05, deuteriumNeighbours: 2, jHz: 2.2, source: 'Gottlieb 1997; Fulmer 2010, Table 1 (J from memory)' },
  { solvent: 'DMSO-d6', nucleus: '1H', kind: 'solvent', what: 'residual CHD2SOCD3', shift: 2.5, deuteriumNeighbours: 2, jHz: 1.9, source: 'Gottlieb 1997; Fulmer 2010, Table 1 (J from memory)' },
  { solvent: 'C6D6', nucleus: '1H', kind: 'solvent', what: 'residual C6D5H', shift: 7.16, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'CD3CN', nucleus: '1H', kind: 'solvent', what: 'residual CHD2CN', shift: 1.94, deuteriumNeighbours: 2, jHz: 2.5, source: 'Gottlieb 1997; Fulmer 2010, Table 1 (J from memory)' },
  { solvent: 'CD3OD', nucleus: '1H', kind: 'solvent', what: 'residual CHD2OD', shift: 3.31, deuteriumNeighbours: 2, jHz: 1.7, source: 'Gottlieb 1997; Fulmer 2010, Table 1 (J from memory)' },
  { solvent: 'D2O', nucleus: '1H', kind: 'water', what: 'residual HDO', shift: 4.79, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1 (temperature dependent, Gottlieb eq 1)' },
  // 1H water (H2O / HOD), position varies with concentration and temperature
  { solvent: 'CDCl3', nucleus: '1H', kind: 'water', what: 'water', shift: 1.56, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'acetone-d6', nucleus: '1H', kind: 'water', what: 'water', shift: 2.84, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'acetone-d6', nucleus: '1H', kind: 'water', what: 'separate HDO peak', shift: 2.81, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997, Table 1 footnote a (from memory)' },
  { solvent: 'DMSO-d6', nucleus: '1H', kind: 'water', what: 'water', shift: 3.33, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'DMSO-d6', nucleus: '1H', kind: 'water', what: 'separate HDO peak', shift: 3.3, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997, Table 1 footnote a (from memory)' },
  { solvent: 'C6D6', nucleus: '1H', kind: 'water', what: 'water', shift: 0.4, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'CD3CN', nucleus: '1H', kind: 'water', what: 'water', shift: 2.13, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  { solvent: 'CD3OD', nucleus: '1H', kind: 'water', what: 'water (CD3OH/HDO)', shift: 4.87, deuteriumNeighbours: 0, jHz: 0, source: 'Gottlieb 1997; Fulmer 2010, Table 1' },
  // 13C residual solvent carbons (from memory)
  { solvent: 'CDCl3', nucleus: '13C', kind: 'solvent', what: 'CDCl3', shift: 77.16, deuteriumNeighbours: 1, jHz: 32, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'acetone-d6', nucleus: '13C', kind: 'solvent', what: '(CD3)2CO, CD3', shift: 29.84, deuteriumNeighbours: 3, jHz: 19.4, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'acetone-d6', nucleus: '13C', kind: 'solvent', what: '(CD3)2CO, C=O', shift: 206.26, deuteriumNeighbours: 0, jHz: 0, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'DMSO-d6', nucleus: '13C', kind: 'solvent', what: '(CD3)2SO', shift: 39.52, deuteriumNeighbours: 3, jHz: 21, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'C6D6', nucleus: '13C', kind: 'solvent', what: 'C6D6', shift: 128.06, deuteriumNeighbours: 1, jHz: 24, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'CD3CN', nucleus: '13C', kind: 'solvent', what: 'CD3CN, CD3', shift: 1.32, deuteriumNeighbours: 3, jHz: 21, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'CD3CN', nucleus: '13C', kind: 'solvent', what: 'CD3CN, CN', shift: 118.26, deuteriumNeighbours: 0, jHz: 0, source: 'Fulmer 2010, Table 2 (from memory)' },
  { solvent: 'CD3OD', nucleus: '13C', kind: 'solvent', what: 'CD3OD', shift: 49.0, deuteriumNeighbours: 3, jHz: 21.4, source: 'Fulmer 2010, Table 2 (from memory)' },
];

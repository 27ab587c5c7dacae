import { z } from 'zod';

/** Deuterated solvents covered by the published residual-signal tables (Gottlieb 1997; Fulmer 2010). */
export const SolventSchema = z.enum(['CDCl3', 'acetone-d6', 'DMSO-d6', 'C6D6', 'CD3CN', 'CD3OD', 'D2O', 'other']);
export type Solvent = z.infer<typeof SolventSchema>;

/** Shift reference compound set to 0.00 ppm. */
export const ShiftReferenceSchema = z.enum(['TMS', 'DSS', 'TSP', 'none']);
export type ShiftReference = z.infer<typeof ShiftReferenceSchema>;

/** True when the shift lies in one of the set-aside regions (solvent, water, reference). */
export function shiftInRegions(shift: number, regions: ReadonlyArray<{ from: number; to: number }>): boolean {
  for (const r of regions) if (shift >= r.from && shift <= r.to) return true;
  return false;
}

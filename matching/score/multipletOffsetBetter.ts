/**
 * The rule a multiplet's offset search keeps its best offset by: more line weight lined up wins
 * (beyond 1e-12, so equal sets of lines tie whatever the rounding), then the smaller summed misfit
 * (beyond 1e-15), then the smaller |offset|; a full tie keeps the earlier one. Shared by
 * multipletsMatchPeaks and the screen's fast scorer, which must choose alike.
 */
export function multipletOffsetBetter(cover: number, misfit: number, offset: number, bestCover: number, bestMisfit: number, bestOffset: number): boolean {
  if (cover > bestCover + 1e-12) return true;
  if (Math.abs(cover - bestCover) > 1e-12) return false;
  if (misfit < bestMisfit - 1e-15) return true;
  return Math.abs(misfit - bestMisfit) <= 1e-15 && Math.abs(offset) < Math.abs(bestOffset);
}

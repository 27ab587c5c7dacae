import { linesAt, type FitDesign, type FitLine } from './fitTypes';

export interface OwnLines {
  /** Lines the mixture supports on their own, counted one linewidth apart. */
  resolvedLines: number;
  /** Those of them at least one linewidth from every line of the other fitted candidates. */
  distinctLines: number;
}

function resolvedAmong(set: FitLine[]): number {
  set.sort((p, q) => p.x - q.x);
  let count = 0;
  let last = -Infinity;
  for (const l of set) {
    if (l.x - last >= l.w) {
      count++;
      last = l.x;
    }
  }
  return count;
}

/**
 * The lines of fitted candidate j that are evidence of its own. A line is supported when the
 * mixture minus the other candidates' fitted lines reaches half of j's model at the line centre:
 * a doublet with one line on a peak and the other on empty baseline is one line of evidence, not
 * two. A supported line nearer than one linewidth to a line of another fitted candidate is shared
 * evidence: two Lorentzians nearer than their FWHM are not resolved (common practice), so the
 * mixture cannot say whose line it is. `c` holds the amounts of `lines` (0 = not fitted); the
 * candidates in `ignore` (look-alikes reported with j) do not count as others for distinctLines.
 */
export function fitOwnLines(design: FitDesign, c: ArrayLike<number>, lines: FitLine[][], j: number, ignore?: ReadonlySet<number>): OwnLines {
  const n = c.length;
  if (!(c[j] > 0)) return { resolvedLines: 0, distinctLines: 0 };
  const supported: FitLine[] = [];
  for (const line of lines[j]) {
    let here = design.mixtureAt(line.x);
    for (let k = 0; k < n; k++) if (k !== j && c[k] > 0) here -= c[k] * linesAt(lines[k], line.x);
    const own = c[j] * linesAt(lines[j], line.x);
    if (own > 0 && here >= 0.5 * own) supported.push(line);
  }
  const distinct = supported.filter((line) => {
    for (let k = 0; k < n; k++) {
      if (k === j || !(c[k] > 0) || ignore?.has(k)) continue;
      for (const o of lines[k]) if (Math.abs(o.x - line.x) < Math.max(o.w, line.w)) return false;
    }
    return true;
  });
  return { resolvedLines: resolvedAmong(supported), distinctLines: resolvedAmong(distinct) };
}

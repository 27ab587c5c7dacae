import type { FittedLine } from '../shared/analysis';

/**
 * A component's contribution on an axis from its fitted lines: Σ area · (w/2π) / ((δ − shift)² + (w/2)²),
 * the area-normalised Lorentzian with full width w at half height (common practice). The result
 * screen draws component curves this way, so a stored analysis keeps a few numbers per line
 * instead of one per point per compound. No engine import: this runs in the page's first bundle.
 */
export function fittedLinesCurve(lines: readonly FittedLine[], axis: ArrayLike<number>): number[] {
  const out = new Array<number>(axis.length).fill(0);
  for (const l of lines) {
    const half = l.widthPpm / 2;
    const k = (l.area * half) / Math.PI;
    const h2 = half * half;
    for (let i = 0; i < axis.length; i++) {
      const d = axis[i] - l.shift;
      out[i] += k / (d * d + h2);
    }
  }
  return out;
}

/** A simulated line in the fit: centre x (ppm), area a (nuclei) and FWHM w (ppm). */
export interface FitLine {
  x: number;
  a: number;
  w: number;
}

/** The inner products a fit needs, for either kind of mixture (spectrum grid or peak list). */
export interface FitDesign {
  kind: 'spectrum' | 'peaks';
  /** ⟨y, y⟩ */
  yy: number;
  /** ⟨r_A, r_B⟩ for two sets of lines. */
  dotLL(A: FitLine[], B: FitLine[]): number;
  /** ⟨r_A, y⟩ */
  dotLY(A: FitLine[]): number;
  /** g(δ) = ⟨r(δ), y − Σ c_k r_k⟩ for each offset δ (ppm), the others fixed; approximate (search only). */
  profile(lines: FitLine[], offsets: number[], others: { lines: FitLine[]; c: number }[]): Float64Array;
  /** The same as profile against a residual R on the axis given directly (grid designs only: lets a search keep one residual up to date instead of rebuilding it). */
  profileOn?(lines: FitLine[], offsets: number[], R: Float64Array): Float64Array;
  /** The mixture at shift x (interpolated on a grid, exact for a peak list). */
  mixtureAt(x: number): number;
  /** ⟨r_A, v⟩ for a vector v on the axis (spectrum designs only: there the axis is the data grid). */
  dotLV?(A: FitLine[], v: Float64Array): number;
  /** Model curve of `lines` on the axis. */
  curve(lines: FitLine[]): Float64Array;
  /** target += scale × model curve of `lines`, touching only the points where the model is not negligible. */
  addCurve(lines: FitLine[], scale: number, target: Float64Array): void;
  /** ppm axis (ascending) and the mixture on it. */
  axis: Float64Array;
  mixtureCurve: Float64Array;
  /** Sum of the positive mixture intensity in the units of `modelIntensity`. */
  totalIntensity: number;
  modelIntensity(lines: FitLine[]): number;
  /** Scale turning σ²·G⁻¹ into the covariance of the amounts, and degrees of freedom of the residual. */
  residualSamples: number;
  gridScale: number;
}

export function shiftLines(lines: FitLine[], delta: number): FitLine[] {
  return delta === 0 ? lines : lines.map((l) => ({ x: l.x + delta, a: l.a, w: l.w }));
}

/** Σ a·L(x − x_l) of a set of lines at one shift (unit-area Lorentzians). */
export function linesAt(lines: FitLine[], x: number): number {
  let v = 0;
  for (const l of lines) {
    const d = x - l.x;
    v += (2 * l.a * l.w) / (Math.PI * (4 * d * d + l.w * l.w));
  }
  return v;
}

/**
 * Copies a typed array into a plain array (JSON output), in reverse order when `reversed`:
 * one indexed pass, where Array.from goes through the iterator and a later reverse() is a
 * second pass.
 */
export function toPlainArray(a: Float64Array, reversed = false): number[] {
  const n = a.length;
  const out = new Array<number>(n).fill(0); // packed from the start: faster to fill
  if (reversed) for (let i = 0; i < n; i++) out[i] = a[n - 1 - i];
  else for (let i = 0; i < n; i++) out[i] = a[i];
  return out;
}

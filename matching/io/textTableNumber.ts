const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Strict number reading: "7.26", "-0.5", "1e3"; null for anything else (no "7.26abc", no ""). */
export function textTableNumber(field: string): number | null {
  const t = field.trim();
  if (!NUMBER.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? v : null;
}

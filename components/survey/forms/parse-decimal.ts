/**
 * A number typed on a phone keyboard: accepts "0.005", "0,005" (the decimal comma many keyboards offer),
 * "-12.5" and "5e-3"; empty text or anything else gives null so the form can say what it expected.
 */
export function parseDecimal(text: string): number | null {
  const t = text.trim().replace(',', '.');
  if (t === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t)) return null;
  const v = Number(t);
  return Number.isFinite(v) ? v : null;
}

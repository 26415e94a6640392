export type NumberText = { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'invalid' };

const decimal = /^[-+]?(\d+\.?\d*|\.\d+)$/;
const fraction = /^(\d+)\/(\d+)$/;
const mixed = /^(\d+)(?:\s+|\s*-\s*)(\d+)\/(\d+)$/;

/**
 * Reads a number typed in a field: decimals ("6.5"), fractions ("1/2") and mixed numbers as the trade
 * writes them ("6 1/2", "6-1/2").
 * @example parseNumberText('6 1/2') // { kind: 'number', value: 6.5 }
 */
export function parseNumberText(text: string): NumberText {
  const t = text.trim();
  if (t === '') return { kind: 'empty' };
  if (decimal.test(t)) return { kind: 'number', value: Number(t) };
  const f = fraction.exec(t);
  if (f) return ratio(0, f[1], f[2]);
  const m = mixed.exec(t);
  if (m) return ratio(Number(m[1]), m[2], m[3]);
  return { kind: 'invalid' };
}

function ratio(whole: number, numerator: string, denominator: string): NumberText {
  const d = Number(denominator);
  if (d === 0) return { kind: 'invalid' };
  return { kind: 'number', value: whole + Number(numerator) / d };
}

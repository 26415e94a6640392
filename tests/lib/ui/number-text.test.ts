import { describe, expect, it } from 'vitest';
import { expectApprox } from '@/tests/helpers/approx';
import { parseNumberText } from '@/lib/ui/number-text';

function valueOf(text: string): number {
  const parsed = parseNumberText(text);
  if (parsed.kind !== 'number') throw new Error(`"${text}" did not read as a number`);
  return parsed.value;
}

describe('parseNumberText', () => {
  it('reads decimals, fractions and mixed numbers', () => {
    expectApprox(valueOf('6'), 6, { abs: 1e-12 });
    expectApprox(valueOf(' 6.25 '), 6.25, { abs: 1e-12 });
    expectApprox(valueOf('.5'), 0.5, { abs: 1e-12 });
    expectApprox(valueOf('1/2'), 0.5, { abs: 1e-12 });
    expectApprox(valueOf('6 1/2'), 6.5, { abs: 1e-12 });
    expectApprox(valueOf('6-1/2'), 6.5, { abs: 1e-12 });
    expectApprox(valueOf('92 5/8'), 92.625, { abs: 1e-12 });
  });

  it('tells empty from invalid', () => {
    expect(parseNumberText('  ')).toEqual({ kind: 'empty' });
    expect(parseNumberText('six')).toEqual({ kind: 'invalid' });
    expect(parseNumberText('1/0')).toEqual({ kind: 'invalid' });
    expect(parseNumberText('6 1/2 ft')).toEqual({ kind: 'invalid' });
  });
});

import { describe, expect, it } from 'vitest';
import { formatLb, formatNumber, formatPlf, formatPsf, formatPsi, formatRatio } from '@/lib/format';

describe('formatNumber', () => {
  it.each([
    [1345.46, 1, '1,345.5'],
    [1345.46, 0, '1,345'],
    [1234567, 0, '1,234,567'],
    [-0.0004, 2, '0.00'],
    [-1500, 0, '-1,500'],
    [0.5, 3, '0.500'],
    [Number.POSITIVE_INFINITY, 0, '—'],
  ])('%f with %i digits → %s', (value, digits, text) => {
    expect(formatNumber(value, digits)).toBe(text);
  });
});

describe('quantities', () => {
  it('adds the unit', () => {
    expect(formatPsf(20.9)).toBe('21 psf');
    expect(formatPlf(201.25, 1)).toBe('201.3 plf');
    expect(formatLb(1250)).toBe('1,250 lb');
    expect(formatPsi(1345.2)).toBe('1,345 psi');
  });

  it('shows a ratio as a percent', () => {
    expect(formatRatio(0.677)).toBe('68%');
    expect(formatRatio(1.034, 1)).toBe('103.4%');
  });
});

import { describe, expect, it } from 'vitest';
import { chipWidth, estimateTextWidth, fitText } from '@/lib/ui/diagrams/text-metrics';

describe('text metrics', () => {
  it('grows with the text and gives wide letters more room than narrow ones', () => {
    expect(estimateTextWidth('5,381 lb')).toBeLessThan(estimateTextWidth('15,381 lb'));
    expect(estimateTextWidth('WWW')).toBeGreaterThan(estimateTextWidth('iii'));
  });

  it('shortens a long name with an ellipsis so its chip fits, and leaves a short one alone', () => {
    const long = 'Bathroom wall with tile and a long label';
    const fitted = fitText(long, 120);
    expect(fitted.endsWith('…')).toBe(true);
    expect(chipWidth(fitted)).toBeLessThanOrEqual(120);
    expect(fitText('Floor', 120)).toBe('Floor');
  });
});

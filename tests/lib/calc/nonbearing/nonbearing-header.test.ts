import { describe, expect, it } from 'vitest';
import { nonbearingHeader } from '@/lib/calc/nonbearing';
import { nonbearingHeaderInputSchema } from '@/shared/schemas/calc/framing';

const rule = (input: Record<string, unknown>) =>
  nonbearingHeader(
    nonbearingHeaderInputSchema.parse({
      screenOutcome: 'likely-nonbearing',
      nailingSurfaceAboveIn: 12,
      ...input,
    }),
  );

// IRC 2021 R602.7.4 (R602.7.2 in earlier editions), as summarized in REFERENCES.md: a single flat 2x4 may be
// the header in a nonbearing wall for openings up to 8 ft when the parallel nailing surface above is within
// 24 in, with no cripples or blocking required.
describe('nonbearingHeader', () => {
  it('allows a flat 2x4 up to 8 ft (96 in) with the nailing surface within 24 in', () => {
    expect(rule({ roughOpeningWidthIn: 96, nailingSurfaceAboveIn: 24 }).verdict).toBe('flat-2x4');
    expect(rule({ roughOpeningWidthIn: 36 }).verdict).toBe('flat-2x4');
  });

  it('sends wider openings to a header on edge, saying why', () => {
    const result = rule({ roughOpeningWidthIn: 97 });
    expect(result.verdict).toBe('header-on-edge');
    expect(result.reasons).toHaveLength(1);
    expect(result.reasons[0]).toContain('8 ft');
    expect(result.message).toContain('engineer');
  });

  it('sends a nailing surface more than 24 in above to a header on edge', () => {
    const result = rule({ roughOpeningWidthIn: 36, nailingSurfaceAboveIn: 30 });
    expect(result.verdict).toBe('header-on-edge');
    expect(result.reasons[0]).toContain('24 in');
  });

  it('lists both failed limits', () => {
    expect(rule({ roughOpeningWidthIn: 120, nailingSurfaceAboveIn: 30 }).reasons).toHaveLength(2);
  });

  it('never applies to walls the screen did not find nonbearing', () => {
    expect(rule({ screenOutcome: 'likely-bearing', roughOpeningWidthIn: 36 }).verdict).toBe('bearing-header');
    expect(rule({ screenOutcome: 'cant-tell', roughOpeningWidthIn: 36 }).verdict).toBe('bearing-header');
    expect(rule({ screenOutcome: 'engineer-required', roughOpeningWidthIn: 36 }).verdict).toBe('engineer');
  });

  it('states the limits and the reference with every answer', () => {
    const result = rule({ roughOpeningWidthIn: 36 });
    expect(result.limits.join(' ')).toContain('8 ft');
    expect(result.limits.join(' ')).toContain('24 in');
    expect(result.reference).toContain('R602.7.4');
  });
});

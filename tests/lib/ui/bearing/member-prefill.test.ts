import { describe, expect, it } from 'vitest';
import { draftFromScreen } from '@/lib/ui/bearing/member-prefill';
import { progressText } from '@/lib/ui/bearing/progress-text';
import { jobSchema } from '@/shared/schemas/jobs';

const job = jobSchema.parse({
  id: 'j1',
  orgId: 'o1',
  name: 'Test job',
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  archivedAt: null,
  version: 1,
});
const seen = <V extends string>(value: V) => ({ value, basis: 'seen' as const });

describe('draftFromScreen', () => {
  it('turns the joist spans each side into a tributary width of half of each (common practice)', () => {
    const draft = draftFromScreen('beam', job, {
      wallLabel: 'Hall / kitchen',
      answers: { above: seen('attic'), joistSpanAFt: 12, joistSpanBFt: 10 },
    });
    expect(draft.wall).toBe('Hall / kitchen');
    expect(draft.sources).toHaveLength(1);
    expect(draft.sources[0]).toMatchObject({ kind: 'ceiling', tributary: '11', flag: 'assumed' });
    expect(draft.sources[0].continuousOver).toBe(false);
  });

  it('a floor above gives a floor source; continuous joists are flagged; a wall above is added', () => {
    const draft = draftFromScreen('beam', job, {
      wallLabel: 'Living / dining',
      answers: {
        above: seen('floor'),
        joistsContinuous: seen('yes'),
        wallAbove: seen('yes'),
        joistSpanAFt: 14,
      },
    });
    expect(draft.sources.map((s) => s.kind)).toEqual(['floor', 'wall-above']);
    expect(draft.sources[0]).toMatchObject({ tributary: '7', continuousOver: true });
  });

  it('no spans: the tributary width is left for the person to measure', () => {
    const draft = draftFromScreen('header', job, { wallLabel: 'W', answers: {} });
    expect(draft.sources[0].tributary).toBe('');
  });
});

describe('progressText', () => {
  it('counts done and not needed as settled', () => {
    expect(progressText({ done: 2, notNeeded: 1, toDo: 9, total: 12 })).toBe(
      'Checklist 3 of 12 settled (2 done, 1 not needed)',
    );
  });
});

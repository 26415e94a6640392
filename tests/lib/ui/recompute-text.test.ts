import { describe, expect, it } from 'vitest';
import { recomputeText } from '@/lib/ui/recompute-text';
import type { MemberRecompute } from '@/shared/schemas/job-update';

const row = (
  label: string,
  before: MemberRecompute['before'],
  after: MemberRecompute['after'],
): MemberRecompute => ({
  memberId: label,
  label,
  kind: 'header',
  fields: ['groundSnowPsf', 'buildingWidthFt'],
  before,
  after,
});

describe('recomputeText', () => {
  it('says nothing when no member was checked again', () => {
    expect(recomputeText([])).toBeNull();
  });

  it('names each member whose state changed, what it took from the job, and counts the rest', () => {
    const text = recomputeText([
      row('Kitchen doorway', 'passes', 'fails'),
      row('Hall opening', 'passes', 'engineer-needed'),
      row('Bath door', 'passes', 'passes'),
    ]);
    expect(text).toEqual({
      title: "2 members changed state with the job's new values",
      changed: [
        'Kitchen doorway: passes before, now fails (ground snow, building width)',
        'Hall opening: passes before, now needs an engineer (ground snow, building width)',
      ],
      unchanged: '1 more member checked again, state unchanged.',
    });
  });

  it('says when members were checked again and none changed state', () => {
    expect(recomputeText([row('Bath door', 'fails', 'fails')])).toEqual({
      title: "1 member checked again with the job's new values",
      changed: [],
      unchanged: 'None changed state.',
    });
  });
});

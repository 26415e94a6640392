import { emptyMemberDraft, type MemberDraft, type MemberKind } from '@/lib/ui/member/member-draft';
import { newSource } from '@/lib/ui/member/source-draft';
import type { Job } from '@/shared/schemas/jobs';
import type { ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';

/** What a bearing screen hands a new member: the wall's name and the answers. */
export type ScreenPrefill = { wallLabel: string; answers: ScreenAnswers };

const yes = (answers: ScreenAnswers, id: 'joistsContinuous' | 'wallAbove') => answers[id]?.value === 'yes';

/**
 * A new member's draft from a bearing screen: the joists above (ceiling under an attic, floor under a
 * floor) with a tributary width of half the joist span each side (continuous joists flagged, so the engine
 * takes 1.25 × the half-span load), a wall above when one was found. Every prefilled number is "assumed"
 * until the person measures it.
 * @example draftFromScreen('beam', job, { wallLabel: 'Hall', answers: { joistSpanAFt: 12, joistSpanBFt: 10 } }).sources[0].tributary // '11'
 */
export function draftFromScreen(kind: MemberKind, job: Job, prefill: ScreenPrefill): MemberDraft {
  const draft = emptyMemberDraft(kind, job);
  const { answers } = prefill;
  const halves = [answers.joistSpanAFt, answers.joistSpanBFt].filter((ft) => ft !== undefined);
  const tributaryFt = halves.reduce((sum, ft) => sum + ft / 2, 0);
  const joists = newSource(answers.above?.value === 'floor' ? 'floor' : 'ceiling');
  const sources = [
    {
      ...joists,
      tributary: halves.length > 0 ? String(Math.round(tributaryFt * 1000) / 1000) : '',
      continuousOver: yes(answers, 'joistsContinuous'),
      flag: 'assumed' as const,
      note: `${joists.note}. Tributary width from the bearing screen's joist spans (half of each side).`,
    },
    ...(yes(answers, 'wallAbove') ? [newSource('wall-above')] : []),
  ];
  return {
    ...draft,
    label: `${draft.label} — ${prefill.wallLabel}`.slice(0, 80),
    wall: prefill.wallLabel,
    sources,
  };
}

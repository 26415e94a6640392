import { describe, expect, it } from 'vitest';
import { checkMember } from '@/lib/calc';
import { draftFromInput } from '@/lib/ui/member/draft-from-input';
import { liveCheck } from '@/lib/ui/member/live-check';
import { emptyMemberDraft, flagAfterEdit, type MemberDraft } from '@/lib/ui/member/member-draft';
import { DraftReader, FINISH_PER_SIDE_IN, readMemberDraft } from '@/lib/ui/member/member-input';
import { moveSource, newSource } from '@/lib/ui/member/source-draft';
import { memberCheckInputSchema } from '@/shared/schemas/calc/member';
import type { Job } from '@/shared/schemas/jobs';
import { expectApprox } from '@/tests/helpers/approx';

/** An invented job for the form tests. */
const job: Job = {
  id: 'job-1',
  orgId: 'org-1',
  name: 'Test job',
  address: '',
  yearBuilt: 1988,
  stories: 2,
  roofType: 'gable',
  roofPitchIn12: 6,
  buildingWidthFt: 28,
  adoptedCode: 'IRC 2021',
  loadStandard: 'ASCE 7-22',
  groundSnowPsf: 30,
  groundSnowSource: 'test',
  foundation: 'basement',
  notes: '',
  createdAt: '2026-01-01T00:00:00.000Z',
  updatedAt: '2026-01-01T00:00:00.000Z',
  archivedAt: null,
  version: 1,
};

function beamDraft(): MemberDraft {
  const floor = { ...newSource('floor'), tributary: '13' };
  const roof = { ...newSource('roof'), tributary: '6-6' };
  const point = { ...newSource('point'), at: '4', deadLb: '800', liveLb: '1200' };
  return { ...emptyMemberDraft('beam', job), clearSpan: '13-6-3/8', sources: [roof, floor, point] };
}

describe('readMemberDraft', () => {
  it('reads tape lengths and prefilled sources into an input the shared schema accepts', () => {
    const { input, errors } = readMemberDraft(beamDraft(), job);
    expect(errors).toEqual({});
    expectApprox(input.clearSpanFt, 162.375 / 12, { abs: 1e-12 });
    expect(input.edition).toBe('ASCE 7-22');
    expect(input.snow).toEqual({
      groundSnowPsf: 30,
      roofType: 'gable',
      thermalCondition: 'vented-attic-insulated-ceiling',
    });
    expect(memberCheckInputSchema.safeParse(input).success).toBe(true);
    const roof = input.sources[0];
    expect(roof.kind === 'roof' && roof.tributaryFt).toBe(6.5);
  });

  it('widens a span measured between finished faces by the finish on both sides (common practice)', () => {
    const framing = readMemberDraft({ ...beamDraft(), clearSpan: '10' }, job).input.clearSpanFt;
    const plaster = readMemberDraft({ ...beamDraft(), clearSpan: '10', measuredTo: 'plaster' }, job).input
      .clearSpanFt;
    expectApprox(plaster - framing, (2 * 0.875) / 12, { abs: 1e-12 });
    expect(FINISH_PER_SIDE_IN.drywall).toBe(0.5);
  });

  it('puts a message at each field it cannot read and at an empty load list', () => {
    const draft = beamDraft();
    draft.clearSpan = 'twelve feet';
    draft.sources[1] = { ...draft.sources[1], tributary: '' };
    const { errors } = readMemberDraft(draft, job);
    expect(errors.clearSpan?.[0]).toMatch(/Clear span/);
    expect(errors['sources.1.tributary']?.[0]).toMatch(/tributary width/);
    expect(readMemberDraft({ ...draft, sources: [] }, job).errors.sources?.[0]).toMatch(/at least one/);
  });
});

describe('liveCheck', () => {
  it('gives the same result as the engine on the same input', () => {
    const live = liveCheck(beamDraft(), job);
    expect(live.ok).toBe(true);
    if (!live.ok) return;
    expect(live.result).toEqual(checkMember(live.input, { diagrams: true }));
    expect(live.prescriptive).toBeNull();
  });

  it('maps schema messages back to the draft field (a negative tributary width)', () => {
    const draft = beamDraft();
    draft.sources[1] = { ...draft.sources[1], tributary: '-4' };
    const live = liveCheck(draft, job);
    expect(live.ok).toBe(false);
    if (live.ok) return;
    expect(Object.keys(live.errors)).toContain('sources.1.tributary');
  });

  it('gives a header its prescriptive-path verdict', () => {
    const header = {
      ...emptyMemberDraft('header', job),
      clearSpan: '6',
      sources: [
        { ...newSource('roof'), tributary: '14' },
        { ...newSource('ceiling'), tributary: '7' },
      ],
    };
    const live = liveCheck(header, job);
    expect(live.ok && live.prescriptive?.verdict).toBeTruthy();
  });
});

describe('draftFromInput', () => {
  it('round-trips a saved input through the draft', () => {
    const { input } = readMemberDraft(beamDraft(), job);
    const parsed = memberCheckInputSchema.parse(input);
    const again = readMemberDraft(draftFromInput(parsed, job), job);
    expect(again.errors).toEqual({});
    expect(memberCheckInputSchema.parse(again.input)).toEqual(parsed);
  });
});

describe('flags and sources', () => {
  it('makes a tape field measured and a load field assumed when typed in, keeping a flag already set', () => {
    expect(flagAfterEdit('clearSpan', undefined)).toBe('measured');
    expect(flagAfterEdit('groundSnow', 'default')).toBe('assumed');
    expect(flagAfterEdit('clearSpan', 'assumed')).toBe('assumed');
  });

  it('prefills a floor with HUD RSDG Table 3.2 dead load and the ASCE 7 / IRC dwelling live load', () => {
    const floor = newSource('floor');
    expect(floor.deadPsf).toBe('12'); // HUD RSDG (2000) Table 3.2, light-frame floor
    expect(floor.livePsf).toBe('40'); // ASCE 7-16 Table 4.3-1 / IRC R301.5
    expect(floor.flag).toBe('default');
  });

  it('reorders sources and leaves the list alone at its ends', () => {
    const list = [newSource('roof'), newSource('floor'), newSource('point')];
    expect(moveSource(list, 2, -1).map((s) => s.kind)).toEqual(['roof', 'point', 'floor']);
    expect(moveSource(list, 0, -1).map((s) => s.kind)).toEqual(['roof', 'floor', 'point']);
  });
});

describe('two spans and overhangs', () => {
  it('reads a continuous member and its overhangs into the engine input, and back', () => {
    const draft = {
      ...beamDraft(),
      continuous: true,
      secondSpan: '10-6',
      centreBearing: '5-1/2',
      overhangRight: '1-6',
    };
    const { input, errors } = readMemberDraft(draft, job);
    expect(errors).toEqual({});
    expect(input).toMatchObject({ secondClearSpanFt: 10.5, centreBearingIn: 5.5, overhangRightFt: 1.5 });
    const parsed = memberCheckInputSchema.parse(input);
    expect(memberCheckInputSchema.parse(readMemberDraft(draftFromInput(parsed, job), job).input)).toEqual(
      parsed,
    );
  });

  it('asks for the second span when the member is continuous', () => {
    const { errors } = readMemberDraft({ ...beamDraft(), continuous: true, secondSpan: '' }, job);
    expect(errors.secondSpan?.[0]).toMatch(/second clear span/);
  });
});

describe('DraftReader (shared by the member form, the framing list and what is above)', () => {
  it('reads a length as typed in the unit asked, and files a message under its path when it cannot', () => {
    const r = new DraftReader();
    // 13 ft 6-3/8 in = 162.375 in, read off a tape (common practice: feet, inches and sixteenths)
    expectApprox(r.parsedLength('width', '13-6-3/8', 'Rough opening width', 'in') ?? NaN, 162.375, {
      abs: 1e-12,
    });
    expectApprox(r.parsedLength('span', '162', 'Span', 'in') ?? NaN, 162, { abs: 1e-12 });
    expectApprox(r.parsedLength('span', '13-6', 'Span', 'ft') ?? NaN, 13.5, { abs: 1e-12 });
    expect(r.errors).toEqual({});
    expect(r.parsedLength('sill', 'high', 'Sill height', 'in')).toBeUndefined();
    expect(r.errors.sill?.[0]).toMatch(/^Sill height/);
    expect(r.parsedLength('height', '', 'Rough opening height', 'in')).toBeUndefined();
    expect(r.errors.height).toHaveLength(1);
  });
});

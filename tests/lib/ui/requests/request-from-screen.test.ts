import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION, screenWall } from '@/lib/calc';
import { composeFromScreen, screenReasonsNote } from '@/lib/ui/requests/request-from-screen';
import type { ScreenWithHistory } from '@/shared/schemas/bearing-screens';
import { screenAnswersSchema, type ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';

const seen = <V extends string>(value: V) => ({ value, basis: 'seen' as const });
const assumed = <V extends string>(value: V) => ({ value, basis: 'assumed' as const });

/** An invented wall whose ceiling joists tie the rafters of a ridge-board roof, and a post is assumed above. */
const answers: ScreenAnswers = screenAnswersSchema.parse({
  exterior: seen('no'),
  above: seen('attic'),
  ridge: seen('board'),
  ceilingJoistsTie: seen('yes'),
  beamAbove: assumed('yes'),
});

function screenOf(a: ScreenAnswers, wallLabel = 'Kitchen / dining'): ScreenWithHistory {
  const result = screenWall(a);
  return {
    id: 's1',
    jobId: 'j1',
    wallLabel,
    answers: a,
    outcome: result.outcome,
    result,
    version: 2,
    engineVersion: ENGINE_VERSION,
    createdBy: 'u1',
    updatedBy: 'u1',
    updatedByName: 'Test person',
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    history: [],
  };
}

describe('a design request started from an "engineer required" bearing screen', () => {
  const screen = screenOf(answers);

  it('names the wall and the screen version, then every engineer reason with its basis and source', () => {
    expect(screen.outcome).toBe('engineer-required');
    const note = screenReasonsNote(screen);
    const lines = note.split('\n');
    expect(lines[0]).toBe('Bearing screen of the wall "Kitchen / dining" (version 2): engineer required.');
    const engineer = screen.result.reasons.filter((r) => r.kind === 'engineer');
    expect(engineer.length).toBeGreaterThanOrEqual(2);
    expect(lines).toHaveLength(1 + engineer.length);
    for (const reason of engineer) {
      expect(note).toContain(
        `• ${reason.text} (${reason.basis === 'assumed' ? 'assumed' : 'seen'}; ${reason.source})`,
      );
    }
    expect(note).toMatch(/R802\.5\.2/);
    expect(note).toContain('(assumed;');
  });

  it('puts the note in the working copy’s bearing points and leaves the rest empty', () => {
    const compose = composeFromScreen(screen);
    expect(compose.conditions.bearingPoints).toBe(screenReasonsNote(screen));
    expect(compose.memberIds).toEqual([]);
    expect(compose.engineerEmail).toBeNull();
    expect(compose.questions).toBe('');
  });

  it('keeps to the field’s 2,000 characters by whole lines', () => {
    const long = screenOf(answers, 'W'.repeat(80));
    const many = {
      ...long,
      result: {
        ...long.result,
        reasons: Array.from({ length: 40 }, (_, i) => ({
          ...long.result.reasons.find((r) => r.kind === 'engineer')!,
          text: `Reason ${i} `.padEnd(100, 'x'),
        })),
      },
    };
    const note = screenReasonsNote(many);
    expect(note.length).toBeLessThanOrEqual(2000);
    expect(note.split('\n').every((line) => line.startsWith('Bearing screen') || line.endsWith(')'))).toBe(
      true,
    );
    expect(() => composeFromScreen(many)).not.toThrow();
  });
});

import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { applicableQuestions, screenWall } from '@/lib/calc';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import type { ScreenAnswer, ScreenAnswers, ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';
import { useScreenDraft, type ScreenDraft } from '@/lib/hooks/use-screen-draft';
import type { StoredScreenResult } from '@/shared/schemas/bearing-screens';
import { AnswerStep } from './answer-step';
import { QUESTION_ORDER } from './question-copy';

type Step = 'wall' | ScreenQuestionId | 'spans';

/** `device`: the outcome this device computed (the server's engine), kept while a save waits for signal. */
export type WizardSave = (
  wallLabel: string,
  answers: ScreenAnswers,
  device: StoredScreenResult,
) => Promise<{ ok: true } | { ok: false; message: string; fields: Record<string, string[]> }>;

function spanText(ft: number | undefined) {
  return ft === undefined ? '' : String(ft);
}

/**
 * The bearing screen, one question per screen: the wall's name, each question that applies to this wall (the
 * engine's own list, so answering "another floor above" drops the roof questions), then the joist spans
 * each side (for a bearing wall's member). Nothing is saved until the last step; until then the answers are
 * kept on the device and offered back after a reload.
 */
export function ScreenWizard({
  initialLabel,
  initialAnswers,
  storageKey,
  onSave,
}: {
  initialLabel: string;
  initialAnswers: ScreenAnswers;
  /** Device storage key of the answers in progress (carries the user, job and screen). */
  storageKey: string;
  onSave: WizardSave;
}) {
  const initial = useMemo<ScreenDraft>(
    () => ({
      wallLabel: initialLabel,
      answers: initialAnswers,
      spans: { a: spanText(initialAnswers.joistSpanAFt), b: spanText(initialAnswers.joistSpanBFt) },
      step: 'wall',
    }),
    [initialLabel, initialAnswers],
  );
  const device = useScreenDraft(initial, storageKey);
  const { wallLabel, answers, spans } = device.draft;
  const stepKey = device.draft.step as Step;
  const setWallLabel = (label: string) => device.update((d) => ({ ...d, wallLabel: label }));
  const setAnswers = (change: (a: ScreenAnswers) => ScreenAnswers) =>
    device.update((d) => ({ ...d, answers: change(d.answers) }));
  const setSpans = (change: (s: ScreenDraft['spans']) => ScreenDraft['spans']) =>
    device.update((d) => ({ ...d, spans: change(d.spans) }));
  const setStepKey = (step: Step) => device.update((d) => ({ ...d, step }));
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<{ message: string; fields: Record<string, string[]> } | null>(null);

  const steps = useMemo<Step[]>(() => {
    const applying = new Set(applicableQuestions(answers));
    return ['wall', ...QUESTION_ORDER.filter((q) => applying.has(q)), 'spans'];
  }, [answers]);
  const index = Math.max(0, steps.indexOf(stepKey));
  const step = steps[index];
  const go = (delta: number) => setStepKey(steps[Math.min(steps.length - 1, Math.max(0, index + delta))]);

  const answered =
    step === 'wall' ? wallLabel.trim() !== '' : step === 'spans' ? true : answers[step] !== undefined;

  const save = async () => {
    const readSpan = (text: string) => (text.trim() === '' ? undefined : Number(text.replace(',', '.')));
    // Answers to questions that no longer apply are dropped: they decide nothing.
    const applying = new Set(applicableQuestions(answers));
    const kept = Object.fromEntries(
      Object.entries(answers).filter(([id]) => applying.has(id as ScreenQuestionId)),
    ) as ScreenAnswers;
    const final: ScreenAnswers = {
      ...kept,
      joistSpanAFt: readSpan(spans.a),
      joistSpanBFt: readSpan(spans.b),
    };
    setBusy(true);
    const outcome = await onSave(wallLabel, final, screenWall(final));
    setBusy(false);
    if (outcome.ok) device.forget();
    setProblem(outcome.ok ? null : { message: outcome.message, fields: outcome.fields });
  };

  return (
    <View style={styles.wrap}>
      {device.restored ? (
        <Notice tone="info" title="Unsaved answers on this device" testID="screen-draft-restored">
          <Text>The answers you gave before are back, at the step you left. Carry on, or start again.</Text>
          <Button
            label="Discard these answers"
            variant="secondary"
            onPress={() => device.forget(initial)}
            testID="screen-draft-discard"
          />
        </Notice>
      ) : null}
      <Text variant="label" tone="muted" testID="screen-step">
        Step {index + 1} of {steps.length}
      </Text>
      <Card>
        {step === 'wall' ? (
          <View style={styles.step}>
            <Text variant="title">Which wall are you screening?</Text>
            <Text>Name it so the crew and the engineer know which one: the two rooms it sits between.</Text>
            <TextField
              label="Wall"
              placeholder="Kitchen / dining"
              value={wallLabel}
              onChangeText={setWallLabel}
              errors={problem?.fields.wallLabel}
              testID="screen-wall-label"
            />
          </View>
        ) : step === 'spans' ? (
          <View style={styles.step}>
            <Text variant="title">Joist spans each side (optional)</Text>
            <Text>
              From this wall to the next support on each side, in feet. If the wall is bearing, half of each
              becomes the new member’s tributary width.
            </Text>
            <TextField
              label="Joist span, side A"
              unit="ft"
              inputMode="decimal"
              value={spans.a}
              onChangeText={(a) => setSpans((s) => ({ ...s, a }))}
              errors={problem?.fields['answers.joistSpanAFt']}
              testID="screen-span-a"
            />
            <TextField
              label="Joist span, side B"
              unit="ft"
              inputMode="decimal"
              value={spans.b}
              onChangeText={(b) => setSpans((s) => ({ ...s, b }))}
              errors={problem?.fields['answers.joistSpanBFt']}
              testID="screen-span-b"
            />
          </View>
        ) : (
          <AnswerStep
            question={step}
            answer={answers[step] as ScreenAnswer | undefined}
            onChange={(answer) => setAnswers((a) => ({ ...a, [step]: answer }) as ScreenAnswers)}
          />
        )}
      </Card>
      {problem ? (
        <Notice tone="error" testID="screen-problem">
          {`Nothing was saved: ${problem.message}`}
        </Notice>
      ) : null}
      <View style={styles.nav}>
        {index > 0 ? (
          <Button
            label="Back"
            icon="chevronLeft"
            variant="secondary"
            onPress={() => go(-1)}
            testID="screen-back"
          />
        ) : null}
        {step === 'spans' ? (
          <Button
            label="See the outcome"
            icon="check"
            busy={busy}
            onPress={() => void save()}
            testID="screen-finish"
          />
        ) : (
          <Button
            label="Next"
            icon="chevronRight"
            disabled={!answered}
            onPress={() => go(1)}
            testID="screen-next"
          />
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  step: { gap: spacing.md },
  nav: { flexDirection: 'row', justifyContent: 'space-between', gap: spacing.md, flexWrap: 'wrap' },
});

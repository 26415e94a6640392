import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { Text } from '@/lib/ui/text';
import type { ScreenAnswer, ScreenQuestionId } from '@/shared/schemas/bearing-screen-answers';
import { QUESTION_COPY } from './question-copy';
import { QuestionDrawing } from './question-drawing';

export const UNSURE_LABEL = 'Not sure — I can’t see';

type How = 'seen' | 'assumed' | 'above' | 'ceiling-marks';

/** How an answer is known, as one choice: for the joist direction, seen from above or from ceiling marks. */
function howOf(question: ScreenQuestionId, answer: ScreenAnswer | undefined): How | '' {
  if (!answer || !('basis' in answer)) return '';
  if (question === 'joistDirection' && answer.basis === 'seen') {
    return answer.from === 'ceiling-marks' ? 'ceiling-marks' : 'above';
  }
  return answer.basis;
}

function withHow(question: ScreenQuestionId, value: string, how: How | ''): ScreenAnswer {
  if (question === 'joistDirection') {
    if (how === 'above' || how === 'ceiling-marks') return { value, basis: 'seen', from: how };
    return { value, basis: how === 'assumed' ? 'assumed' : 'seen', from: 'above' };
  }
  return { value, basis: how === 'assumed' ? 'assumed' : 'seen' };
}

const howChoices = (question: ScreenQuestionId) =>
  question === 'joistDirection'
    ? [
        { value: 'above' as How, label: 'Seen from above', description: 'In the attic, through a hole' },
        {
          value: 'ceiling-marks' as How,
          label: 'From ceiling marks',
          description: 'Screw lines, seams, cracks',
        },
        { value: 'assumed' as How, label: 'I’m assuming' },
      ]
    : [
        { value: 'seen' as How, label: 'I saw it' },
        { value: 'assumed' as How, label: 'I’m assuming' },
      ];

/** One question of the bearing screen: its sketch, what to look for, the answer and how it is known. */
export function AnswerStep({
  question,
  answer,
  onChange,
}: {
  question: ScreenQuestionId;
  answer: ScreenAnswer | undefined;
  onChange: (answer: ScreenAnswer) => void;
}) {
  const copy = QUESTION_COPY[question];
  const value = answer?.value ?? '';
  const how = howOf(question, answer);
  return (
    <View style={styles.wrap} testID={`question-${question}`}>
      <Text variant="title">{copy.prompt}</Text>
      {copy.trap ? (
        <Text variant="label" style={styles.trap}>
          Trap: this can make a bearing wall look nonbearing.
        </Text>
      ) : null}
      <View style={styles.sketch}>
        <QuestionDrawing question={question} />
      </View>
      <Text>{copy.help}</Text>
      <ChoiceGroup
        label="Your answer"
        choices={[...copy.options, { value: 'unsure', label: UNSURE_LABEL }]}
        value={value}
        onChange={(next) =>
          onChange(next === 'unsure' ? { value: 'unsure' } : withHow(question, next, how || 'seen'))
        }
        testID={`answer-${question}`}
      />
      {value && value !== 'unsure' ? (
        <ChoiceGroup
          label="How do you know?"
          choices={howChoices(question)}
          value={how}
          onChange={(next) => onChange(withHow(question, value, next))}
          testID={`basis-${question}`}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  trap: { color: colors.warning },
  sketch: {
    backgroundColor: colors.surface,
    borderColor: colors.line,
    borderWidth: 1,
    borderRadius: radii.md,
    padding: spacing.sm,
  },
});

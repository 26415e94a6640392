import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { CautionNote } from '@/lib/ui/caution-note';
import { Icon } from '@/lib/ui/icon';
import { LinkButton } from '@/lib/ui/link-button';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import type { ScreenWithHistory } from '@/shared/schemas/bearing-screens';
import { NonbearingNext } from './nonbearing-next';
import { outcomeLook, reasonLook } from './outcome-look';

type Look = { topic: string; why: string; where: string };

function LookList({ title, items, testID }: { title: string; items: Look[]; testID: string }) {
  if (items.length === 0) return null;
  return (
    <Card title={title} testID={testID}>
      {items.map((look) => (
        <View key={`${look.topic}-${look.why}`} style={styles.look}>
          <Text variant="bodyStrong">{look.why}</Text>
          <Text>{look.where}</Text>
        </View>
      ))}
    </Card>
  );
}

function NextStep({ screen }: { screen: ScreenWithHistory }) {
  const fromScreen = { jobId: screen.jobId, fromScreen: screen.id };
  switch (screen.outcome) {
    case 'likely-nonbearing':
      return <NonbearingNext />;
    case 'likely-bearing':
      return (
        <Card title="Next: size the member" testID="bearing-next">
          <Text>
            A new member starts from these answers: the joists above and the joist spans each side become its
            load sources and tributary widths. Check every prefilled number.
          </Text>
          <View style={styles.actions}>
            <LinkButton
              label="Size a header for an opening"
              icon="plus"
              href={{ pathname: '/jobs/[jobId]/members/new', params: { ...fromScreen, kind: 'header' } }}
              testID="screen-new-header"
            />
            <LinkButton
              label="Size a beam to take the wall out"
              icon="plus"
              variant="secondary"
              href={{ pathname: '/jobs/[jobId]/members/new', params: { ...fromScreen, kind: 'beam' } }}
              testID="screen-new-beam"
            />
          </View>
        </Card>
      );
    case 'engineer-required':
      return (
        <Notice tone="error" title="The job is marked engineer needed" testID="engineer-next">
          <Text>
            Do not open this wall on a preliminary check. A licensed engineer designs what replaces it; send
            them these reasons with the job. A design request started here already holds them.
          </Text>
          {screen.result.engineerReasons.map((r) => (
            <Text key={r}>• {r}</Text>
          ))}
          <View style={styles.actions}>
            <LinkButton
              label="Start a design request"
              icon="requests"
              href={{ pathname: '/jobs/[jobId]/requests/new', params: fromScreen }}
              testID="screen-new-request"
            />
          </View>
        </Notice>
      );
    case 'cant-tell':
      return null;
  }
}

/** A screen's outcome: what it is, every reason with its source, where to look, the next step, the history. */
export function ScreenOutcome({ screen }: { screen: ScreenWithHistory }) {
  const look = outcomeLook[screen.outcome];
  const { result } = screen;
  return (
    <View style={styles.wrap}>
      <Notice tone={look.tone} title={look.word} testID="screen-outcome">
        <Text>{result.headline}</Text>
      </Notice>
      <LookList
        title="Go and look — open an inspection hole here"
        items={result.lookAt}
        testID="screen-look-at"
      />
      <NextStep screen={screen} />
      <LookList
        title="Assumed — confirm before you cut"
        items={result.toConfirm}
        testID="screen-to-confirm"
      />
      <Card title="Reasons" testID="screen-reasons">
        {result.reasons.map((reason) => {
          const mark = reasonLook[reason.kind];
          return (
            <View key={`${reason.topic}-${reason.text}`} style={styles.reason}>
              <Icon name={mark.icon} color={reason.kind === 'engineer' ? colors.danger : colors.ink} />
              <View style={styles.reasonText}>
                <Text>
                  <Text variant="bodyStrong">{mark.word}: </Text>
                  {reason.text}
                </Text>
                <Text variant="caption" tone="muted">
                  {reason.basis === 'assumed' ? 'Assumed · ' : reason.basis === 'seen' ? 'Seen · ' : ''}
                  {reason.source}
                </Text>
              </View>
            </View>
          );
        })}
      </Card>
      <CautionNote />
      {screen.history.length > 0 ? (
        <Card title="Earlier versions" testID="screen-history">
          {screen.history.map((v) => (
            <Text key={v.version} variant="caption">
              Version {v.version}: {outcomeLook[v.outcome].word} — {v.wallLabel}, by {v.savedByName},{' '}
              {new Date(v.savedAt).toLocaleString()}
            </Text>
          ))}
        </Card>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  look: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: colors.paper,
    borderWidth: 1,
    borderColor: colors.line,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  reason: { flexDirection: 'row', gap: spacing.sm, alignItems: 'flex-start' },
  reasonText: { flex: 1, gap: spacing.xxs },
});

import { Link } from 'expo-router';
import { Pressable, View } from 'react-native';
import { useJobScreens } from '@/lib/hooks/use-job-screens';
import { colors } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { cardRowStyles as styles } from '@/lib/ui/card-row-styles';
import { DeviceMark } from '@/lib/ui/offline/device-mark';
import { ErrorView } from '@/lib/ui/error-view';
import { Icon } from '@/lib/ui/icon';
import { LinkButton } from '@/lib/ui/link-button';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import type { Screen } from '@/shared/schemas/bearing-screens';
import { outcomeLook } from './outcome-look';

function ScreenRow({ screen }: { screen: Screen }) {
  const look = outcomeLook[screen.outcome];
  return (
    <Link
      href={{
        pathname: '/jobs/[jobId]/screens/[screenId]',
        params: { jobId: screen.jobId, screenId: screen.id },
      }}
      asChild
    >
      <Pressable aria-label={`${screen.wallLabel}: ${look.word}`} testID="screen-row" style={styles.link}>
        {({ pressed }) => (
          <View style={[styles.row, pressed && styles.pressed]}>
            <Icon
              name={look.icon}
              color={screen.outcome === 'engineer-required' ? colors.danger : colors.ink}
            />
            <View style={styles.text}>
              <Text variant="bodyStrong">{screen.wallLabel}</Text>
              <Text>{look.word}</Text>
              <Text variant="caption" tone="muted">
                Version {screen.version} · {screen.updatedByName}
              </Text>
              <DeviceMark recordId={screen.id} />
            </View>
            <Icon name="chevronRight" color={colors.inkMuted} />
          </View>
        )}
      </Pressable>
    </Link>
  );
}

/** The job's bearing screens, the "engineer needed" mark with its reasons, and "Screen a wall". */
export function JobScreensPanel({ jobId }: { jobId: string }) {
  const { data, error, mutate } = useJobScreens(jobId);
  return (
    <Card title="Bearing screens" testID="job-screens">
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {data?.engineerNeeded.needed ? (
        <Notice tone="error" title="Engineer needed" testID="job-engineer-needed">
          {data.engineerNeeded.reasons.map((r) => (
            <Text key={`${r.screenId}-${r.reason}`}>
              • {r.wallLabel}: {r.reason}
            </Text>
          ))}
        </Notice>
      ) : null}
      {data && data.screens.length === 0 ? (
        <Text tone="muted">No wall screened yet. Screen each wall before you open it.</Text>
      ) : null}
      {data?.screens.map((s) => (
        <ScreenRow key={s.id} screen={s} />
      ))}
      <LinkButton
        label="Screen a wall"
        icon="plus"
        href={{ pathname: '/jobs/[jobId]/screens/new', params: { jobId } }}
        testID="screen-new"
      />
    </Card>
  );
}

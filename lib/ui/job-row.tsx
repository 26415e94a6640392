import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import type { JobProgressList } from '@/shared/schemas/job-checklist';
import type { Job, MemberStateCounts } from '@/shared/schemas/jobs';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Icon } from './icon';
import { progressText } from './bearing/progress-text';
import { yearBuiltLabel } from './job-labels';
import { JobMemberStates } from './job-member-states';
import { DeviceMark } from './offline/device-mark';
import { Text } from './text';

/** One job in the list: name, address, year built, load standard, members by state and checklist progress. */
export function JobRow({
  job,
  progress,
}: {
  job: Job & { memberStates?: MemberStateCounts };
  progress?: JobProgressList['jobs'][number];
}) {
  return (
    <Link href={{ pathname: '/jobs/[jobId]', params: { jobId: job.id } }} asChild>
      <Pressable
        aria-label={`${job.name}, ${job.address || 'no address'}`}
        testID="job-row"
        style={styles.link}
      >
        {({ pressed }) => (
          <View style={[styles.row, pressed && styles.pressed]}>
            <View style={styles.text}>
              <Text variant="bodyStrong" numberOfLines={2}>
                {job.name}
              </Text>
              <Text tone="muted" numberOfLines={2}>
                {job.address || 'No address yet'}
              </Text>
              <Text variant="caption" tone="muted">
                {yearBuiltLabel(job)} · {job.loadStandard}
              </Text>
              {job.memberStates ? <JobMemberStates counts={job.memberStates} /> : null}
              <DeviceMark recordId={job.id} />
              {progress ? (
                <Text variant="caption" testID="job-progress">
                  {progressText(progress.progress)}
                  {progress.engineerNeeded ? ' · Engineer needed' : ''}
                </Text>
              ) : null}
            </View>
            <Icon name="chevronRight" color={colors.inkMuted} />
          </View>
        )}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { borderRadius: radii.lg },
  row: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.lg,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radii.lg,
  },
  pressed: { backgroundColor: colors.surfaceSunken },
  text: { flex: 1, gap: spacing.xxs },
});

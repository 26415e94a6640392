import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { useDeviceStatus } from '@/lib/hooks/use-device-status';
import { colors, iconSize, layout, radii, spacing } from '@/lib/theme';
import { Icon } from '../icon';
import { Text } from '../text';
import { syncSummary } from './sync-words';

const LOOK = {
  online: { bg: colors.successSoft, fg: colors.success, icon: 'online' },
  offline: { bg: colors.warningSoft, fg: colors.warning, icon: 'offline' },
  attention: { bg: colors.dangerSoft, fg: colors.danger, icon: 'warning' },
} as const;

/** The header's connection and queue at a glance; opens the sync page. */
export function SyncPill() {
  const status = useDeviceStatus();
  const summary = syncSummary(status);
  const look = LOOK[summary.tone];
  return (
    <Link href="/sync" asChild>
      <Pressable
        aria-label={`${summary.long} Open sync`}
        testID="sync-pill"
        style={StyleSheet.flatten([styles.pill, { backgroundColor: look.bg, borderColor: look.fg }])}
      >
        <Icon name={look.icon} size={iconSize.sm} color={look.fg} />
        <Text variant="label" style={{ color: look.fg }} numberOfLines={1} testID="sync-pill-text">
          {summary.short}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  pill: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    minHeight: layout.touchTarget - spacing.sm,
    paddingHorizontal: spacing.md,
    borderRadius: radii.pill,
    borderWidth: 1,
    flexShrink: 0,
  },
});

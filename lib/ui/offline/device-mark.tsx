import { StyleSheet, View } from 'react-native';
import { useDeviceMark } from '@/lib/hooks/use-device-status';
import { colors, radii, spacing } from '@/lib/theme';
import { Icon } from '../icon';
import { Text } from '../text';

const WORDS = {
  new: 'Only on this device',
  changed: 'Changes only on this device',
  conflict: 'Changed elsewhere too: choose on Sync',
} as const;

/** A small tag on a record made or changed here and not on the server yet (nothing when it is). */
export function DeviceMark({ recordId }: { recordId: string | undefined }) {
  const mark = useDeviceMark(recordId);
  if (!mark) return null;
  const conflict = mark === 'conflict';
  return (
    <View
      style={[styles.tag, conflict ? styles.conflict : styles.waiting]}
      testID={`device-mark-${mark}`}
      role="status"
    >
      <Icon name={conflict ? 'warning' : 'device'} size={14} color={conflict ? colors.danger : colors.info} />
      <Text variant="caption" style={{ color: conflict ? colors.danger : colors.info }}>
        {WORDS[mark]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  tag: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radii.pill,
  },
  waiting: { backgroundColor: colors.infoSoft },
  conflict: { backgroundColor: colors.dangerSoft },
});

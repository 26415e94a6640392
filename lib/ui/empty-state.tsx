import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, iconSize, radii, spacing } from '@/lib/theme';
import { Icon, type IconName } from './icon';
import { Text } from './text';

type EmptyStateProps = {
  icon: IconName;
  title: string;
  body: string;
  action?: ReactNode;
  testID?: string;
};

/** What a screen shows when it has nothing yet: what belongs here and how to add it. */
export function EmptyState({ icon, title, body, action, testID }: EmptyStateProps) {
  return (
    <View style={styles.box} testID={testID}>
      <View style={styles.badge}>
        <Icon name={icon} size={iconSize.lg} color={colors.accent} />
      </View>
      <Text variant="title" style={styles.center}>
        {title}
      </Text>
      <Text tone="muted" style={styles.center}>
        {body}
      </Text>
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: spacing.md,
    paddingVertical: spacing.xxl,
    paddingHorizontal: spacing.lg,
    borderWidth: 2,
    borderStyle: 'dashed',
    borderColor: colors.line,
    borderRadius: radii.lg,
  },
  badge: {
    width: 56,
    height: 56,
    borderRadius: radii.pill,
    backgroundColor: colors.accentSoft,
    alignItems: 'center',
    justifyContent: 'center',
  },
  center: { textAlign: 'center', maxWidth: 440 },
});

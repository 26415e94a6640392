import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/lib/theme';
import { Icon, type IconName } from './icon';
import { Text } from './text';

export type NoticeTone = 'info' | 'success' | 'warning' | 'error';

const toneLook: Record<NoticeTone, { icon: IconName; word: string; fg: string; bg: string }> = {
  info: { icon: 'info', word: 'Note', fg: colors.info, bg: colors.infoSoft },
  success: { icon: 'check', word: 'Done', fg: colors.success, bg: colors.successSoft },
  warning: { icon: 'warning', word: 'Caution', fg: colors.warning, bg: colors.warningSoft },
  error: { icon: 'error', word: 'Problem', fg: colors.danger, bg: colors.dangerSoft },
};

type NoticeProps = {
  tone: NoticeTone;
  /** Replaces the tone's default leading word ("Note", "Done", "Caution", "Problem"). */
  title?: string;
  children: ReactNode;
  testID?: string;
};

/** A boxed message whose state is told by icon and leading word as well as colour. */
export function Notice({ tone, title, children, testID }: NoticeProps) {
  const look = toneLook[tone];
  return (
    <View
      role={tone === 'error' ? 'alert' : 'status'}
      testID={testID}
      style={[styles.box, { backgroundColor: look.bg, borderLeftColor: look.fg }]}
    >
      <Icon name={look.icon} color={look.fg} />
      <View style={styles.body}>
        <Text variant="bodyStrong" style={{ color: look.fg }}>
          {title ?? look.word}
        </Text>
        {typeof children === 'string' ? <Text>{children}</Text> : children}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.md,
    borderLeftWidth: 6,
    alignSelf: 'stretch',
  },
  body: { flex: 1, gap: spacing.xs },
});

import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, spacing } from '@/lib/theme';
import { Text } from './text';

type ScreenProps = {
  title?: string;
  /** Shown beside the title on wide screens and under it on phones. */
  actions?: ReactNode;
  children: ReactNode;
  /** Narrower column for forms. */
  narrow?: boolean;
};

/** A scrolling page with a centred column and an optional title row. */
export function Screen({ title, actions, children, narrow = false }: ScreenProps) {
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={styles.content}
      keyboardShouldPersistTaps="handled"
    >
      <View style={[styles.column, { maxWidth: narrow ? layout.formMaxWidth : layout.contentMaxWidth }]}>
        {title || actions ? (
          <View style={styles.header}>
            {title ? (
              <Text variant="display" style={styles.title}>
                {title}
              </Text>
            ) : null}
            {actions}
          </View>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { padding: spacing.lg, paddingBottom: spacing.xxxl },
  column: { width: '100%', alignSelf: 'center', gap: spacing.lg },
  header: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  title: { flexShrink: 1 },
});

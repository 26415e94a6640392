import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Text } from './text';
import { Wordmark } from './wordmark';

/** The frame around sign-in, sign-up and invitation pages: the wordmark, a title and one card. */
export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={styles.content}
      keyboardShouldPersistTaps="handled"
    >
      <View style={styles.column}>
        <Wordmark size="lg" />
        <Text tone="muted">
          Preliminary header and beam checks, budgets and design requests for opening up walls.
        </Text>
        <View style={styles.card}>
          <Text variant="title">{title}</Text>
          {children}
        </View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.paper },
  content: { flexGrow: 1, justifyContent: 'center', padding: spacing.lg, paddingVertical: spacing.xxl },
  column: { width: '100%', maxWidth: layout.formMaxWidth, alignSelf: 'center', gap: spacing.lg },
  card: {
    gap: spacing.lg,
    padding: spacing.xl,
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.line,
  },
});

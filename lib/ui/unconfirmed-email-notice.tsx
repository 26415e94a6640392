import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/lib/theme';
import type { Me } from '@/shared/schemas/auth';
import { Icon } from './icon';
import { ResendConfirmation } from './resend-confirmation';
import { Text } from './text';

/** A strip above every signed-in page until the person confirms their e-mail address. */
export function UnconfirmedEmailNotice({ me }: { me: Me }) {
  if (me.user.emailVerified) return null;
  return (
    <View style={styles.strip} role="status" testID="unconfirmed-email">
      <View style={styles.row}>
        <Icon name="mail" color={colors.warning} />
        <Text variant="caption" style={styles.text}>
          <Text variant="label">Confirm your e-mail address. </Text>
          {me.role === 'owner'
            ? 'Follow the link we mailed you. Until then you can look around but cannot invite anyone.'
            : 'Follow the link we mailed you. Until then some actions wait for it.'}
        </Text>
      </View>
      <ResendConfirmation email={me.user.email} compact />
    </View>
  );
}

const styles = StyleSheet.create({
  strip: {
    gap: spacing.xxs,
    paddingHorizontal: spacing.lg,
    paddingTop: spacing.sm,
    backgroundColor: colors.warningSoft,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.sm },
  text: { flex: 1 },
});

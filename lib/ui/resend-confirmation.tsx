import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { resendConfirmation } from '@/lib/api/auth';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { Button } from './button';
import { FieldMessages } from './field-messages';
import { Text } from './text';

/** Mails the signed-in person a new confirmation link; says where it went, or why it could not. */
export function ResendConfirmation({ email, compact = false }: { email: string; compact?: boolean }) {
  const resend = useSubmit(resendConfirmation);
  const [sent, setSent] = useState(false);
  const run = async () => {
    setSent(false);
    const result = await resend.run();
    setSent(result.ok);
  };
  return (
    <View style={styles.wrap}>
      <Button
        label="Send a new link"
        icon="mail"
        variant={compact ? 'quiet' : 'secondary'}
        testID="resend-confirmation"
        busy={resend.busy}
        onPress={() => void run()}
      />
      {sent ? (
        <Text variant="caption" role="status" testID="resend-confirmation-sent">
          {`Sent to ${email}. Only the newest link works.`}
        </Text>
      ) : null}
      <FieldMessages messages={resend.error ? [resend.error.message] : undefined} />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.xs, alignSelf: 'stretch' } });

import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useDeviceStatus } from '@/lib/hooks/use-device-status';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { Button } from '../button';
import { Notice } from '../notice';
import { TextLink } from '../text-link';
import { waitingLossText } from './waiting-loss-text';

/** Sign-out; when changes still wait on this device, the person is warned first and can cancel. */
export function SignOutControl() {
  const { signOut } = useSessionActions();
  const signingOut = useSubmit(signOut);
  const { items, online } = useDeviceStatus();
  const [asking, setAsking] = useState(false);
  const warning = waitingLossText(items.length, online);

  const press = () => {
    if (warning && !asking) setAsking(true);
    else void signingOut.run();
  };

  return (
    <View style={styles.wrap}>
      {signingOut.error ? <Notice tone="error">{signingOut.error.message}</Notice> : null}
      {asking && warning ? (
        <Notice tone="warning" title="Changes are still waiting" testID="sign-out-warning">
          {warning}
        </Notice>
      ) : null}
      {asking && warning ? <TextLink href="/sync" label="Open Sync" /> : null}
      <View style={styles.buttons}>
        <Button
          label={asking ? 'Sign out and delete them' : 'Sign out'}
          icon="signOut"
          variant={asking ? 'danger' : 'secondary'}
          testID={asking ? 'sign-out-confirm' : 'sign-out'}
          busy={signingOut.busy}
          onPress={press}
        />
        {asking ? (
          <Button
            label="Cancel"
            variant="secondary"
            testID="sign-out-cancel"
            onPress={() => setAsking(false)}
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});

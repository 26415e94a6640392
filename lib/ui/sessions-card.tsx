import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useDeviceStatus } from '@/lib/hooks/use-device-status';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSessions } from '@/lib/hooks/use-sessions';
import { useSubmit } from '@/lib/hooks/use-submit';
import { colors, iconSize, spacing } from '@/lib/theme';
import type { SessionRow } from '@/shared/schemas/auth';
import { browserLabel } from './browser-label';
import { Button } from './button';
import { Card } from './card';
import { dateTimeLabel } from './date-label';
import { ErrorView } from './error-view';
import { Icon } from './icon';
import { Notice } from './notice';
import { waitingLossText } from './offline/waiting-loss-text';
import { Text } from './text';

function SessionLine({ session, first }: { session: SessionRow; first: boolean }) {
  return (
    <View style={[styles.row, !first && styles.divider]} testID="session-row">
      <View style={styles.rowHead}>
        <Text variant="bodyStrong" style={styles.grow}>
          {browserLabel(session.userAgent)}
        </Text>
        {session.current ? (
          <View style={styles.current} testID="session-current">
            <Icon name="check" size={iconSize.sm} color={colors.success} />
            <Text variant="label" style={{ color: colors.success }}>
              This browser
            </Text>
          </View>
        ) : null}
      </View>
      <Text variant="caption" tone="muted">
        {session.createdAt
          ? `Signed in ${dateTimeLabel(session.createdAt)}`
          : 'Signed in before this was noted'}
      </Text>
    </View>
  );
}

/** Every browser the person is signed in on, and a way to sign out of all of them at once. */
export function SessionsCard() {
  const { data: sessions, error, mutate } = useSessions();
  const { signOutEverywhere } = useSessionActions();
  const leaving = useSubmit(signOutEverywhere);
  const [confirming, setConfirming] = useState(false);
  const device = useDeviceStatus();
  const loss = waitingLossText(device.items.length, device.online);

  return (
    <Card title="Where you are signed in" testID="sessions">
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {sessions ? (
        <View>
          {sessions.map((session, index) => (
            <SessionLine key={session.id} session={session} first={index === 0} />
          ))}
        </View>
      ) : null}
      {leaving.error ? <Notice tone="error">{leaving.error.message}</Notice> : null}
      {confirming ? (
        <View style={styles.confirm}>
          <Notice tone="warning" title="Sign out everywhere?">
            Every browser listed here is signed out, this one too. Anyone using a lost phone or a shared
            computer has to sign in again.
          </Notice>
          {loss ? <Notice tone="warning">{loss}</Notice> : null}
          <View style={styles.buttons}>
            <Button
              label="Sign out everywhere"
              variant="danger"
              icon="signOut"
              testID="sign-out-everywhere-confirm"
              busy={leaving.busy}
              onPress={() => void leaving.run()}
            />
            <Button label="Cancel" variant="secondary" onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : (
        <Button
          label="Sign out everywhere"
          variant="secondary"
          icon="signOut"
          testID="sign-out-everywhere"
          onPress={() => setConfirming(true)}
        />
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.xxs, paddingVertical: spacing.md },
  divider: { borderTopWidth: 1, borderTopColor: colors.line },
  rowHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grow: { flexShrink: 1 },
  current: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  confirm: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});

import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { device } from '@/lib/offline/device';
import type { OutboxItem } from '@/lib/offline/outbox-types';
import { spacing } from '@/lib/theme';
import { Button } from '../button';
import { Card } from '../card';
import { Notice } from '../notice';
import { Text } from '../text';
import { ConflictCompare } from './conflict-compare';
import { syncTimeLabel } from './sync-words';

type Action = 'keepMine' | 'keepTheirs' | 'retry' | 'discard';

const STATE_WORDS = {
  waiting: 'Waiting to send',
  failed: 'Not accepted by the server',
  conflict: 'Changed on the server too',
} as const;

/** One change in the device's queue: what it is, why it waits or stopped, and what the person can do. */
export function OutboxItemCard({ item }: { item: OutboxItem }) {
  const [busy, setBusy] = useState<Action | null>(null);
  const [confirmDiscard, setConfirmDiscard] = useState(false);

  const act = async (action: Action) => {
    setBusy(action);
    try {
      const outbox = await device.outbox();
      await outbox?.[action](item.seq);
    } finally {
      setBusy(null);
      setConfirmDiscard(false);
    }
  };
  const button = (action: Action, label: string, variant: 'primary' | 'secondary' | 'danger') => (
    <Button
      label={label}
      variant={variant}
      busy={busy === action}
      disabled={busy !== null}
      testID={`outbox-${action}-${item.seq}`}
      onPress={() => void act(action)}
    />
  );

  return (
    <Card testID={`outbox-item-${item.status}`}>
      <View style={styles.head}>
        <Text variant="bodyStrong" testID="outbox-item-label">
          {item.label}
        </Text>
        <Text variant="caption" tone="muted">
          {`${STATE_WORDS[item.status]} · made ${syncTimeLabel(item.createdAt)}${
            item.attempts > 0 ? ` · ${item.attempts} ${item.attempts === 1 ? 'try' : 'tries'}` : ''
          }`}
        </Text>
      </View>
      {item.status === 'waiting' && item.lastError ? (
        <Text tone="muted">{`Last try: ${item.lastError}. It is sent again by itself.`}</Text>
      ) : null}
      {item.status === 'failed' ? (
        <Notice tone="error" title="Refused" testID="outbox-reason">
          {item.lastError ?? 'The server refused this change.'}
        </Notice>
      ) : null}
      {item.status === 'conflict' ? (
        <>
          <Text>
            Someone saved this record after you last saw it. Compare, then keep yours (it is saved over
            theirs) or take the server’s (your change is dropped).
          </Text>
          <ConflictCompare mine={item.body} server={item.current} />
        </>
      ) : null}
      {item.status === 'waiting' ? null : (
        <View style={styles.buttons}>
          {item.status === 'conflict' ? (
            <>
              {button('keepMine', 'Keep mine', 'primary')}
              {button('keepTheirs', 'Take the server’s', 'secondary')}
            </>
          ) : null}
          {item.status === 'failed' ? button('retry', 'Try again', 'primary') : null}
          {item.status === 'failed' && !confirmDiscard ? (
            <Button
              label="Throw away…"
              variant="quiet"
              disabled={busy !== null}
              testID={`outbox-ask-discard-${item.seq}`}
              onPress={() => setConfirmDiscard(true)}
            />
          ) : null}
        </View>
      )}
      {confirmDiscard ? (
        <Notice tone="warning" title="Throw this change away?">
          {`"${item.label}" is only on this device; it is lost for good.`}
        </Notice>
      ) : null}
      {confirmDiscard ? (
        <View style={styles.buttons}>
          {button('discard', 'Throw it away', 'danger')}
          <Button label="Keep it" variant="secondary" onPress={() => setConfirmDiscard(false)} />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { gap: spacing.xxs },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

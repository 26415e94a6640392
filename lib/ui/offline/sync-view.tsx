import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useDeviceStatus } from '@/lib/hooks/use-device-status';
import { device } from '@/lib/offline/device';
import type { OutboxItem } from '@/lib/offline/outbox-types';
import { spacing } from '@/lib/theme';
import { Button } from '../button';
import { EmptyState } from '../empty-state';
import { Notice } from '../notice';
import { Text } from '../text';
import { OutboxItemCard } from './outbox-item-card';
import { syncSummary } from './sync-words';

function Section({ title, items, testID }: { title: string; items: OutboxItem[]; testID: string }) {
  if (items.length === 0) return null;
  return (
    <View style={styles.section} testID={testID}>
      <Text variant="heading">{title}</Text>
      {items.map((item) => (
        <OutboxItemCard key={item.seq} item={item} />
      ))}
    </View>
  );
}

/** The device's queue: conflicts and refusals that need the person, then what waits to be sent. */
export function SyncView() {
  const status = useDeviceStatus();
  const summary = syncSummary(status);
  const [sending, setSending] = useState(false);
  const by = (state: OutboxItem['status']) => status.items.filter((i) => i.status === state);
  const waiting = by('waiting');

  const sendNow = async () => {
    setSending(true);
    try {
      await device.setOnline(status.online);
    } finally {
      setSending(false);
    }
  };

  return (
    <View style={styles.wrap}>
      <Text testID="sync-summary">{summary.long}</Text>
      {!status.online ? (
        <Notice tone="warning" title="No connection">
          Keep working: every change is kept on this device and sent, in order, when the network returns.
        </Notice>
      ) : null}
      {status.online && waiting.length > 0 ? (
        <Button
          label="Send now"
          icon="sync"
          busy={sending}
          testID="sync-send-now"
          onPress={() => void sendNow()}
        />
      ) : null}
      {status.items.length === 0 ? (
        <EmptyState
          icon="check"
          title="Nothing waiting"
          body="Every change made on this device is on the server."
          testID="sync-empty"
        />
      ) : null}
      <Section title="Changed on the server too" items={by('conflict')} testID="sync-conflicts" />
      <Section title="Not accepted" items={by('failed')} testID="sync-failed" />
      <Section title="Waiting to send" items={waiting} testID="sync-waiting" />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  section: { gap: spacing.md },
});

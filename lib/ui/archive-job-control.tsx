import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { Button } from './button';
import { Notice } from './notice';
import { Text } from './text';

/** Archive with a second, explicit confirmation in place (no pop-up). */
export function ArchiveJobControl({
  jobName,
  onArchive,
}: {
  jobName: string;
  onArchive: () => Promise<unknown>;
}) {
  const [confirming, setConfirming] = useState(false);
  const { run, busy, error } = useSubmit(onArchive);

  if (!confirming) {
    return (
      <Button
        label="Archive job"
        icon="archive"
        variant="danger"
        testID="job-archive"
        onPress={() => setConfirming(true)}
      />
    );
  }
  return (
    <Notice tone="warning" title="Archive this job?">
      <Text>“{jobName}” leaves the Jobs list. Its records are kept.</Text>
      {error ? <Text tone="danger">{error.message}</Text> : null}
      <View style={styles.actions}>
        <Button
          label="Archive"
          variant="danger"
          busy={busy}
          testID="job-archive-confirm"
          onPress={() => void run()}
        />
        <Button label="Keep it" variant="secondary" onPress={() => setConfirming(false)} />
      </View>
    </Notice>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md } });

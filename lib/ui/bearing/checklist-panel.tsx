import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { DeviceMark } from '@/lib/ui/offline/device-mark';
import { useChecklist } from '@/lib/hooks/use-checklist';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { ErrorView } from '@/lib/ui/error-view';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { EngineerItemRow } from '@/lib/ui/requests/engineer-item-row';
import type { ChecklistItem, ChecklistState } from '@/shared/schemas/job-checklist';
import { progressText } from './progress-text';

const STATES = [
  { value: 'to-do' as const, label: 'To do' },
  { value: 'done' as const, label: 'Done' },
  { value: 'not-needed' as const, label: 'Not needed' },
];

function ItemRow({
  item,
  recordId,
  onSet,
}: {
  item: ChecklistItem;
  /** The item's name in the device's queue (its "only on this device" mark). */
  recordId: string;
  onSet: (patch: { state?: ChecklistState; note?: string }) => Promise<string[] | null>;
}) {
  const [note, setNote] = useState(item.note);
  const [errors, setErrors] = useState<string[] | null>(null);
  const set = async (patch: { state?: ChecklistState; note?: string }) => setErrors(await onSet(patch));
  return (
    <View style={styles.item} testID={`checklist-${item.key}`}>
      <Text variant="bodyStrong">{item.title}</Text>
      <Text variant="caption" tone="muted">
        {item.detail}
      </Text>
      {item.because ? (
        <Text variant="caption" style={item.raised ? styles.raised : undefined}>
          {item.raised ? 'Raised: ' : ''}
          {item.because}
        </Text>
      ) : null}
      <ChoiceGroup
        label="Where it stands"
        choices={STATES}
        value={item.state}
        onChange={(state) => void set({ state, note })}
        testID={`checklist-${item.key}-state`}
      />
      <View style={styles.noteRow}>
        <View style={styles.noteField}>
          <TextField label="Note" value={note} onChangeText={setNote} testID={`checklist-${item.key}-note`} />
        </View>
        {note !== item.note ? (
          <Button label="Save note" variant="secondary" onPress={() => void set({ note })} />
        ) : null}
      </View>
      <FieldMessages messages={errors ?? undefined} />
      <DeviceMark recordId={recordId} />
      {item.updatedByName && item.updatedAt ? (
        <Text variant="caption" tone="muted">
          Set by {item.updatedByName}, {new Date(item.updatedAt).toLocaleString()}
        </Text>
      ) : null}
    </View>
  );
}

/**
 * The job checklist: every item with its state, note, who and when, the engineer's items to verify in the
 * field after them, and the progress over both.
 */
export function ChecklistPanel({ jobId }: { jobId: string }) {
  const { data, error, mutate, setItem, setEngineerItem } = useChecklist(jobId);
  return (
    <Card title="Job checklist" testID="job-checklist">
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {data ? (
        <Text variant="label" testID="checklist-progress">
          {progressText(data.progress)}
        </Text>
      ) : null}
      {data?.items.map((item) => (
        <ItemRow
          key={item.key}
          item={item}
          recordId={`${jobId}:${item.key}`}
          onSet={async (patch) => {
            try {
              await setItem(item.key, patch);
              return null;
            } catch (e) {
              if (!(e instanceof ApiError)) throw e;
              return e.fields.note ?? [e.message];
            }
          }}
        />
      ))}
      {data && data.engineerItems.length > 0 ? (
        <Text variant="heading" testID="engineer-items-heading">
          To verify in the field, from the engineer
        </Text>
      ) : null}
      {data?.engineerItems.map((item) => (
        <EngineerItemRow
          key={item.id}
          item={item}
          onSet={async (patch) => {
            await setEngineerItem(item.id, patch);
          }}
        />
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  item: {
    gap: spacing.xs,
    padding: spacing.md,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radii.md,
    backgroundColor: colors.paper,
  },
  raised: { color: colors.warning },
  noteRow: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.sm, flexWrap: 'wrap' },
  noteField: { flexGrow: 1, flexBasis: 200 },
});

import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { uploadRequestFile } from '@/lib/api/design-requests';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { FieldMessages } from '@/lib/ui/field-messages';
import { Icon } from '@/lib/ui/icon';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { TextLink } from '@/lib/ui/text-link';
import type { EngineerChecklistItem, EngineerItemPatch } from '@/shared/schemas/job-checklist';
import { pickFile } from './browser-files';

const STATES = [
  { value: 'to-do' as const, label: 'To do' },
  { value: 'done' as const, label: 'Done' },
  { value: 'not-needed' as const, label: 'Not needed' },
];
const PHOTO_TYPES = 'image/jpeg,image/png,image/heic,image/heif,.heic';

/**
 * One item the engineer asked to verify in the field, marked as the engineer's, with its request and
 * version; when the engineer asked for a photo, a way to take or pick it (it is filed on the request).
 */
export function EngineerItemRow({
  item,
  onSet,
}: {
  item: EngineerChecklistItem;
  onSet: (patch: EngineerItemPatch) => Promise<void>;
}) {
  const [note, setNote] = useState(item.note);
  const [errors, setErrors] = useState<string[] | null>(null);
  const [busy, setBusy] = useState(false);
  const set = async (patch: EngineerItemPatch) => {
    setBusy(true);
    try {
      await onSet(patch);
      setErrors(null);
    } catch (e) {
      if (!(e instanceof ApiError)) throw e;
      setErrors(e.fields.photoIds ?? e.fields.note ?? [e.message]);
    } finally {
      setBusy(false);
    }
  };
  const addPhoto = async () => {
    const file = pickFile ? await pickFile(PHOTO_TYPES) : null;
    if (!file) return;
    setBusy(true);
    try {
      const saved = await uploadRequestFile(item.requestId, file, file.name, {
        purpose: 'photo',
        place: 'other',
        caption: item.item.slice(0, 300),
      });
      await onSet({ photoIds: [...item.photos.map((p) => p.id), saved.id] });
      setErrors(null);
    } catch (e) {
      if (!(e instanceof ApiError)) throw e;
      setErrors(e.fields.file ?? e.fields.photoIds ?? [e.message]);
    } finally {
      setBusy(false);
    }
  };
  const testID = `engineer-item-${item.id}`;
  return (
    <View style={styles.item} testID="engineer-item">
      <View style={styles.from}>
        <Icon name="requests" size={16} color={colors.accent} />
        <Text variant="label" tone="accent">
          From the engineer · request {item.requestNumber} v{item.version}
        </Text>
      </View>
      <Text variant="bodyStrong">{item.item}</Text>
      {item.photoAsked ? (
        <Text variant="caption" style={item.photos.length === 0 ? styles.asked : undefined}>
          {item.photos.length === 0
            ? 'The engineer asks for a photo of this before it is closed in.'
            : `Photo for the engineer: ${item.photos.map((p) => p.fileName).join(', ')}`}
        </Text>
      ) : null}
      <ChoiceGroup
        label="Where it stands"
        choices={STATES}
        value={item.state}
        onChange={(state) => void set({ state, note })}
        testID={`${testID}-state`}
      />
      <View style={styles.row}>
        <View style={styles.noteField}>
          <TextField label="Note" value={note} onChangeText={setNote} testID={`${testID}-note`} />
        </View>
        {note !== item.note ? (
          <Button label="Save note" variant="secondary" busy={busy} onPress={() => void set({ note })} />
        ) : null}
        {item.photoAsked && pickFile ? (
          <Button
            label={item.photos.length === 0 ? 'Add the photo' : 'Add another photo'}
            variant="secondary"
            busy={busy}
            testID={`${testID}-photo`}
            onPress={() => void addPhoto()}
          />
        ) : null}
      </View>
      <FieldMessages messages={errors ?? undefined} />
      <View style={styles.row}>
        {item.updatedByName && item.updatedAt ? (
          <Text variant="caption" tone="muted">
            Set by {item.updatedByName}, {new Date(item.updatedAt).toLocaleString()}
          </Text>
        ) : null}
        <TextLink href={`/requests/${item.requestId}`} label={`Open request ${item.requestNumber}`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  item: {
    gap: spacing.xs,
    padding: spacing.md,
    borderWidth: 1,
    borderLeftWidth: 4,
    borderColor: colors.line,
    borderLeftColor: colors.accent,
    borderRadius: radii.md,
    backgroundColor: colors.paper,
  },
  from: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  asked: { color: colors.warning },
  row: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.sm, flexWrap: 'wrap' },
  noteField: { flexGrow: 1, flexBasis: 200 },
});

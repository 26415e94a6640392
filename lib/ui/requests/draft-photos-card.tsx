import { useState } from 'react';
import { Image, StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { fetchRequest, filePath, removeRequestFile, uploadRequestFile } from '@/lib/api/design-requests';
import { colors, radii, spacing } from '@/lib/theme';
import { PHOTO_PLACE_LABELS, photoPlaces, type PhotoPlace } from '@/shared/schemas/requests/snapshot';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Button } from '../button';
import { Card } from '../card';
import { Notice } from '../notice';
import { PickerField } from '../picker-field';
import { Text } from '../text';
import { TextField } from '../text-field';
import { pickFile } from './browser-files';

const ACCEPT = 'image/jpeg,image/png,image/heic,image/heif,application/pdf,.heic';

/**
 * The photos and sketches of the working copy: each with its place and caption and a Remove that asks once
 * more, and a new one added with its place and caption. A photo a sent version went with stays (marked so);
 * one added since can still go.
 */
export function DraftPhotosCard({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (detail: RequestDetail) => void;
}) {
  const [place, setPlace] = useState<PhotoPlace>('attic-over-wall');
  const [caption, setCaption] = useState('');
  const [asking, setAsking] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [problem, setProblem] = useState<ApiError | null>(null);
  const photos = request.files.filter((f) => f.purpose === 'photo');
  const sent = new Set(request.snapshot?.files.map((f) => f.id));
  const copy = request.status === 'draft' ? 'the draft' : 'the next version';

  async function run(name: string, act: () => Promise<unknown>) {
    setBusy(name);
    setProblem(null);
    try {
      await act();
      onChange(await fetchRequest(request.id));
      setAsking(null);
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      setProblem(error);
    } finally {
      setBusy(null);
    }
  }

  async function add() {
    const file = pickFile ? await pickFile(ACCEPT) : null;
    if (!file) return;
    await run('add', async () => {
      await uploadRequestFile(request.id, file, file.name, { purpose: 'photo', place, caption });
      setCaption('');
    });
  }

  return (
    <Card title="Photos and sketches" testID="draft-photos">
      {photos.length === 0 ? <Text tone="muted">No photos yet.</Text> : null}
      {photos.map((file) => (
        <View key={file.id} style={styles.photo} testID="draft-photo">
          <Text variant="bodyStrong">{PHOTO_PLACE_LABELS[file.place]}</Text>
          <Text>{file.caption || file.fileName}</Text>
          {file.mimeType === 'image/jpeg' || file.mimeType === 'image/png' ? (
            <Image
              source={{ uri: filePath(request.id, file.id, 'preview') }}
              accessibilityLabel={file.caption || file.fileName}
              style={styles.image}
              resizeMode="contain"
            />
          ) : null}
          {sent.has(file.id) ? (
            <Text variant="caption" tone="muted" testID="draft-photo-sent">
              Sent with version {request.snapshot?.version}: it stays with the request.
            </Text>
          ) : asking === file.id ? (
            <View style={styles.row}>
              <Text style={styles.ask}>Remove this photo from {copy}?</Text>
              <Button
                label="Remove it"
                variant="danger"
                busy={busy === file.id}
                onPress={() => void run(file.id, () => removeRequestFile(request.id, file.id))}
                testID="draft-photo-confirm-remove"
              />
              <Button label="Keep it" variant="secondary" onPress={() => setAsking(null)} />
            </View>
          ) : (
            <Button
              label={`Remove ${file.fileName}`}
              variant="quiet"
              onPress={() => setAsking(file.id)}
              testID="draft-photo-remove"
            />
          )}
        </View>
      ))}
      {problem ? (
        <Notice tone="error" title="Not done" testID="draft-photos-problem">
          {problem.message}
        </Notice>
      ) : null}
      {pickFile ? (
        <View style={styles.add}>
          <PickerField
            label="Where the photo was taken"
            value={place}
            choices={photoPlaces.map((p) => ({ value: p, label: PHOTO_PLACE_LABELS[p] }))}
            onChange={setPlace}
            errors={problem?.fields.place}
            testID="draft-photo-place"
          />
          <TextField
            label="Caption"
            hint="What the engineer should see in it, like “joists over the wall, tape at 16 in”."
            value={caption}
            onChangeText={setCaption}
            errors={problem?.fields.caption}
            testID="draft-photo-caption"
          />
          <Button
            label="Add a photo or sketch"
            icon="plus"
            variant="secondary"
            busy={busy === 'add'}
            onPress={() => void add()}
            testID="draft-photo-add"
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  photo: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
  },
  image: { width: '100%', height: 200 },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  ask: { flexBasis: '100%' },
  add: { gap: spacing.md, paddingTop: spacing.sm },
});

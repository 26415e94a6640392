import { Image, StyleSheet, View } from 'react-native';
import { downloadPath, filePath } from '@/lib/api/design-requests';
import { spacing } from '@/lib/theme';
import { PHOTO_PLACE_LABELS } from '@/shared/schemas/requests/snapshot';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Button } from '../button';
import { Card } from '../card';
import { Text } from '../text';
import { openDownload } from './browser-files';
import { WaitingPhotos } from './waiting-photos';

const PURPOSE_WORDS = {
  photo: 'Photo or sketch',
  message: 'In a message',
  design: 'Design document',
} as const;

/** The package downloads (PDF, JSON, load table, photos) and every file of the request with its tag. */
export function RequestFilesCard({ request }: { request: RequestDetail }) {
  const sent = request.version > 0;
  return (
    <Card title="Package and files" testID="request-files">
      {sent && openDownload ? (
        <View style={styles.buttons}>
          {(
            [
              ['package.pdf', 'PDF package'],
              ['package.json', 'JSON package'],
              ['loads.csv', 'Load table (CSV)'],
              ['photos.zip', 'Photos (zip)'],
            ] as const
          ).map(([what, label]) => (
            <Button
              key={what}
              label={label}
              variant="secondary"
              testID={`download-${what}`}
              onPress={() => openDownload?.(downloadPath(request.id, what))}
            />
          ))}
        </View>
      ) : null}
      {!sent ? <Text tone="muted">The package is made when the request is sent.</Text> : null}
      <WaitingPhotos requestId={request.id} />
      {request.files.map((file) => (
        <View key={file.id} style={styles.file} testID="request-file">
          <Text variant="bodyStrong">
            {PURPOSE_WORDS[file.purpose]}
            {file.purpose === 'photo' ? `: ${PHOTO_PLACE_LABELS[file.place]}` : ''}
            {file.version ? ` (answers version ${file.version})` : ''}
          </Text>
          <Text>{file.caption || file.fileName}</Text>
          {file.mimeType === 'image/jpeg' || file.mimeType === 'image/png' ? (
            <Image
              source={{ uri: filePath(request.id, file.id, 'preview') }}
              accessibilityLabel={file.caption || file.fileName}
              style={styles.photo}
              resizeMode="contain"
            />
          ) : null}
          {file.previewNote ? (
            <Text variant="caption" tone="muted">
              {file.previewNote}
            </Text>
          ) : null}
          {openDownload ? (
            <Button
              label={`Download ${file.fileName}`}
              variant="quiet"
              onPress={() => openDownload?.(filePath(request.id, file.id))}
            />
          ) : null}
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  file: { gap: spacing.xxs, paddingTop: spacing.md },
  photo: { width: '100%', height: 220 },
});

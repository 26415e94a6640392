import { StyleSheet, View } from 'react-native';
import { requestUploadGroup } from '@/lib/hooks/use-photo-upload';
import { useDeviceStatus } from '@/lib/hooks/use-device-status';
import { spacing } from '@/lib/theme';
import { DeviceMark } from '../offline/device-mark';
import { Text } from '../text';

/** Photos taken for this request that are still only on this device, waiting to upload. */
export function WaitingPhotos({ requestId }: { requestId: string }) {
  const { items } = useDeviceStatus();
  const photos = items.filter((i) => i.entity === 'photo' && i.group === requestUploadGroup(requestId));
  return photos.map((photo) => (
    <View key={photo.seq} style={styles.row} testID="request-file-waiting">
      <Text variant="bodyStrong">{photo.label}</Text>
      <Text variant="caption" tone="muted">
        {photo.status === 'waiting'
          ? 'Uploads by itself when there is signal.'
          : `Stopped: ${photo.lastError ?? 'see Sync'}.`}
      </Text>
      <DeviceMark recordId={photo.recordId} />
    </View>
  ));
}

const styles = StyleSheet.create({ row: { gap: spacing.xxs } });

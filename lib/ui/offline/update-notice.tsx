import { StyleSheet, View } from 'react-native';
import { applyUpdate } from '@/lib/offline/service-worker';
import { colors, layout, radii, spacing } from '@/lib/theme';
import { Button } from '../button';
import { Text } from '../text';

/** A strip at the foot of the screen: a new version of the app is ready and loads when the person says. */
export function UpdateNotice() {
  return (
    <View style={styles.wrap} pointerEvents="box-none">
      <View style={styles.strip} role="status" testID="update-notice">
        <Text variant="label" style={styles.text}>
          New version — reload to use it. Changes waiting on this device are kept.
        </Text>
        <Button label="Reload" variant="secondary" testID="update-reload" onPress={applyUpdate} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: {
    position: 'absolute',
    left: 0,
    right: 0,
    bottom: layout.tabBarHeight + spacing.md,
    alignItems: 'center',
    paddingHorizontal: spacing.lg,
  },
  strip: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: spacing.md,
    maxWidth: layout.contentMaxWidth,
    padding: spacing.md,
    borderRadius: radii.md,
    backgroundColor: colors.ink,
  },
  text: { color: colors.onAccent, flexShrink: 1, flexBasis: 200, flexGrow: 1 },
});

import { StyleSheet, View } from 'react-native';
import { colors, iconSize, spacing } from '@/lib/theme';
import { Icon } from './icon';
import { Text } from './text';

/** Error messages under a field, each with an icon so the state never rests on colour alone. */
export function FieldMessages({ messages }: { messages?: string[] }) {
  if (!messages?.length) return null;
  return (
    <View role="alert" style={styles.list}>
      {messages.map((message) => (
        <View key={message} style={styles.row}>
          <Icon name="error" size={iconSize.sm} color={colors.danger} />
          <Text variant="caption" tone="danger" style={styles.text}>
            {message}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xxs },
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  text: { flex: 1 },
});

import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { spacing } from '@/lib/theme';
import { Button } from './button';
import { Notice } from './notice';

const titles: Record<number, string> = {
  0: 'Offline',
  403: 'Not allowed',
  404: 'Not found',
};

/** Shows why a screen could not load, with a retry when retrying can help. */
export function ErrorView({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const apiError = error instanceof ApiError ? error : null;
  const message = apiError?.message ?? (error instanceof Error ? error.message : 'Something went wrong.');
  const canRetry = onRetry && (!apiError || apiError.status === 0 || apiError.status >= 500);
  return (
    <View style={styles.wrap}>
      <Notice tone="error" title={apiError ? titles[apiError.status] : undefined} testID="error-view">
        {message}
      </Notice>
      {canRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.md, alignSelf: 'stretch' } });

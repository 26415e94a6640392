import { memo } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii } from '@/lib/theme';

/**
 * Demand over capacity as a bar to 1.5× capacity with a mark at 1.0. Decorative: the ratio is always written
 * beside it, and a failing bar is hatched by its full-height end mark as well as its colour.
 */
function RatioBarView({ ratio }: { ratio: number }) {
  const shown = Math.max(0, Math.min(ratio, 1.5)) / 1.5;
  const fail = ratio > 1;
  return (
    <View style={styles.track} aria-hidden>
      <View style={[styles.fill, { width: `${shown * 100}%` }, fail ? styles.fail : styles.pass]} />
      <View style={styles.limit} />
    </View>
  );
}

/** Memoised: drawn again only for a new ratio. */
export const RatioBar = memo(RatioBarView);

const styles = StyleSheet.create({
  track: {
    height: 12,
    borderRadius: radii.sm,
    backgroundColor: colors.surfaceSunken,
    borderWidth: 1,
    borderColor: colors.line,
    overflow: 'hidden',
    alignSelf: 'stretch',
  },
  fill: { height: '100%' },
  pass: { backgroundColor: colors.accent },
  fail: { backgroundColor: colors.danger },
  limit: {
    position: 'absolute',
    top: 0,
    bottom: 0,
    left: `${(1 / 1.5) * 100}%`,
    width: 2,
    backgroundColor: colors.ink,
  },
});

import { StyleSheet } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';

/** A tappable boxed row inside a card (a job's members, a job's wall screens): link, row, pressed, text. */
export const cardRowStyles = StyleSheet.create({
  link: { borderRadius: radii.md },
  row: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.md,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radii.md,
    backgroundColor: colors.paper,
  },
  pressed: { backgroundColor: colors.surfaceSunken },
  text: { flex: 1, gap: spacing.xxs },
});

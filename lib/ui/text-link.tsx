import { Link, type Href } from 'expo-router';
import { StyleSheet } from 'react-native';
import { colors, layout, spacing, typeScale } from '@/lib/theme';

/** An underlined in-app link on its own line, tall enough to tap. */
export function TextLink({ href, label, testID }: { href: Href; label: string; testID?: string }) {
  return (
    <Link href={href} style={styles.link} testID={testID}>
      {label}
    </Link>
  );
}

const styles = StyleSheet.create({
  link: {
    ...typeScale.bodyStrong,
    color: colors.accent,
    textDecorationLine: 'underline',
    minHeight: layout.touchTarget,
    paddingVertical: spacing.md,
    alignSelf: 'flex-start',
  },
});

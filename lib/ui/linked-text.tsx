import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { colors, fonts } from '@/lib/theme';
import { splitLinks } from './split-links';
import { Text, type TextProps } from './text';

/** Plain text whose http(s) addresses are real links. */
export function LinkedText({ children, ...rest }: Omit<TextProps, 'children'> & { children: string }) {
  return (
    <Text {...rest}>
      {splitLinks(children).map((piece, i) =>
        piece.kind === 'link' ? (
          <Link key={i} href={piece.value} style={styles.link}>
            {piece.value}
          </Link>
        ) : (
          piece.value
        ),
      )}
    </Text>
  );
}

const styles = StyleSheet.create({
  link: { color: colors.accent, fontFamily: fonts.semibold, textDecorationLine: 'underline' },
});

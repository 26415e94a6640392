import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, iconSize, layout, radii, spacing } from '@/lib/theme';
import { Icon } from './icon';
import type { NavItem } from './nav-items';
import { Text } from './text';

type NavLinkProps = { item: NavItem; active: boolean; placement: 'tab' | 'side' };

/** One navigation destination; the current one is marked by a bar, a bolder label and `aria-current`. */
export function NavLink({ item, active, placement }: NavLinkProps) {
  const tint = active ? colors.accent : colors.inkMuted;
  const side = placement === 'side';
  return (
    <Link href={item.href} asChild>
      <Pressable
        aria-current={active ? 'page' : undefined}
        aria-label={item.label}
        testID={`nav-${item.label.toLowerCase().replaceAll(' ', '-')}`}
        // Flat style object: expo-router Link asChild merges the child style by object spread.
        style={StyleSheet.flatten([side ? styles.side : styles.tab, active && side && styles.sideActive])}
      >
        <View style={[side ? styles.sideBar : styles.tabBar, active && styles.barActive]} />
        <Icon name={item.icon} size={side ? iconSize.md : iconSize.lg} color={tint} />
        <Text
          variant={active ? 'label' : 'caption'}
          style={[{ color: active ? colors.ink : colors.inkMuted }, side && styles.sideLabel]}
        >
          {item.label}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  tab: {
    flex: 1,
    minHeight: layout.tabBarHeight,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.xxs,
  },
  tabBar: {
    position: 'absolute',
    top: 0,
    left: spacing.lg,
    right: spacing.lg,
    height: 4,
    borderRadius: radii.sm,
  },
  side: {
    minHeight: layout.touchTarget,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    paddingHorizontal: spacing.lg,
    borderRadius: radii.md,
  },
  sideActive: { backgroundColor: colors.accentSoft },
  sideBar: {
    position: 'absolute',
    left: 0,
    top: spacing.sm,
    bottom: spacing.sm,
    width: 4,
    borderRadius: radii.sm,
  },
  sideLabel: { fontSize: 17 },
  barActive: { backgroundColor: colors.accent },
});

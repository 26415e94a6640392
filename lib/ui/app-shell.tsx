import { usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import type { Me } from '@/shared/schemas/auth';
import { colors, layout, spacing } from '@/lib/theme';
import { NavLink } from './nav-link';
import { SyncPill } from './offline/sync-pill';
import { isNavItemActive, navItemsForRole } from './nav-items';
import { roleLabel } from './role-label';
import { Text } from './text';
import { UnconfirmedEmailNotice } from './unconfirmed-email-notice';
import { Wordmark } from './wordmark';

/**
 * The signed-in frame: bottom tabs on a phone (< 768 px wide), a side navigation on a wide screen.
 * The tabs a person sees follow their role in the active firm; the sync pill shows in the header.
 */
export function AppShell({ me, children }: { me: Me; children: ReactNode }) {
  const { width } = useWindowDimensions();
  const pathname = usePathname();
  const items = navItemsForRole(me.role);
  const firm = me.memberships.find((m) => m.orgId === me.activeOrgId);
  const wide = width >= layout.wideBreakpoint;
  const insets = useSafeAreaInsets();

  const links = items.map((item) => (
    <NavLink
      key={item.href}
      item={item}
      active={isNavItemActive(item, pathname)}
      placement={wide ? 'side' : 'tab'}
    />
  ));
  const firmLine = firm ? `${firm.orgName} · ${roleLabel(me.role)}` : roleLabel(me.role);

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.sideNav} role="navigation" aria-label="Main">
          <Wordmark />
          <Text variant="caption" tone="muted" numberOfLines={2}>
            {firmLine}
          </Text>
          <SyncPill />
          <View style={styles.sideLinks}>{links}</View>
        </View>
        <View style={styles.content}>
          <UnconfirmedEmailNotice me={me} />
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={styles.phoneRoot}>
      <View style={[styles.topBar, { paddingTop: spacing.sm + insets.top }]}>
        <View style={styles.topBrand}>
          <Wordmark />
          <Text variant="caption" tone="muted" numberOfLines={1}>
            {firmLine}
          </Text>
        </View>
        <SyncPill />
      </View>
      <UnconfirmedEmailNotice me={me} />
      <View style={styles.content}>{children}</View>
      <View style={[styles.tabBar, { paddingBottom: insets.bottom }]} role="navigation" aria-label="Main">
        {links}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  sideNav: {
    width: layout.sideNavWidth,
    padding: spacing.lg,
    gap: spacing.md,
    borderRightWidth: 1,
    borderRightColor: colors.line,
    backgroundColor: colors.surface,
  },
  sideLinks: { gap: spacing.xs, marginTop: spacing.lg },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  topBar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    backgroundColor: colors.surface,
  },
  topBrand: { flexShrink: 1, gap: spacing.xxs },
  content: { flex: 1 },
  tabBar: {
    flexDirection: 'row',
    borderTopWidth: 1,
    borderTopColor: colors.line,
    backgroundColor: colors.surface,
  },
});

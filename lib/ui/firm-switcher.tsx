import { StyleSheet, View } from 'react-native';
import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSubmit } from '@/lib/hooks/use-submit';
import { colors, spacing } from '@/lib/theme';
import type { Me } from '@/shared/schemas/auth';
import { Button } from './button';
import { Icon } from './icon';
import { Notice } from './notice';
import { orgKindLabel, roleLabel } from './role-label';
import { Text } from './text';

/** Each firm the person belongs to; the active one is marked, the others can be switched to. */
export function FirmSwitcher({ me }: { me: Me }) {
  const { switchFirm } = useSessionActions();
  const { run, busy, error } = useSubmit(switchFirm);
  return (
    <View style={styles.list}>
      {error ? <Notice tone="error">{error.message}</Notice> : null}
      {me.memberships.map((m, i) => {
        const active = m.orgId === me.activeOrgId;
        return (
          <View key={m.orgId} style={[styles.row, i > 0 && styles.divider]} testID="firm-row">
            <View style={styles.text}>
              <Text variant="bodyStrong">{m.orgName}</Text>
              <Text variant="caption" tone="muted">
                {orgKindLabel(m.orgKind)} · {roleLabel(m.role)}
              </Text>
            </View>
            {active ? (
              <View style={styles.current}>
                <Icon name="check" color={colors.success} />
                <Text variant="label" style={{ color: colors.success }}>
                  Current
                </Text>
              </View>
            ) : (
              <Button
                label="Switch"
                icon="swap"
                variant="secondary"
                disabled={busy}
                onPress={() => void run(m.orgId)}
              />
            )}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { alignSelf: 'stretch' },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
    paddingVertical: spacing.md,
  },
  divider: { borderTopWidth: 1, borderTopColor: colors.line },
  text: { flexGrow: 1, flexShrink: 1, minWidth: 180, gap: spacing.xxs },
  current: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, minHeight: 48 },
});

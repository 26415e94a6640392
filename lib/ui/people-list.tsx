import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/lib/theme';
import type { InvitationRow, MemberRow } from '@/shared/schemas/orgs';
import { Button } from './button';
import { dateLabel } from './date-label';
import { roleLabel } from './role-label';
import { Text } from './text';

/** The firm's members: name, e-mail, role and the date they joined. */
export function MemberList({ members }: { members: MemberRow[] }) {
  return (
    <View>
      {members.map((m, i) => (
        <View key={m.userId} style={[styles.row, i > 0 && styles.divider]} testID="member-row">
          <Text variant="bodyStrong">{m.name}</Text>
          <Text tone="muted">{m.email}</Text>
          <Text variant="caption" tone="muted">
            {roleLabel(m.role)} · joined {dateLabel(m.joinedAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

type InvitationListProps = {
  invitations: InvitationRow[];
  onRevoke: (id: string) => void;
  revoking: boolean;
};

/** Invitations sent and not yet accepted, each with a way to take it back. */
export function InvitationList({ invitations, onRevoke, revoking }: InvitationListProps) {
  if (invitations.length === 0) return <Text tone="muted">No invitations waiting.</Text>;
  return (
    <View>
      {invitations.map((inv, i) => (
        <View
          key={inv.id}
          style={[styles.row, styles.inviteRow, i > 0 && styles.divider]}
          testID="invitation-row"
        >
          <View style={styles.inviteText}>
            <Text variant="bodyStrong">{inv.email}</Text>
            <Text variant="caption" tone="muted">
              {roleLabel(inv.role)} · sent {dateLabel(inv.createdAt)} · expires {dateLabel(inv.expiresAt)}
            </Text>
          </View>
          <Button label="Revoke" variant="secondary" disabled={revoking} onPress={() => onRevoke(inv.id)} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.md, gap: spacing.xxs },
  divider: { borderTopWidth: 1, borderTopColor: colors.line },
  inviteRow: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
  },
  inviteText: { flexGrow: 1, flexShrink: 1, minWidth: 200, gap: spacing.xxs },
});

import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radii, spacing } from '@/lib/theme';
import type { RequestListItem } from '@/shared/schemas/requests/views';
import { REQUEST_STATE_LABELS } from '@/shared/schemas/requests/workflow';
import { dateLabel } from '../date-label';
import { Icon } from '../icon';
import { Text } from '../text';

/** One request in a list: number, job, firm, state in words, and "New" (not colour alone) when unread. */
export function RequestRow({ request, showFirm }: { request: RequestListItem; showFirm: boolean }) {
  const state = REQUEST_STATE_LABELS[request.status];
  return (
    <Link href={{ pathname: '/requests/[requestId]', params: { requestId: request.id } }} asChild>
      <Pressable
        aria-label={`Request ${request.number}, ${request.jobName}: ${state}${request.unread ? ', new' : ''}`}
        testID="request-row"
        style={styles.link}
      >
        {({ pressed }) => (
          <View style={[styles.row, pressed && styles.pressed]}>
            <View style={[styles.dot, request.unread && styles.unread]} />
            <View style={styles.text}>
              <Text variant="bodyStrong">
                Request {request.number} · {request.jobName}
              </Text>
              <Text>
                {state}
                {request.unread ? ' · New' : ''}
              </Text>
              <Text variant="caption" tone="muted">
                {showFirm ? `${request.firmName} · ` : ''}
                {request.version > 0 ? `version ${request.version} · ` : ''}
                {request.engineerEmail ?? 'no engineer yet'} · {dateLabel(request.updatedAt)}
              </Text>
            </View>
            <Icon name="chevronRight" color={colors.inkMuted} />
          </View>
        )}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { borderRadius: radii.md },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: layout.touchTarget,
    paddingVertical: spacing.sm,
    borderBottomWidth: StyleSheet.hairlineWidth,
    borderBottomColor: colors.line,
  },
  pressed: { backgroundColor: colors.overlay },
  dot: { width: 10, height: 10, borderRadius: 5 },
  unread: { backgroundColor: colors.accent },
  text: { flex: 1, gap: spacing.xxs },
});

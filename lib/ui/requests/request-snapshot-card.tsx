import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/lib/format';
import { spacing } from '@/lib/theme';
import { DESIGNED_MATERIAL_LABELS } from '@/shared/schemas/requests/reply';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Card } from '../card';
import { FieldList } from '../field-list';
import { Text } from '../text';

/**
 * The sent version, read-only: the job facts and each member's preliminary size beside the engineer's
 * member when there is a reply; once Designed the preliminary size is marked superseded.
 */
export function RequestSnapshotCard({ request }: { request: RequestDetail }) {
  const snapshot = request.snapshot;
  if (!snapshot) return null;
  const designed = request.status === 'designed' || request.status === 'closed';
  const reply = request.reply?.reply;
  return (
    <Card title={`Version ${snapshot.version} as sent`} testID="request-snapshot">
      <FieldList
        items={[
          {
            label: 'Job',
            value: `${snapshot.job.name}${snapshot.job.address ? `, ${snapshot.job.address}` : ''}`,
          },
          {
            label: 'Jurisdiction',
            value:
              [snapshot.jurisdiction.place, snapshot.jurisdiction.state].filter(Boolean).join(', ') || '—',
          },
          { label: 'Load standard', value: snapshot.job.loadStandard },
          {
            label: 'Ground snow',
            value: `${snapshot.job.groundSnowPsf} psf (${snapshot.job.groundSnowSource || 'source not entered'})`,
          },
          { label: 'Flush or dropped', value: snapshot.constraints.mount },
          { label: 'Questions', value: snapshot.questions || '—' },
        ]}
      />
      {snapshot.members.map((member) => {
        const answer = reply?.members.find((m) => m.memberId === member.id);
        return (
          <View key={member.id} style={styles.member} testID="request-member">
            <Text variant="bodyStrong">{member.label}</Text>
            <Text
              tone={designed && answer ? 'muted' : 'ink'}
              style={designed && answer ? styles.superseded : undefined}
            >
              Preliminary: {member.summary.sizeLabel} {member.summary.materialLabel} (
              {member.summary.governingCheck} at {formatNumber(member.summary.governingRatio, 2)})
            </Text>
            {designed && answer ? (
              <Text variant="caption">Preliminary size superseded by the engineer’s member</Text>
            ) : null}
            {answer ? (
              <Text variant="bodyStrong" testID="engineer-member">
                Engineer: {DESIGNED_MATERIAL_LABELS[answer.material]}, {answer.designation}
                {answer.plies ? ` (${answer.plies} plies)` : ''}
              </Text>
            ) : null}
            {answer ? (
              <Text variant="caption" tone="muted">
                {[answer.plyFastening, answer.hangers, answer.posts, answer.footing, answer.connections]
                  .filter(Boolean)
                  .join(' · ')}
                {answer.bearingLeftIn
                  ? ` · bearing ${answer.bearingLeftIn} / ${answer.bearingRightIn ?? '—'} in`
                  : ''}
              </Text>
            ) : null}
          </View>
        );
      })}
      {reply && reply.verifyInField.length > 0 ? (
        <View style={styles.member} testID="verify-in-field">
          <Text variant="bodyStrong">Verify in the field</Text>
          {reply.verifyInField.map((item) => (
            <Text key={item.item}>
              • {item.item}
              {item.photo ? ' (photo wanted)' : ''}
            </Text>
          ))}
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  member: { gap: spacing.xxs, paddingTop: spacing.md },
  superseded: { textDecorationLine: 'line-through' },
});

import { StyleSheet, View } from 'react-native';
import { useJobMembers } from '@/lib/hooks/use-job-members';
import { spacing } from '@/lib/theme';
import { Card } from '@/lib/ui/card';
import { LinkButton } from '@/lib/ui/link-button';
import { Text } from '@/lib/ui/text';

/** Temporary shoring: a planner per member, from the member's own loads. */
export function ShoringPanel({ jobId }: { jobId: string }) {
  const { data: members } = useJobMembers(jobId);
  return (
    <Card title="Temporary shoring" testID="job-shoring">
      <Text tone="muted">
        Plan the temporary walls that hold the house up while a bearing wall comes out. Shore before you
        remove any bearing element.
      </Text>
      {members && members.length === 0 ? <Text tone="muted">Save a header or beam first.</Text> : null}
      <View style={styles.list}>
        {members?.map((m) => (
          <LinkButton
            key={m.id}
            label={`Plan shoring: ${m.label}`}
            variant="secondary"
            href={{ pathname: '/jobs/[jobId]/shoring/[memberId]', params: { jobId, memberId: m.id } }}
            testID="plan-shoring"
          />
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ list: { gap: spacing.sm } });

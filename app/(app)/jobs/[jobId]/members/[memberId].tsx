import { useLocalSearchParams } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/lib/theme';
import { TextLink } from '@/lib/ui/text-link';
import { useJob } from '@/lib/hooks/use-job';
import { useJobDesigns } from '@/lib/hooks/use-job-designs';
import { useMe } from '@/lib/hooks/use-me';
import { useMember } from '@/lib/hooks/use-member';
import { useMemberSave } from '@/lib/hooks/use-member-save';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { LazyMemberEditor, WorkspaceSuspense } from '@/lib/ui/lazy-workspace';
import { DeviceMark } from '@/lib/ui/offline/device-mark';

export default function MemberPage() {
  const { jobId, memberId, saved } = useLocalSearchParams<{
    jobId: string;
    memberId: string;
    saved?: string;
  }>();
  const job = useJob(jobId);
  const member = useMember(memberId);
  const designs = useJobDesigns(jobId);
  const { data: me } = useMe();
  const save = useMemberSave(jobId, member.data);
  const error = job.error ?? member.error;
  if (error)
    return (
      <ErrorView
        error={error}
        onRetry={() => {
          void job.mutate();
          void member.mutate();
        }}
      />
    );
  if (!job.data || !member.data || !me) return <LoadingView />;
  return (
    <View style={styles.page}>
      <View style={styles.links}>
        <TextLink
          href={`/jobs/${jobId}/load-path/${memberId}`}
          label={`Load path to the ground: ${member.data.summary.loadPath?.closed ? 'closed' : 'open — say what each end bears on'}`}
        />
        <TextLink href={`/jobs/${jobId}/budget/${memberId}`} label="Budget for this member" />
        <DeviceMark recordId={memberId} />
      </View>
      <WorkspaceSuspense>
        <LazyMemberEditor
          key={member.data.id}
          job={job.data}
          member={member.data}
          kind={member.data.kind}
          storageKey={`${me.user.id}.${job.data.id}.${member.data.id}`}
          onSave={save}
          justSaved={saved === '1' ? 'server' : saved === 'device' ? 'device' : undefined}
          design={designs.data?.find((d) => d.memberId === memberId)}
        />
      </WorkspaceSuspense>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1 },
  links: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    columnGap: spacing.lg,
    paddingHorizontal: spacing.lg,
    paddingTop: spacing.sm,
  },
});

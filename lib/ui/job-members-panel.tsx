import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { formatNumber } from '@/lib/format';
import { useJobDesigns } from '@/lib/hooks/use-job-designs';
import { useJobMembers } from '@/lib/hooks/use-job-members';
import { colors, spacing } from '@/lib/theme';
import type { MemberRecompute } from '@/shared/schemas/job-update';
import type { Job } from '@/shared/schemas/jobs';
import type { MemberListItem } from '@/shared/schemas/members';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { Card } from './card';
import { cardRowStyles } from './card-row-styles';
import { ErrorView } from './error-view';
import { Icon } from './icon';
import { LinkButton } from './link-button';
import { memberStateLook } from './member-state';
import { DeviceMark } from './offline/device-mark';
import { RecomputeNotice } from './recompute-notice';
import { checkNames } from './result/check-names';
import { Text } from './text';
import { TextLink } from './text-link';

function MemberRow({ member, design }: { member: MemberListItem; design?: MemberDesign }) {
  const look = memberStateLook[member.summary.state];
  return (
    <Link
      href={{
        pathname: '/jobs/[jobId]/members/[memberId]',
        params: { jobId: member.jobId, memberId: member.id },
      }}
      asChild
    >
      <Pressable
        aria-label={`${member.label}: ${design ? 'designed by the engineer' : look.word}`}
        testID="member-row"
        style={cardRowStyles.link}
      >
        {({ pressed }) => (
          <View style={[cardRowStyles.row, pressed && cardRowStyles.pressed]}>
            <Icon name={look.icon} color={look.tone === 'danger' ? colors.danger : colors.ink} />
            <View style={cardRowStyles.text}>
              <Text variant="bodyStrong">{member.label}</Text>
              {design ? (
                <Text variant="bodyStrong" testID="member-designed">
                  Engineer’s member: {design.designation}
                </Text>
              ) : (
                <Text tone={look.tone}>{look.word}</Text>
              )}
              <DeviceMark recordId={member.id} />
              <Text variant="caption" tone="muted" style={design ? styles.superseded : undefined}>
                {member.kind === 'header' ? 'Header' : 'Beam'}
                {member.wall ? ` · ${member.wall}` : ''} · {member.summary.sizeLabel}{' '}
                {member.summary.materialLabel} · {checkNames[member.summary.governingCheck]} at{' '}
                {formatNumber(member.summary.governingRatio, 2)}
                {member.summary.warningsCount ? ` · ${member.summary.warningsCount} warnings` : ''}
              </Text>
              {design ? (
                <Text variant="caption" testID="member-superseded">
                  Preliminary size superseded (design request {design.requestNumber}, version {design.version}
                  )
                </Text>
              ) : null}
            </View>
            <Icon name="chevronRight" color={colors.inkMuted} />
          </View>
        )}
      </Pressable>
    </Link>
  );
}

/**
 * The job's members with their state, the loads they inherit from the job, "Add a header" / "Add a beam",
 * and after a job save the members the server checked again (`recomputed`).
 */
export function JobMembersPanel({
  job,
  recomputed = [],
}: {
  job: Job;
  recomputed?: readonly MemberRecompute[];
}) {
  const { data: members, error, mutate } = useJobMembers(job.id);
  const { data: designs } = useJobDesigns(job.id);
  return (
    <Card title="Members" testID="job-members">
      <Text variant="caption" tone="muted">
        Members take these from the job: {job.loadStandard}, ground snow {job.groundSnowPsf} psf
        {job.groundSnowSource ? ` (${job.groundSnowSource})` : ' (source not entered)'}, roof {job.roofType}{' '}
        at {job.roofPitchIn12} in 12.
      </Text>
      <RecomputeNotice recomputed={recomputed} />
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {members && members.length === 0 ? (
        <Text tone="muted">No members yet. Add the header or beam for an opening.</Text>
      ) : null}
      {members?.map((m) => (
        <MemberRow key={m.id} member={m} design={designs?.find((d) => d.memberId === m.id)} />
      ))}
      <TextLink href={`/jobs/${job.id}/framing`} label="Existing framing (girders, posts, footings…)" />
      <View style={styles.actions}>
        <LinkButton
          label="Add a header"
          icon="plus"
          href={{ pathname: '/jobs/[jobId]/members/new', params: { jobId: job.id, kind: 'header' } }}
          testID="add-header"
        />
        <LinkButton
          label="Add a beam"
          icon="plus"
          variant="secondary"
          href={{ pathname: '/jobs/[jobId]/members/new', params: { jobId: job.id, kind: 'beam' } }}
          testID="add-beam"
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  superseded: { textDecorationLine: 'line-through' },
});

import { useMemberMutations } from '@/lib/hooks/use-member-mutations';
import { useMembers } from '@/lib/hooks/use-members';
import { useSubmit } from '@/lib/hooks/use-submit';
import { Card } from './card';
import { ErrorView } from './error-view';
import { InviteForm } from './invite-form';
import { LoadingView } from './loading-view';
import { Notice } from './notice';
import { InvitationList, MemberList } from './people-list';

/** Owner's view of the firm: members, pending invitations and the invite form. */
export function MembersPanel() {
  const { data, error, mutate } = useMembers();
  const { invite, revoke } = useMemberMutations();
  const revoking = useSubmit(revoke);

  if (error) return <ErrorView error={error} onRetry={() => mutate()} />;
  if (!data) return <LoadingView />;
  const pending = data.invitations.filter((inv) => inv.acceptedAt === null);
  return (
    <>
      <Card title={`Members (${data.members.length})`}>
        <MemberList members={data.members} />
      </Card>
      <Card title="Waiting invitations">
        {revoking.error ? <Notice tone="error">{revoking.error.message}</Notice> : null}
        <InvitationList
          invitations={pending}
          revoking={revoking.busy}
          onRevoke={(id) => void revoking.run(id)}
        />
      </Card>
      <Card title="Invite someone">
        <InviteForm onInvite={invite} />
      </Card>
    </>
  );
}

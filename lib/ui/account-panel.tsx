import { useSessionActions } from '@/lib/hooks/use-session-actions';
import { useSubmit } from '@/lib/hooks/use-submit';
import type { Me } from '@/shared/schemas/auth';
import { Button } from './button';
import { Card } from './card';
import { FieldList } from './field-list';
import { FirmSwitcher } from './firm-switcher';
import { Notice } from './notice';
import { orgKindLabel, roleLabel } from './role-label';
import { SessionsCard } from './sessions-card';

/** Who is signed in, in which firm and role; firm switching, the person's sessions and sign-out. */
export function AccountPanel({ me }: { me: Me }) {
  const { signOut } = useSessionActions();
  const signingOut = useSubmit(signOut);
  const firm = me.memberships.find((m) => m.orgId === me.activeOrgId);
  return (
    <>
      <Card title="You">
        <FieldList
          items={[
            { label: 'Name', value: me.user.name },
            {
              label: 'E-mail',
              value: me.user.emailVerified ? me.user.email : `${me.user.email} (not confirmed yet)`,
            },
            { label: 'Firm', value: firm ? `${firm.orgName} (${orgKindLabel(firm.orgKind)})` : 'None' },
            { label: 'Role', value: roleLabel(me.role) },
          ]}
        />
      </Card>
      {me.memberships.length > 1 ? (
        <Card title="Your firms">
          <FirmSwitcher me={me} />
        </Card>
      ) : null}
      <SessionsCard />
      {signingOut.error ? <Notice tone="error">{signingOut.error.message}</Notice> : null}
      <Button
        label="Sign out"
        icon="signOut"
        variant="secondary"
        testID="sign-out"
        busy={signingOut.busy}
        onPress={() => void signingOut.run()}
      />
    </>
  );
}

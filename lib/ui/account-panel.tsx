import type { Me } from '@/shared/schemas/auth';
import { Card } from './card';
import { FieldList } from './field-list';
import { FirmSwitcher } from './firm-switcher';
import { SignOutControl } from './offline/sign-out-control';
import { orgKindLabel, roleLabel } from './role-label';
import { SessionsCard } from './sessions-card';

/** Who is signed in, in which firm and role; firm switching, the person's sessions and sign-out. */
export function AccountPanel({ me }: { me: Me }) {
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
      <SignOutControl />
    </>
  );
}

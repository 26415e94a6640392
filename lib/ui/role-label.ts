import type { OrgKind, Role } from '@/shared/schemas/auth';

const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  contractor: 'Contractor',
  estimator: 'Estimator',
  engineer: 'Engineer',
};

const orgKindLabels: Record<OrgKind, string> = {
  contracting: 'Contracting firm',
  engineering: 'Engineering firm',
};

/** The word shown for a role. */
export function roleLabel(role: Role): string {
  return roleLabels[role];
}

/** The words shown for a kind of firm. */
export function orgKindLabel(kind: OrgKind): string {
  return orgKindLabels[kind];
}

/**
 * Every SWR cache key the client uses. Firm-scoped keys carry the firm id so switching firms never shows
 * another firm's cached data.
 */
export const keys = {
  me: (orgId: string | null) => ['me', orgId] as const,
  jobs: (orgId: string) => ['jobs', orgId] as const,
  job: (orgId: string, jobId: string) => ['job', orgId, jobId] as const,
  /** The firm's people (orgs.ts). */
  members: (orgId: string) => ['members', orgId] as const,
  /** A job's structural members: headers and beams (structural-members.ts). */
  jobMembers: (orgId: string, jobId: string) => ['job-members', orgId, jobId] as const,
  member: (orgId: string, memberId: string) => ['member', orgId, memberId] as const,
  priceBook: (orgId: string) => ['price-book', orgId] as const,
  memberBudget: (orgId: string, memberId: string) => ['member-budget', orgId, memberId] as const,
  jobBudget: (orgId: string, jobId: string) => ['job-budget', orgId, jobId] as const,
  invitation: (token: string) => ['invitation', token] as const,
  devMail: () => ['dev-mail'] as const,
};

/** True for keys that belong to a firm, so a firm switch or sign-out can drop them. */
export function isFirmScopedKey(key: unknown): boolean {
  return (
    Array.isArray(key) &&
    [
      'me',
      'jobs',
      'job',
      'members',
      'job-members',
      'member',
      'price-book',
      'member-budget',
      'job-budget',
    ].includes(key[0])
  );
}

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
  /** A job's bearing screens and its engineer-needed mark (bearing-screens.ts). */
  jobScreens: (orgId: string, jobId: string) => ['job-screens', orgId, jobId] as const,
  screen: (orgId: string, screenId: string) => ['screen', orgId, screenId] as const,
  checklist: (orgId: string, jobId: string) => ['checklist', orgId, jobId] as const,
  jobProgress: (orgId: string) => ['job-progress', orgId] as const,
  shoring: (orgId: string, memberId: string) => ['shoring', orgId, memberId] as const,
  /** A job's existing framing, bearings and their check (load-path.ts). */
  loadPath: (orgId: string, jobId: string) => ['load-path', orgId, jobId] as const,
  priceBook: (orgId: string) => ['price-book', orgId] as const,
  memberBudget: (orgId: string, memberId: string) => ['member-budget', orgId, memberId] as const,
  jobBudget: (orgId: string, jobId: string) => ['job-budget', orgId, jobId] as const,
  invitation: (token: string) => ['invitation', token] as const,
  devMail: () => ['dev-mail'] as const,
  /** The signed-in person's sessions (browsers). */
  sessions: () => ['sessions'] as const,
  /** Design requests: the viewer's list (optionally one state), a job's, and one request (design-requests.ts). */
  requests: (orgId: string, state: string) => ['requests', orgId, state] as const,
  jobRequests: (orgId: string, jobId: string) => ['job-requests', orgId, jobId] as const,
  /** The engineer's members that supersede a job's preliminary sizes (member-designs.ts). */
  jobDesigns: (orgId: string, jobId: string) => ['job-designs', orgId, jobId] as const,
  request: (orgId: string, requestId: string) => ['request', orgId, requestId] as const,
  /** One sent version of a request: frozen, so it never needs revalidating. */
  requestVersion: (orgId: string, requestId: string, version: number) =>
    ['request-version', orgId, requestId, version] as const,
};

/** True for keys that belong to a firm or a session, so a firm switch or sign-out can drop them. */
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
      'job-screens',
      'screen',
      'checklist',
      'job-progress',
      'shoring',
      'load-path',
      'sessions',
      'requests',
      'job-requests',
      'job-designs',
      'request',
      'request-version',
      'price-book',
      'member-budget',
      'job-budget',
    ].includes(key[0])
  );
}

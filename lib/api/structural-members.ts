import { memberListSchema, memberSchema } from '@/shared/schemas/members';
import { apiRequest, noContentSchema } from './client';

/**
 * Members of a job in the structural sense (headers and beams: DESIGN.md §3 "Member"). The firm's people
 * are in orgs.ts (`fetchMembers`). Creates and edits go through the device's queue (lib/hooks/use-member-save.ts).
 */

const jobMembersPath = (jobId: string) => `/api/jobs/${encodeURIComponent(jobId)}/members`;
const memberPath = (memberId: string) => `/api/members/${encodeURIComponent(memberId)}`;

/** The job's members in the order they were made, each with its summary (no input, no result). */
export const fetchJobMembers = (jobId: string) =>
  apiRequest('GET', jobMembersPath(jobId), memberListSchema).then((body) => body.members);

export const fetchMember = (memberId: string) => apiRequest('GET', memberPath(memberId), memberSchema);

/** Deletes the member for good. */
export const deleteMember = (memberId: string) => apiRequest('DELETE', memberPath(memberId), noContentSchema);

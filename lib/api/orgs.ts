import { meSchema } from '@/shared/schemas/auth';
import {
  invitationPreviewSchema,
  invitationRowSchema,
  membersResponseSchema,
  type AcceptInvitationInput,
  type CreateInvitationInput,
} from '@/shared/schemas/orgs';
import { apiRequest, noContentSchema } from './client';

/** Members and pending invitations of the active firm (owner only). */
export const fetchMembers = () => apiRequest('GET', '/api/orgs/current/members', membersResponseSchema);

export const createInvitation = (input: CreateInvitationInput) =>
  apiRequest('POST', '/api/orgs/current/invitations', invitationRowSchema, input);

export const revokeInvitation = (invitationId: string) =>
  apiRequest('DELETE', `/api/orgs/current/invitations/${encodeURIComponent(invitationId)}`, noContentSchema);

/** What an invitee sees before accepting (public). */
export const fetchInvitation = (token: string) =>
  apiRequest('GET', `/api/invitations/${encodeURIComponent(token)}`, invitationPreviewSchema);

/** Joins the invited firm; answers with the person as seen from that firm. */
export const acceptInvitation = (token: string, input: AcceptInvitationInput) =>
  apiRequest('POST', `/api/invitations/${encodeURIComponent(token)}/accept`, meSchema, input);

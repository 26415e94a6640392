import { z } from 'zod';
import { emailSchema, passwordSchema, personNameSchema, roleSchema } from './auth';

/** Roles an owner may invite into a contracting firm (engineers join through their own firm). */
export const invitableRoleSchema = z.enum(['owner', 'contractor', 'estimator']);

export const createInvitationSchema = z.object({
  email: emailSchema,
  role: invitableRoleSchema,
});
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;

export const memberRowSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type MemberRow = z.infer<typeof memberRowSchema>;

export const invitationRowSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  createdAt: z.string(),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type InvitationRow = z.infer<typeof invitationRowSchema>;

/** `GET /api/orgs/current/members` (owner only). */
export const membersResponseSchema = z.object({
  members: z.array(memberRowSchema),
  invitations: z.array(invitationRowSchema),
});
export type MembersResponse = z.infer<typeof membersResponseSchema>;

/** `GET /api/invitations/:token` (public): what the invitee sees before accepting. */
export const invitationPreviewSchema = z.object({
  orgName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  expiresAt: z.string(),
  hasAccount: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/**
 * `POST /api/invitations/:token/accept`. A new person sends a name and password; a person who already has
 * an account with the invited e-mail signs in first and sends an empty body.
 */
export const acceptInvitationSchema = z.object({
  name: personNameSchema.optional(),
  password: passwordSchema.optional(),
});
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;

import { z } from 'zod';
import { visibleTextSchema } from './visible-text';

export const roles = ['owner', 'contractor', 'estimator', 'engineer'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const orgKinds = ['contracting', 'engineering'] as const;
export const orgKindSchema = z.enum(orgKinds);
export type OrgKind = z.infer<typeof orgKindSchema>;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));
/** Fewest characters a password may have. */
export const PASSWORD_MIN_LENGTH = 10;
export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, { message: `Use at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(200, { message: 'Use at most 200 characters' });
export const PASSWORD_IS_EMAIL = 'Use a password that is not your e-mail address';
/** The password rule as shown at every field that sets a password; the server checks each part. */
export const PASSWORD_RULE = `At least ${PASSWORD_MIN_LENGTH} characters; not your e-mail address and not a common password. A few unrelated words make a good one.`;

/** True when the password is the e-mail address or the part before its @, in any case or spacing. */
export function passwordMatchesEmail(password: string, email: string): boolean {
  const typed = password.trim().toLowerCase();
  const address = email.trim().toLowerCase();
  return typed === address || typed === address.split('@')[0];
}

export const personNameSchema = visibleTextSchema('Enter your name', 120);

/**
 * Sign-up creates a user and a new firm. A contracting firm makes the user its `owner`; an engineering
 * firm makes the user an `engineer` (engineers receive design requests only).
 */
export const signUpSchema = z
  .object({
    name: personNameSchema,
    email: emailSchema,
    password: passwordSchema,
    firmName: visibleTextSchema('Enter your firm’s name', 160),
    firmKind: orgKindSchema.default('contracting'),
  })
  .refine((input) => !passwordMatchesEmail(input.password, input.email), {
    path: ['password'],
    message: PASSWORD_IS_EMAIL,
  });
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { message: 'Enter your password' }).max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const membershipSchema = z.object({
  orgId: z.string(),
  orgName: z.string(),
  orgKind: orgKindSchema,
  role: roleSchema,
});
export type Membership = z.infer<typeof membershipSchema>;

/**
 * `GET /api/me`. The active firm is the one named by the `X-Org-Id` request header when the user belongs to
 * it, otherwise the user's earliest membership.
 */
export const meSchema = z.object({
  /** `emailVerified`: the person followed the e-mailed link; until then they cannot invite anyone. */
  user: z.object({ id: z.string(), email: z.string(), name: z.string(), emailVerified: z.boolean() }),
  memberships: z.array(membershipSchema),
  activeOrgId: z.string(),
  role: roleSchema,
});
export type Me = z.infer<typeof meSchema>;

/** `POST /api/auth/password-reset`: mail a reset link to this address if it has an account. */
export const passwordResetRequestSchema = z.object({ email: emailSchema });

/** `POST /api/auth/password-reset/:resetToken`: the new password. */
export const passwordResetSchema = z.object({ password: passwordSchema });

/** One of the signed-in person's sessions; `id` is a handle, never the secret cookie value. */
export const sessionRowSchema = z.object({
  id: z.string(),
  createdAt: z.string().nullable(),
  expiresAt: z.string(),
  userAgent: z.string().nullable(),
  current: z.boolean(),
});
export type SessionRow = z.infer<typeof sessionRowSchema>;

/** `GET /api/auth/sessions`, newest first. */
export const sessionListSchema = z.object({ sessions: z.array(sessionRowSchema).max(10_000) });

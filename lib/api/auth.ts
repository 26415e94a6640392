import { meSchema, sessionListSchema, type SignInInput, type SignUpInput } from '@/shared/schemas/auth';
import { apiRequest, noContentSchema } from './client';

/** The signed-in person, their firms and their role in the active firm. 401 when signed out. */
export const fetchMe = () => apiRequest('GET', '/api/me', meSchema);

/** Creates the person and their firm and starts a session (cookie). */
export const signUp = (input: SignUpInput) => apiRequest('POST', '/api/auth/sign-up', meSchema, input);

export const signIn = (input: SignInInput) => apiRequest('POST', '/api/auth/sign-in', meSchema, input);

export const signOut = () => apiRequest('POST', '/api/auth/sign-out', noContentSchema);

/** Every browser the person is signed in on, newest first, this one marked `current`. */
export const fetchSessions = () =>
  apiRequest('GET', '/api/auth/sessions', sessionListSchema).then((body) => body.sessions);

/** Ends every session of the person, this browser's too. */
export const signOutEverywhere = () => apiRequest('POST', '/api/auth/sign-out-everywhere', noContentSchema);

/** Mails a reset link if the address has an account; the answer is the same either way. */
export const requestPasswordReset = (input: { email: string }) =>
  apiRequest('POST', '/api/auth/password-reset', noContentSchema, input);

/** Sets the new password with the mailed link's token, ends every other session and signs this browser in. */
export const resetPassword = (token: string, input: { password: string }) =>
  apiRequest('POST', `/api/auth/password-reset/${encodeURIComponent(token)}`, meSchema, input);

/** Confirms the e-mail address with the mailed link's token (no sign-in needed). */
export const confirmEmail = (token: string) =>
  apiRequest('POST', `/api/auth/verify-email/${encodeURIComponent(token)}`, noContentSchema);

/** Mails the signed-in person a new confirmation link (older links stop working). */
export const resendConfirmation = () => apiRequest('POST', '/api/auth/verify-email', noContentSchema);

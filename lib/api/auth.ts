import { meSchema, type SignInInput, type SignUpInput } from '@/shared/schemas/auth';
import { apiRequest, noContentSchema } from './client';

/** The signed-in person, their firms and their role in the active firm. 401 when signed out. */
export const fetchMe = () => apiRequest('GET', '/api/me', meSchema);

/** Creates the person and their firm and starts a session (cookie). */
export const signUp = (input: SignUpInput) => apiRequest('POST', '/api/auth/sign-up', meSchema, input);

export const signIn = (input: SignInInput) => apiRequest('POST', '/api/auth/sign-in', meSchema, input);

export const signOut = () => apiRequest('POST', '/api/auth/sign-out', noContentSchema);

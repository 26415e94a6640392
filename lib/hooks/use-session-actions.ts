import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { setActiveOrgId } from '@/lib/api/active-org';
import { resetPassword, signIn, signOut, signOutEverywhere, signUp } from '@/lib/api/auth';
import { isFirmScopedKey, keys } from '@/lib/api/keys';
import { acceptInvitation } from '@/lib/api/orgs';
import type { SignInInput, SignUpInput } from '@/shared/schemas/auth';
import type { AcceptInvitationInput } from '@/shared/schemas/orgs';

/**
 * Sign in, sign up, password reset, invitation acceptance, sign out (here or everywhere) and firm switching. Each leaves the SWR cache clean
 * for the new session; the session gates then route the person to the right screen.
 */
export function useSessionActions() {
  const { mutate } = useSWRConfig();
  const router = useRouter();

  const refreshFirmData = useCallback(() => mutate(isFirmScopedKey, undefined), [mutate]);

  return {
    signIn: useCallback(
      async (input: SignInInput) => {
        await signIn(input);
        setActiveOrgId(null);
        await refreshFirmData();
      },
      [refreshFirmData],
    ),
    signUp: useCallback(
      async (input: SignUpInput) => {
        await signUp(input);
        setActiveOrgId(null);
        await refreshFirmData();
      },
      [refreshFirmData],
    ),
    /** Sets a new password with a reset link; the server ends every other session and signs this one in. */
    resetPassword: useCallback(
      async (token: string, input: { password: string }) => {
        await resetPassword(token, input);
        setActiveOrgId(null);
        await refreshFirmData();
        router.replace('/');
      },
      [refreshFirmData, router],
    ),
    acceptInvitation: useCallback(
      async (token: string, input: AcceptInvitationInput) => {
        const me = await acceptInvitation(token, input);
        setActiveOrgId(me.activeOrgId);
        await refreshFirmData();
        router.replace('/');
      },
      [refreshFirmData, router],
    ),
    /** Ends the session; `returnTo` (an in-app path) is where sign-in leads afterwards. */
    signOut: useCallback(
      async (returnTo?: string) => {
        await signOut();
        setActiveOrgId(null);
        await mutate(isFirmScopedKey, undefined, { revalidate: false });
        router.replace(returnTo ?? '/sign-in');
        await mutate(keys.me(null));
      },
      [mutate, router],
    ),
    /** Ends every session of the person (this one too) and goes to sign-in. */
    signOutEverywhere: useCallback(async () => {
      await signOutEverywhere();
      setActiveOrgId(null);
      await mutate(isFirmScopedKey, undefined, { revalidate: false });
      router.replace('/sign-in');
      await mutate(keys.me(null));
    }, [mutate, router]),
    switchFirm: useCallback(
      async (orgId: string) => {
        setActiveOrgId(orgId);
        await refreshFirmData();
        router.replace('/');
      },
      [refreshFirmData, router],
    ),
  };
}

import { useRouter } from 'expo-router';
import { useCallback } from 'react';
import { useSWRConfig } from 'swr';
import { setActiveOrgId } from '@/lib/api/active-org';
import { resetPassword, signIn, signOut, signOutEverywhere, signUp } from '@/lib/api/auth';
import { isFirmScopedKey, keys } from '@/lib/api/keys';
import { acceptInvitation } from '@/lib/api/orgs';
import { device } from '@/lib/offline/device';
import type { SignInInput, SignUpInput } from '@/shared/schemas/auth';
import type { AcceptInvitationInput } from '@/shared/schemas/orgs';

/**
 * Sign in, sign up, password reset, invitation acceptance, sign out (here or everywhere) and firm switching. Each leaves the SWR cache clean
 * for the new session and opens (or, signing out, deletes) the person's own device store; the session gates then route the person to the
 * right screen.
 */
export function useSessionActions() {
  const { mutate } = useSWRConfig();
  const router = useRouter();

  const refreshFirmData = useCallback(() => mutate(isFirmScopedKey, undefined), [mutate]);

  return {
    signIn: useCallback(
      async (input: SignInInput) => {
        const me = await signIn(input);
        await device.open(me.user.id);
        setActiveOrgId(null);
        await refreshFirmData();
      },
      [refreshFirmData],
    ),
    signUp: useCallback(
      async (input: SignUpInput) => {
        const me = await signUp(input);
        await device.open(me.user.id);
        setActiveOrgId(null);
        await refreshFirmData();
      },
      [refreshFirmData],
    ),
    /** Sets a new password with a reset link; the server ends every other session and signs this one in. */
    resetPassword: useCallback(
      async (token: string, input: { password: string }) => {
        const me = await resetPassword(token, input);
        await device.open(me.user.id);
        setActiveOrgId(null);
        await refreshFirmData();
        router.replace('/');
      },
      [refreshFirmData, router],
    ),
    acceptInvitation: useCallback(
      async (token: string, input: AcceptInvitationInput) => {
        const me = await acceptInvitation(token, input);
        await device.open(me.user.id);
        setActiveOrgId(me.activeOrgId);
        await refreshFirmData();
        router.replace('/');
      },
      [refreshFirmData, router],
    ),
    /**
     * Ends the session and deletes this person's device store (records, waiting changes, photos) and the
     * worker's runtime caches; `returnTo` (an in-app path) is where sign-in leads afterwards. Callers warn
     * first when changes still wait (`useDeviceStatus().items`).
     */
    signOut: useCallback(
      async (returnTo?: string) => {
        await signOut();
        await device.end();
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
      await device.end();
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

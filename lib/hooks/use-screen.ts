import useSWR from 'swr';
import { fetchScreen } from '@/lib/api/bearing-screens';
import { keys } from '@/lib/api/keys';
import { useMe } from './use-me';

/** One bearing screen with its history. */
export function useScreen(screenId: string | undefined) {
  const { data: me } = useMe();
  return useSWR(me && screenId ? keys.screen(me.activeOrgId, screenId) : null, () =>
    fetchScreen(screenId as string),
  );
}

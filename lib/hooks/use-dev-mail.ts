import useSWR from 'swr';
import { fetchDevMail } from '@/lib/api/dev-mail';
import { keys } from '@/lib/api/keys';

/** Captured mail, refreshed every few seconds so a just-sent invitation shows up. */
export function useDevMail(key: string) {
  return useSWR(keys.devMail(), () => fetchDevMail(key), { refreshInterval: 4000 });
}

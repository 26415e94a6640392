import useSWR from 'swr';
import { fetchSessions } from '@/lib/api/auth';
import { keys } from '@/lib/api/keys';

/** The signed-in person's sessions, newest first. */
export function useSessions() {
  return useSWR(keys.sessions(), fetchSessions);
}

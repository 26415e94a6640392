import { useSyncExternalStore } from 'react';
import { getActiveOrgId, subscribeActiveOrgId } from '@/lib/api/active-org';

/** The firm id the person picked (null until they pick one; the server then uses their first firm). */
export function useActiveOrgId(): string | null {
  return useSyncExternalStore(subscribeActiveOrgId, getActiveOrgId, () => null);
}

import { orgStorage } from './org-storage';

type Listener = () => void;
const listeners = new Set<Listener>();

/**
 * The firm the person chose to work in; sent as `X-Org-Id` on every API call. `null` lets the server pick
 * the person's earliest membership.
 */
export function getActiveOrgId(): string | null {
  return orgStorage.read();
}

export function setActiveOrgId(orgId: string | null): void {
  if (orgStorage.read() === orgId) return;
  orgStorage.write(orgId);
  listeners.forEach((listener) => listener());
}

export function subscribeActiveOrgId(listener: Listener): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

const storageKey = 'tributary.activeOrgId';

/** Where the chosen firm id is kept between visits (the browser's localStorage). */
export const orgStorage = {
  read: (): string | null => window.localStorage.getItem(storageKey),
  write: (orgId: string | null): void => {
    if (orgId) window.localStorage.setItem(storageKey, orgId);
    else window.localStorage.removeItem(storageKey);
  },
};

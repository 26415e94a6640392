const prefix = 'tributary.draft.';

/**
 * Member drafts kept on this device until they are saved (the browser's localStorage). Keys carry the user
 * id, so one person's drafts are never offered to another person of the same browser.
 */
export const draftStorage = {
  read: (key: string): unknown => {
    const text = window.localStorage.getItem(prefix + key);
    if (text === null) return null;
    try {
      return JSON.parse(text);
    } catch {
      return null;
    }
  },
  write: (key: string, value: unknown): void =>
    window.localStorage.setItem(prefix + key, JSON.stringify(value)),
  remove: (key: string): void => window.localStorage.removeItem(prefix + key),
};

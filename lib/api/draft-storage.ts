const drafts = new Map<string, string>();

/** Member drafts kept until they are saved (in memory off the web). */
export const draftStorage = {
  read: (key: string): unknown => {
    const text = drafts.get(key);
    return text === undefined ? null : JSON.parse(text);
  },
  write: (key: string, value: unknown): void => {
    drafts.set(key, JSON.stringify(value));
  },
  remove: (key: string): void => {
    drafts.delete(key);
  },
};

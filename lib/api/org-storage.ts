let remembered: string | null = null;

/** Where the chosen firm id is kept between visits (in memory off the web). */
export const orgStorage = {
  read: (): string | null => remembered,
  write: (orgId: string | null): void => {
    remembered = orgId;
  },
};

/**
 * The in-app path to go to after signing in, from a `next` query value. Anything that is not a plain path
 * on this site (another origin, `//host`, a scheme) is refused so the sign-in page cannot be used to send
 * people elsewhere.
 */
export function safeNextPath(next: unknown): string | null {
  const value = Array.isArray(next) ? next[0] : next;
  if (typeof value !== 'string') return null;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return null;
  if ([...value].some((ch) => ch.charCodeAt(0) < 32)) return null;
  return value;
}

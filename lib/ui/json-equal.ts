/**
 * True when `a` and `b` would serialise to the same JSON text (keys in any order): values that JSON leaves
 * out (undefined, functions) count as absent, non-finite numbers as null, -0 as 0. Shared sub-objects are
 * equal at once by identity, so comparing an immutable draft with an earlier copy of itself costs about as
 * many steps as it has changed parts, and a difference ends the walk — unlike two JSON.stringify calls,
 * which always write both out in full.
 *
 * @example jsonEqual({ a: 1, b: undefined }, { a: 1 }) // true
 */
export function jsonEqual(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  const ja = jsonValue(a);
  const jb = jsonValue(b);
  if (ja === jb) return true;
  if (typeof ja !== 'object' || typeof jb !== 'object' || ja === null || jb === null) return false;
  if (Array.isArray(ja) !== Array.isArray(jb)) return false;
  if (Array.isArray(ja) && Array.isArray(jb)) {
    return ja.length === jb.length && ja.every((v, i) => jsonEqual(inArray(v), inArray(jb[i])));
  }
  const ra = ja as Record<string, unknown>;
  const rb = jb as Record<string, unknown>;
  const keysA = Object.keys(ra).filter((k) => present(ra[k]));
  const keysB = Object.keys(rb).filter((k) => present(rb[k]));
  return keysA.length === keysB.length && keysA.every((k) => present(rb[k]) && jsonEqual(ra[k], rb[k]));
}

/** What JSON keeps of a value in an array or at the top: non-finite numbers become null. */
function jsonValue(v: unknown): unknown {
  if (typeof v === 'number' && !Number.isFinite(v)) return null;
  if (v === undefined || typeof v === 'function') return undefined;
  return v;
}

/** An array element as JSON writes it: a value it leaves out elsewhere is null here. */
const inArray = (v: unknown) => (present(v) ? v : null);

/** A property JSON writes out. */
const present = (v: unknown) => v !== undefined && typeof v !== 'function' && typeof v !== 'symbol';

import type { MemberDraftState } from '@/lib/hooks/use-member-draft';
import type { MemberDraft } from './member-draft';
import type { FieldErrors } from './member-input';

/** The messages under the given path prefixes, as one comparable string. */
function errorSlice(errors: FieldErrors, prefixes: readonly string[]): string {
  return JSON.stringify(
    Object.entries(errors).filter(([path]) => prefixes.some((p) => path === p || path.startsWith(`${p}.`))),
  );
}

type CardProps = { form: MemberDraftState; errors: FieldErrors };

/**
 * A props comparison for React.memo on an editor card: it renders again only when a draft field it reads,
 * a message under its fields, or another prop changes. Keeps a keystroke in one card from re-rendering the
 * others (the check must follow within a frame on a phone).
 */
export function sameCardSlice<P extends CardProps>(
  keys: readonly (keyof MemberDraft)[],
  errorPrefixes: readonly string[],
) {
  return (a: P, b: P): boolean => {
    if (a.form.set !== b.form.set) return false;
    if (keys.some((k) => a.form.draft[k] !== b.form.draft[k])) return false;
    if (errorSlice(a.errors, errorPrefixes) !== errorSlice(b.errors, errorPrefixes)) return false;
    return (Object.keys(a) as (keyof P)[]).every((k) => k === 'form' || k === 'errors' || a[k] === b[k]);
  };
}

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

/** The member editor's cards that re-render only for their own fields. */
export type CardName = 'basics' | 'span' | 'loads' | 'material' | 'conditions';

/** Which cards read a draft field, and whether messages are filed under its path. */
interface FieldUse {
  cards: readonly CardName[];
  messages: boolean;
}

const use = (card: CardName | readonly CardName[], messages: boolean): FieldUse => ({
  cards: typeof card === 'string' ? [card] : card,
  messages,
});

/** Every draft field and the cards that show it: a field added to the draft must be placed here. */
const FIELD_CARDS = {
  kind: use('basics', true),
  label: use('basics', true),
  wall: use('basics', true),
  clearSpan: use('span', true),
  measuredTo: use('span', false),
  bearingLeft: use('span', true),
  bearingRight: use('span', true),
  overhangLeft: use('span', true),
  overhangRight: use('span', true),
  continuous: use('span', false),
  secondSpan: use('span', true),
  centreBearing: use('span', true),
  edition: use('loads', false),
  groundSnow: use('loads', true),
  thermal: use('loads', false),
  roofPitch: use('loads', true),
  sources: use('loads', true),
  selfWeight: use('material', false),
  materialId: use('material', true),
  sizeId: use('material', true),
  gradeUnknown: use('material', false),
  braced: use('conditions', false),
  unbracedLength: use('conditions', true),
  deflectionUse: use('conditions', false),
  deflectionCap: use('conditions', true),
  mount: use('conditions', false),
  joistDepth: use('conditions', true),
  underJoistsHeight: use('conditions', true),
  atticClearance: use('conditions', true),
  supportKind: use('conditions', false),
  supportWidth: use('conditions', true),
  plateMaterialId: use('conditions', false),
  wetService: use('conditions', false),
  temperature: use('conditions', true),
  posts: use('conditions', true),
  flags: use(['span', 'loads', 'conditions'], false),
} satisfies Record<keyof MemberDraft, FieldUse>;

/**
 * The draft fields a card reads and the paths its messages sit under, from FIELD_CARDS.
 * @example cardFields('material').keys // ['selfWeight', 'materialId', 'sizeId', 'gradeUnknown']
 */
export function cardFields(card: CardName): { keys: (keyof MemberDraft)[]; errorPrefixes: string[] } {
  const entries = (Object.entries(FIELD_CARDS) as [keyof MemberDraft, FieldUse][]).filter(([, u]) =>
    u.cards.includes(card),
  );
  return {
    keys: entries.map(([field]) => field),
    errorPrefixes: entries.filter(([, u]) => u.messages).map(([field]) => field),
  };
}

/**
 * A props comparison for React.memo on an editor card: it renders again only when a draft field it reads,
 * a message under its fields, or another prop changes. Keeps a keystroke in one card from re-rendering the
 * others (the check must follow within a frame on a phone).
 */
export function sameCardSlice<P extends CardProps>(card: CardName) {
  const { keys, errorPrefixes } = cardFields(card);
  return (a: P, b: P): boolean => {
    if (a.form.set !== b.form.set) return false;
    if (keys.some((k) => a.form.draft[k] !== b.form.draft[k])) return false;
    if (a.errors !== b.errors && errorSlice(a.errors, errorPrefixes) !== errorSlice(b.errors, errorPrefixes))
      return false;
    return (Object.keys(a) as (keyof P)[]).every((k) => k === 'form' || k === 'errors' || a[k] === b[k]);
  };
}

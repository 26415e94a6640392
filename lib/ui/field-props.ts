import type { InputFlag } from '@/lib/ui/member/source-draft';

/** Keys of a form whose values are free text (not a choice among a few strings). */
export type TextKeys<D> = {
  [P in keyof D]: string extends D[P] ? (D[P] extends string ? P : never) : never;
}[keyof D] &
  string;

/** A form as the field helpers see it: its values, a setter per key and, for a member draft, its flags. */
export interface FieldForm<D, K extends TextKeys<D>> {
  draft: D;
  set: (key: K) => (value: string) => void;
  /** Only on forms whose fields carry a measured / assumed / default flag. */
  setFlag?: (field: K, flag: InputFlag) => void;
}

/** What a text field takes from its form: value, change handler, messages and, where kept, its flag. */
export interface FieldProps {
  value: string;
  onChangeText: (text: string) => void;
  errors: string[] | undefined;
  flag?: InputFlag;
  onFlag?: (flag: InputFlag) => void;
}

/**
 * The wiring of one text field to its form (the member cards, the span table form, what's above): its
 * value, its setter, its messages from `errors` under the same name, and — when the form keeps flags — its
 * flag (default when none is set) and flag setter.
 * @example <MeasureField label="Clear span" {...fieldProps(form, errors, 'clearSpan')} testID="clear-span" />
 */
export function fieldProps<D, K extends TextKeys<D>>(
  form: FieldForm<D, K>,
  errors: Readonly<Record<string, string[] | undefined>>,
  field: K,
): FieldProps {
  const props: FieldProps = {
    value: form.draft[field] as string,
    onChangeText: form.set(field),
    errors: errors[field],
  };
  const { setFlag } = form;
  if (!setFlag) return props;
  const flags = (form.draft as { flags?: Partial<Record<K, InputFlag>> }).flags;
  return { ...props, flag: flags?.[field] ?? 'default', onFlag: flagSetter(setFlag, field) };
}

type FlagSetter = (field: never, flag: InputFlag) => void;
const flagSetters = new WeakMap<FlagSetter, Map<string, (flag: InputFlag) => void>>();

/** The same handler for the same form and field on every render, so a memoised field can skip a render. */
function flagSetter<K extends string>(
  setFlag: (field: K, flag: InputFlag) => void,
  field: K,
): (flag: InputFlag) => void {
  let byField = flagSetters.get(setFlag);
  if (!byField) flagSetters.set(setFlag, (byField = new Map()));
  let handler = byField.get(field);
  if (!handler) byField.set(field, (handler = (flag) => setFlag(field, flag)));
  return handler;
}

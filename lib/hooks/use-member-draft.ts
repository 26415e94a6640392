import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { draftStorage } from '@/lib/api/draft-storage';
import {
  flagAfterEdit,
  flaggedFields,
  type FlaggedField,
  type MemberDraft,
} from '@/lib/ui/member/member-draft';
import {
  moveSource,
  newSource,
  type InputFlag,
  type SourceDraft,
  type SourceKind,
} from '@/lib/ui/member/source-draft';

const isFlagged = (key: string): key is FlaggedField => key in flaggedFields;

/**
 * The flags after `key` was edited: the same object when its flag stays as it was, so the memoised cards
 * that read `flags` do not render again on every keystroke.
 */
function flagsAfterEdit(flags: MemberDraft['flags'], key: string): MemberDraft['flags'] {
  if (!isFlagged(key)) return flags;
  const next = flagAfterEdit(key, flags[key]);
  return flags[key] === next ? flags : { ...flags, [key]: next };
}

function isDraft(value: unknown): value is MemberDraft {
  return typeof value === 'object' && value !== null && 'sources' in value && 'clearSpan' in value;
}

/**
 * The member form's state, kept on the device under `storageKey` as it is typed so nothing is lost before
 * it is saved (a reload or a dropped signal). `restored` says the draft came from the device.
 */
export function useMemberDraft(initial: MemberDraft, storageKey: string) {
  const [state, setState] = useState(() => {
    const stored = draftStorage.read(storageKey);
    return isDraft(stored) ? { draft: stored, restored: true } : { draft: initial, restored: false };
  });
  const { draft } = state;
  const touched = useRef(false);

  useEffect(() => {
    if (touched.current) draftStorage.write(storageKey, draft);
  }, [draft, storageKey]);

  const update = useCallback((change: (d: MemberDraft) => MemberDraft) => {
    touched.current = true;
    setState((s) => ({ ...s, draft: change(s.draft) }));
  }, []);

  // One setter per field for the life of the form, so a memoised field compares its handler by identity.
  const setters = useRef(new Map<keyof MemberDraft, (value: never) => void>());
  const set = useCallback(
    <K extends keyof MemberDraft>(key: K): ((value: MemberDraft[K]) => void) => {
      const known = setters.current.get(key) as ((value: MemberDraft[K]) => void) | undefined;
      if (known) return known;
      const setter = (value: MemberDraft[K]) =>
        update((d) => ({ ...d, [key]: value, flags: flagsAfterEdit(d.flags, key) }));
      setters.current.set(key, setter as (value: never) => void);
      return setter;
    },
    [update],
  );

  const forget = useCallback(
    (replacement?: MemberDraft) => {
      draftStorage.remove(storageKey);
      touched.current = false;
      setState((s) => ({ draft: replacement ?? s.draft, restored: false }));
    },
    [storageKey],
  );

  // One object of actions for the life of the form, so memoised cards can compare them by identity.
  const actions = useMemo(
    () => ({
      set,
      setFlag: (field: FlaggedField, flag: InputFlag) =>
        update((d) => ({ ...d, flags: { ...d.flags, [field]: flag } })),
      setSource: (index: number, patch: Partial<SourceDraft>) =>
        update((d) => ({
          ...d,
          sources: d.sources.map((s, i) =>
            i === index
              ? { ...s, ...patch, flag: patch.flag ?? (s.flag === 'default' ? 'assumed' : s.flag) }
              : s,
          ),
        })),
      addSource: (kind: SourceKind) => update((d) => ({ ...d, sources: [...d.sources, newSource(kind)] })),
      addSources: (sources: SourceDraft[]) => update((d) => ({ ...d, sources: [...d.sources, ...sources] })),
      removeSource: (index: number) =>
        update((d) => ({ ...d, sources: d.sources.filter((_, i) => i !== index) })),
      moveSource: (index: number, step: -1 | 1) =>
        update((d) => ({ ...d, sources: moveSource(d.sources, index, step) })),
      /** Forget the device copy (after a save, or when the person discards it). */
      forget,
    }),
    [set, update, forget],
  );

  return { draft, restored: state.restored, ...actions };
}

export type MemberDraftState = ReturnType<typeof useMemberDraft>;

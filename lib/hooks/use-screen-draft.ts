import { useCallback, useEffect, useRef, useState } from 'react';
import { draftStorage } from '@/lib/api/draft-storage';
import { screenAnswersSchema, type ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';

/** The bearing screen's answers in progress: the wall, the answers, the spans as typed and the step. */
export type ScreenDraft = {
  wallLabel: string;
  answers: ScreenAnswers;
  spans: { a: string; b: string };
  step: string;
};

/** A stored draft is used only when it still reads as answers (the schema may have moved on since). */
function readStored(value: unknown): ScreenDraft | null {
  if (typeof value !== 'object' || value === null) return null;
  const v = value as Partial<ScreenDraft>;
  const answers = screenAnswersSchema.safeParse(v.answers);
  if (!answers.success || typeof v.wallLabel !== 'string' || typeof v.step !== 'string') return null;
  const spans = v.spans && typeof v.spans.a === 'string' && typeof v.spans.b === 'string' ? v.spans : null;
  if (!spans) return null;
  return { wallLabel: v.wallLabel, answers: answers.data, spans, step: v.step };
}

/**
 * The bearing screen's answers kept on the device under `storageKey` (user, job and screen) as they are
 * given, until the screen is saved, so a reload or a dropped signal in the attic loses nothing. `restored`
 * says the answers came back from the device.
 */
export function useScreenDraft(initial: ScreenDraft, storageKey: string) {
  const [state, setState] = useState(() => {
    const stored = readStored(draftStorage.read(storageKey));
    return stored ? { draft: stored, restored: true } : { draft: initial, restored: false };
  });
  const touched = useRef(false);

  useEffect(() => {
    if (touched.current) draftStorage.write(storageKey, state.draft);
  }, [state.draft, storageKey]);

  const update = useCallback((change: (d: ScreenDraft) => ScreenDraft) => {
    touched.current = true;
    setState((s) => ({ ...s, draft: change(s.draft) }));
  }, []);

  /** Forget the device copy (after a save, or when the person discards it and starts again). */
  const forget = useCallback(
    (replacement?: ScreenDraft) => {
      draftStorage.remove(storageKey);
      touched.current = false;
      setState((s) => ({ draft: replacement ?? s.draft, restored: false }));
    },
    [storageKey],
  );

  return { draft: state.draft, restored: state.restored, update, forget };
}

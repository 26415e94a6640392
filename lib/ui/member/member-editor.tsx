import { useDeferredValue, useMemo, useRef, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { useMemberDraft } from '@/lib/hooks/use-member-draft';
import { MemberDiagrams } from '@/lib/ui/diagrams/member-diagrams';
import { colors, layout, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Notice } from '@/lib/ui/notice';
import { VerdictBanner } from '@/lib/ui/result/verdict-banner';
import { Text } from '@/lib/ui/text';
import { TextLink } from '@/lib/ui/text-link';
import type { Job } from '@/shared/schemas/jobs';
import type { Member, MemberCreateBody } from '@/shared/schemas/members';
import type { MemberDesign } from '@/shared/schemas/requests/member-design';
import { BasicsCard } from './basics-card';
import { ConditionsCard } from './conditions-card';
import { deviceMemberFields, type DeviceMemberFields } from './device-member';
import { draftFromInput } from './draft-from-input';
import { FramingCard } from './framing-card';
import { jsonEqual } from '@/lib/ui/json-equal';
import { liveCheck } from './live-check';
import { LoadsCard } from './loads-card';
import { MaterialCard } from './material-card';
import { draftFromScreen, type ScreenPrefill } from '@/lib/ui/bearing/member-prefill';
import { emptyMemberDraft, type MemberDraft, type MemberKind } from './member-draft';
import { draftPathOf, readMemberDraft, type FieldErrors } from './member-input';
import { ResultPane } from './result-pane';
import { ShortlistPanel } from './shortlist-panel';
import { SpanCard } from './span-card';
import { SupersededNotice } from './superseded-notice';

/** Two panes (inputs | result) from this content width up, px. */
const TWO_PANE_MIN = 1000;

/** `onDevice`: no signal, the member is saved on this device and waits to be sent. */
export type SaveOutcome =
  { ok: true; member: Member; onDevice: boolean } | { ok: false; fields: FieldErrors; message: string };

type MemberEditorProps = {
  job: Job;
  member?: Member;
  kind: MemberKind;
  /** Device storage key of the draft (carries the user, job and member). */
  storageKey: string;
  /** `device`: the device's own result, kept for the member while a save waits for signal. */
  onSave: (body: MemberCreateBody, device: DeviceMemberFields) => Promise<SaveOutcome>;
  /** The member was created just before this page opened: say where it was saved. */
  justSaved?: 'server' | 'device';
  /** A new member started from a bearing screen's answers. */
  prefill?: ScreenPrefill;
  /** The engineer's member from a Designed request: it supersedes the preliminary size. */
  design?: MemberDesign;
};

const NO_ERRORS: FieldErrors = {};
const savedStatus = { tone: 'success', text: 'Saved. The result shown is the server’s.' } as const;
const deviceStatus = {
  tone: 'success',
  text: 'Saved on this device only: it is sent when there is signal. The result shown is this device’s own check until the server’s replaces it.',
} as const;

/** Messages that only say a required field is still empty: held back until the person tries to save. */
const isEmptyFieldMessage = (message: string) =>
  message.startsWith('Enter the') || message.startsWith('Add at least');

function visibleErrors(errors: FieldErrors, all: boolean): FieldErrors {
  if (all) return errors;
  const out: FieldErrors = {};
  for (const [path, messages] of Object.entries(errors)) {
    const shown = messages.filter((m) => !isEmptyFieldMessage(m));
    if (shown.length) out[path] = shown;
  }
  return out;
}

/**
 * The member editor: inputs, and the check recomputed on the device as the person types (same schema and
 * engine as the server). Saving sends the input; the server recomputes and its result is what is stored.
 */
export function MemberEditor({
  job,
  member,
  kind,
  storageKey,
  onSave,
  justSaved,
  prefill,
  design,
}: MemberEditorProps) {
  const initial = useMemo<MemberDraft>(
    () =>
      member
        ? { ...draftFromInput(member.input, job), label: member.label, wall: member.wall }
        : prefill
          ? draftFromScreen(kind, job, prefill)
          : emptyMemberDraft(kind, job),
    [member, job, kind, prefill],
  );
  const form = useMemberDraft(initial, storageKey);
  const deferred = useDeferredValue(form.draft);
  const live = useMemo(() => liveCheck(deferred, job), [deferred, job]);
  const [attempted, setAttempted] = useState(false);
  const [serverErrors, setServerErrors] = useState<FieldErrors>({});
  const [status, setStatus] = useState<{ tone: 'success' | 'error'; text: string } | null>(
    justSaved === 'server' ? savedStatus : justSaved === 'device' ? deviceStatus : null,
  );
  const [busy, setBusy] = useState(false);
  /** The draft as last saved (null for a member not saved yet): "dirty" compares with it. */
  const savedDraft = useRef<MemberDraft | null>(member ? initial : null);
  const scroll = useRef<ScrollView>(null);
  const latestDraft = useRef(form.draft);
  const resultY = useRef(0);
  const { width } = useWindowDimensions();
  const contentWidth = width >= layout.wideBreakpoint ? width - layout.sideNavWidth : width;
  const twoPane = contentWidth >= TWO_PANE_MIN;

  const dirty = savedDraft.current === null || !jsonEqual(form.draft, savedDraft.current);
  const showSaved = member && !dirty;
  const result = showSaved ? member.result : live.ok ? live.result : null;
  const prescriptive = showSaved ? member.prescriptive : live.ok ? live.prescriptive : null;
  // One errors object per change of what it is made of, so the memoised cards compare it by identity.
  const errors = useMemo(
    () => ({ ...visibleErrors(live.ok ? {} : live.errors, attempted), ...serverErrors }),
    [live, attempted, serverErrors],
  );
  // Compared once per new check or saved member, not on every keystroke's render.
  const differs = useMemo(
    () =>
      showSaved && live.ok && !jsonEqual(live.result, member.result)
        ? `This device computes a different result from the one saved (engine ${member.engineVersion} on the server). The server's saved result is shown.`
        : null,
    [showSaved, live, member],
  );

  const save = async (draft: MemberDraft = form.draft) => {
    setAttempted(true);
    setStatus(null);
    const reading = readMemberDraft(draft, job);
    // The live check already ran on this very draft unless the person typed since (or a size was just chosen).
    const checked = draft === deferred ? live : liveCheck(draft, job);
    if (Object.keys(reading.errors).length > 0 || !checked.ok) {
      setStatus({ tone: 'error', text: 'Nothing was saved: fix the fields marked below.' });
      return;
    }
    setBusy(true);
    const outcome = await onSave(
      { label: draft.label, wall: draft.wall, input: reading.input },
      deviceMemberFields(job, draft.label, checked),
    );
    setBusy(false);
    if (outcome.ok) {
      setServerErrors({});
      savedDraft.current = draft;
      form.forget();
      setStatus(outcome.onDevice ? deviceStatus : savedStatus);
    } else {
      const mapped: FieldErrors = {};
      for (const [path, messages] of Object.entries(outcome.fields)) {
        mapped[draftPathOf(path.replace(/^input\./, ''))] = messages;
      }
      setServerErrors(mapped);
      setStatus({ tone: 'error', text: `Nothing was saved: ${outcome.message}` });
    }
  };

  const inputs = (
    <View style={styles.column}>
      {form.restored ? (
        <Notice tone="info" title="Unsaved changes on this device" testID="draft-restored">
          <Text>What you typed before is back. Save it, or start again from the saved member.</Text>
          <Button
            label="Discard changes"
            variant="secondary"
            onPress={() => form.forget(initial)}
            testID="draft-discard"
          />
        </Notice>
      ) : null}
      <BasicsCard form={form} errors={errors} />
      <SpanCard form={form} errors={errors} />
      <LoadsCard form={form} errors={errors} job={job} />
      <MaterialCard form={form} errors={errors} />
      <ConditionsCard form={form} errors={errors} />
    </View>
  );
  latestDraft.current = form.draft;
  const { materialId, sizeId, kind: draftKind } = form.draft;
  // The result column depends on the deferred check only: the keystroke's own render leaves it alone.
  const results = useMemo(() => {
    const statusNotice = (
      <>
        {status ? (
          <Notice tone={status.tone} testID="save-status">
            {status.text}
          </Notice>
        ) : null}
        {differs ? <Notice tone="info">{differs}</Notice> : null}
      </>
    );
    return (
      <View
        style={styles.column}
        onLayout={(e) => {
          resultY.current = e.nativeEvent.layout.y;
        }}
      >
        <ResultPane
          result={result}
          prescriptive={prescriptive}
          errors={live.ok ? NO_ERRORS : live.errors}
          notice={statusNotice}
          diagrams={result ? <MemberDiagrams result={result} testID="member-diagrams" /> : null}
        >
          {live.ok ? (
            <ShortlistPanel
              input={live.input}
              joistDepthIn={live.input.joistDepthIn}
              chosen={{ materialId, sizeId }}
              onChoose={(entry) => {
                const next = { ...latestDraft.current, materialId: entry.materialId, sizeId: entry.sizeId };
                form.set('materialId')(entry.materialId);
                form.set('sizeId')(entry.sizeId);
                if (member) void save(next);
              }}
            />
          ) : null}
          {result && draftKind === 'header' ? (
            <FramingCard result={result} yearBuilt={job.yearBuilt} design={design} />
          ) : null}
        </ResultPane>
      </View>
    );
    // save and form change identity every render but only their latest draft matters (latestDraft).
  }, [result, prescriptive, live, status, differs, materialId, sizeId, draftKind, job, member, design]);
  const saveButton = (
    <Button
      label={member ? 'Save changes' : 'Save member'}
      icon="check"
      busy={busy}
      onPress={() => void save()}
      testID="member-save"
    />
  );
  const header = (
    <View style={styles.header}>
      <TextLink
        href={{ pathname: '/jobs/[jobId]', params: { jobId: job.id } }}
        label={`Back to ${job.name}`}
      />
      <View style={styles.headerRow}>
        <Text variant="display" style={styles.title}>
          {form.draft.label || 'Member'}
        </Text>
        {twoPane ? saveButton : null}
      </View>
      {design ? <SupersededNotice design={design} /> : null}
    </View>
  );

  if (twoPane) {
    return (
      <View style={styles.root}>
        <View style={styles.pad}>{header}</View>
        <View style={styles.panes}>
          <ScrollView
            style={styles.pane}
            contentContainerStyle={styles.paneContent}
            keyboardShouldPersistTaps="handled"
          >
            {inputs}
          </ScrollView>
          <ScrollView style={[styles.pane, styles.resultPane]} contentContainerStyle={styles.paneContent}>
            {results}
          </ScrollView>
        </View>
      </View>
    );
  }
  return (
    <View style={styles.root}>
      <ScrollView
        ref={scroll}
        style={styles.pane}
        contentContainerStyle={styles.paneContent}
        keyboardShouldPersistTaps="handled"
      >
        {header}
        {inputs}
        {results}
      </ScrollView>
      <View style={styles.bar} testID="pinned-verdict">
        <Pressable
          role="button"
          accessibilityRole="button"
          aria-label="Go to the result"
          style={styles.barVerdict}
          onPress={() => scroll.current?.scrollTo({ y: resultY.current, animated: true })}
          testID="jump-to-result"
        >
          {result ? (
            <VerdictBanner result={result} compact />
          ) : (
            <Text variant="caption" tone="muted">
              No result yet: enter the span and the loads.
            </Text>
          )}
        </Pressable>
        {saveButton}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper },
  pad: { paddingHorizontal: spacing.lg, paddingTop: spacing.lg },
  header: { gap: spacing.sm },
  headerRow: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: spacing.md,
    flexWrap: 'wrap',
  },
  title: { flexShrink: 1 },
  panes: { flex: 1, flexDirection: 'row' },
  pane: { flex: 1 },
  resultPane: { borderLeftWidth: 1, borderLeftColor: colors.line },
  paneContent: { padding: spacing.lg, paddingBottom: spacing.xxxl, gap: spacing.lg },
  column: { gap: spacing.lg },
  bar: {
    borderTopWidth: 1,
    borderTopColor: colors.lineStrong,
    backgroundColor: colors.surface,
    padding: spacing.sm,
    gap: spacing.sm,
    flexDirection: 'row',
    alignItems: 'center',
  },
  barVerdict: { flex: 1, minWidth: 0, justifyContent: 'center' },
});

import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { useJobMembers } from '@/lib/hooks/use-job-members';
import { spacing } from '@/lib/theme';
import type { Job } from '@/shared/schemas/jobs';
import { heavyItems, mountChoices, usStates, type RequestCompose } from '@/shared/schemas/requests/compose';
import { Button } from '../button';
import { Card } from '../card';
import { CheckRow } from '../check-row';
import { ChoiceGroup } from '../choice-group';
import { Notice } from '../notice';
import { PickerField } from '../picker-field';
import { Text } from '../text';
import { TextField } from '../text-field';
import {
  DAMAGE_LABELS,
  HEAVY_ITEM_LABELS,
  readComposeDraft,
  type ComposeDraft,
  type TextField as ComposeTextField,
} from './compose-draft';
import { YardStockRows } from './yard-stock-rows';

const MOUNT_WORDS = { flush: 'Flush', dropped: 'Dropped', either: 'Either' } as const;
const DAMAGE_MARKS = ['sistered', 'notched', 'bored', 'rot'] as const;

type ComposeFormProps = {
  job: Job;
  initial: ComposeDraft;
  /** Saves the body (a new Draft or the working copy); an ApiError's field messages show at the fields. */
  onSave: (body: RequestCompose) => Promise<void>;
  saveLabel: string;
  /** Shown above the form (where it started from). */
  intro?: ReactNode;
  /** Shown just above the save button (what goes with the save). */
  beforeSave?: ReactNode;
};

/**
 * A design request's working copy: the members to send, the engineer, where the house is, the conditions
 * and constraints and the items engineers phone back for. Bad fields are named at the field and nothing is
 * saved; photos are added on the request's own pages.
 */
export function ComposeForm({ job, initial, onSave, saveLabel, intro, beforeSave }: ComposeFormProps) {
  const { data: members } = useJobMembers(job.id);
  const [draft, setDraft] = useState<ComposeDraft>(initial);
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const change = (patch: Partial<ComposeDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const field = (
    name: ComposeTextField,
    label: string,
    options: { hint?: string; multiline?: boolean; unit?: string; numeric?: boolean } = {},
  ) => (
    <TextField
      label={label}
      hint={options.hint}
      unit={options.unit}
      inputMode={options.numeric ? 'decimal' : undefined}
      value={draft.text[name]}
      onChangeText={(v) => setDraft((d) => ({ ...d, text: { ...d.text, [name]: v } }))}
      errors={fields[name]}
      multiline={options.multiline}
      testID={`compose-${name}`}
    />
  );
  const toggle = <T,>(list: T[], item: T, on: boolean) =>
    on ? [...list.filter((x) => x !== item), item] : list.filter((x) => x !== item);

  async function submit() {
    setProblem(null);
    const reading = readComposeDraft(draft);
    if (!reading.ok) {
      setFields(reading.errors);
      setProblem('Nothing was saved: fix the fields marked below.');
      return;
    }
    setBusy(true);
    try {
      await onSave(reading.body);
      setFields({});
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      setProblem(`Nothing was saved: ${error.message}`);
      setFields(error.fields);
    } finally {
      setBusy(false);
    }
  }

  return (
    <View style={styles.wrap}>
      {intro}
      <Card title="Members to send">
        {members?.length === 0 ? <Text tone="muted">Add a header or beam to the job first.</Text> : null}
        {(members ?? []).map((member) => (
          <CheckRow
            key={member.id}
            label={`${member.label} (${member.summary.sizeLabel})`}
            value={draft.memberIds.includes(member.id)}
            onChange={(on) => change({ memberIds: toggle(draft.memberIds, member.id, on) })}
            testID="compose-member"
          />
        ))}
        <Text variant="caption" tone="muted">
          Each member goes with its inputs (measured, assumed or default), its preliminary check and the job’s{' '}
          {job.loadStandard} and ground snow source.
        </Text>
      </Card>
      <Card title="Engineer and place">
        {field('engineerEmail', 'Engineer’s e-mail', { hint: 'Needed before you send, not for a draft.' })}
        {field('jurisdiction.place', 'Town or county')}
        <PickerField
          label="State (the engineer’s licence depends on it)"
          choices={[
            { value: '' as const, label: 'Pick the state' },
            ...usStates.map((s) => ({ value: s, label: s })),
          ]}
          value={draft.state}
          onChange={(state) => change({ state })}
          errors={fields['jurisdiction.state']}
          testID="compose-state"
        />
      </Card>
      <Card title="Existing conditions">
        {field('conditions.framingDirection', 'Framing direction')}
        {field('conditions.bearingPoints', 'Bearing points', { multiline: true })}
        {field('conditions.foundation', 'Foundation')}
        {field('conditions.whatIsAbove', 'What is above', { multiline: true })}
      </Card>
      <Card title="Constraints">
        <ChoiceGroup
          label="Flush or dropped"
          choices={mountChoices.map((m) => ({ value: m, label: MOUNT_WORDS[m] }))}
          value={draft.mount}
          onChange={(mount) => change({ mount })}
        />
        {field('constraints.maxDepthIn', 'Maximum depth', { unit: 'in', numeric: true })}
        {field('constraints.postsMayGo', 'Where posts may go')}
        {field('constraints.longestPieceFt', 'Longest piece that can be carried in', {
          unit: 'ft',
          numeric: true,
        })}
        {field('constraints.heaviestPieceLb', 'Heaviest piece that can be carried in', {
          unit: 'lb',
          numeric: true,
        })}
      </Card>
      <Card title="The existing joists or rafters" testID="compose-joists">
        {field('phoneBack.joists.size', 'Size', { hint: 'Measured, like 2x8 at 1-1/2 × 7-1/4 in' })}
        {field('phoneBack.joists.spacingIn', 'Spacing', { unit: 'in', numeric: true })}
        {field('phoneBack.joists.species', 'Species (from a grade stamp)')}
        <CheckRow
          label="A photo shows them with a tape measure on them"
          hint="Lay the tape across the joist’s depth and take the photo square on: the engineer reads the size off it. Add the photo on the request’s page."
          value={draft.tapeInPhoto}
          onChange={(tapeInPhoto) => change({ tapeInPhoto })}
          testID="compose-tape-in-photo"
        />
      </Card>
      <Card title="Roof and anything heavy above" testID="compose-heavy">
        {field('phoneBack.roofingLayers', 'Roofing layers', { numeric: true })}
        <Text variant="label">Heavy items above the wall</Text>
        {heavyItems.map((item) => (
          <CheckRow
            key={item}
            label={HEAVY_ITEM_LABELS[item]}
            value={draft.heavyAbove.includes(item)}
            onChange={(on) => change({ heavyAbove: toggle(draft.heavyAbove, item, on) })}
            testID={`compose-heavy-${item}`}
          />
        ))}
        {field('phoneBack.heavyAboveNote', 'Where they sit and what they weigh, if known', {
          multiline: true,
        })}
      </Card>
      <Card title="Sag and existing damage" testID="compose-damage">
        {field('phoneBack.sag.sagIn', 'Sag measured with a string line', { unit: 'in', numeric: true })}
        <Text variant="label">Damage or changes to the joists</Text>
        {DAMAGE_MARKS.map((mark) => (
          <CheckRow
            key={mark}
            label={DAMAGE_LABELS[mark]}
            value={draft.damage[mark]}
            onChange={(on) => change({ damage: { ...draft.damage, [mark]: on } })}
            testID={`compose-damage-${mark}`}
          />
        ))}
        {field('phoneBack.damage.note', 'Where, and how bad', { multiline: true })}
      </Card>
      <Card title="Below the wall">
        {field('phoneBack.below.girder', 'Girder below')}
        {field('phoneBack.below.columns', 'Columns below')}
        {field('phoneBack.below.footings', 'Footings below')}
        {field('phoneBack.ductsOrPipes', 'Ducts or pipes in the joist bays')}
      </Card>
      <Card title="Engineered lumber the local yard stocks" testID="compose-yard">
        <YardStockRows
          rows={draft.yardStock}
          onChange={(yardStock) => change({ yardStock })}
          errors={fields}
        />
      </Card>
      <Card title="Questions">{field('questions', 'Questions for the engineer', { multiline: true })}</Card>
      {beforeSave}
      {problem ? (
        <Notice tone="error" title="Not saved" testID="compose-problem">
          {problem}
        </Notice>
      ) : null}
      <Button label={saveLabel} busy={busy} onPress={() => void submit()} testID="compose-save" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });

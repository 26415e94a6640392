import { router } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { createRequest } from '@/lib/api/design-requests';
import { useJobMembers } from '@/lib/hooks/use-job-members';
import { spacing } from '@/lib/theme';
import type { Job } from '@/shared/schemas/jobs';
import { mountChoices, usStates, type RequestComposeBody } from '@/shared/schemas/requests/compose';
import { Button } from '../button';
import { Card } from '../card';
import { ChoiceGroup } from '../choice-group';
import { Notice } from '../notice';
import { PickerField } from '../picker-field';
import { Text } from '../text';
import { TextField } from '../text-field';

const MOUNT_WORDS = { flush: 'Flush', dropped: 'Dropped', either: 'Either' } as const;
const numberOrNull = (text: string) => (text.trim() === '' ? null : Number(text));

/**
 * A new design request from the job: the members to send, the engineer, where the house is, the
 * conditions and constraints and the items engineers phone back for. Saved as a Draft; photos are added
 * and the request sent from its own page.
 */
export function ComposeForm({ job }: { job: Job }) {
  const { data: members } = useJobMembers(job.id);
  const [picked, setPicked] = useState<string[]>([]);
  const [text, setText] = useState<Record<string, string>>({});
  const [state, setState] = useState<(typeof usStates)[number] | ''>('');
  const [mount, setMount] = useState<(typeof mountChoices)[number]>('either');
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const value = (name: string) => text[name] ?? '';
  const field = (name: string, label: string, hint?: string, multiline = false) => (
    <TextField
      label={label}
      hint={hint}
      value={value(name)}
      onChangeText={(v) => setText((all) => ({ ...all, [name]: v }))}
      errors={fields[name]}
      multiline={multiline}
      testID={`compose-${name}`}
    />
  );

  async function submit() {
    setBusy(true);
    setProblem(null);
    const body: RequestComposeBody = {
      memberIds: picked,
      engineerEmail: value('engineerEmail') || null,
      jurisdiction: { place: value('place'), state: state || null },
      conditions: {
        framingDirection: value('conditions.framingDirection'),
        bearingPoints: value('conditions.bearingPoints'),
        foundation: value('conditions.foundation'),
        whatIsAbove: value('conditions.whatIsAbove'),
      },
      constraints: {
        mount,
        maxDepthIn: numberOrNull(value('constraints.maxDepthIn')),
        postsMayGo: value('constraints.postsMayGo'),
        longestPieceFt: numberOrNull(value('constraints.longestPieceFt')),
        heaviestPieceLb: numberOrNull(value('constraints.heaviestPieceLb')),
      },
      phoneBack: {
        joists: {
          size: value('phoneBack.joists.size'),
          spacingIn: numberOrNull(value('phoneBack.joists.spacingIn')),
          species: value('phoneBack.joists.species'),
          flag: 'measured',
        },
        roofingLayers: numberOrNull(value('phoneBack.roofingLayers')),
        heavyAboveNote: value('phoneBack.heavyAboveNote'),
        sag: {
          sagIn: numberOrNull(value('phoneBack.sag.sagIn')),
          stringLine: value('phoneBack.sag.sagIn') !== '',
        },
        damage: { note: value('phoneBack.damage.note') },
        below: {
          girder: value('phoneBack.below.girder'),
          columns: value('phoneBack.below.columns'),
          footings: value('phoneBack.below.footings'),
        },
        ductsOrPipes: value('phoneBack.ductsOrPipes'),
      },
      questions: value('questions'),
    };
    try {
      const request = await createRequest(job.id, body);
      router.replace({ pathname: '/requests/[requestId]', params: { requestId: request.id } });
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The request was not saved');
      setFields(
        error && typeof error === 'object' && 'fields' in error
          ? (error.fields as Record<string, string[]>)
          : {},
      );
    } finally {
      setBusy(false);
    }
  }

  return (
    <View style={styles.wrap}>
      {problem ? (
        <Notice tone="error" title="Not saved">
          {problem}
        </Notice>
      ) : null}
      <Card title="Members to send">
        {members?.length === 0 ? <Text tone="muted">Add a header or beam to the job first.</Text> : null}
        {(members ?? []).map((member) => {
          const on = picked.includes(member.id);
          return (
            <Button
              key={member.id}
              label={`${on ? '✓ ' : ''}${member.label} (${member.summary.sizeLabel})`}
              variant={on ? 'primary' : 'secondary'}
              aria-checked={on}
              testID="compose-member"
              onPress={() =>
                setPicked((all) => (on ? all.filter((id) => id !== member.id) : [...all, member.id]))
              }
            />
          );
        })}
        <Text variant="caption" tone="muted">
          Each member goes with its inputs (measured, assumed or default), its preliminary check and the job’s{' '}
          {job.loadStandard} and ground snow source.
        </Text>
      </Card>
      <Card title="Engineer and place">
        {field('engineerEmail', 'Engineer’s e-mail')}
        {field('place', 'Town or county')}
        <PickerField
          label="State (the engineer’s licence depends on it)"
          choices={[
            { value: '' as const, label: 'Pick the state' },
            ...usStates.map((s) => ({ value: s, label: s })),
          ]}
          value={state}
          onChange={setState}
          errors={fields['jurisdiction.state']}
          testID="compose-state"
        />
      </Card>
      <Card title="Existing conditions">
        {field('conditions.framingDirection', 'Framing direction')}
        {field('conditions.bearingPoints', 'Bearing points')}
        {field('conditions.foundation', 'Foundation')}
        {field('conditions.whatIsAbove', 'What is above', undefined, true)}
      </Card>
      <Card title="Constraints">
        <ChoiceGroup
          label="Flush or dropped"
          choices={mountChoices.map((m) => ({ value: m, label: MOUNT_WORDS[m] }))}
          value={mount}
          onChange={setMount}
        />
        {field('constraints.maxDepthIn', 'Maximum depth (in)')}
        {field('constraints.postsMayGo', 'Where posts may go')}
        {field('constraints.longestPieceFt', 'Longest piece that can be carried in (ft)')}
        {field('constraints.heaviestPieceLb', 'Heaviest piece (lb)')}
      </Card>
      <Card title="What engineers ask for">
        {field(
          'phoneBack.joists.size',
          'Existing joists or rafters: size',
          'measured, with a tape in the photo',
        )}
        {field('phoneBack.joists.spacingIn', 'Spacing (in)')}
        {field('phoneBack.joists.species', 'Species (from a grade stamp)')}
        {field('phoneBack.roofingLayers', 'Roofing layers')}
        {field(
          'phoneBack.heavyAboveNote',
          'Anything heavy above',
          'solar, an air handler or water heater in the attic, a cast-iron tub',
        )}
        {field('phoneBack.sag.sagIn', 'Sag measured with a string line (in)')}
        {field('phoneBack.damage.note', 'Sistered, notched or bored joists, rot')}
        {field('phoneBack.below.girder', 'Girder below')}
        {field('phoneBack.below.columns', 'Columns below')}
        {field('phoneBack.below.footings', 'Footings below')}
        {field('phoneBack.ductsOrPipes', 'Ducts or pipes in the joist bays')}
        {field('questions', 'Questions for the engineer', undefined, true)}
      </Card>
      <Button label="Save the draft" busy={busy} onPress={() => void submit()} testID="compose-save" />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: spacing.lg } });

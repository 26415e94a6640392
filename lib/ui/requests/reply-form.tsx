import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { sendReply } from '@/lib/api/design-requests';
import { spacing } from '@/lib/theme';
import {
  DESIGNED_MATERIAL_LABELS,
  designedMaterials,
  type DesignedMaterial,
} from '@/shared/schemas/requests/reply';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { Button } from '../button';
import { Card } from '../card';
import { ChoiceGroup } from '../choice-group';
import { Notice } from '../notice';
import { Text } from '../text';
import { TextField } from '../text-field';

const TEXT_FIELDS = [
  ['designation', 'Member, as you specify it', 'e.g. 2-ply 1-3/4 x 9-1/4 LVL 2.0E, W8x18'],
  ['plies', 'Plies', ''],
  ['widthIn', 'Width (in)', ''],
  ['depthIn', 'Depth (in)', ''],
  ['plyFastening', 'Ply fastening', 'nails or screws, rows and spacing'],
  ['hangers', 'Hangers', ''],
  ['bearingLeftIn', 'Bearing, left end (in)', ''],
  ['bearingRightIn', 'Bearing, right end (in)', ''],
  ['posts', 'Posts', ''],
  ['footing', 'Footing', ''],
  ['connections', 'Connections', ''],
] as const;
type FieldName = (typeof TEXT_FIELDS)[number][0];
type Draft = Record<FieldName, string> & { material: DesignedMaterial };

const empty = (): Draft => ({
  material: 'lvl',
  ...(Object.fromEntries(TEXT_FIELDS.map(([name]) => [name, ''])) as Record<FieldName, string>),
});
const numberOrNull = (text: string) => (text.trim() === '' ? null : Number(text));

/** The engineer's structured reply to the current version: one designed member per request member. */
export function ReplyForm({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (d: RequestDetail) => void;
}) {
  const members = request.snapshot?.members ?? [];
  const [drafts, setDrafts] = useState<Record<string, Draft>>(() =>
    Object.fromEntries(members.map((m) => [m.id, empty()])),
  );
  const [shoring, setShoring] = useState('');
  const [verify, setVerify] = useState('');
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [problem, setProblem] = useState<string | null>(null);
  if (!request.actions.includes('reply')) return null;
  const set = (id: string, patch: Partial<Draft>) =>
    setDrafts((all) => ({ ...all, [id]: { ...all[id], ...patch } }));

  async function submit() {
    setBusy(true);
    setProblem(null);
    try {
      const detail = await sendReply(request.id, {
        members: members.map((m) => {
          const d = drafts[m.id];
          return {
            memberId: m.id,
            material: d.material,
            designation: d.designation,
            plies: numberOrNull(d.plies),
            widthIn: numberOrNull(d.widthIn),
            depthIn: numberOrNull(d.depthIn),
            plyFastening: d.plyFastening,
            hangers: d.hangers,
            bearingLeftIn: numberOrNull(d.bearingLeftIn),
            bearingRightIn: numberOrNull(d.bearingRightIn),
            posts: d.posts,
            footing: d.footing,
            connections: d.connections,
          };
        }),
        shoring,
        // One item a line; "(photo)" at the end asks for a photo of it before closing in.
        verifyInField: verify
          .split('\n')
          .map((line) => line.trim())
          .filter(Boolean)
          .map((line) => ({ item: line.replace(/\s*\(photo\)$/i, ''), photo: /\(photo\)$/i.test(line) })),
        feeUsd: request.fee?.feeUsd ?? null,
        turnaroundDays: request.fee?.turnaroundDays ?? null,
        siteVisit: request.fee?.siteVisit ?? false,
        note,
      });
      setFields({});
      onChange(detail);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The reply was not sent');
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
    <Card title={`Structured reply to version ${request.version}`} testID="reply-form">
      {problem ? (
        <Notice tone="error" title="Not sent">
          {problem}
        </Notice>
      ) : null}
      {members.map((member, index) => (
        <View key={member.id} style={styles.member}>
          <Text variant="bodyStrong">
            {member.label} (preliminary {member.summary.sizeLabel})
          </Text>
          <ChoiceGroup
            label="Material"
            choices={designedMaterials.map((m) => ({ value: m, label: DESIGNED_MATERIAL_LABELS[m] }))}
            value={drafts[member.id].material}
            onChange={(material) => set(member.id, { material })}
            testID={`reply-material-${index}`}
          />
          {TEXT_FIELDS.map(([name, label, hint]) => (
            <TextField
              key={name}
              label={label}
              hint={hint || undefined}
              value={drafts[member.id][name]}
              onChangeText={(value) => set(member.id, { [name]: value })}
              errors={fields[`members.${index}.${name}`]}
              testID={`reply-${name}-${index}`}
            />
          ))}
        </View>
      ))}
      <TextField label="Shoring" value={shoring} onChangeText={setShoring} multiline testID="reply-shoring" />
      <TextField
        label="Verify in the field"
        hint='One item a line; end a line with "(photo)" to ask for a photo of it before closing in'
        value={verify}
        onChangeText={setVerify}
        multiline
        testID="reply-verify"
      />
      <TextField label="Note" value={note} onChangeText={setNote} multiline testID="reply-note" />
      <Button label="Send the reply" busy={busy} onPress={() => void submit()} testID="reply-send" />
    </Card>
  );
}

const styles = StyleSheet.create({ member: { gap: spacing.sm, paddingTop: spacing.md } });

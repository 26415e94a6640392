import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { setEnd, clearEnd } from '@/lib/api/load-path';
import { useSubmit } from '@/lib/hooks/use-submit';
import { colors, radii, spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { ChoiceGroup, type Choice } from '@/lib/ui/choice-group';
import { Notice } from '@/lib/ui/notice';
import { PickerField } from '@/lib/ui/picker-field';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import {
  beamElementKinds,
  type LoadPathEnd,
  type LoadPathElementKind,
} from '@/shared/schemas/calc/load-path';
import type { LoadStandard } from '@/shared/schemas/jobs';
import type { BearingSetBody, JobLoadPath } from '@/shared/schemas/load-path-elements';
import { elementFromDraft, newDraft, type ElementDraft } from './element-draft';
import { ElementFields, errorsAt } from './element-fields';
import { endWords, kindWords, lbText, throughWords } from './words';

type Option =
  'wall' | 'post' | 'hanger' | 'beam' | 'steel-column' | 'pier' | 'footing' | 'foundation-wall' | 'slab';

const OPTION_WORDS: Record<Option, Choice<Option>> = {
  wall: {
    value: 'wall',
    label: 'Jack studs in a wall',
    description: 'The end sits on studs in a wall below it',
  },
  post: { value: 'post', label: 'A post' },
  hanger: {
    value: 'hanger',
    label: 'Another member, by a hanger',
    description: 'Flush, hung from a beam or girder',
  },
  beam: {
    value: 'beam',
    label: 'An existing girder, beam or joist',
    description: 'It lands on top of it, somewhere along it',
  },
  'steel-column': { value: 'steel-column', label: 'A steel column' },
  pier: { value: 'pier', label: 'A pier (concrete, block, brick or stone)' },
  footing: { value: 'footing', label: 'A footing', description: 'A new pad, or an existing footing' },
  'foundation-wall': { value: 'foundation-wall', label: 'A foundation wall' },
  slab: { value: 'slab', label: 'A concrete slab' },
};
const NEW = '__new';
const isBeamKind = (kind: string) => (beamElementKinds as readonly string[]).includes(kind);
/** The kinds each choice can name, and the kind of a new one. */
const TARGETS: Record<Option, { kinds: string[]; newKind?: ElementDraft['kind'] }> = {
  wall: { kinds: ['wall'], newKind: 'wall' },
  post: { kinds: ['post'], newKind: 'post' },
  hanger: { kinds: ['member', 'girder', 'joist'] },
  beam: { kinds: ['girder', 'joist', 'member'], newKind: 'girder' },
  'steel-column': { kinds: ['steel-column'], newKind: 'steel-column' },
  pier: { kinds: ['pier'], newKind: 'pier' },
  footing: { kinds: ['footing'], newKind: 'footing' },
  'foundation-wall': { kinds: ['foundation-wall'], newKind: 'foundation-wall' },
  slab: { kinds: ['slab'], newKind: 'slab' },
};

type Props = {
  owner: { id: string; isMember: boolean; kind: LoadPathElementKind; label: string };
  end: LoadPathEnd;
  loadPath: JobLoadPath;
  edition: LoadStandard;
  onSaved: () => Promise<void>;
};

/** Every node of the job with its kind and label (members first). */
function nodesOf(lp: JobLoadPath) {
  return [
    ...lp.members.map((m) => ({ id: m.id, label: m.label, kind: 'member' })),
    ...lp.elements.map((e) => ({ id: e.id, label: e.label, kind: e.kind })),
  ];
}

/** "What does this end bear on?": the answer as saved, or the question with its follow-up fields. */
export function EndBearingEditor({ owner, end, loadPath, edition, onSaved }: Props) {
  const bearing = loadPath.bearings.find((b) => b.fromId === owner.id && b.end === end);
  const [editing, setEditing] = useState(false);
  const nodes = nodesOf(loadPath);
  const onto = bearing ? nodes.find((n) => n.id === bearing.ontoId) : undefined;
  const endResult = loadPath.result.elements.find((e) => e.id === owner.id)?.ends.find((e) => e.end === end);
  const clear = useSubmit(async () => {
    await clearEnd(owner, end);
    await onSaved();
  });
  const testID = `end-${end}`;
  return (
    <View style={styles.end} testID={testID}>
      <Text variant="bodyStrong">{endWords[end]}</Text>
      {endResult ? (
        <Text variant="caption" tone="muted">
          Passes down {lbText(endResult.governingLb)} ({endResult.governingCombination})
        </Text>
      ) : null}
      {bearing && onto && !editing ? (
        <>
          <Text testID={`${testID}-onto`}>
            Bears on {onto.label} ({kindWords[onto.kind as LoadPathElementKind].toLowerCase()})
            {bearing.atFt !== undefined ? `, ${bearing.atFt} ft from its left support` : ''}
            {bearing.hanger ? ', by a hanger' : ''}
            {bearing.through && bearing.through !== 'direct'
              ? ` — ${throughWords[bearing.through].toLowerCase()}`
              : ''}
          </Text>
          <View style={styles.row}>
            <Button
              label="Change"
              variant="secondary"
              onPress={() => setEditing(true)}
              testID={`${testID}-change`}
            />
            <Button label="Clear" variant="quiet" busy={clear.busy} onPress={() => void clear.run()} />
          </View>
        </>
      ) : (
        <EndQuestion
          owner={owner}
          end={end}
          nodes={nodes}
          edition={edition}
          onCancel={bearing ? () => setEditing(false) : undefined}
          onSaved={async () => {
            setEditing(false);
            await onSaved();
          }}
        />
      )}
    </View>
  );
}

function EndQuestion({
  owner,
  end,
  nodes,
  edition,
  onCancel,
  onSaved,
}: Omit<Props, 'loadPath'> & { nodes: ReturnType<typeof nodesOf>; onCancel?: () => void }) {
  const beamOwner = isBeamKind(owner.kind);
  const options: Option[] = beamOwner
    ? ['wall', 'post', 'hanger', 'beam', 'steel-column', 'pier', 'footing', 'foundation-wall']
    : ['beam', 'wall', 'post', 'steel-column', 'pier', 'footing', 'foundation-wall', 'slab'];
  const [option, setOption] = useState<Option | null>(null);
  const [pick, setPick] = useState<string>(NEW);
  const [draft, setDraft] = useState<ElementDraft | null>(null);
  const [atFt, setAtFt] = useState('');
  const [through, setThrough] = useState<keyof typeof throughWords>('direct');
  const [joistRelation, setJoistRelation] = useState<'parallel' | 'across'>('across');
  const target = option ? TARGETS[option] : null;
  // In the order of the choice's kinds: an existing girder before a new member for "an existing girder".
  const candidatesOf = (t: (typeof TARGETS)[Option]) =>
    nodes
      .filter((n) => n.id !== owner.id && t.kinds.includes(n.kind))
      .sort((a, b) => t.kinds.indexOf(a.kind) - t.kinds.indexOf(b.kind));
  const candidates = target ? candidatesOf(target) : [];
  const pickChoices: Choice<string>[] = [
    ...candidates.map((n) => ({
      value: n.id,
      label: `${n.label} (${kindWords[n.kind as LoadPathElementKind]})`,
    })),
    ...(target?.newKind
      ? [{ value: NEW, label: `Add a new ${kindWords[target.newKind].toLowerCase()}` }]
      : []),
  ];
  const choose = (next: Option) => {
    setOption(next);
    const t = TARGETS[next];
    const first = candidatesOf(t)[0];
    setPick(next === 'beam' || !t.newKind ? (first?.id ?? NEW) : NEW);
    setDraft(
      t.newKind ? { ...newDraft(t.newKind), label: `${kindWords[t.newKind]} under ${owner.label}` } : null,
    );
  };
  const picked = nodes.find((n) => n.id === pick);
  const landsOnBeam = pick === NEW ? target?.newKind === 'girder' : picked ? isBeamKind(picked.kind) : false;
  const save = useSubmit(async () => {
    const body: BearingSetBody = {
      ...(pick === NEW && draft
        ? { onto: { label: draft.label, element: elementFromDraft(draft, edition) } }
        : { ontoId: pick }),
      ...(landsOnBeam ? { atFt: atFt.trim() === '' ? undefined : Number(atFt) } : {}),
      ...(option === 'hanger' ? { hanger: true } : {}),
      ...(!beamOwner ? { through } : {}),
      ...(owner.kind === 'wall' && picked?.kind === 'joist' ? { joistRelation } : {}),
    };
    await setEnd(owner, end, body);
    await onSaved();
  });
  const refused =
    save.error &&
    (errorsAt(save.error, 'ontoId') ??
      (Object.keys(save.error.fields).length === 0 ? [save.error.message] : undefined));
  const testID = `end-${end}`;
  return (
    <View style={styles.question}>
      <ChoiceGroup
        label="What does this end bear on?"
        choices={options.map((o) => OPTION_WORDS[o])}
        value={option as Option}
        onChange={choose}
        testID={`${testID}-bears-on`}
      />
      {option ? (
        <>
          {pickChoices.length > 1 || pick !== NEW ? (
            <PickerField
              label="Which one?"
              choices={pickChoices}
              value={pick}
              onChange={setPick}
              testID={`${testID}-which`}
            />
          ) : null}
          {pickChoices.length === 0 ? (
            <Text tone="muted">Nothing of this kind in the job yet: add a member first.</Text>
          ) : null}
          {pick === NEW && draft ? (
            <>
              <TextField
                label="Name"
                value={draft.label}
                onChangeText={(label) => setDraft({ ...draft, label })}
                errors={errorsAt(save.error, 'onto.label')}
                testID={`${testID}-name`}
              />
              <ElementFields draft={draft} onChange={setDraft} error={save.error} testID={`${testID}-new`} />
            </>
          ) : null}
          {landsOnBeam ? (
            <TextField
              label="Where does it land on it?"
              hint="Feet from the face of its left support"
              unit="ft"
              value={atFt}
              onChangeText={setAtFt}
              keyboardType="decimal-pad"
              inputMode="decimal"
              errors={errorsAt(save.error, 'atFt')}
              testID={`${testID}-at`}
            />
          ) : null}
          {!beamOwner ? (
            <ChoiceGroup
              label="How does the load cross the floor framing?"
              choices={(Object.keys(throughWords) as (keyof typeof throughWords)[]).map((value) => ({
                value,
                label: throughWords[value],
              }))}
              value={through}
              onChange={setThrough}
              testID={`${testID}-through`}
            />
          ) : null}
          {owner.kind === 'wall' && picked?.kind === 'joist' ? (
            <ChoiceGroup
              label="The wall runs"
              choices={[
                { value: 'across', label: 'Across the joists' },
                { value: 'parallel', label: 'Along one joist' },
              ]}
              value={joistRelation}
              onChange={setJoistRelation}
            />
          ) : null}
          {refused ? (
            <Notice tone="error" title="Not saved">
              {refused.join(' ')}
            </Notice>
          ) : save.error && Object.keys(save.error.fields).length > 0 ? (
            <Notice tone="error">Check the fields marked above.</Notice>
          ) : null}
        </>
      ) : null}
      <View style={styles.row}>
        {option ? (
          <Button
            label="Save"
            icon="check"
            busy={save.busy}
            onPress={() => void save.run()}
            testID={`${testID}-save`}
          />
        ) : null}
        {onCancel ? <Button label="Cancel" variant="quiet" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  end: {
    gap: spacing.sm,
    padding: spacing.md,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radii.md,
    backgroundColor: colors.surface,
  },
  question: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

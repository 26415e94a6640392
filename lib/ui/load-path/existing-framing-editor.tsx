import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { createElement, deleteElement, updateElement } from '@/lib/api/load-path';
import { useLoadPath, useLoadPathRefresh } from '@/lib/hooks/use-load-path';
import { useSubmit } from '@/lib/hooks/use-submit';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import { TextField } from '@/lib/ui/text-field';
import { existingElementKinds } from '@/shared/schemas/calc/load-path';
import type { Job } from '@/shared/schemas/jobs';
import type { Element, JobLoadPath } from '@/shared/schemas/load-path-elements';
import { draftFromElement, elementFromDraft, newDraft, type ElementDraft } from './element-draft';
import { ElementFields, errorsAt } from './element-fields';
import { EndBearingEditor } from './end-bearing-editor';
import { kindWords, pathStateLook } from './words';

type Kind = ElementDraft['kind'];

function DraftForm({
  initial,
  submitLabel,
  onSubmit,
  onCancel,
  testID,
}: {
  initial: ElementDraft;
  submitLabel: string;
  onSubmit: (draft: ElementDraft) => Promise<void>;
  onCancel: () => void;
  testID: string;
}) {
  const [draft, setDraft] = useState(initial);
  const save = useSubmit(onSubmit);
  return (
    <View style={styles.form}>
      <TextField
        label="Name"
        hint="What you call it on site (“Basement girder”, “Post by the stairs”)"
        value={draft.label}
        onChangeText={(label) => setDraft({ ...draft, label })}
        errors={errorsAt(save.error, 'label')}
        testID={`${testID}-name`}
      />
      <ElementFields draft={draft} onChange={setDraft} error={save.error} testID={testID} />
      {save.error ? (
        <Notice tone="error" title="Not saved">
          {Object.keys(save.error.fields).length > 0 ? 'Check the fields marked above.' : save.error.message}
          {errorsAt(save.error, 'element') ? ` ${errorsAt(save.error, 'element')?.join(' ')}` : ''}
        </Notice>
      ) : null}
      <View style={styles.row}>
        <Button
          label={submitLabel}
          icon="check"
          busy={save.busy}
          onPress={() => void save.run(draft)}
          testID={`${testID}-save`}
        />
        <Button label="Cancel" variant="quiet" onPress={onCancel} />
      </View>
    </View>
  );
}

function ElementRow({
  element,
  job,
  loadPath,
  onSaved,
}: {
  element: Element;
  job: Job;
  loadPath: JobLoadPath;
  onSaved: () => Promise<void>;
}) {
  const [editing, setEditing] = useState(false);
  const result = loadPath.result.elements.find((e) => e.id === element.id);
  const look = result ? pathStateLook[result.state] : null;
  const remove = useSubmit(async () => {
    await deleteElement(element.id);
    await onSaved();
  });
  return (
    <Card title={element.label} testID={`element-${element.label}`}>
      <Text variant="caption" tone="muted">
        {kindWords[element.element.kind]}
      </Text>
      {look ? (
        <Text tone={look.tone} testID="element-state">
          {look.word}
        </Text>
      ) : null}
      {result?.openReasons.map((r) => (
        <Text key={r} variant="caption">
          {r}
        </Text>
      ))}
      {[...(result?.engineerReasons ?? []), ...(result?.assumptions ?? [])].map((r) => (
        <Text key={r} variant="caption" tone="muted">
          {r}
        </Text>
      ))}
      {editing ? (
        <DraftForm
          initial={draftFromElement(element.label, element.element)}
          submitLabel="Save changes"
          testID="edit-element"
          onCancel={() => setEditing(false)}
          onSubmit={async (draft) => {
            await updateElement(element.id, {
              label: draft.label,
              element: elementFromDraft(draft, job.loadStandard),
            });
            setEditing(false);
            await onSaved();
          }}
        />
      ) : (
        <View style={styles.row}>
          <Button
            label="Edit"
            icon="edit"
            variant="secondary"
            onPress={() => setEditing(true)}
            testID={`edit-element-${element.label}`}
          />
          <Button label="Delete" variant="danger" busy={remove.busy} onPress={() => void remove.run()} />
        </View>
      )}
      {result?.ends.map((end) => (
        <EndBearingEditor
          key={end.end}
          owner={{ id: element.id, isMember: false, kind: element.element.kind, label: element.label }}
          end={end.end}
          loadPath={loadPath}
          edition={job.loadStandard}
          onSaved={onSaved}
        />
      ))}
    </Card>
  );
}

/**
 * The job's existing framing: each girder, joist, wall, post, column, pier, footing and foundation wall with
 * its state on the load path and what its ends bear on; a form to add one by its measured size.
 */
export function ExistingFramingEditor({ job }: { job: Job }) {
  const { data, error, mutate } = useLoadPath(job.id);
  const refresh = useLoadPathRefresh(job.id);
  const [adding, setAdding] = useState<Kind | null>(null);
  if (error) return <ErrorView error={error} onRetry={() => void mutate()} />;
  if (!data) return <LoadingView />;
  return (
    <View style={styles.list}>
      <Text tone="muted">
        Old lumber: enter its measured size. A grade stamp you cannot read is checked as the weakest grade of
        the species.
      </Text>
      {data.elements.length === 0 ? <Text tone="muted">No existing framing entered yet.</Text> : null}
      {data.elements.map((e) => (
        <ElementRow key={e.id} element={e} job={job} loadPath={data} onSaved={refresh} />
      ))}
      <Card title="Add existing framing" testID="add-element">
        <ChoiceGroup
          label="What is it?"
          choices={existingElementKinds.map((k) => ({ value: k as Kind, label: kindWords[k] }))}
          value={adding as Kind}
          onChange={setAdding}
          testID="add-element-kind"
        />
        {adding ? (
          <DraftForm
            key={adding}
            initial={newDraft(adding)}
            submitLabel="Add"
            testID="new-element"
            onCancel={() => setAdding(null)}
            onSubmit={async (draft) => {
              await createElement(job.id, {
                label: draft.label,
                element: elementFromDraft(draft, job.loadStandard),
              });
              setAdding(null);
              await refresh();
            }}
          />
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.lg },
  form: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

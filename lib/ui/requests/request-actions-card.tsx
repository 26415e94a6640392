import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import {
  acceptFee,
  changeStatus,
  fetchRequest,
  quoteFee,
  reviseRequest,
  sendRequest,
  uploadRequestFile,
} from '@/lib/api/design-requests';
import { usePhotoUpload } from '@/lib/hooks/use-photo-upload';
import { ApiError } from '@/lib/api/client';
import { spacing } from '@/lib/theme';
import { PHOTO_PLACE_LABELS, photoPlaces, type PhotoPlace } from '@/shared/schemas/requests/snapshot';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { REQUEST_STATE_LABELS } from '@/shared/schemas/requests/workflow';
import { Button } from '../button';
import { Card } from '../card';
import { LinkButton } from '../link-button';
import { Notice } from '../notice';
import { PickerField } from '../picker-field';
import { Text } from '../text';
import { TextField } from '../text-field';
import { pickFile } from './browser-files';

const ACCEPT = 'image/jpeg,image/png,image/heic,image/heif,application/pdf,.heic';

/** The state changes, fee, revisions and uploads the viewer may make now (the server says which). */
export function RequestActionsCard({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (detail: RequestDetail) => void;
}) {
  const [text, setText] = useState('');
  const [fee, setFee] = useState('');
  const [days, setDays] = useState('');
  const [place, setPlace] = useState<PhotoPlace>('attic-over-wall');
  const [busy, setBusy] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [queued, setQueued] = useState(false);
  const queuePhoto = usePhotoUpload(request.id);
  const can = (action: RequestDetail['actions'][number]) => request.actions.includes(action);

  async function run(name: string, act: () => Promise<RequestDetail>) {
    setBusy(name);
    setProblem(null);
    try {
      onChange(await act());
      setText('');
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'That did not work');
    } finally {
      setBusy(null);
    }
  }

  /** A photo goes through the device's queue, so one taken with no signal uploads when there is. */
  async function attachPhoto() {
    const file = pickFile ? await pickFile(ACCEPT) : null;
    if (!file) return;
    setBusy('photo');
    setProblem(null);
    try {
      const onServer = await queuePhoto(file, file.name, { place, caption: text });
      setQueued(!onServer);
      setText('');
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      setProblem(error.message);
    } finally {
      setBusy(null);
    }
  }

  async function upload(purpose: 'design') {
    const file = pickFile ? await pickFile(ACCEPT) : null;
    if (!file) return;
    await run(purpose, async () => {
      await uploadRequestFile(request.id, file, file.name, { purpose, place, caption: text });
      return fetchRequest(request.id);
    });
  }

  const firm = request.viewer === 'firm';
  const status = (to: 'in-review' | 'needs-info' | 'designed' | 'closed' | 'declined') =>
    run(to, () => changeStatus(request.id, { to, reason: text }));
  const button = (
    name: string,
    label: string,
    onPress: () => void,
    variant: 'primary' | 'secondary' = 'secondary',
  ) => (
    <Button
      key={name}
      label={label}
      variant={variant}
      busy={busy === name}
      testID={`action-${name}`}
      onPress={onPress}
    />
  );

  // The thread and the reply form have their own cards; with nothing else to do, say so instead of a bare box.
  if (request.actions.every((action) => action === 'message' || action === 'reply')) {
    return (
      <Card title={firm ? 'What you can do' : 'Your answer'} testID="request-actions">
        <Text tone="muted">{`Nothing to do while the request is ${REQUEST_STATE_LABELS[request.status]}.`}</Text>
      </Card>
    );
  }

  return (
    <Card title={firm ? 'What you can do' : 'Your answer'} testID="request-actions">
      {problem ? (
        <Notice tone="error" title="Not done">
          {problem}
        </Notice>
      ) : null}
      {queued ? (
        <Notice tone="info" title="Photo kept on this device" testID="photo-queued">
          No signal: it uploads by itself when there is. It is listed under Package and files until then.
        </Notice>
      ) : null}
      <TextField
        label={firm ? 'Note, question or photo caption' : 'Reason, question or file caption'}
        value={text}
        onChangeText={setText}
        multiline
        testID="action-text"
      />
      {firm && can('edit') && pickFile ? (
        <PickerField
          label="Where the photo was taken"
          value={place}
          choices={photoPlaces.map((p) => ({ value: p, label: PHOTO_PLACE_LABELS[p] }))}
          onChange={setPlace}
        />
      ) : null}
      {!firm && can('quote-fee') ? (
        <View style={styles.row}>
          <TextField
            label="Fee"
            unit="$"
            value={fee}
            onChangeText={setFee}
            keyboardType="numeric"
            testID="fee-usd"
          />
          <TextField
            label="Turnaround"
            unit="working days"
            value={days}
            onChangeText={setDays}
            keyboardType="numeric"
            testID="fee-days"
          />
        </View>
      ) : null}
      <View style={styles.buttons}>
        {can('send')
          ? button(
              'send',
              'Send to the engineer',
              () => run('send', () => sendRequest(request.id)),
              'primary',
            )
          : null}
        {firm && can('edit') && request.status === 'draft' ? (
          <LinkButton
            label="Edit the draft"
            icon="edit"
            variant="secondary"
            href={{ pathname: '/requests/[requestId]/edit', params: { requestId: request.id } }}
            testID="action-edit-draft"
          />
        ) : null}
        {firm && can('edit') && pickFile
          ? button('photo', 'Add a photo or sketch', () => void attachPhoto())
          : null}
        {firm && (can('revise') || can('reopen')) ? (
          <LinkButton
            label={can('revise') ? 'Revise and send' : 'Reopen with changes'}
            icon="edit"
            variant="secondary"
            href={{ pathname: '/requests/[requestId]/revise', params: { requestId: request.id } }}
            testID="action-revise"
          />
        ) : null}
        {can('reopen')
          ? button('reopen', 'Reopen with a question', () =>
              run('reopen', () => reviseRequest(request.id, { question: text, note: '' })),
            )
          : null}
        {can('accept-fee') && request.fee && !request.fee.acceptedAt
          ? button(
              'accept-fee',
              `Accept the fee ($${request.fee.feeUsd})`,
              () => run('accept-fee', () => acceptFee(request.id)),
              'primary',
            )
          : null}
        {can('to-in-review')
          ? button(
              'in-review',
              firm ? 'Answered: back to review' : 'Start review',
              () => void status('in-review'),
              firm ? 'secondary' : 'primary',
            )
          : null}
        {can('to-needs-info')
          ? button('needs-info', 'Ask for information', () => void status('needs-info'))
          : null}
        {can('quote-fee')
          ? button('quote-fee', 'Quote the fee', () =>
              run('quote-fee', () =>
                quoteFee(request.id, { feeUsd: Number(fee), turnaroundDays: Number(days) }),
              ),
            )
          : null}
        {can('upload-design') && pickFile
          ? button('design', 'Upload the design document', () => void upload('design'))
          : null}
        {can('to-designed')
          ? button('designed', 'Mark Designed', () => void status('designed'), 'primary')
          : null}
        {can('to-declined') ? button('declined', 'Decline', () => void status('declined')) : null}
        {can('to-closed') ? button('closed', 'Close the request', () => void status('closed')) : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, paddingTop: spacing.sm },
});

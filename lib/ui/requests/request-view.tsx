import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/lib/format';
import { spacing } from '@/lib/theme';
import type { RequestDetail } from '@/shared/schemas/requests/views';
import { REQUEST_STATE_LABELS } from '@/shared/schemas/requests/workflow';
import { Card } from '../card';
import { CautionNote } from '../caution-note';
import { FieldList } from '../field-list';
import { Text } from '../text';
import { ReplyForm } from './reply-form';
import { RequestActionsCard } from './request-actions-card';
import { RequestFilesCard } from './request-files-card';
import { RequestSnapshotCard } from './request-snapshot-card';
import { RequestThreadCard } from './request-thread-card';
import { VersionCompareCard } from './version-compare-card';

/** One design request for either side: its state, the snapshot read-only, files, thread and what to do next. */
export function RequestView({
  request,
  onChange,
}: {
  request: RequestDetail;
  onChange: (d: RequestDetail) => void;
}) {
  const fee = request.fee;
  return (
    <View style={styles.wrap}>
      <Card title="State" testID="request-state">
        <Text variant="heading" testID="request-status">
          {REQUEST_STATE_LABELS[request.status]}
        </Text>
        <FieldList
          items={[
            { label: 'Version', value: request.version > 0 ? String(request.version) : 'not sent yet' },
            { label: 'From', value: request.firmName },
            {
              label: 'Engineer',
              value: `${request.engineerEmail ?? '—'}${request.engineerBound ? '' : ' (no account bound yet)'}`,
            },
            ...(fee
              ? [
                  {
                    label: 'Fee',
                    value: `$${formatNumber(fee.feeUsd)}, ${fee.turnaroundDays} working days${fee.siteVisit ? ', site visit' : ''} · ${fee.acceptedAt ? 'accepted' : 'waiting for the contractor'}`,
                  },
                ]
              : []),
            ...(request.declineReason ? [{ label: 'Declined because', value: request.declineReason }] : []),
          ]}
        />
      </Card>
      <RequestActionsCard request={request} onChange={onChange} />
      <ReplyForm key={`${request.id}-${request.version}`} request={request} onChange={onChange} />
      <RequestSnapshotCard request={request} />
      <RequestFilesCard request={request} />
      <RequestThreadCard request={request} onChange={onChange} />
      {request.versions.length > 1 ? <VersionCompareCard request={request} /> : null}
      <CautionNote />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});

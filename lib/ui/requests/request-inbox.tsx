import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useRequests } from '@/lib/hooks/use-design-requests';
import { spacing } from '@/lib/theme';
import { REQUEST_STATE_LABELS, requestStates, type RequestState } from '@/shared/schemas/requests/workflow';
import { Button } from '../button';
import { Card } from '../card';
import { EmptyState } from '../empty-state';
import { ErrorView } from '../error-view';
import { LoadingView } from '../loading-view';
import { RequestRow } from './request-row';

/**
 * The viewer's design requests, newest first, filtered by state: for an engineer the inbox of requests sent
 * to them (a Draft never shows), for the firm every request it composed.
 */
export function RequestInbox({ engineer }: { engineer: boolean }) {
  const [state, setState] = useState<RequestState | undefined>(undefined);
  const { data, error, mutate } = useRequests(state);
  const states = requestStates.filter((s) => !engineer || s !== 'draft');
  return (
    <View style={styles.wrap}>
      <View role="radiogroup" aria-label="Show requests" style={styles.filters}>
        <Button
          label="All"
          variant={state === undefined ? 'primary' : 'secondary'}
          aria-checked={state === undefined}
          onPress={() => setState(undefined)}
        />
        {states.map((s) => (
          <Button
            key={s}
            label={REQUEST_STATE_LABELS[s]}
            variant={state === s ? 'primary' : 'secondary'}
            aria-checked={state === s}
            testID={`filter-${s}`}
            onPress={() => setState(s)}
          />
        ))}
      </View>
      {error ? <ErrorView error={error} onRetry={() => mutate()} /> : null}
      {!data && !error ? <LoadingView /> : null}
      {data && data.length === 0 ? (
        <EmptyState
          testID="requests-empty"
          icon="requests"
          title={state ? `No ${REQUEST_STATE_LABELS[state]} requests` : 'No design requests yet'}
          body={
            engineer
              ? 'Design requests sent to you will appear here, each with the job’s details, loads, photos and the contractor’s questions.'
              : 'Start one from a job: pick its members, add photos and notes, and send it to your engineer.'
          }
        />
      ) : null}
      {data && data.length > 0 ? (
        <Card testID="request-list">
          {data.map((request) => (
            <RequestRow key={request.id} request={request} showFirm={engineer} />
          ))}
        </Card>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  filters: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

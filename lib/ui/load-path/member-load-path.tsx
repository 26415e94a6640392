import { chainBelow } from '@/lib/calc/load-path';
import { useLoadPath, useLoadPathRefresh } from '@/lib/hooks/use-load-path';
import { CautionNote } from '@/lib/ui/caution-note';
import { Card } from '@/lib/ui/card';
import { ErrorView } from '@/lib/ui/error-view';
import { LoadingView } from '@/lib/ui/loading-view';
import { Notice } from '@/lib/ui/notice';
import { Text } from '@/lib/ui/text';
import { TextLink } from '@/lib/ui/text-link';
import type { Job } from '@/shared/schemas/jobs';
import { ChainEndsEditor } from './chain-ends-editor';
import { LoadPathDrawing } from './load-path-drawing';
import { pathStateLook } from './words';

/**
 * A member's load path: its state, each end's "What does this end bear on?" and the ends of everything
 * under it, and the section drawing from the member down to the ground with its text equivalent.
 */
export function MemberLoadPath({ job, memberId }: { job: Job; memberId: string }) {
  const { data, error, mutate } = useLoadPath(job.id);
  const refresh = useLoadPathRefresh(job.id);
  if (error) return <ErrorView error={error} onRetry={() => void mutate()} />;
  if (!data) return <LoadingView />;
  const self = data.result.elements.find((e) => e.id === memberId);
  if (!self) return <Text tone="muted">This member is not on the job’s load path.</Text>;
  const look = pathStateLook[self.state];
  const steps = chainBelow(data.result, memberId);
  return (
    <>
      <Notice
        tone={
          self.closed && self.state === 'passes' ? 'success' : self.state === 'fails' ? 'error' : 'warning'
        }
        title={self.closed ? 'Load path closed' : look.word}
        testID="load-path-state"
      >
        {self.closed
          ? 'Every end reaches a confirmed footing or foundation wall through framing that passes.'
          : self.openReasons.join(' ') || 'Its load does not reach the ground through checked framing yet.'}
      </Notice>
      <ChainEndsEditor startId={memberId} loadPath={data} edition={job.loadStandard} onSaved={refresh} />
      <TextLink href={`/jobs/${job.id}/framing`} label="Existing framing of this job" />
      <Card title="Section to the ground" testID="load-path-section">
        <Text variant="caption" tone="muted">
          {data.result.transfer}
        </Text>
        <LoadPathDrawing steps={steps} testID="load-path-drawing" />
      </Card>
      <CautionNote />
    </>
  );
}

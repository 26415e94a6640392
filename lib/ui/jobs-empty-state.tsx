import { EmptyState } from './empty-state';
import { LinkButton } from './link-button';

/** The first thing a new firm sees: what a Job is and how to start one. */
export function JobsEmptyState() {
  return (
    <EmptyState
      testID="jobs-empty"
      icon="jobs"
      title="No jobs yet"
      body="A Job is one house and its work: the address, the age of the house, its roof and the snow and load standard that apply. The walls you screen, the headers and beams you check and the design requests you send all live inside it."
      action={<LinkButton href="/jobs/new" label="New job" icon="plus" testID="jobs-new" />}
    />
  );
}

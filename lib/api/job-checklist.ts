import {
  checklistSchema,
  jobProgressListSchema,
  type EngineerItemPatch,
} from '@/shared/schemas/job-checklist';
import { apiRequest } from './client';

export const fetchChecklist = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/checklist`, checklistSchema);

/** Sets one of the engineer's items: state, note and/or photos; answers with the whole checklist. */
export const updateEngineerItem = (jobId: string, itemId: string, patch: EngineerItemPatch) =>
  apiRequest(
    'PATCH',
    `/api/jobs/${encodeURIComponent(jobId)}/checklist/engineer/${encodeURIComponent(itemId)}`,
    checklistSchema,
    patch,
  );

/** Every open job's checklist progress, for the jobs list. */
export const fetchJobProgress = () =>
  apiRequest('GET', '/api/job-progress', jobProgressListSchema).then((body) => body.jobs);

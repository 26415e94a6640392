import { checklistSchema, jobProgressListSchema } from '@/shared/schemas/job-checklist';
import { apiRequest } from './client';

export const fetchChecklist = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/checklist`, checklistSchema);

/** Every open job's checklist progress, for the jobs list. */
export const fetchJobProgress = () =>
  apiRequest('GET', '/api/job-progress', jobProgressListSchema).then((body) => body.jobs);

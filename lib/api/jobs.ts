import { jobListSchema, jobSchema } from '@/shared/schemas/jobs';
import { apiRequest, noContentSchema } from './client';

export const fetchJobs = () => apiRequest('GET', '/api/jobs', jobListSchema).then((body) => body.jobs);

export const fetchJob = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}`, jobSchema);

/** Archives the job (the API keeps it; it leaves the list). */
export const archiveJob = (jobId: string) =>
  apiRequest('DELETE', `/api/jobs/${encodeURIComponent(jobId)}`, noContentSchema);

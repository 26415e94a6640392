import { jobUpdateResultSchema } from '@/shared/schemas/job-update';
import { jobListSchema, jobSchema, type JobInput } from '@/shared/schemas/jobs';
import { apiRequest, noContentSchema } from './client';

export const fetchJobs = () => apiRequest('GET', '/api/jobs', jobListSchema).then((body) => body.jobs);

export const fetchJob = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}`, jobSchema);

export const createJob = (input: JobInput) => apiRequest('POST', '/api/jobs', jobSchema, input);

/** Saves the job; the answer names every member the server checked again with the job's new values. */
export const updateJob = (jobId: string, input: Partial<JobInput>) =>
  apiRequest('PATCH', `/api/jobs/${encodeURIComponent(jobId)}`, jobUpdateResultSchema, input);

/** Archives the job (the API keeps it; it leaves the list). */
export const archiveJob = (jobId: string) =>
  apiRequest('DELETE', `/api/jobs/${encodeURIComponent(jobId)}`, noContentSchema);

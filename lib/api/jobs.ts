import { jobListSchema, jobSchema } from '@/shared/schemas/jobs';
import { apiRequest } from './client';

export const fetchJobs = () => apiRequest('GET', '/api/jobs', jobListSchema).then((body) => body.jobs);

export const fetchJob = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}`, jobSchema);

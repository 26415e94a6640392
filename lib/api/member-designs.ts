import { jobDesignsSchema } from '@/shared/schemas/requests/member-design';
import { apiRequest } from './client';

/** The engineer's members that supersede the job's preliminary sizes. */
export const fetchJobDesigns = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/designs`, jobDesignsSchema).then(
    (body) => body.designs,
  );

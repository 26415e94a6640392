import { screenListSchema, screenWithHistorySchema } from '@/shared/schemas/bearing-screens';
import { apiRequest } from './client';

/** A job's bearing screens, with the job's "engineer needed" mark (saves go through the device's queue). */
export const fetchJobScreens = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/screens`, screenListSchema);

export const fetchScreen = (screenId: string) =>
  apiRequest('GET', `/api/screens/${encodeURIComponent(screenId)}`, screenWithHistorySchema);

import {
  screenListSchema,
  screenSchema,
  screenWithHistorySchema,
  type ScreenCreateBody,
} from '@/shared/schemas/bearing-screens';
import type { ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';
import { apiRequest } from './client';

/** A job's bearing screens, with the job's "engineer needed" mark; every save answers with the server's outcome. */
export const fetchJobScreens = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/screens`, screenListSchema);

export const fetchScreen = (screenId: string) =>
  apiRequest('GET', `/api/screens/${encodeURIComponent(screenId)}`, screenWithHistorySchema);

export const createScreen = (jobId: string, body: ScreenCreateBody) =>
  apiRequest('POST', `/api/jobs/${encodeURIComponent(jobId)}/screens`, screenSchema, body);

export const updateScreen = (screenId: string, patch: { wallLabel?: string; answers?: ScreenAnswers }) =>
  apiRequest('PATCH', `/api/screens/${encodeURIComponent(screenId)}`, screenSchema, patch);

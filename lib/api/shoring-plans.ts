import { shoringAnswerSchema, type ShoringPlanBodyInput } from '@/shared/schemas/shoring-plans';
import { apiRequest } from './client';

const path = (memberId: string) => `/api/members/${encodeURIComponent(memberId)}/shoring`;

/** The member's saved shoring plan, or null. */
export const fetchShoring = (memberId: string) =>
  apiRequest('GET', path(memberId), shoringAnswerSchema).then((body) => body.shoring);

/** Saves the plan; the server computes it from the member's saved loads. */
export const saveShoring = (memberId: string, body: ShoringPlanBodyInput) =>
  apiRequest('PUT', path(memberId), shoringAnswerSchema, body).then((body) => body.shoring);

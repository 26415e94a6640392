import { shoringAnswerSchema } from '@/shared/schemas/shoring-plans';
import { apiRequest } from './client';

const path = (memberId: string) => `/api/members/${encodeURIComponent(memberId)}/shoring`;

/** The member's saved shoring plan, or null. */
export const fetchShoring = (memberId: string) =>
  apiRequest('GET', path(memberId), shoringAnswerSchema).then((body) => body.shoring);

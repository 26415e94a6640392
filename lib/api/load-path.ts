import type { LoadPathEnd } from '@/shared/schemas/calc/load-path';
import {
  bearingSavedSchema,
  elementSchema,
  jobLoadPathSchema,
  type BearingSetBody,
  type ElementCreateBody,
} from '@/shared/schemas/load-path-elements';
import { apiRequest, noContentSchema } from './client';

/** The job's load path (DESIGN.md §6): existing framing, what each end bears on, and the server's check. */

const enc = encodeURIComponent;

export const fetchLoadPath = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${enc(jobId)}/load-path`, jobLoadPathSchema);

export const createElement = (jobId: string, body: ElementCreateBody) =>
  apiRequest('POST', `/api/jobs/${enc(jobId)}/elements`, elementSchema, body);

export const updateElement = (elementId: string, body: Partial<ElementCreateBody>) =>
  apiRequest('PATCH', `/api/elements/${enc(elementId)}`, elementSchema, body);

export const deleteElement = (elementId: string) =>
  apiRequest('DELETE', `/api/elements/${enc(elementId)}`, noContentSchema);

/** Where an end lives: a member's (`/api/members/…`) or an existing element's (`/api/elements/…`). */
export interface EndOwner {
  id: string;
  isMember: boolean;
}
const endPath = (owner: EndOwner, end: LoadPathEnd) =>
  `/api/${owner.isMember ? 'members' : 'elements'}/${enc(owner.id)}/ends/${end}`;

export const setEnd = (owner: EndOwner, end: LoadPathEnd, body: BearingSetBody) =>
  apiRequest('PUT', endPath(owner, end), bearingSavedSchema, body);

export const clearEnd = (owner: EndOwner, end: LoadPathEnd) =>
  apiRequest('DELETE', endPath(owner, end), noContentSchema);

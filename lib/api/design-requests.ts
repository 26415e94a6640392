import { z } from 'zod';
import { apiErrorBodySchema } from '@/shared/errors';
import { meSchema } from '@/shared/schemas/auth';
import type { RequestComposeBody } from '@/shared/schemas/requests/compose';
import type { EngineerReplyBody } from '@/shared/schemas/requests/reply';
import {
  requestDetailSchema,
  requestFileSchema,
  requestInvitationPreviewSchema,
  requestListSchema,
  requestVersionSnapshotSchema,
  type RequestDetail,
} from '@/shared/schemas/requests/views';
import type { RequestState, StatusChange } from '@/shared/schemas/requests/workflow';
import { getActiveOrgId } from './active-org';
import { ApiError, apiRequest, noContentSchema } from './client';

const path = (requestId: string, rest = '') => `/api/requests/${encodeURIComponent(requestId)}${rest}`;

export const fetchRequests = (state?: RequestState) =>
  apiRequest('GET', state ? `/api/requests?state=${state}` : '/api/requests', requestListSchema).then(
    (body) => body.requests,
  );

export const fetchJobRequests = (jobId: string) =>
  apiRequest('GET', `/api/jobs/${encodeURIComponent(jobId)}/requests`, requestListSchema).then(
    (body) => body.requests,
  );

export const fetchRequest = (requestId: string) => apiRequest('GET', path(requestId), requestDetailSchema);

/** One sent version as it was frozen, for comparing two versions. */
export const fetchRequestVersion = (requestId: string, version: number) =>
  apiRequest('GET', path(requestId, `/versions/${version}`), requestVersionSnapshotSchema);

export const createRequest = (jobId: string, body: RequestComposeBody) =>
  apiRequest('POST', `/api/jobs/${encodeURIComponent(jobId)}/requests`, requestDetailSchema, body);

export const updateRequest = (requestId: string, body: Partial<RequestComposeBody>) =>
  apiRequest('PATCH', path(requestId), requestDetailSchema, body);

export const sendRequest = (requestId: string) =>
  apiRequest('POST', path(requestId, '/send'), requestDetailSchema);

/** A new version; `draft` edits the working copy first, in the same step (nothing is kept when refused). */
export const reviseRequest = (
  requestId: string,
  body: { note?: string; question?: string; draft?: Partial<RequestComposeBody> },
) => apiRequest('POST', path(requestId, '/revisions'), requestDetailSchema, body);

export const changeStatus = (requestId: string, body: { to: StatusChange['to']; reason?: string }) =>
  apiRequest('POST', path(requestId, '/status'), requestDetailSchema, body);

export const quoteFee = (
  requestId: string,
  body: { feeUsd: number; turnaroundDays: number; siteVisit?: boolean },
) => apiRequest('POST', path(requestId, '/fee'), requestDetailSchema, body);

export const acceptFee = (requestId: string) =>
  apiRequest('POST', path(requestId, '/fee/accept'), requestDetailSchema);

export const sendReply = (requestId: string, body: EngineerReplyBody) =>
  apiRequest('POST', path(requestId, '/reply'), requestDetailSchema, body);

export const postMessage = (requestId: string, body: { body: string; attachmentIds?: string[] }) =>
  apiRequest('POST', path(requestId, '/messages'), requestDetailSchema, body);

/** Where each download of a request is (same origin, the session cookie goes with it). */
export const downloadPath = (
  requestId: string,
  what: 'package.pdf' | 'package.json' | 'loads.csv' | 'photos.zip',
) => path(requestId, `/${what}`);

export const filePath = (requestId: string, fileId: string, size: 'original' | 'preview' = 'original') =>
  path(requestId, `/attachments/${encodeURIComponent(fileId)}${size === 'preview' ? '?size=preview' : ''}`);

/** Removes a photo or sketch from a Draft (refused once the request was sent). */
export const removeRequestFile = (requestId: string, fileId: string) =>
  apiRequest('DELETE', path(requestId, `/attachments/${encodeURIComponent(fileId)}`), noContentSchema);

/** Uploads one file (multipart) with its purpose, place tag and caption. */
export async function uploadRequestFile(
  requestId: string,
  file: Blob,
  fileName: string,
  fields: { purpose: 'photo' | 'message' | 'design'; place?: string; caption?: string },
) {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined) form.append(key, value);
  form.append('file', file, fileName);
  const headers: Record<string, string> = { Accept: 'application/json' };
  const orgId = getActiveOrgId();
  if (orgId) headers['X-Org-Id'] = orgId;
  let response: Response;
  try {
    response = await fetch(path(requestId, '/attachments'), {
      method: 'POST',
      headers,
      body: form,
      credentials: 'include',
    });
  } catch {
    throw new ApiError('network', 0, 'Could not reach Tributary. Check your connection and try again.');
  }
  const json: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const error = apiErrorBodySchema.safeParse(json);
    if (!error.success) throw new ApiError('bad_response', response.status, 'The upload failed.');
    const { code, message, fields } = error.data.error;
    throw new ApiError(code, response.status, message, fields);
  }
  return requestFileSchema.parse(json);
}

export type { RequestDetail };

export const fetchRequestInvitation = (token: string) =>
  apiRequest('GET', `/api/request-invitations/${encodeURIComponent(token)}`, requestInvitationPreviewSchema);

export const acceptRequestInvitation = (
  token: string,
  body: { name?: string; password?: string; firmName?: string },
) =>
  apiRequest(
    'POST',
    `/api/request-invitations/${encodeURIComponent(token)}/accept`,
    z.object({ requestId: z.string(), me: meSchema }),
    body,
  );

import type { Sender } from './outbox';
import { NetworkFailure } from './outbox';
import { parseJson } from '@/lib/api/client';

/**
 * Sends one queued write to the API with its Idempotency-Key and the firm it was made in. A photo goes as
 * a multipart upload of its stored blob, with the item's body as the form's other fields.
 */
export const sendWrite: Sender = async (item, blob) => {
  const headers: Record<string, string> = {
    Accept: 'application/json',
    'Idempotency-Key': item.key,
    'X-Org-Id': item.orgId,
  };
  let body: BodyInit | undefined;
  if (blob) {
    const form = new FormData();
    const fields = (item.body ?? {}) as Record<string, string | undefined>;
    for (const [name, value] of Object.entries(fields)) if (value !== undefined) form.append(name, value);
    form.append('file', blob.blob, blob.name);
    body = form;
  } else if (item.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(item.body);
  }
  let response: Response;
  try {
    response = await fetch(item.path, { method: item.method, headers, body, credentials: 'include' });
  } catch {
    throw new NetworkFailure();
  }
  return { status: response.status, body: parseJson(await response.text()) };
};

import { ApiError } from '@/lib/api/client';
import { getActiveOrgId } from '@/lib/api/active-org';

/** Fetches a file from the API (with the active firm) and saves it through a temporary download link. */
export async function downloadFile(path: string, fileName: string): Promise<void> {
  const orgId = getActiveOrgId();
  let response: Response;
  try {
    response = await fetch(path, { credentials: 'include', headers: orgId ? { 'X-Org-Id': orgId } : {} });
  } catch {
    throw new ApiError('network', 0, 'Could not reach Tributary. Check your connection and try again.');
  }
  if (!response.ok)
    throw new ApiError('bad_response', response.status, `The download failed (${response.status}).`);
  const url = URL.createObjectURL(await response.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

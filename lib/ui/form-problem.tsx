import type { ApiError } from '@/lib/api/client';
import { Notice } from './notice';

/**
 * The server's answer to a failed form submit. When the answer names fields, their messages already sit
 * under those fields, so only a pointer to them is shown here.
 */
export function FormProblem({
  error,
  fieldsAre = 'below',
}: {
  error: ApiError | null;
  fieldsAre?: 'above' | 'below';
}) {
  if (!error) return null;
  const named = Object.keys(error.fields).length > 0;
  return <Notice tone="error">{named ? `Check the fields marked ${fieldsAre}.` : error.message}</Notice>;
}

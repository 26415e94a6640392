import { capturedMailListSchema } from '@/shared/schemas/mail';
import { apiRequest } from './client';

/**
 * Mail captured by the local fake SMTP server. The API answers 404 in production, to other machines and
 * without the key the server printed at start.
 */
export const fetchDevMail = (key: string) =>
  apiRequest('GET', `/api/dev/mail?key=${encodeURIComponent(key)}`, capturedMailListSchema).then(
    (body) => body.messages,
  );

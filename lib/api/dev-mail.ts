import { capturedMailListSchema } from '@/shared/schemas/mail';
import { apiRequest } from './client';

/** Mail captured by the local fake SMTP server; the API answers 404 in production. */
export const fetchDevMail = () =>
  apiRequest('GET', '/api/dev/mail', capturedMailListSchema).then((body) => body.messages);

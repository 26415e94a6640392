import { randomUUID } from 'node:crypto';

/** Primary keys are random UUIDs: unguessable, so an id alone never reveals or reaches another firm's row. */
export function newId(): string {
  return randomUUID();
}

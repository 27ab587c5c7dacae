import { v4 as uuidv4 } from 'uuid';

/** A client-made UUID (outbox items are pushed with it, so a repeated push is recognised). */
export function newId(): string {
  return uuidv4();
}

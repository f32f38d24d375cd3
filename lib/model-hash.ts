/** The fingerprint of an engine input stored with every run: SHA-256 of its JSON text. */
import { createHash } from 'node:crypto';

export function hashModel(model: unknown): string {
  return createHash('sha256').update(JSON.stringify(model)).digest('hex');
}

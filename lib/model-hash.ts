/**
 * Fingerprints stored with every run: SHA-256 of the engine input's JSON text, and of the
 * result in RFC 8785 canonical JSON (`canonicalize`), so the result's hash is the same whether
 * it is computed from the engine's answer or from the copy PostgreSQL's jsonb hands back (jsonb
 * reorders keys; numbers round-trip exactly). Two results with the same hash are the same figures.
 */
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';

export function hashModel(model: unknown): string {
  return createHash('sha256').update(JSON.stringify(model)).digest('hex');
}

export function hashResult(result: unknown): string {
  return createHash('sha256')
    .update(canonicalize(result) ?? '')
    .digest('hex');
}

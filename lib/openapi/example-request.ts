/**
 * The example request the API reference page shows for an operation: a curl command with the
 * key from the environment (never a real one), path ids as placeholders and the operation's
 * example body.
 */
import type { Operation } from './operation';

export function exampleRequest(op: Operation, baseUrl: string): string {
  const url = `${baseUrl.replace(/\/$/, '')}${op.path.replace(/\{(\w+)\}/g, (_, name: string) => `<${name}>`)}`;
  const lines = [`curl${op.method === 'get' ? '' : ` -X ${op.method.toUpperCase()}`} "${url}"`, '  -H "Authorization: Bearer $LEEWAY_API_KEY"'];
  if (op.otherBody?.contentType === 'multipart/form-data') lines.push('  -F "file=@<file>"');
  else if (op.body || op.otherBody) {
    lines.push('  -H "Content-Type: application/json"');
    lines.push(`  --data '${JSON.stringify(op.example ?? {})}'`);
  }
  const file = Object.values(op.answers).find((a) => a.file);
  if (file) lines.push(`  -o "<file>"`);
  return lines.join(' \\\n');
}

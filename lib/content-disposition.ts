/**
 * The Content-Disposition of a download (RFC 6266): an ASCII name for old clients, and the name
 * as written (accents, en dashes, apostrophes) in RFC 8187's UTF-8 form, whose value may not
 * hold ' ( ) * as they are. The browser's side reads it back with `filenameOf` (lib/api-client.ts).
 */
export function attachmentDisposition(filename: string): string {
  const ascii = filename.replace(/[^\w .()-]/g, '_');
  const encoded = encodeURIComponent(filename).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}

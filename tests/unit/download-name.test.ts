/**
 * The name a download is saved under comes from the server's Content-Disposition header
 * (lib/api-client.ts filenameOf), as a browser would take it: the UTF-8 `filename*` first
 * (RFC 6266 §4.3), else the quoted plain name; and what the routes send (lib/content-disposition.ts)
 * reads back as the name written, whatever its letters.
 */
import { expect, it } from 'vitest';
import { filenameOf } from '@/lib/api-client';
import { attachmentDisposition } from '@/lib/content-disposition';

it('reads the UTF-8 name first, then the plain one, and nothing from no header', () => {
  expect(
    filenameOf(`attachment; filename="Anlage M_nchen - validation report v3.pdf"; filename*=UTF-8''Anlage%20M%C3%BCnchen%20-%20validation%20report%20v3.pdf`),
  ).toBe('Anlage München - validation report v3.pdf');
  expect(filenameOf('attachment; filename="Leeway portfolio.csv"')).toBe('Leeway portfolio.csv');
  expect(filenameOf(`attachment; filename="plain.pdf"; filename*=UTF-8''bad%E0%A4%A.pdf`)).toBe('plain.pdf');
  expect(filenameOf('attachment')).toBeNull();
  expect(filenameOf(null)).toBeNull();
});

it('sends any name so that it reads back as written, with an ASCII name for old clients', () => {
  for (const name of ['Anlage München – Basis (A4).pdf', "Founder's plant * v2.xlsx", 'Scénario "haut" ; 50%.pdf', 'plain.csv']) {
    const header = attachmentDisposition(name);
    expect(filenameOf(header)).toBe(name);
    // Only the characters RFC 8187 allows in the UTF-8 value, and a printable ASCII fallback.
    expect(header).toMatch(/^attachment; filename="[\w .()-]*"; filename\*=UTF-8''[A-Za-z0-9!#$&+.^_`|~%-]+$/);
  }
});

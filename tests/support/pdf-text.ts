/** A PDF's text as pdftotext reads it, runs of white space as one space (`layout` keeps columns side by side). */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

export function pdfText(pdf: Buffer, { layout = false } = {}): string {
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'leeway-pack-')), 'pack.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', [...(layout ? ['-layout'] : []), file, '-'])
    .toString()
    .replace(/\s+/g, ' ');
}

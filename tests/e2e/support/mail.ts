/** Reads what the test mail sink caught, waiting for a message to arrive. */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import type { StoredMail } from '@/lib/mail-sink-store';
import { E2E_MAIL_DIR } from './env';

export async function waitForMail(to: string, subject: RegExp, timeoutMs = 15_000): Promise<StoredMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    let names: string[] = [];
    try {
      names = await fs.readdir(E2E_MAIL_DIR);
    } catch {
      // nothing yet
    }
    for (const name of names
      .filter((n) => n.endsWith('.json'))
      .sort()
      .reverse()) {
      const mail = JSON.parse(await fs.readFile(path.join(E2E_MAIL_DIR, name), 'utf8')) as StoredMail;
      if (mail.to.includes(to.toLowerCase()) && subject.test(mail.subject)) return mail;
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no e-mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}

export function firstLink(mail: StoredMail): string {
  const match = mail.text.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`no link in the e-mail "${mail.subject}"`);
  return match[0];
}

/**
 * E-mail from the app: every message is a job on the `mail` queue, written in the caller's
 * transaction when it has one, and sent by a worker (lib/jobs/deliver-mail.ts) with retries while
 * the mail server is away. A request never waits for SMTP.
 */
import { enqueue, type Executor } from './jobs/enqueue';
import { QUEUES, type MailJob } from './jobs/queues';

export type Mail = MailJob;

export async function queueMail(mail: Mail, executor?: Executor): Promise<void> {
  // API keys act as users whose address is on the reserved .invalid domain (db/queries/api-keys.ts):
  // nothing can be delivered there, so nothing is queued.
  if (mail.to.toLowerCase().endsWith('.invalid')) return;
  await enqueue(QUEUES.mail, mail, { executor });
}

/** A plain, readable message with one call to action. */
export function linkMail(to: string, subject: string, intro: string, label: string, url: string): Mail {
  const text = `${intro}\n\n${label}: ${url}\n\nIf you did not expect this message, you can ignore it.\n— Leeway`;
  const html = `<p>${escapeHtml(intro)}</p><p><a href="${escapeHtml(url)}">${escapeHtml(label)}</a></p><p style="color:#666">If you did not expect this message, you can ignore it.<br>— Leeway</p>`;
  return { to, subject, text, html };
}

function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/**
 * Sends e-mail through nodemailer: to SMTP_URL when it is set, otherwise to the local sink
 * (scripts/mail-sink.ts), which keeps every message for the tests and the local inbox page.
 */
import nodemailer from 'nodemailer';
import { env } from './env';

const transport = nodemailer.createTransport(env.SMTP_URL ?? { host: '127.0.0.1', port: env.MAIL_SINK_PORT, secure: false, ignoreTLS: true });

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export async function sendMail(mail: Mail): Promise<void> {
  await transport.sendMail({ from: env.MAIL_FROM, ...mail });
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

/**
 * A worker's side of e-mail: sends one queued message through nodemailer — to SMTP_URL when it is
 * set, otherwise to the local sink (scripts/mail-sink.ts), which keeps every message for the
 * tests and the local inbox page. A failure throws, and the queue tries again with backoff.
 */
import nodemailer from 'nodemailer';
import { findBoardPack } from '../board-pack/records';
import { env } from '../env';
import type { MailJob } from './queues';

const transport = nodemailer.createTransport(env.SMTP_URL ?? { host: '127.0.0.1', port: env.MAIL_SINK_PORT, secure: false, ignoreTLS: true });

export async function deliverMail({ boardPack, ...mail }: MailJob): Promise<void> {
  const attachments = [];
  if (boardPack) {
    const stored = await findBoardPack(boardPack.orgId, boardPack.snapshotId, boardPack.pageSize);
    if (!stored) throw new Error(`board pack ${boardPack.snapshotId} (${boardPack.pageSize}) is not stored yet`);
    attachments.push({ filename: boardPack.filename, content: stored.pdf, contentType: 'application/pdf' });
  }
  await transport.sendMail({ from: env.MAIL_FROM, ...mail, attachments });
}

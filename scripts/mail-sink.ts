/**
 * The local SMTP sink: accepts every message on 127.0.0.1:$MAIL_SINK_PORT (default 2525) and
 * keeps it as JSON in $MAIL_SINK_DIR (default .data/mail), for the tests and the local inbox
 * page. It never relays anything. Started by the start command and the tests.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { env } from '../lib/env';
import type { StoredMail } from '../lib/mail-sink-store';

const dir = path.resolve(process.cwd(), env.MAIL_SINK_DIR);
const MAX_MESSAGE_BYTES = 5_000_000;

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  size: MAX_MESSAGE_BYTES,
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (parsed) => {
        const id = `${Date.now()}-${Math.random().toString(36).slice(2, 10)}`;
        const mail: StoredMail = {
          id,
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address.toLowerCase()),
          subject: parsed.subject ?? '',
          text: parsed.text ?? '',
          html: typeof parsed.html === 'string' ? parsed.html : null,
          attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, size: a.size })),
        };
        // Messages hold sign-in, reset and invitation links: readable by this account only.
        await fs.mkdir(dir, { recursive: true, mode: 0o700 });
        await fs.chmod(dir, 0o700);
        // Written aside and renamed into place (atomic on one file system): a reader — the local
        // inbox, the e2e tests — never sees a message half written.
        const file = path.join(dir, `${id}.json`);
        await fs.writeFile(`${file}.partial`, JSON.stringify(mail, null, 2), { mode: 0o600 });
        await fs.rename(`${file}.partial`, file);
        callback();
      })
      .catch((error) => callback(error));
  },
});

server.on('error', (error) => {
  console.error('[mail-sink]', error.message);
  // Not listening (the port is taken): another process would get the mail, so stop and say so.
  if (!server.server.listening) process.exit(1);
});
server.listen(env.MAIL_SINK_PORT, '127.0.0.1', () => {
  console.log(`› mail sink on 127.0.0.1:${env.MAIL_SINK_PORT}, keeping messages in ${path.relative(process.cwd(), dir)}`);
});

for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => server.close(() => process.exit(0)));

/**
 * The local mail sink's store: one JSON file per message in MAIL_SINK_DIR, written by
 * scripts/mail-sink.ts and read by the local inbox page and the tests.
 */
import { promises as fs } from 'node:fs';
import path from 'node:path';
import { env } from './env';

export interface StoredMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  /** What was attached (names, types and sizes; the sink does not keep the bytes). */
  attachments?: { filename: string; contentType: string; size: number }[];
}

export function sinkDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), env.MAIL_SINK_DIR);
}

export async function listMail(): Promise<StoredMail[]> {
  let names: string[] = [];
  try {
    names = await fs.readdir(sinkDir());
  } catch {
    return [];
  }
  const messages = await Promise.all(
    names
      .filter((n) => n.endsWith('.json'))
      .map(async (n) => JSON.parse(await fs.readFile(path.join(/*turbopackIgnore: true*/ sinkDir(), n), 'utf8')) as StoredMail),
  );
  return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

export async function findMail(id: string): Promise<StoredMail | null> {
  if (!/^[a-z0-9-]+$/i.test(id)) return null;
  try {
    return JSON.parse(await fs.readFile(path.join(/*turbopackIgnore: true*/ sinkDir(), `${id}.json`), 'utf8')) as StoredMail;
  } catch {
    return null;
  }
}

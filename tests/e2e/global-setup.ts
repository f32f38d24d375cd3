/**
 * Starts what the end-to-end tests drive: a fresh, migrated and seeded test database, the mail
 * sink on its own port and folder, a job worker (scripts/worker.ts), and the built app
 * (scripts/serve.ts) on 127.0.0.1:3100 — the same processes `npm start` runs. Stops them afterwards. The tests stand in for a
 * reverse proxy on loopback (TRUSTED_PROXIES), so each browser context's X-Forwarded-For is its
 * own client address for the sign-in limits.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import { connect } from 'node:net';
import recreateTestDatabase from '../db/global-setup';
import { BASE_URL, E2E_MAIL_DIR, E2E_MAIL_PORT, E2E_PORT } from './support/env';

const children: ChildProcess[] = [];

function start(command: string, args: string[], env: Record<string, string>, name: string) {
  const child = spawn(command, args, { env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  child.on('exit', (code) => {
    if (code && code !== 0 && code !== 143) console.error(`[e2e] ${name} exited with ${code}\n${output.slice(-3000)}`);
  });
  children.push(child);
  return () => output;
}

async function waitFor(url: string, log: () => string) {
  for (let k = 0; k < 300; k++) {
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`${url} did not answer in 30 s:\n${log().slice(-3000)}`);
}

function run(command: string, args: string[], env: Record<string, string>) {
  return new Promise<void>((resolve, reject) => {
    const child = spawn(command, args, { env: { ...process.env, ...env }, stdio: 'inherit' });
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(' ')} exited with ${code}`))));
  });
}

/** Whether something already answers on a loopback port (a process left over from an earlier run). */
function taken(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = connect(port, '127.0.0.1');
    socket.once('connect', () => (socket.destroy(), resolve(true)));
    socket.once('error', () => resolve(false));
  });
}

export default async function setup() {
  // A leftover mail sink or server would take the tests' mail or requests, and they would fail far from the cause.
  for (const [port, what] of [
    [E2E_MAIL_PORT, 'the mail sink'],
    [E2E_PORT, 'the app'],
  ] as const)
    if (await taken(port)) throw new Error(`127.0.0.1:${port}, the port of ${what} for the end-to-end tests, is in use by another process: stop it first.`);
  const env = {
    PG_DATABASE: process.env.PG_TEST_DATABASE ?? 'leeway_test',
    APP_URL: BASE_URL,
    MAIL_SINK_PORT: String(E2E_MAIL_PORT),
    MAIL_SINK_DIR: E2E_MAIL_DIR,
    NEXT_TELEMETRY_DISABLED: '1',
  };
  await recreateTestDatabase();
  await run(process.execPath, ['--import', 'tsx', 'scripts/migrate.ts', 'up'], env);
  await run(process.execPath, ['--import', 'tsx', 'scripts/seed.ts'], env);
  rmSync(E2E_MAIL_DIR, { recursive: true, force: true });
  start(process.execPath, ['--import', 'tsx', 'scripts/mail-sink.ts'], env, 'mail sink');
  start(process.execPath, ['.data/worker.mjs'], env, 'worker');
  const log = start(process.execPath, ['.data/serve.mjs'], { ...env, HOST: '127.0.0.1', PORT: String(E2E_PORT), TRUSTED_PROXIES: '127.0.0.1' }, 'app');
  await waitFor(`${BASE_URL}/api/health`, log);
  return async () => {
    for (const child of children) child.kill('SIGTERM');
  };
}

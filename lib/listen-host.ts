/**
 * Where the server listens, as scripts/serve.ts set it when it started. Unset means the app was
 * started some other way (`next start`, `next dev`) and its address is unknown, which every
 * check treats as "reachable from other machines".
 */
import { isLoopback } from './client-address';

export const LISTEN_HOST_VARIABLE = 'LEEWAY_LISTEN_HOST';

export function listensOnLoopbackOnly(): boolean {
  return isLoopback(process.env[LISTEN_HOST_VARIABLE]);
}

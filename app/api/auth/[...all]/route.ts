// /api/auth/* – better-auth's own endpoints (sign-in, sign-up, sessions, organisations)
import { toNextJsHandler } from 'better-auth/next-js';
import { auth } from '@/lib/auth';

export const { GET, POST } = toNextJsHandler(auth);

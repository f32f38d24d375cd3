/**
 * The better-auth server instance: e-mail and password with verification and reset, the
 * organization plugin with Leeway's four roles, database-backed rate limits (so several app
 * servers share them), and `nextCookies()` last so server actions can set cookies.
 *
 * Hardening (issue "safe by default"): limits key on the address scripts/serve.ts vouches for,
 * never on a client's X-Forwarded-For; a per-account backoff after repeated wrong passwords;
 * common passwords refused; every other session ends when a password is reset or changed; the
 * reset mail is sent after the answer, so the answer takes as long whether or not the account
 * exists; the demo's published password opens its accounts only on a server no other machine
 * can reach, and no one may choose it; and only a user who belongs to no organisation may create
 * one, through any door.
 */
import { betterAuth } from 'better-auth';
import { APIError, createAuthMiddleware, isAPIError } from 'better-auth/api';
import { nextCookies } from 'better-auth/next-js';
import { organization } from 'better-auth/plugins';
import { db, pool } from '@/db';
import { DEMO_PASSWORD } from '@/demo/organisations';
import { findFirstMembership, INVITATION_LIFETIME_MS } from '@/db/queries/members';
import { CLIENT_ADDRESS_HEADER } from './client-address';
import { COMMON_PASSWORD_MESSAGE, isCommonPassword } from './common-passwords';
import { COMMON_PASSWORD, PUBLISHED_PASSWORD } from './password-refusals';
import { authSecret, env } from './env';
import { queueInvitationMail } from './invitation-mail';
import { listensOnLoopbackOnly } from './listen-host';
import { linkMail, queueMail } from './mail';
import { ac, roles } from './permissions';
import { addSignInFailure, clearSignInFailures } from '@/db/queries/sign-in-failures';
import { secondsUntilAllowed } from './sign-in-backoff';

/** The body field holding a new password, per auth endpoint. */
const passwordFields: Record<string, string> = {
  '/sign-up/email': 'password',
  '/reset-password': 'newPassword',
  '/change-password': 'newPassword',
  '/set-password': 'newPassword',
};

export const auth = betterAuth({
  appName: 'Leeway',
  baseURL: env.APP_URL,
  secret: authSecret(),
  database: pool,
  trustedOrigins: [env.APP_URL, 'http://127.0.0.1:3000', 'http://localhost:3000'],
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    minPasswordLength: 10,
    maxPasswordLength: 128,
    revokeSessionsOnPasswordReset: true,
    sendResetPassword: async ({ user, url }) => {
      // Not awaited: even queueing takes time an unknown address would not, which would tell an observer the account exists.
      queueMail(
        linkMail(user.email, 'Reset your Leeway password', 'Someone asked to reset the password of your Leeway account.', 'Choose a new password', url),
      ).catch((error) => console.error('[leeway] reset-password mail', error));
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: async ({ user, url }) => {
      await queueMail(
        linkMail(user.email, 'Confirm your e-mail for Leeway', 'Welcome to Leeway. Please confirm this is your e-mail address.', 'Confirm my e-mail', url),
      );
    },
  },
  rateLimit: {
    enabled: true,
    storage: 'database',
    window: 60,
    max: 200,
    customRules: {
      '/sign-in/email': { window: 60, max: 10 },
      '/sign-up/email': { window: 60, max: 10 },
      '/request-password-reset': { window: 60, max: 5 },
    },
  },
  advanced: {
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
    // The session and its user in one query, not two: every signed-in request reads them.
    database: { joins: true },
  },
  hooks: {
    before: createAuthMiddleware(async (ctx) => {
      const field = passwordFields[ctx.path];
      const password = field ? (ctx.body as Record<string, unknown> | undefined)?.[field] : undefined;
      if (typeof password === 'string' && isCommonPassword(password))
        throw new APIError('BAD_REQUEST', { message: COMMON_PASSWORD_MESSAGE, code: COMMON_PASSWORD });
      if (password === DEMO_PASSWORD)
        throw new APIError('BAD_REQUEST', { message: 'This is the demo’s published password; choose your own.', code: PUBLISHED_PASSWORD });
      // The demo accounts' password is in the README: it opens them only while no other machine can
      // reach this server. Listening wider (HOST=0.0.0.0) with the demo seeded let anyone in as its admin.
      if (ctx.path === '/sign-in/email' && ctx.body?.password === DEMO_PASSWORD && !listensOnLoopbackOnly())
        throw new APIError('FORBIDDEN', {
          message: 'The demo’s published password works only while Leeway listens on this machine alone. Reset this account’s password to sign in.',
          code: PUBLISHED_PASSWORD,
        });
      if (ctx.path === '/sign-in/email' && typeof ctx.body?.email === 'string') {
        const wait = await secondsUntilAllowed(db, ctx.body.email);
        if (wait > 0)
          throw new APIError('TOO_MANY_REQUESTS', {
            message: `Too many wrong passwords for this account. Try again in ${wait < 90 ? `${wait} seconds` : `${Math.ceil(wait / 60)} minutes`}, or reset the password.`,
            code: 'ACCOUNT_BACKOFF',
          });
      }
      // A changed password ends every other session, whatever the client asked for.
      if (ctx.path === '/change-password') return { context: { body: { ...ctx.body, revokeOtherSessions: true } } };
    }),
    after: createAuthMiddleware(async (ctx) => {
      if (ctx.path !== '/sign-in/email' || typeof ctx.body?.email !== 'string') return;
      const returned = ctx.context.returned;
      if (isAPIError(returned)) {
        // Only a wrong password counts; refusals for other reasons (unverified e-mail, our own backoff) do not.
        if (returned.status === 'UNAUTHORIZED') await addSignInFailure(db, { email: ctx.body.email });
      } else await clearSignInFailures(db, { email: ctx.body.email });
    }),
  },
  databaseHooks: {
    session: {
      create: {
        // Open every session in the user's organisation, so pages know whose data to show.
        before: async (session) => {
          const { rows } = await pool.query<{ organizationId: string }>(
            'SELECT "organizationId" FROM "member" WHERE "userId" = $1 ORDER BY "createdAt" LIMIT 1',
            [session.userId],
          );
          return { data: { ...session, activeOrganizationId: rows[0]?.organizationId ?? null } };
        },
      },
    },
  },
  plugins: [
    organization({
      ac,
      roles,
      creatorRole: 'admin',
      // The app's rule: one organisation per user, created from the welcome page by someone without one.
      allowUserToCreateOrganization: async (user) => !(await findFirstMembership(db, { userId: user.id })),
      invitationExpiresIn: INVITATION_LIFETIME_MS / 1000,
      cancelPendingInvitationsOnReInvite: true,
      sendInvitationEmail: async ({ id, email, organization: org, inviter, role }) =>
        queueInvitationMail({ invitationId: id, email, organisationName: org.name, inviterName: inviter.user.name, role }),
    }),
    nextCookies(),
  ],
});

export type Session = typeof auth.$Infer.Session;

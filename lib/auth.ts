/**
 * The better-auth server instance: e-mail and password with verification and reset, the
 * organization plugin with Leeway's four roles, database-backed rate limits (so several app
 * servers share them), and `nextCookies()` last so server actions can set cookies.
 */
import { betterAuth } from 'better-auth';
import { nextCookies } from 'better-auth/next-js';
import { organization } from 'better-auth/plugins';
import { pool } from '@/db';
import { env } from './env';
import { linkMail, sendMail } from './mail';
import { ac, roles } from './permissions';

const DAY = 24 * 60 * 60;

export const auth = betterAuth({
  appName: 'Leeway',
  baseURL: env.APP_URL,
  secret: env.BETTER_AUTH_SECRET,
  database: pool,
  trustedOrigins: [env.APP_URL, 'http://127.0.0.1:3000', 'http://localhost:3000'],
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    minPasswordLength: 10,
    maxPasswordLength: 128,
    sendResetPassword: async ({ user, url }) => {
      await sendMail(
        linkMail(user.email, 'Reset your Leeway password', 'Someone asked to reset the password of your Leeway account.', 'Choose a new password', url),
      );
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    autoSignInAfterVerification: true,
    sendVerificationEmail: async ({ user, url }) => {
      await sendMail(
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
      invitationExpiresIn: 7 * DAY,
      cancelPendingInvitationsOnReInvite: true,
      sendInvitationEmail: async ({ id, email, organization: org, inviter, role }) => {
        const url = `${env.APP_URL}/accept-invitation/${id}`;
        await sendMail(
          linkMail(
            email,
            `Join ${org.name} on Leeway`,
            `${inviter.user.name} invited you to join ${org.name} on Leeway as ${role}.`,
            'Accept the invitation',
            url,
          ),
        );
      },
    }),
    nextCookies(),
  ],
});

export type Session = typeof auth.$Infer.Session;

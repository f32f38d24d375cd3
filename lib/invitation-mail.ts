/** The e-mail that carries an invitation's link; queued after the invitation is committed. */
import { env } from './env';
import { linkMail, queueMail } from './mail';

export async function queueInvitationMail(args: { invitationId: string; email: string; organisationName: string; inviterName: string; role: string }) {
  const url = `${env.APP_URL}/accept-invitation/${args.invitationId}`;
  await queueMail(
    linkMail(
      args.email,
      `Join ${args.organisationName} on Leeway`,
      `${args.inviterName} invited you to join ${args.organisationName} on Leeway as ${args.role}.`,
      'Accept the invitation',
      url,
    ),
  );
}

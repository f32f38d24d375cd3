/** The e-mail that carries an invitation's link; sent after the invitation is committed. */
import { env } from './env';
import { linkMail, sendMail } from './mail';

export async function sendInvitationMail(args: { invitationId: string; email: string; organisationName: string; inviterName: string; role: string }) {
  const url = `${env.APP_URL}/accept-invitation/${args.invitationId}`;
  await sendMail(
    linkMail(
      args.email,
      `Join ${args.organisationName} on Leeway`,
      `${args.inviterName} invited you to join ${args.organisationName} on Leeway as ${args.role}.`,
      'Accept the invitation',
      url,
    ),
  );
}

/**
 * The review workflow's e-mail: reviewers hear of a submission, the analyst of a decision (the
 * reason when returned, the board pack attached when approved), each with a link back into the
 * app. Sending never undoes a transition: a failed e-mail is logged and the action stands.
 */
import 'server-only';
import { db } from '@/db';
import { env } from '../env';
import { formatMoney } from '../format';
import { linkMail, sendMail, type Mail } from '../mail';

interface CaseRef {
  orgId: string;
  caseId: string;
  projectId: string;
  projectName: string;
  caseName: string;
  currency: string;
  expandedNpv: number;
}

const caseUrl = (c: CaseRef) => `${env.APP_URL}/projects/${c.projectId}/cases/${c.caseId}`;

async function deliver(mails: Mail[]) {
  for (const mail of mails) {
    try {
      await sendMail(mail);
    } catch (error) {
      console.error('[leeway] review e-mail not sent', mail.to, error);
    }
  }
}

export async function notifySubmitted(c: CaseRef, submitter: string) {
  const reviewers = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select('user.email')
    .where('member.organizationId', '=', c.orgId)
    .where('member.role', '=', 'reviewer')
    .execute();
  await deliver(
    reviewers.map((r) =>
      linkMail(
        r.email,
        `For review: ${c.projectName} — ${c.caseName}`,
        `${submitter} submitted “${c.caseName}” of ${c.projectName} for review. Expanded NPV in the submitted snapshot: ${formatMoney(c.expandedNpv, c.currency)}.`,
        'Open the case',
        caseUrl(c),
      ),
    ),
  );
}

export async function notifyDecided(
  c: CaseRef,
  args: { to: string | null; decision: 'approved' | 'returned'; by: string; reason?: string | null; pdf?: Buffer },
) {
  if (!args.to) return;
  const intro =
    args.decision === 'approved'
      ? `${args.by} approved “${c.caseName}” of ${c.projectName}. The board pack is attached and can be downloaded from the case.`
      : `${args.by} returned “${c.caseName}” of ${c.projectName}. Edit the case and submit it again when it is ready. Their reason:\n\n${args.reason ?? ''}`;
  const mail = linkMail(
    args.to,
    `${args.decision === 'approved' ? 'Approved' : 'Returned'}: ${c.projectName} — ${c.caseName}`,
    intro,
    'Open the case',
    caseUrl(c),
  );
  if (args.pdf) mail.attachments = [{ filename: `${c.projectName} - ${c.caseName} - board pack.pdf`, content: args.pdf, contentType: 'application/pdf' }];
  await deliver([mail]);
}

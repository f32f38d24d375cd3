/**
 * The review workflow's e-mail: reviewers hear of a submission and of its withdrawal, the analyst
 * of a decision (the reason when returned, the board pack attached when approved), each with a
 * link back into the app. The messages are queued in the transaction that records the transition, so they go out
 * exactly when it commits; the worker sends them and retries while the mail server is away.
 */
import 'server-only';
import type { Transaction } from 'kysely';
import { listReviewerEmails } from '@/db/queries/members';
import type { DB } from '@/db/types';
import { env } from '../env';
import { formatMoney } from '../format';
import { enqueue } from '../jobs/enqueue';
import { QUEUES } from '../jobs/queues';
import { linkMail, queueMail } from '../mail';

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

export async function notifySubmitted(trx: Transaction<DB>, c: CaseRef, submitter: string) {
  for (const email of await listReviewerEmails(trx, { orgId: c.orgId }))
    await queueMail(
      linkMail(
        email,
        `For review: ${c.projectName} — ${c.caseName}`,
        `${submitter} submitted “${c.caseName}” of ${c.projectName} for review. Expanded NPV in the submitted snapshot: ${formatMoney(c.expandedNpv, c.currency)}.`,
        'Open the case',
        caseUrl(c),
      ),
      trx,
    );
}

/** Tells the reviewers that a submission they were asked to review was withdrawn, so nobody reviews it in vain. */
export async function notifyWithdrawn(trx: Transaction<DB>, c: CaseRef, analyst: string) {
  for (const email of await listReviewerEmails(trx, { orgId: c.orgId }))
    await queueMail(
      linkMail(
        email,
        `Withdrawn: ${c.projectName} — ${c.caseName}`,
        `${analyst} withdrew “${c.caseName}” of ${c.projectName} from review; nothing waits for your decision until it is submitted again.`,
        'Open the case',
        caseUrl(c),
      ),
      trx,
    );
}

/** Queues the analyst's e-mail; an approval first renders the board packs, then sends it with the A4 pack attached. */
export async function notifyDecided(
  trx: Transaction<DB>,
  c: CaseRef,
  args: { to: string | null; decision: 'approved' | 'returned'; by: string; reason?: string | null; snapshotId: string },
) {
  const approved = args.decision === 'approved';
  const intro = approved
    ? `${args.by} approved “${c.caseName}” of ${c.projectName}. The board pack is attached and can be downloaded from the case.`
    : `${args.by} returned “${c.caseName}” of ${c.projectName}. Edit the case and submit it again when it is ready. Their reason:\n\n${args.reason ?? ''}`;
  const mail = args.to
    ? linkMail(args.to, `${approved ? 'Approved' : 'Returned'}: ${c.projectName} — ${c.caseName}`, intro, 'Open the case', caseUrl(c))
    : undefined;
  // Every page size is rendered from the snapshot alone, so the approval record never changes later.
  if (approved)
    await enqueue(
      QUEUES.boardPack,
      { orgId: c.orgId, snapshotId: args.snapshotId, mail: mail && { ...mail, filename: `${c.projectName} - ${c.caseName} - board pack.pdf` } },
      { executor: trx },
    );
  else if (mail) await queueMail(mail, trx);
}

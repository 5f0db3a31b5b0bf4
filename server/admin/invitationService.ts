// Invitations: the administrator names the person, their role and projects; the person chooses a
// password through a one-time link and the account is made with exactly what was granted.
import { createHash, randomBytes } from 'node:crypto';
import type { Database } from '../../db/client';
import { passwordProblem } from '../../shared/people/password';
import type { AcceptInvitationInput, InviteInput } from '../../shared/people/schemas';
import type { InvitationPreview, PendingInvitation } from '../../shared/people/types';
import type { Actor } from '../../shared/requests/types';
import { HttpError } from '../http/errors';
import type { Mailer } from '../mail/mailer';
import { invitationLink, invitationMail } from '../people/accountMail';
import { accountIdByEmail, createAccount } from '../people/accountRepository';
import {
  findInvitationByToken,
  findOpenInvitation,
  lockInvitationByToken,
  markAccepted,
  openInvitations,
  replaceOpenInvitation,
  withdrawInvitation,
  type InvitationRow,
} from './invitationRepository';
import { addMember, projectRefs } from './projectAdminRepository';

export const invitationLifetimeMs = 7 * 24 * 60 * 60 * 1000;

export type InvitationDeps = { db: Database; mailer: Mailer; publicUrl: string };

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

const alreadyHasAccount = () =>
  new HttpError(409, 'already_has_account', 'This address already has an account.', { email: 'This address already has an account; change its role or projects in the people list.' });

function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } } | null;
  return e?.code === '23505' || e?.cause?.code === '23505';
}

export async function invite(deps: InvitationDeps, actor: Actor, input: InviteInput, now = new Date()): Promise<PendingInvitation> {
  const { db } = deps;
  if (await accountIdByEmail(db, input.email)) throw alreadyHasAccount();
  const wanted = [...new Set(input.projectIds)];
  const projects = await projectRefs(db, wanted);
  if (projects.length !== wanted.length) {
    throw new HttpError(400, 'invalid_input', 'Some fields need attention.', { projectIds: 'One of the chosen projects no longer exists; reload and choose again.' });
  }
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + invitationLifetimeMs);
  const organization = input.organization || null;
  try {
    const row = await db.transaction(async (tx) => {
      const row = await replaceOpenInvitation(tx, { ...input, organization, projectIds: wanted, tokenHash: hashToken(token), invitedById: actor.id, expiresAt });
      // Sent before commit: an invitation whose mail did not go out is not kept.
      const mail = invitationMail({ ...input, to: input.email, organization, projects: projects.map((p) => `${p.code} ${p.name}`), invitedBy: actor.name, link: invitationLink(deps.publicUrl, token), expiresAt });
      try {
        await deps.mailer.send(mail);
      } catch {
        throw new HttpError(502, 'mail_not_sent', 'The invitation was not sent: the mail server did not take it. Try again in a moment.');
      }
      return row;
    });
    return pending(row, actor.name, projects, now);
  } catch (err) {
    if (isUniqueViolation(err)) throw new HttpError(409, 'invitation_in_progress', 'Someone is inviting this address at this moment; reload the list.');
    throw err;
  }
}

// A new link (and a new week) for an open invitation, e.g. one that expired unused.
export async function resendInvitation(deps: InvitationDeps, actor: Actor, id: string): Promise<PendingInvitation> {
  const row = await findOpenInvitation(deps.db, id);
  if (!row) throw new HttpError(404, 'invitation_not_found', 'No open invitation has that id.');
  const stillThere = (await projectRefs(deps.db, row.projectIds)).map((p) => p.id);
  return invite(deps, actor, { email: row.email, name: row.name, role: row.role, organization: row.organization ?? '', projectIds: stillThere });
}

export async function withdraw(db: Database, id: string): Promise<void> {
  if (!(await withdrawInvitation(db, id))) throw new HttpError(404, 'invitation_not_found', 'No open invitation has that id.');
}

export async function listOpenInvitations(db: Database, now = new Date()): Promise<PendingInvitation[]> {
  const rows = await openInvitations(db);
  const refs = await projectRefs(db, [...new Set(rows.flatMap((r) => r.invitation.projectIds))]);
  const byId = new Map(refs.map((p) => [p.id, p]));
  return rows.map(({ invitation, invitedBy }) =>
    pending(invitation, invitedBy, invitation.projectIds.flatMap((id) => byId.get(id) ?? []), now),
  );
}

function pending(row: InvitationRow, invitedBy: string, projects: PendingInvitation['projects'], now: Date): PendingInvitation {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    organization: row.organization,
    projects,
    invitedBy,
    expiresAt: row.expiresAt.toISOString(),
    expired: row.expiresAt <= now,
    createdAt: row.createdAt.toISOString(),
  };
}

function usable(row: InvitationRow | null, now: Date): InvitationRow {
  if (!row) throw new HttpError(404, 'invitation_not_found', 'This invitation link is not valid. Check that the whole link was opened, or ask your administrator for a new one.');
  if (row.acceptedAt) throw new HttpError(410, 'invitation_used', 'This invitation has already been used. Sign in with the password chosen then, or choose “Forgot your password?”.');
  if (row.expiresAt <= now) throw new HttpError(410, 'invitation_expired', 'This invitation has expired. Ask your administrator to send it again.');
  return row;
}

export async function previewInvitation(db: Database, token: string, now = new Date()): Promise<InvitationPreview> {
  const row = usable(await findInvitationByToken(db, hashToken(token)), now);
  const projects = await projectRefs(db, row.projectIds);
  return { email: row.email, name: row.name, role: row.role, organization: row.organization, projects: projects.map((p) => `${p.code} ${p.name}`) };
}

export async function acceptInvitation(db: Database, input: AcceptInvitationInput, now = new Date()): Promise<{ email: string }> {
  try {
    return await db.transaction(async (tx) => {
      const row = usable(await lockInvitationByToken(tx, hashToken(input.token)), now);
      const problem = passwordProblem(input.password, row.email);
      if (problem) throw new HttpError(400, 'invalid_input', 'Choose another password.', { password: problem });
      if (await accountIdByEmail(tx, row.email)) throw alreadyHasAccount();
      const userId = await createAccount(tx, { email: row.email, name: input.name, role: row.role, organization: row.organization, password: input.password });
      for (const project of await projectRefs(tx, row.projectIds)) await addMember(tx, project.id, userId);
      await markAccepted(tx, row.id, userId);
      return { email: row.email };
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw alreadyHasAccount();
    throw err;
  }
}

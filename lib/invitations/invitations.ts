import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { createAccount } from '@/lib/accounts/create-account';
import type { Actor } from '@/lib/auth/actor';
import { hashToken, newToken } from '@/lib/auth/tokens';
import { recordAudit } from '@/lib/audit';
import { getSequelize } from '@/lib/db';
import { AppError } from '@/lib/errors';
import { sendMail } from '@/lib/mail/mailer';
import { invitationMail } from '@/lib/mail/templates';
import { Invitation, Membership, User, Workspace, type Role } from '@/models';

/** Invitations stay valid for seven days (common practice for e-mailed invitations). */
export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

export type InvitationStatus = 'pending' | 'accepted' | 'revoked' | 'expired';

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  invitedBy: string;
  createdAt: string;
  expiresAt: string;
  status: InvitationStatus;
}

function statusOf(inv: Invitation, now: Date): InvitationStatus {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  return inv.expiresAt <= now ? 'expired' : 'pending';
}

type InvitationWithInviter = Invitation & { invitedBy?: User; workspace?: Workspace };

function view(inv: InvitationWithInviter, now: Date): InvitationView {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    invitedBy: inv.invitedBy?.name ?? '',
    createdAt: inv.createdAt.toISOString(),
    expiresAt: inv.expiresAt.toISOString(),
    status: statusOf(inv, now),
  };
}

export async function listInvitations({ workspaceId, now = new Date() }: { workspaceId: string; now?: Date }): Promise<InvitationView[]> {
  getSequelize();
  const rows = (await Invitation.findAll({
    where: { workspaceId },
    include: [{ model: User, as: 'invitedBy', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
    limit: 200,
  })) as InvitationWithInviter[];
  return rows.map((r) => view(r, now));
}

/** Creates an invitation and e-mails its link; an open invitation to the same address is replaced. */
export async function createInvitation({ actor, email, role, now = new Date() }: { actor: Actor; email: string; role: Role; now?: Date }): Promise<InvitationView> {
  return getSequelize().transaction(async (transaction) => {
    const existingUser = await User.findOne({ where: { email }, transaction });
    if (existingUser && (await Membership.findOne({ where: { userId: existingUser.id, workspaceId: actor.workspaceId }, transaction }))) {
      throw new AppError('conflict', 'member', `${email} is already a member of this workspace`, 'email');
    }
    await Invitation.update(
      { revokedAt: now },
      { where: { workspaceId: actor.workspaceId, email, acceptedAt: { [Op.is]: null }, revokedAt: { [Op.is]: null } }, transaction },
    );
    const { token, hash } = newToken();
    const expiresAt = new Date(now.getTime() + INVITATION_LIFETIME_MS);
    const invitation = await Invitation.create(
      { workspaceId: actor.workspaceId, email, role, tokenHash: hash, invitedById: actor.userId, expiresAt },
      { transaction },
    );
    const inviter = await User.findByPk(actor.userId, { transaction });
    await recordAudit(
      { action: 'member.invited', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'invitation', targetId: invitation.id, data: { email, role } },
      transaction,
    );
    // Inside the transaction: when the mail server refuses, no invitation is left that nobody received.
    await sendMail(invitationMail({ to: email, workspaceName: actor.workspaceName, role, inviterName: inviter?.name ?? 'A colleague', token, expiresAt }));
    return view(Object.assign(invitation, { invitedBy: inviter ?? undefined }), now);
  });
}

export async function revokeInvitation({ actor, invitationId, now = new Date() }: { actor: Actor; invitationId: string; now?: Date }): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const inv = await Invitation.findOne({ where: { id: invitationId, workspaceId: actor.workspaceId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!inv) throw new AppError('not_found', 'invitation', 'No such invitation in this workspace');
    if (statusOf(inv, now) !== 'pending') throw new AppError('conflict', 'invitation', `This invitation is already ${statusOf(inv, now)}`);
    await inv.update({ revokedAt: now }, { transaction });
    await recordAudit({ action: 'invitation.revoked', actorId: actor.userId, workspaceId: actor.workspaceId, targetType: 'invitation', targetId: inv.id }, transaction);
  });
}

function unusable(): AppError {
  return new AppError('invalid', 'token', 'This invitation link is unknown, used, withdrawn or expired; ask for a new one', 'token');
}

async function pendingByToken(token: string, now: Date, transaction?: Transaction): Promise<InvitationWithInviter> {
  const inv = (await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [
      { model: Workspace, as: 'workspace', attributes: ['id', 'name'] },
      { model: User, as: 'invitedBy', attributes: ['name'] },
    ],
    transaction,
    lock: transaction ? { level: transaction.LOCK.UPDATE, of: Invitation } : undefined,
  })) as InvitationWithInviter | null;
  if (!inv || statusOf(inv, now) !== 'pending') throw unusable();
  return inv;
}

export interface InvitationLookup {
  workspaceName: string;
  role: Role;
  email: string;
  invitedBy: string;
  accountExists: boolean;
}

/** What the accept page shows before the invitee decides. */
export async function lookupInvitation({ token, now = new Date() }: { token: string; now?: Date }): Promise<InvitationLookup> {
  getSequelize();
  const inv = await pendingByToken(token, now);
  const accountExists = (await User.count({ where: { email: inv.email } })) > 0;
  return { workspaceName: inv.workspace?.name ?? '', role: inv.role, email: inv.email, invitedBy: inv.invitedBy?.name ?? '', accountExists };
}

/**
 * Accepts an invitation: an existing account must be signed in as the invited
 * address; a new one is created from the name and password given.
 */
export async function acceptInvitation({
  token,
  sessionUserId,
  newAccount,
  now = new Date(),
}: {
  token: string;
  sessionUserId?: string;
  newAccount?: { name: string; password: string };
  now?: Date;
}): Promise<{ workspace: { id: string; name: string }; email: string; userId: string }> {
  return getSequelize().transaction(async (transaction) => {
    const inv = await pendingByToken(token, now, transaction);
    const existing = await User.findOne({ where: { email: inv.email }, transaction });
    let userId: string;
    if (existing) {
      if (!sessionUserId) throw new AppError('unauthorized', 'session', `Sign in as ${inv.email} to accept this invitation`);
      if (sessionUserId !== existing.id) throw new AppError('forbidden', 'invitation', `This invitation is for ${inv.email}; sign in with that account`);
      userId = existing.id;
    } else {
      if (!newAccount) throw new AppError('invalid', 'password', 'password: choose a password for your new account', 'password');
      userId = (await createAccount({ name: newAccount.name, email: inv.email, password: newAccount.password }, transaction)).id;
    }
    if (await Membership.findOne({ where: { userId, workspaceId: inv.workspaceId }, transaction })) {
      throw new AppError('conflict', 'member', 'You are already a member of this workspace');
    }
    await Membership.create({ userId, workspaceId: inv.workspaceId, role: inv.role }, { transaction });
    await inv.update({ acceptedAt: now, acceptedById: userId }, { transaction });
    await recordAudit(
      { action: 'invitation.accepted', actorId: userId, workspaceId: inv.workspaceId, targetType: 'invitation', targetId: inv.id, data: { role: inv.role } },
      transaction,
    );
    return { workspace: { id: inv.workspaceId, name: inv.workspace?.name ?? '' }, email: inv.email, userId };
  });
}

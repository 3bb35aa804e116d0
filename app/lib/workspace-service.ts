import 'server-only';
import { consumePoint, RateLimitedError } from './rate-limit';
import { recordAudit } from '@/db/audit-log';
import { countHolders, createWorkspace, findRole, findUserById, membersOf, slugFrom } from '@/db/accounts';
import { acceptInvitation, createInvitation, lookUpInvitation, revokeInvitation } from '@/db/invitations';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import { HOLDING_ROLE } from '@/lib/access-policy';
import type { Role } from '@/lib/roles';
import { errorText, randomSlugTail, type ServiceResult } from './account-service';
import type { Access } from './authz';
import { invitationMail } from './emails';
import { sendMail } from './mailer';
import { TOKEN_REFUSAL_MESSAGES } from '@/lib/one-time-token';
import type { DateFormat } from '@/lib/format/date-format';

const refuse = (status: number, message: string) => ({ ok: false, status, message }) as const;

export async function createShop(userId: number, name: string) {
  const workspace = await createWorkspace({ name, kind: 'shop', ownerId: userId, slug: slugFrom(name, randomSlugTail()) });
  await recordAudit({ action: 'workspace-created', actorUserId: userId, workspaceId: workspace.id, detail: { name } });
  return workspace;
}

export async function invite(
  access: Access,
  input: { email: string; role: Role },
  origin: string,
  dateFormat: DateFormat,
): Promise<ServiceResult<{ invitationId: number }>> {
  if (access.workspace.kind === 'personal') {
    return refuse(409, 'A personal workspace has only you in it: create a shop workspace to invite others');
  }
  const inviter = await findUserById(access.user.id);
  if (!inviter?.email_verified_at) {
    return refuse(403, 'Confirm your own e-mail address before inviting others: use the link we sent, or ask for a new one on your account page');
  }
  const members = await membersOf(access.workspace.id);
  if (members.some((m) => m.email === input.email.trim().toLowerCase())) {
    return refuse(409, `${input.email} is already a member of ${access.workspace.name}`);
  }
  try {
    await consumePoint([
      ['invitePerWorkspace', String(access.workspace.id)],
      ['invitePerTarget', input.email.trim().toLowerCase()],
    ]);
  } catch (err) {
    if (err instanceof RateLimitedError) return refuse(429, `${err.message} (invitations are limited per shop per day and per invited address)`);
    throw err;
  }
  const { id, token, expiresAt } = await createInvitation({ workspaceId: access.workspace.id, email: input.email, role: input.role, invitedBy: access.user.id });
  try {
    await sendMail(
      invitationMail(
        input.email,
        { inviter: access.user.name, workspace: access.workspace.name, role: input.role, link: `${origin}/invitations/accept?token=${token}`, expiresAt },
        dateFormat,
      ),
    );
  } catch (err) {
    await revokeInvitation(access.workspace.id, id);
    console.error(`[mail] invitation not sent: ${errorText(err)}`);
    return refuse(502, 'The invitation e-mail could not be sent (the mail server did not accept it). Try again later.');
  }
  await recordAudit({
    action: 'invitation-sent',
    actorUserId: access.user.id,
    workspaceId: access.workspace.id,
    detail: { email: input.email.trim().toLowerCase(), role: input.role },
  });
  return { ok: true, value: { invitationId: id } };
}

export async function acceptInvitationFor(
  userId: number,
  token: string,
): Promise<ServiceResult<{ workspaceSlug: string; role: Role }>> {
  const looked = await lookUpInvitation(token);
  if (!looked.ok) return refuse(400, TOKEN_REFUSAL_MESSAGES[looked.reason]);
  const { invitation } = looked;
  const user = await findUserById(userId);
  if (!user) return refuse(401, 'Sign in to continue');
  if (user.email !== invitation.email) {
    return refuse(403, `This invitation was sent to ${invitation.email}: sign in with that address to accept it`);
  }
  const existing = await findRole(userId, invitation.workspaceId);
  if (!(await acceptInvitation(invitation, userId))) return refuse(400, TOKEN_REFUSAL_MESSAGES.used);
  // Following the mailed link proves the address.
  await db()(TABLES.users).where({ id: userId }).whereNull('email_verified_at').update({ email_verified_at: new Date().toISOString() });
  await recordAudit({
    action: 'invitation-accepted',
    actorUserId: userId,
    workspaceId: invitation.workspaceId,
    detail: { role: existing ?? invitation.role },
  });
  return { ok: true, value: { workspaceSlug: invitation.workspaceSlug, role: existing ?? invitation.role } };
}

async function lastOwnerGuard(workspaceId: number, targetRole: Role | undefined, workspaceName: string, what: string) {
  if (targetRole === HOLDING_ROLE && (await countHolders(workspaceId)) <= 1) {
    return refuse(409, `${what}: this is the last owner of ${workspaceName}. Make another member owner first.`);
  }
  return null;
}

export async function changeRole(access: Access, targetUserId: number, role: Role): Promise<ServiceResult<{ role: Role }>> {
  const current = await findRole(targetUserId, access.workspace.id);
  if (!current) return refuse(404, 'No such member in this workspace');
  if (role !== HOLDING_ROLE) {
    const blocked = await lastOwnerGuard(access.workspace.id, current, access.workspace.name, 'Cannot change the role');
    if (blocked) return blocked;
  }
  await db()(TABLES.memberships).where({ user_id: targetUserId, workspace_id: access.workspace.id }).update({ role });
  await recordAudit({
    action: 'role-changed',
    actorUserId: access.user.id,
    workspaceId: access.workspace.id,
    detail: { userId: targetUserId, from: current, to: role },
  });
  return { ok: true, value: { role } };
}

export async function removeMember(access: Access, targetUserId: number, leaving = false): Promise<ServiceResult<null>> {
  const current = await findRole(targetUserId, access.workspace.id);
  if (!current) return refuse(404, 'No such member in this workspace');
  const blocked = await lastOwnerGuard(
    access.workspace.id,
    current,
    access.workspace.name,
    leaving ? 'You cannot leave' : 'Cannot remove this member',
  );
  if (blocked) return blocked;
  await db()(TABLES.memberships).where({ user_id: targetUserId, workspace_id: access.workspace.id }).del();
  await recordAudit({
    action: leaving ? 'member-left' : 'member-removed',
    actorUserId: access.user.id,
    workspaceId: access.workspace.id,
    detail: { userId: targetUserId, role: current },
  });
  return { ok: true, value: null };
}

export async function renameWorkspace(access: Access, name: string) {
  await db()(TABLES.workspaces).where({ id: access.workspace.id }).update({ name });
}

// Teams and roles. Every check happens here on the server: a non-member gets 404 (the team's
// existence is not revealed), a member without the role gets 403.
import { Op, type Transaction } from 'sequelize';
import { Invitation, Membership, Team, User } from '../models';
import type { AppContext } from '../context';
import { AppError, forbidden, notFound } from '../http/errors';
import { HOUR_MS, hashToken, newLinkToken } from './tokens';
import { invitationMail } from '../mail/templates';
import { recordAudit } from './audit';
import type {
  Invitation as InvitationView,
  InvitationPreview,
  InviteBody,
  Member,
  MemberChangeBody,
  Role,
  TeamDetail,
  TeamSummary,
} from '../../shared/schemas';

const INVITATION_TTL_MS = 7 * 24 * HOUR_MS;

export type TeamAccess = { team: Team; membership: Membership };

/** The team and the caller's membership; 404 unless the caller belongs to it. */
export async function teamAccess(teamId: number, user: User, allowed: readonly Role[] = ['owner', 'editor', 'viewer']): Promise<TeamAccess> {
  const membership = await Membership.findOne({ where: { teamId, userId: user.id }, include: [{ model: Team, as: 'team' }] });
  if (!membership?.team) throw notFound('Team');
  if (!allowed.includes(membership.role)) {
    throw forbidden(`Only ${allowed.join(' or ')} members of this team can do this; you are ${membership.role}.`);
  }
  return { team: membership.team, membership };
}

const summary = (team: Team, role: Role): TeamSummary => ({ id: team.id, name: team.name, role });

function memberView(m: Membership): Member {
  if (!m.user) throw new Error('membership loaded without its user');
  return { userId: m.userId, name: m.user.name, email: m.user.email, role: m.role, notifyRuns: m.notifyRuns };
}

function invitationView(i: Invitation): InvitationView {
  return { id: i.id, email: i.email, role: i.role, invitedBy: i.inviter?.name ?? '', expiresAt: i.expiresAt.toISOString() };
}

export async function listTeams(user: User): Promise<TeamSummary[]> {
  const memberships = await Membership.findAll({
    where: { userId: user.id },
    include: [{ model: Team, as: 'team' }],
    order: [[{ model: Team, as: 'team' }, 'name', 'ASC']],
  });
  return memberships.flatMap((m) => (m.team ? [summary(m.team, m.role)] : []));
}

export async function createTeam(ctx: AppContext, user: User, name: string): Promise<TeamSummary> {
  return ctx.sequelize.transaction(async (transaction) => {
    const team = await Team.create({ name }, { transaction });
    await Membership.create({ teamId: team.id, userId: user.id, role: 'owner', notifyRuns: true }, { transaction });
    return summary(team, 'owner');
  });
}

export async function teamDetail(access: TeamAccess): Promise<TeamDetail> {
  const { team, membership } = access;
  const members = await Membership.findAll({
    where: { teamId: team.id },
    include: [{ model: User, as: 'user' }],
    order: [['createdAt', 'ASC']],
  });
  const invitations =
    membership.role === 'owner'
      ? await Invitation.findAll({
          where: { teamId: team.id, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
          include: [{ model: User, as: 'inviter' }],
          order: [['createdAt', 'ASC']],
        })
      : [];
  return { team: summary(team, membership.role), members: members.map(memberView), invitations: invitations.map(invitationView) };
}

export async function renameTeam(access: TeamAccess, actor: User, name: string): Promise<TeamSummary> {
  const before = access.team.name;
  await access.team.update({ name });
  if (before !== name) await recordAudit(access.team.id, actor, { action: 'team.renamed', from: before, to: name });
  return summary(access.team, access.membership.role);
}

export async function invite(ctx: AppContext, access: TeamAccess, inviter: User, body: InviteBody): Promise<InvitationView> {
  const existing = await Membership.findOne({
    where: { teamId: access.team.id },
    include: [{ model: User, as: 'user', where: { email: body.email } }],
  });
  if (existing) throw new AppError(409, 'already_member', `${body.email} is already a member of this team.`);
  const { token, tokenHash } = newLinkToken();
  // The invitation, its audit entry and the mail carrying its link are saved together or not at all.
  const invitation = await ctx.sequelize.transaction(async (transaction) => {
    const created = await Invitation.create(
      { teamId: access.team.id, email: body.email, role: body.role, tokenHash, invitedBy: inviter.id, expiresAt: new Date(Date.now() + INVITATION_TTL_MS) },
      { transaction },
    );
    await recordAudit(access.team.id, inviter, { action: 'invitation.sent', email: body.email, role: body.role }, { transaction });
    await ctx.mailer.send(invitationMail(ctx.config.appUrl, body.email, access.team.name, inviter.name, body.role, token), { transaction });
    return created;
  });
  invitation.inviter = inviter;
  return invitationView(invitation);
}

export async function cancelInvitation(access: TeamAccess, actor: User, invitationId: number): Promise<void> {
  const invitation = await Invitation.findOne({ where: { id: invitationId, teamId: access.team.id, acceptedAt: null } });
  if (!invitation) throw notFound('Invitation');
  await invitation.destroy();
  await recordAudit(access.team.id, actor, { action: 'invitation.cancelled', email: invitation.email });
}

async function ownerCount(teamId: number, transaction: Transaction): Promise<number> {
  // Row locks keep two owners from demoting each other at the same moment.
  const owners = await Membership.findAll({ where: { teamId, role: 'owner' }, lock: transaction.LOCK.UPDATE, transaction });
  return owners.length;
}

const lastOwner = (): AppError =>
  new AppError(409, 'last_owner', 'A team needs at least one owner: make another member owner first.');

export async function changeMember(ctx: AppContext, access: TeamAccess, actor: User, userId: number, body: MemberChangeBody): Promise<Member> {
  const isSelf = userId === access.membership.userId;
  if (body.role !== undefined && access.membership.role !== 'owner') throw forbidden('Only owners can change roles.');
  if (body.role === undefined && !isSelf && access.membership.role !== 'owner') {
    throw forbidden('Only owners can change another member’s notifications.');
  }
  return ctx.sequelize.transaction(async (transaction) => {
    const member = await Membership.findOne({
      where: { teamId: access.team.id, userId },
      include: [{ model: User, as: 'user' }],
      transaction,
    });
    if (!member) throw notFound('Member');
    if (body.role && member.role === 'owner' && body.role !== 'owner' && (await ownerCount(access.team.id, transaction)) <= 1) {
      throw lastOwner();
    }
    const before = member.role;
    await member.update({ ...(body.role ? { role: body.role } : {}), ...(body.notifyRuns === undefined ? {} : { notifyRuns: body.notifyRuns }) }, { transaction });
    if (body.role && body.role !== before) {
      await recordAudit(access.team.id, actor, { action: 'member.role_changed', member: member.user?.name, from: before, to: body.role }, { transaction });
    }
    return memberView(member);
  });
}

export async function removeMember(ctx: AppContext, access: TeamAccess, actor: User, userId: number): Promise<void> {
  const isSelf = userId === access.membership.userId;
  if (!isSelf && access.membership.role !== 'owner') throw forbidden('Only owners can remove other members.');
  await ctx.sequelize.transaction(async (transaction) => {
    const member = await Membership.findOne({ where: { teamId: access.team.id, userId }, include: [{ model: User, as: 'user' }], transaction });
    if (!member) throw notFound('Member');
    if (member.role === 'owner' && (await ownerCount(access.team.id, transaction)) <= 1) throw lastOwner();
    await member.destroy({ transaction });
    if (isSelf) await recordAudit(access.team.id, actor, { action: 'member.left', role: member.role }, { transaction });
    else await recordAudit(access.team.id, actor, { action: 'member.removed', member: member.user?.name, role: member.role }, { transaction });
  });
}

async function openInvitation(token: string): Promise<Invitation> {
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [
      { model: Team, as: 'team' },
      { model: User, as: 'inviter' },
    ],
  });
  if (!invitation?.team) {
    throw new AppError(404, 'invitation_invalid', 'This invitation is invalid, used or expired: ask the team owner for a new one.');
  }
  return invitation;
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const invitation = await openInvitation(token);
  const account = await User.findOne({ where: { email: invitation.email } });
  return {
    teamName: invitation.team?.name ?? '',
    email: invitation.email,
    role: invitation.role,
    invitedBy: invitation.inviter?.name ?? '',
    accountExists: account !== null,
  };
}

export async function acceptInvitation(ctx: AppContext, user: User, token: string): Promise<TeamSummary> {
  const invitation = await openInvitation(token);
  if (invitation.email !== user.email) {
    throw forbidden(`This invitation was sent to ${invitation.email}; sign in with that address to accept it.`);
  }
  return ctx.sequelize.transaction(async (transaction) => {
    const [accepted] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: null }, transaction },
    );
    if (accepted !== 1) throw new AppError(409, 'invitation_used', 'This invitation has just been used.');
    const existing = await Membership.findOne({ where: { teamId: invitation.teamId, userId: user.id }, transaction });
    const role = existing?.role ?? invitation.role;
    if (!existing) await Membership.create({ teamId: invitation.teamId, userId: user.id, role }, { transaction });
    await recordAudit(invitation.teamId, user, { action: 'invitation.accepted', role, inviter: invitation.inviter?.name }, { transaction });
    if (!invitation.team) throw new Error('invitation loaded without its team');
    return summary(invitation.team, role);
  });
}

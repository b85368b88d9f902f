// The team audit log: membership, role and deletion events, readable by owners.
import type { Transaction } from 'sequelize';
import { AuditEvent, type User } from '../models';
import type { AuditEventView } from '../../shared/schemas';
import type { TeamAccess } from './teams';

export type AuditAction =
  | 'team.renamed'
  | 'invitation.sent'
  | 'invitation.cancelled'
  | 'invitation.accepted'
  | 'member.role_changed'
  | 'member.removed'
  | 'member.left'
  | 'study_area.deleted';

export async function recordAudit(teamId: number, actor: Pick<User, 'id' | 'name'>, action: AuditAction, summary: string, transaction?: Transaction): Promise<void> {
  await AuditEvent.create({ teamId, actorId: actor.id, actorName: actor.name, action, summary }, { transaction });
}

const AUDIT_PAGE = 200;

export async function auditLog(access: TeamAccess): Promise<AuditEventView[]> {
  const events = await AuditEvent.findAll({ where: { teamId: access.team.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: AUDIT_PAGE });
  return events.map((e) => ({ id: Number(e.id), at: e.createdAt.toISOString(), actor: e.actorName, action: e.action, summary: e.summary }));
}

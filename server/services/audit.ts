// The team audit log: membership, role and deletion events, readable by owners.
import type { Transaction } from 'sequelize';
import { AuditEvent, type User } from '../models';
import type { AuditEventView, Role } from '../../shared/schemas';
import type { TeamAccess } from './teams';

/** What happened, with what its line names; a name may be gone (a deleted account). */
export type AuditRecord =
  | { action: 'team.renamed'; from: string; to: string }
  | { action: 'invitation.sent'; email: string; role: Role }
  | { action: 'invitation.cancelled'; email: string }
  | { action: 'invitation.accepted'; role: Role; inviter: string | undefined }
  | { action: 'member.role_changed'; member: string | undefined; from: Role; to: Role }
  | { action: 'member.removed'; member: string | undefined; role: Role }
  | { action: 'member.left'; role: Role }
  | { action: 'study_area.deleted'; name: string };

/** The log line after the actor's name: one wording wherever an event is recorded. */
function summaryOf(record: AuditRecord): string {
  switch (record.action) {
    case 'team.renamed':
      return `renamed the team from "${record.from}" to "${record.to}"`;
    case 'invitation.sent':
      return `invited ${record.email} as ${record.role}`;
    case 'invitation.cancelled':
      return `cancelled the invitation of ${record.email}`;
    case 'invitation.accepted':
      return `joined as ${record.role} (invited by ${record.inviter ?? 'a former member'})`;
    case 'member.role_changed':
      return `changed ${record.member ?? 'a member'} from ${record.from} to ${record.to}`;
    case 'member.removed':
      return `removed ${record.member ?? 'a member'} (${record.role})`;
    case 'member.left':
      return `left the team (was ${record.role})`;
    case 'study_area.deleted':
      return `deleted the study area "${record.name}"`;
  }
}

/** `at` is for the demo seed's history; everything else happens now. */
export async function recordAudit(teamId: number, actor: Pick<User, 'id' | 'name'>, record: AuditRecord, options: { transaction?: Transaction; at?: Date } = {}): Promise<void> {
  await AuditEvent.create({ teamId, actorId: actor.id, actorName: actor.name, action: record.action, summary: summaryOf(record), ...(options.at ? { createdAt: options.at } : {}) }, { transaction: options.transaction });
}

const AUDIT_PAGE = 200;

export async function auditLog(access: TeamAccess): Promise<AuditEventView[]> {
  const events = await AuditEvent.findAll({ where: { teamId: access.team.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: AUDIT_PAGE });
  return events.map((e) => ({ id: Number(e.id), at: e.createdAt.toISOString(), actor: e.actorName, action: e.action, summary: e.summary }));
}

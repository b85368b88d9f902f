// The demo team's activity log: how its three people came together over the last two months, so
// an owner trying the app sees the log at work. Invented like the rest of the demo; written once
// (a team that has a log already keeps it).
import { AuditEvent, type Team, type User } from '../models';
import { recordAudit, type AuditRecord } from '../services/audit';

const DAY_MS = 24 * 3_600_000;

export async function seedDemoActivity(team: Team, [owner, editor, viewer]: User[]): Promise<void> {
  if (await AuditEvent.count({ where: { teamId: team.id } })) return;
  const history: [daysAgo: number, actor: User, record: AuditRecord][] = [
    [62, owner, { action: 'invitation.sent', email: editor.email, role: 'viewer' }],
    [61, editor, { action: 'invitation.accepted', role: 'viewer', inviter: owner.name }],
    [45, owner, { action: 'member.role_changed', member: editor.name, from: 'viewer', to: 'editor' }],
    [30, owner, { action: 'invitation.sent', email: viewer.email, role: 'viewer' }],
    [29, viewer, { action: 'invitation.accepted', role: 'viewer', inviter: owner.name }],
    [12, owner, { action: 'invitation.sent', email: 'field.crew@juniper-wash.example', role: 'viewer' }],
    [10, owner, { action: 'invitation.cancelled', email: 'field.crew@juniper-wash.example' }],
    [5, owner, { action: 'study_area.deleted', name: 'Cinder Flat trial grid' }],
  ];
  const now = Date.now();
  for (const [daysAgo, actor, record] of history) await recordAudit(team.id, actor, record, { at: new Date(now - daysAgo * DAY_MS) });
}

import type { ReactElement } from 'react';
import { View } from 'react-native';

import { LoadingState } from '@/components/LoadingState';
import { Section } from '@/components/Section';
import type { TeamSummary, User } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';

import { InviteForm } from './InviteForm';
import { LeaveTeam } from './LeaveTeam';
import { MemberRow } from './MemberRow';
import { NotifyRunsToggle } from './NotifyRunsToggle';
import { PendingInvitations } from './PendingInvitations';
import { AuditLog } from './AuditLog';
import { useTeam } from './queries';
import { RenameTeamForm } from './RenameTeamForm';

export type TeamDetailsProps = { team: TeamSummary; user: User };

/** Everything about one team: your settings, its members and, for owners, invitations. */
export function TeamDetails({ team, user }: TeamDetailsProps): ReactElement {
  const detail = useTeam(team.id);
  if (detail.isPending) return <LoadingState label="Loading members…" />;
  if (detail.error) return <QueryErrorState what="the team" error={detail.error} onRetry={() => void detail.refetch()} />;

  const { members, invitations } = detail.data;
  const isOwner = detail.data.team.role === 'owner';
  const self = members.find((member) => member.userId === user.id);
  return (
    <>
      {self ? (
        <Section title="Notifications">
          <NotifyRunsToggle teamId={team.id} self={self} />
        </Section>
      ) : null}
      <Section
        title={`Members (${members.length})`}
        description={isOwner ? 'As an owner you can change roles and remove members. A team always keeps at least one owner.' : undefined}
      >
        <View>
          {members.map((member) => (
            <MemberRow key={member.userId} teamId={team.id} member={member} selfId={user.id} canManage={isOwner} />
          ))}
        </View>
      </Section>
      {isOwner ? (
        <>
          <Section title="Invite someone" description="They get an e-mail with a link to join; the link expires.">
            <InviteForm teamId={team.id} />
          </Section>
          <Section title="Pending invitations">
            <PendingInvitations teamId={team.id} invitations={invitations} />
          </Section>
          <Section title="Team name">
            <RenameTeamForm key={detail.data.team.name} team={detail.data.team} />
          </Section>
          <Section title="Activity log" description="Invitations, role changes, removals and deletions, newest first.">
            <AuditLog teamId={team.id} />
          </Section>
        </>
      ) : null}
      <Section title="Leave this team">
        <LeaveTeam team={detail.data.team} selfId={user.id} />
      </Section>
    </>
  );
}

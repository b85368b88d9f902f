import type { ReactElement } from 'react';

import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import type { TeamSummary } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useRemoveMember } from './queries';

export type LeaveTeamProps = { team: TeamSummary; selfId: number };

/** Leave the team; the server refuses (409) when you are its last owner, and says so. */
export function LeaveTeam({ team, selfId }: LeaveTeamProps): ReactElement {
  const leave = useRemoveMember(team.id, selfId);
  return (
    <>
      <ConfirmButton
        label="Leave team"
        question={`Leave ${team.name}? You will lose access to its study areas.`}
        confirmLabel="Leave"
        busy={leave.isPending}
        onConfirm={() => leave.mutate(selfId)}
      />
      <FormError message={describeError(leave.error)} />
    </>
  );
}

import type { ReactElement } from 'react';

import { FormError } from '@/components/FormError';
import { Toggle } from '@/components/Toggle';
import type { Member } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useChangeMember } from './queries';

export type NotifyRunsToggleProps = { teamId: number; self: Member };

/** Your own choice, per team, to be e-mailed when a run finishes or fails. */
export function NotifyRunsToggle({ teamId, self }: NotifyRunsToggleProps): ReactElement {
  const change = useChangeMember(teamId);
  const value = change.isPending ? !self.notifyRuns : self.notifyRuns;
  return (
    <>
      <Toggle
        label="E-mail me when runs finish"
        hint="A message when a run of this team finishes or fails."
        value={value}
        disabled={change.isPending}
        onChange={(notifyRuns) => change.mutate({ userId: self.userId, change: { notifyRuns } })}
      />
      <FormError message={describeError(change.error)} />
    </>
  );
}

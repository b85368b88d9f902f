import type { ReactElement } from 'react';

import { SegmentedControl } from '@/components/SegmentedControl';

import type { CurrentTeam } from './useCurrentTeam';

export type TeamSwitcherProps = { current: CurrentTeam };

/** Choose among your teams; shown only when you belong to more than one. */
export function TeamSwitcher({ current }: TeamSwitcherProps): ReactElement | null {
  const { teams, team, selectTeam } = current;
  if (teams.length < 2 || !team) return null;
  return (
    <SegmentedControl
      label="Your teams"
      options={teams.map(({ id, name }) => ({ value: id, label: name }))}
      value={team.id}
      onChange={selectTeam}
    />
  );
}

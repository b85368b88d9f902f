import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import type { TeamSummary } from '@/shared/schemas';

/** The fictional team seeded for trying Patchcast out (brief §9). */
export const DEMO_TEAM_NAME = 'Juniper Wash Restoration Cooperative';

export type DemoNoticeProps = { team: TeamSummary | null };

/** Says plainly that the demo team's places and numbers are made up. */
export function DemoNotice({ team }: DemoNoticeProps): ReactElement | null {
  if (team?.name !== DEMO_TEAM_NAME) return null;
  return (
    <Banner tone="warning" title="Demo data is invented">
      This team, its people and its places are fictional, made up to show how Patchcast works.
    </Banner>
  );
}

import type { ReactElement } from 'react';

import { Badge, type BadgeTone } from '@/components/Badge';
import type { RunStatus } from '@/shared/schemas';

import { STATUS_LABEL } from './progressText';

const TONE: Record<RunStatus, BadgeTone> = { queued: 'neutral', running: 'info', merging: 'info', succeeded: 'primary', failed: 'danger', cancelled: 'neutral' };

export type RunStatusBadgeProps = { status: RunStatus };

export function RunStatusBadge({ status }: RunStatusBadgeProps): ReactElement {
  return <Badge label={STATUS_LABEL[status]} tone={TONE[status]} />;
}

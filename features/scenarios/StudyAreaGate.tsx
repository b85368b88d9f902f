import type { ReactElement } from 'react';

import { LoadingState } from '@/components/LoadingState';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import type { StudyAreaDetail } from '@/shared/schemas';

import type { StudyAreaContext } from './useStudyAreaContext';

export type StudyAreaGateProps = {
  context: StudyAreaContext;
  children: (studyArea: StudyAreaDetail) => ReactElement;
};

/** Shows loading and load errors of the study area, then its content. */
export function StudyAreaGate({ context, children }: StudyAreaGateProps): ReactElement {
  if (context.studyArea) return children(context.studyArea);
  if (context.error) return <QueryErrorState what="the study area" error={context.error} onRetry={context.refetch} />;
  return <LoadingState label="Loading the study area…" />;
}

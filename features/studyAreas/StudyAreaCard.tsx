import type { ReactElement } from 'react';

import { CardLink } from '@/components/CardLink';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import type { AreaUnit, StudyAreaSummary } from '@/shared/schemas';

import { FactList } from './FactList';
import { formatArea, formatCount, formatMetres } from './formatArea';

export type StudyAreaCardProps = { studyArea: StudyAreaSummary; unit: AreaUnit };

/** One study area in the list: its name and the size of its grid; opens the study area. */
export function StudyAreaCard({ studyArea, unit }: StudyAreaCardProps): ReactElement {
  return (
    <CardLink href={`/study-areas/${studyArea.id}`} label={`Open ${studyArea.name}`}>
      <Heading level={3}>{studyArea.name}</Heading>
      {studyArea.description ? (
        <Text variant="small" tone="muted" numberOfLines={2}>
          {studyArea.description}
        </Text>
      ) : null}
      <FactList
        facts={[
          { label: 'Patches', value: formatCount(studyArea.patchCount) },
          { label: 'Total area', value: formatArea(studyArea.totalAreaM2, unit) },
          { label: 'Cell size', value: formatMetres(studyArea.cellSizeM) },
          { label: 'Cover states', value: String(studyArea.stateCount) },
        ]}
      />
    </CardLink>
  );
}

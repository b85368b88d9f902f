import type { ReactElement } from 'react';

import { DownloadLink } from '@/components/DownloadLink';
import { Text } from '@/components/Text';
import type { AreaUnit, StudyAreaDetail } from '@/shared/schemas';
import { formatDateTime } from '@/features/ui/formatDate';

import { FactList } from './FactList';
import { formatArea, formatBytes, formatCount, formatDifference, formatMetres, formatPercent } from './formatArea';

/** A 64-digit hash in groups of 16, so that it wraps on a phone and can be compared by eye. */
const groupedDigest = (hex: string): string => hex.match(/.{1,16}/g)?.join(' ') ?? hex;

export type StudyAreaFactsProps = { studyArea: StudyAreaDetail; unit: AreaUnit };

/** The grid's figures beside the boundary's, and where the boundary came from. */
export function StudyAreaFacts({ studyArea, unit }: StudyAreaFactsProps): ReactElement {
  const { source } = studyArea;
  return (
    <FactList
      stacked
      facts={[
        { label: 'Patches', value: formatCount(studyArea.patchCount) },
        { label: 'Total patch area', value: formatArea(studyArea.totalAreaM2, unit) },
        { label: 'Boundary area', value: `${formatArea(studyArea.boundaryAreaM2, unit)} (ellipsoidal)` },
        { label: 'Patches vs boundary', value: formatDifference(studyArea.totalAreaM2, studyArea.boundaryAreaM2) },
        { label: 'Cell size', value: formatMetres(studyArea.cellSizeM) },
        ...(studyArea.minFraction > 0 ? [{ label: 'Edge patches dropped', value: `under ${formatPercent(studyArea.minFraction)} of a cell` }] : []),
        { label: 'Grid', value: `${formatCount(studyArea.grid.cols)} × ${formatCount(studyArea.grid.rows)} cells` },
        { label: 'Projection', value: studyArea.grid.projection },
        {
          label: 'Source file',
          value: <DownloadLink url={`/api/v1/study-areas/${studyArea.id}/source`}>{`${source.fileName} (${formatBytes(source.bytes)})`}</DownloadLink>,
        },
        { label: 'SHA-256', value: groupedDigest(source.sha256) },
        {
          label: 'Created',
          value: <Text variant="small">{`${formatDateTime(studyArea.createdAt)} by ${studyArea.createdBy}`}</Text>,
        },
      ]}
    />
  );
}

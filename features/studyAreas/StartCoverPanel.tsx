import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { LoadingState } from '@/components/LoadingState';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import type { AreaUnit, StartCoverSummary, StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { formatDateTime } from '@/features/ui/formatDate';

import { CoverMapForm } from './CoverMapForm';
import { formatCount } from './formatArea';
import { ProportionsForm } from './ProportionsForm';
import { StartCoverTable } from './StartCoverTable';
import { useStartCover } from './queries';

export type StartCoverPanelProps = { studyArea: StudyAreaDetail; editable: boolean; unit: AreaUnit };

type Source = 'proportions' | 'map';

const SOURCES = [
  { value: 'proportions', label: 'By proportions' },
  { value: 'map', label: 'From a cover map' },
] as const satisfies ReadonlyArray<{ value: Source; label: string }>;

const METHOD_LABEL: Record<StartCoverSummary['method'], string> = { random: 'random draw', exact: 'exact counts', 'cover-map': 'cover map' };

function describe(startCover: StartCoverSummary): string {
  const how = startCover.sourceName ? `${METHOD_LABEL[startCover.method]} ${startCover.sourceName}` : METHOD_LABEL[startCover.method];
  const seed = startCover.seed ? `, seed ${startCover.seed}` : '';
  return `Set by ${how}${seed}, ${formatDateTime(startCover.updatedAt)}.`;
}

/** The state of every patch at step 0: what it is now, and (editors) how to set it. */
export function StartCoverPanel({ studyArea, editable, unit }: StartCoverPanelProps): ReactElement {
  const startCover = useStartCover(studyArea.id);
  const [source, setSource] = useState<Source>('proportions');
  if (startCover.isPending) return <LoadingState label="Loading the start cover…" />;
  if (startCover.error) return <QueryErrorState what="the start cover" error={startCover.error} onRetry={() => void startCover.refetch()} />;
  const current = startCover.data;
  return (
    <>
      {current ? (
        <>
          <Text variant="small" tone="muted">
            {describe(current)}
          </Text>
          <StartCoverTable states={studyArea.states} startCover={current} unit={unit} />
          {current.unmatchedCount > 0 ? (
            <Banner tone="warning" title="Patches under no mapped polygon">
              {`${formatCount(current.unmatchedCount)} patches had no polygon (or an unmapped value) under their centroid and took the fallback state.`}
            </Banner>
          ) : null}
        </>
      ) : (
        <Text tone="muted">No start cover yet.{editable ? ' Set one below.' : ''}</Text>
      )}
      {editable ? (
        <>
          <SegmentedControl label="Set the start cover" options={SOURCES} value={source} onChange={setSource} />
          {source === 'proportions' ? (
            <ProportionsForm key={`${current?.updatedAt ?? 'none'}-${studyArea.states.length}`} studyArea={studyArea} startCover={current} />
          ) : (
            <CoverMapForm studyArea={studyArea} />
          )}
        </>
      ) : null}
    </>
  );
}

import { useMemo, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Text } from '@/components/Text';
import type { ProjectedBoundary } from '@/shared/geo/projected-boundary';
import type { AreaUnit } from '@/shared/schemas';

import { BoundaryDrawing, type DrawingOverlay } from './BoundaryDrawing';
import { MAX_DRAWN_LINES } from './drawing';
import { FactList } from './FactList';
import { formatArea, formatCount, formatMetres } from './formatArea';
import type { GridEstimate } from './gridEstimate';

export type GridPreviewProps = {
  boundary: ProjectedBoundary;
  /** Ellipsoidal area of the boundary, m². */
  areaM2: number;
  estimate: GridEstimate;
  minFraction: number;
  unit: AreaUnit;
  /** Switch to another cell size (offered when the chosen one gives too many patches). */
  onUseCellSize: (metres: number) => void;
};

/** The outline with the grid that the chosen cell size would lay over it, and its size. */
export function GridPreview({ boundary, areaM2, estimate, minFraction, unit, onUseCellSize }: GridPreviewProps): ReactElement {
  const overlay = useMemo<DrawingOverlay>(
    () => (estimate.kind === 'ok' && estimate.drawable ? { kind: 'lines', spec: estimate.spec } : { kind: 'none' }),
    [estimate],
  );
  const fits = estimate.kind === 'too-many' ? estimate.fits : null;
  const patches = estimate.kind === 'ok' ? `about ${formatCount(estimate.patches)}` : '—';
  return (
    <>
      <BoundaryDrawing boundary={boundary} overlay={overlay} label={`Outline of the boundary${overlay.kind === 'lines' ? ' with the patch grid' : ''}`} />
      <FactList
        facts={[
          { label: 'Patches (estimate)', value: patches },
          { label: minFraction > 0 ? 'Boundary area (patches: a little less)' : 'Total area', value: formatArea(areaM2, unit) },
          ...(estimate.kind === 'ok' ? [{ label: 'Grid', value: `${formatCount(estimate.spec.cols)} × ${formatCount(estimate.spec.rows)} cells` }] : []),
        ]}
      />
      {estimate.kind === 'ok' && !estimate.drawable ? (
        <Text variant="small" tone="muted">
          {`Grid lines are not drawn past ${MAX_DRAWN_LINES} cells a side; they would blur into a tint at this size.`}
        </Text>
      ) : null}
      {estimate.kind === 'too-many' ? (
        <Banner tone="danger" title="Too many patches" live>
          <Text variant="small">{estimate.message}</Text>
          {fits === null ? null : <Button label={`Use ${formatMetres(fits)}`} variant="secondary" size="sm" onPress={() => onUseCellSize(fits)} />}
        </Banner>
      ) : null}
    </>
  );
}

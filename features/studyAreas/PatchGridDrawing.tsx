import { useMemo, type ReactElement } from 'react';

import { LoadingState } from '@/components/LoadingState';
import { Text } from '@/components/Text';
import { localProjection } from '@/shared/geo/laea';
import { projectBoundary } from '@/shared/geo/projected-boundary';
import type { StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';

import { BoundaryDrawing, type DrawingOverlay } from './BoundaryDrawing';
import { decodeCells, gridIsDrawable } from './drawing';
import { usePatchGrid } from './queries';

export type PatchGridDrawingProps = { studyArea: StudyAreaDetail };

/** The stored boundary with every patch, drawn in the grid's own projection. */
export function PatchGridDrawing({ studyArea }: PatchGridDrawingProps): ReactElement {
  const patches = usePatchGrid(studyArea.id);
  const projected = useMemo(() => projectBoundary(studyArea.boundary, localProjection(studyArea.grid.projection)), [studyArea.boundary, studyArea.grid.projection]);
  const overlay = useMemo<DrawingOverlay>(
    () => (patches.data ? { kind: 'cells', spec: patches.data.grid, cells: decodeCells(patches.data.cells) } : { kind: 'none' }),
    [patches.data],
  );
  if (patches.error) return <QueryErrorState what="the patches" error={patches.error} onRetry={() => void patches.refetch()} />;
  return (
    <>
      <BoundaryDrawing boundary={projected} overlay={overlay} label={`Outline of ${studyArea.name} with its ${studyArea.patchCount} patches`} />
      {patches.isPending ? <LoadingState label="Loading the patches…" /> : null}
      {patches.data && !gridIsDrawable(patches.data.grid) ? (
        <Text variant="small" tone="muted">
          The grid is too fine to draw cell by cell at this size: patches are shown as a tint.
        </Text>
      ) : null}
    </>
  );
}

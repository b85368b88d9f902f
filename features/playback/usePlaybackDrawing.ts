import { useMemo } from 'react';

import { localProjection } from '@/shared/geo/laea';
import { projectBoundary } from '@/shared/geo/projected-boundary';
import type { PatchGridResponse, StudyAreaDetail } from '@/shared/schemas';
import { decodeCells, fitFrame } from '@/features/studyAreas/drawing';

import type { MapDrawing } from './mapDrawing';
import { decodeFloat32 } from './patchGeometry';

/** The study area's outline, patch cells and areas in the drawing frame, decoded once. */
export function usePlaybackDrawing(studyArea: StudyAreaDetail | undefined, grid: PatchGridResponse | undefined): MapDrawing | null {
  return useMemo(() => {
    if (!studyArea || !grid) return null;
    const projected = projectBoundary(studyArea.boundary, localProjection(grid.grid.projection));
    return { frame: fitFrame(projected.bbox), spec: grid.grid, cells: decodeCells(grid.cells), areas: decodeFloat32(grid.areas), parts: projected.parts };
  }, [studyArea, grid]);
}

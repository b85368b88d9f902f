import type { GridSpec } from '@/shared/geo/grid';
import type { Frame } from '@/features/studyAreas/drawing';

/** Everything the map needs that does not change from step to step. */
export type MapDrawing = {
  frame: Frame;
  spec: GridSpec;
  /** Cell index (row * cols + col) of each patch, ascending. */
  cells: Int32Array;
  /** Clipped area of each patch, m². */
  areas: Float32Array;
  /** The boundary's rings in the grid's metres. */
  parts: ReadonlyArray<ReadonlyArray<ReadonlyArray<readonly number[]>>>;
};

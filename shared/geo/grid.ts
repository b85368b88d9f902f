// The patch grid: square cells in the boundary's local equal-area frame, each patch a cell
// clipped to the boundary with its exact clipped area. Stored compactly: a spec and two arrays.
import { coverCells } from './cell-cover';
import { BoundaryInputError } from './errors';
import { projectBoundary, type ProjectedBoundary } from './projected-boundary';
import type { Boundary } from './types';

export const GRID_LIMITS = { minCellSizeM: 10, maxCellSizeM: 10_000, maxPatches: 250_000 } as const;

/** Cell (row, col) spans x in originX + [col, col+1]·cellSize, y in originY + [row, row+1]·cellSize; row 0 is the southern edge. */
export type GridSpec = {
  projection: string;
  originX: number;
  originY: number;
  cellSize: number;
  rows: number;
  cols: number;
};

export type PatchGrid = {
  spec: GridSpec;
  /** Cell index row * cols + col of each patch, ascending. */
  cells: Int32Array;
  /** Clipped area of each patch in m². */
  areas: Float32Array;
  /** Sum of `areas`, m². */
  totalAreaM2: number;
};

export type GridOptions = {
  cellSize: number;
  /** Drop cells whose clipped area is below this fraction of a full cell (0 ≤ f < 1; default 0). */
  minFraction?: number;
  maxPatches?: number;
};

type Shape = Pick<Boundary, 'parts'> | ProjectedBoundary;

function projected(shape: Shape): ProjectedBoundary {
  return 'projection' in shape ? shape : projectBoundary(shape);
}

export function gridSpecFor(shape: ProjectedBoundary, cellSize: number): GridSpec {
  const [minX, minY, maxX, maxY] = shape.bbox;
  const originX = Math.floor(minX / cellSize) * cellSize;
  const originY = Math.floor(minY / cellSize) * cellSize;
  return {
    projection: shape.projection.definition,
    originX,
    originY,
    cellSize,
    rows: Math.max(1, Math.ceil((maxY - originY) / cellSize)),
    cols: Math.max(1, Math.ceil((maxX - originX) / cellSize)),
  };
}

/**
 * Expected patch count without building the grid: interior cells A/s² plus half the cells the
 * outline crosses, (4/π)·L/s of them for a curve of length L at random orientation (Cauchy–Crofton).
 */
export function estimatePatchCount(shape: Shape, cellSize: number): number {
  const { areaM2, perimeterM } = projected(shape);
  return Math.round(areaM2 / cellSize ** 2 + ((2 / Math.PI) * perimeterM) / cellSize);
}

function checkOptions(cellSize: number, minFraction: number): void {
  const { minCellSizeM, maxCellSizeM } = GRID_LIMITS;
  if (!Number.isFinite(cellSize) || cellSize < minCellSizeM || cellSize > maxCellSizeM) {
    throw new BoundaryInputError(
      'cell-size-out-of-range',
      `the cell size must be between ${minCellSizeM} m and ${maxCellSizeM.toLocaleString('en-US')} m, got ${cellSize}`,
    );
  }
  if (!Number.isFinite(minFraction) || minFraction < 0 || minFraction >= 1) {
    throw new BoundaryInputError('min-fraction-out-of-range', `the minimum fraction must be at least 0 and below 1, got ${minFraction}`);
  }
}

function cover(shape: ProjectedBoundary, spec: GridSpec, minFraction: number, maxPatches: number): ReturnType<typeof coverCells> {
  if (spec.rows * spec.cols > 2 ** 31 - 1) return null;
  const { originX, originY, cellSize } = spec;
  const rings = shape.parts.flatMap((polygon) =>
    polygon.map((ring) => Float64Array.from(ring.flatMap(([x, y]) => [(x - originX) / cellSize, (y - originY) / cellSize]))),
  );
  return coverCells(rings, { rows: spec.rows, cols: spec.cols, minFraction, maxPatches });
}

/** Smallest whole-metre cell size whose grid has at most `maxPatches` patches, or null if none ≤ 10 km. */
export function smallestFittingCellSize(shape: Shape, maxPatches: number, minFraction = 0): number | null {
  const p = projected(shape);
  // Solve A t² + (2/π) L t = maxPatches for t = 1/s (the estimate above), then check for real.
  const b = (2 / Math.PI) * p.perimeterM;
  const t = (-b + Math.sqrt(b * b + 4 * p.areaM2 * maxPatches)) / (2 * p.areaM2);
  let size = Math.max(GRID_LIMITS.minCellSizeM, Math.ceil(1 / t));
  for (let tries = 0; tries < 50 && size <= GRID_LIMITS.maxCellSizeM; tries++) {
    if (cover(p, gridSpecFor(p, size), minFraction, maxPatches) !== null) return size;
    size = Math.ceil(size * 1.01);
  }
  return null;
}

function tooMany(p: ProjectedBoundary, cellSize: number, minFraction: number, maxPatches: number): BoundaryInputError {
  const fits = smallestFittingCellSize(p, maxPatches, minFraction);
  const advice = fits === null ? 'no cell size up to 10 km fits' : `the smallest cell size that fits is ${fits} m`;
  return new BoundaryInputError(
    'too-many-patches',
    `a ${cellSize} m grid would give about ${estimatePatchCount(p, cellSize).toLocaleString('en-US')} patches, more than the ` +
      `${maxPatches.toLocaleString('en-US')} allowed; ${advice}`,
  );
}

/** Builds the patch grid of a boundary (lon/lat, or already projected). */
export function buildPatchGrid(shape: Shape, options: GridOptions): PatchGrid {
  const { cellSize, minFraction = 0, maxPatches = GRID_LIMITS.maxPatches } = options;
  checkOptions(cellSize, minFraction);
  const p = projected(shape);
  // Refuse clearly hopeless requests before allocating anything.
  if (estimatePatchCount(p, cellSize) > 1.5 * maxPatches) throw tooMany(p, cellSize, minFraction, maxPatches);
  const spec = gridSpecFor(p, cellSize);
  const covered = cover(p, spec, minFraction, maxPatches);
  if (covered === null) throw tooMany(p, cellSize, minFraction, maxPatches);
  // A grid without patches would make a study area with nothing to simulate.
  if (covered.cells.length === 0) {
    const kept = minFraction > 0 ? `keeps ${Number((minFraction * 100).toPrecision(6))} % of its area inside the boundary` : 'overlaps the boundary';
    throw new BoundaryInputError('no-patches', `no ${cellSize} m cell ${kept}, so the grid has no patches; use a smaller cell size${minFraction > 0 ? ' or a lower minimum fraction' : ''}`);
  }
  const areas = new Float32Array(covered.fractions.length);
  let totalAreaM2 = 0;
  for (let i = 0; i < areas.length; i++) {
    areas[i] = covered.fractions[i] * cellSize * cellSize;
    totalAreaM2 += areas[i];
  }
  return { spec, cells: covered.cells, areas, totalAreaM2 };
}

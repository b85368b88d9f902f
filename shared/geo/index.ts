// Boundary import and the equal-area patch grid: the public surface of shared/geo.
export { BoundaryInputError, type BoundaryErrorCode } from './errors';
export { detectFormat, readBoundary, readPolygonFeatures, type PolygonFeature, type ReadBoundaryOptions } from './read-boundary';
export { geodesicArea } from './geodesic-area';
export { boundaryCentre, laeaDefinition, localProjection, projectionFor, type LocalProjection } from './laea';
export { projectBoundary, type ProjectedBoundary } from './projected-boundary';
export {
  buildPatchGrid,
  estimatePatchCount,
  gridSpecFor,
  GRID_LIMITS,
  smallestFittingCellSize,
  type GridOptions,
  type GridSpec,
  type PatchGrid,
} from './grid';
export { cellCentre, cellCentreLonLat, cellPolygon, patchCentroid, patchPolygon, rowCol } from './patch-geometry';
export { MAX_VERTICES } from './validate';
export type { Boundary, BoundaryFormat, LonLat, PickOption, PolygonRings, Ring } from './types';
export { patchAttributes, patchFeatureCollection, type PatchProperties } from './patch-features';

// Types for the part of geojson-validation (no bundled types) that Patchcast uses.
declare module 'geojson-validation' {
  /** With `trace` true: the list of problems, empty when the coordinates are valid. */
  export function isPolygonCoor(coordinates: unknown, trace: true): string[];
  /** Whether a whole GeoJSON object is valid. */
  export function valid(geoJson: unknown): boolean;
}

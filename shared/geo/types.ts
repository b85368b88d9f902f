// Shapes shared by the boundary readers, the validator and the grid.

/** [longitude, latitude] in degrees, WGS84 (RFC 7946 §3.1.1 order). */
export type LonLat = [number, number];

/** A closed ring: the first and last positions are equal (RFC 7946 §3.1.6). */
export type Ring = LonLat[];

/** One polygon: the exterior ring first, then its holes. */
export type PolygonRings = Ring[];

export type BoundaryFormat = 'geojson' | 'shapefile' | 'kml';

/** A validated boundary in lon/lat: exterior rings counter-clockwise, holes clockwise (RFC 7946 §3.1.6). */
export type Boundary = {
  parts: PolygonRings[];
  format: BoundaryFormat;
  /** What the source coordinates were in, e.g. "EPSG:32611" or "EPSG:4326". */
  sourceCrs: string;
  vertexCount: number;
  /** Harmless repairs made while reading (winding, duplicate positions, merges). */
  notes: string[];
  /** Things the user should know were left out (non-polygon features). */
  warnings: string[];
};

/** A polygon geometry found in a file, before validation; `label` says where it came from. */
export type PolygonCandidate = {
  label: string;
  properties: Record<string, unknown>;
  /** Polygons in source coordinates; positions may carry more than two numbers. */
  polygons: number[][][][];
};

/** What a format reader hands to the validator. */
export type SourceFeatures = {
  format: BoundaryFormat;
  sourceCrs: string;
  /** proj4 definition to reproject the candidates from, or null when they are lon/lat already. */
  reprojectFrom: string | null;
  candidates: PolygonCandidate[];
  /** Non-polygon features, described for the warnings list. */
  ignored: string[];
  /** What the reader did, e.g. "reprojected from EPSG:32611 to EPSG:4326". */
  notes: string[];
};

/** How to choose among several polygon features: merge all (default) or pick by a property. */
export type PickOption = { property: string; value: string | number };

/** A candidate after structural checks and reprojection: 2-D lon/lat polygons. */
export type LonLatCandidate = { label: string; properties: Record<string, unknown>; parts: PolygonRings[] };

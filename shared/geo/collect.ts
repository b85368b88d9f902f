// Walks a parsed GeoJSON object (Feature, FeatureCollection, geometry, GeometryCollection) and
// sorts what it finds into polygon candidates and ignored non-polygon features.
import { BoundaryInputError } from './errors';
import type { PolygonCandidate } from './types';

export type Collected = { candidates: PolygonCandidate[]; ignored: string[] };

type GeoJsonLike = {
  type?: unknown;
  features?: unknown;
  geometry?: unknown;
  geometries?: unknown;
  coordinates?: unknown;
  properties?: unknown;
  id?: unknown;
};

const NON_POLYGON_TYPES = ['Point', 'MultiPoint', 'LineString', 'MultiLineString'];

function featureLabel(index: number, properties: Record<string, unknown>, id: unknown): string {
  const name = properties.name ?? properties.Name ?? properties.NAME ?? id;
  const shown = typeof name === 'string' || typeof name === 'number' ? ` "${name}"` : '';
  return `feature ${index + 1}${shown}`;
}

function asObject(value: unknown, where: string): GeoJsonLike {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new BoundaryInputError('invalid-geojson', `${where} is not a GeoJSON object (RFC 7946 §3)`);
  }
  return value as GeoJsonLike;
}

function collectGeometry(
  geometry: GeoJsonLike,
  label: string,
  properties: Record<string, unknown>,
  out: Collected,
): void {
  const type = geometry.type;
  if (type === 'Polygon' || type === 'MultiPolygon') {
    if (!Array.isArray(geometry.coordinates)) {
      throw new BoundaryInputError('invalid-geojson', `${label}: a ${type} needs a "coordinates" array (RFC 7946 §3.1)`);
    }
    const polygons = (type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates) as number[][][][];
    out.candidates.push({ label, properties, polygons });
  } else if (type === 'GeometryCollection') {
    if (!Array.isArray(geometry.geometries)) {
      throw new BoundaryInputError('invalid-geojson', `${label}: a GeometryCollection needs a "geometries" array`);
    }
    geometry.geometries.forEach((member, i) =>
      collectGeometry(asObject(member, `${label}, geometry ${i + 1}`), `${label}, geometry ${i + 1}`, properties, out),
    );
  } else if (typeof type === 'string' && NON_POLYGON_TYPES.includes(type)) {
    out.ignored.push(`${label} (${type})`);
  } else {
    throw new BoundaryInputError(
      'invalid-geojson',
      `${label} has type ${JSON.stringify(type)}; expected Polygon, MultiPolygon, Feature or FeatureCollection (RFC 7946 §1.4)`,
    );
  }
}

function collectFeature(feature: GeoJsonLike, index: number, out: Collected): void {
  const properties =
    typeof feature.properties === 'object' && feature.properties !== null
      ? (feature.properties as Record<string, unknown>)
      : {};
  const label = featureLabel(index, properties, feature.id);
  if (feature.geometry === null || feature.geometry === undefined) {
    out.ignored.push(`${label} (no geometry)`);
    return;
  }
  collectGeometry(asObject(feature.geometry, `${label}'s geometry`), label, properties, out);
}

/** Polygon candidates and ignored features of any GeoJSON object. */
export function collectPolygons(root: unknown): Collected {
  const object = asObject(root, 'the file');
  const out: Collected = { candidates: [], ignored: [] };
  if (object.type === 'FeatureCollection') {
    if (!Array.isArray(object.features)) {
      throw new BoundaryInputError('invalid-geojson', 'the FeatureCollection has no "features" array (RFC 7946 §3.3)');
    }
    object.features.forEach((feature, i) => collectFeature(asObject(feature, `feature ${i + 1}`), i, out));
  } else if (object.type === 'Feature') {
    collectFeature(object, 0, out);
  } else {
    collectGeometry(object, 'the geometry', {}, out);
  }
  return out;
}

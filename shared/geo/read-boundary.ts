// The boundary import pipeline: detect the format, read, validate, reproject, choose, orient.
import { BoundaryInputError } from './errors';
import { readGeoJson } from './read-geojson';
import { readKml } from './read-kml';
import { readShapefileZip } from './read-shapefile';
import { selectBoundary } from './select';
import { findSelfIntersections } from './self-intersections';
import {
  checkLonLatRange,
  checkRingAreas,
  checkStructure,
  checkVertexCount,
  countPositions,
  dropRepeatedPositions,
  ringName,
  ringWhere,
  toLonLatCandidate,
} from './validate';
import { orientRings } from './winding';
import type { Boundary, BoundaryFormat, LonLatCandidate, PickOption, SourceFeatures } from './types';

export type ReadBoundaryOptions = { fileName?: string; pick?: PickOption };

const ZIP_MAGIC = [0x50, 0x4b, 0x03, 0x04];

/** The format of a file, by its first bytes (zip signature, '<' for XML, '{' for JSON), else its extension. */
export function detectFormat(bytes: Uint8Array, fileName?: string): BoundaryFormat {
  if (ZIP_MAGIC.every((b, i) => bytes[i] === b)) return 'shapefile';
  const head = new TextDecoder().decode(bytes.subarray(0, 512)).replace(/^\uFEFF/, '').trimStart();
  if (head.startsWith('{')) return 'geojson';
  if (head.startsWith('<')) return 'kml';
  const extension = fileName?.toLowerCase().split('.').pop();
  if (extension === 'geojson' || extension === 'json') return 'geojson';
  if (extension === 'kml') return 'kml';
  throw new BoundaryInputError(
    'unknown-format',
    `${fileName ? `"${fileName}"` : 'the file'} is neither GeoJSON, KML nor a zipped shapefile; ` +
      'export the boundary as one of those (a .kmz must be unzipped to its .kml first)',
  );
}

async function readSource(bytes: Uint8Array, format: BoundaryFormat): Promise<SourceFeatures> {
  if (format === 'shapefile') return readShapefileZip(bytes);
  const text = new TextDecoder().decode(bytes);
  return format === 'geojson' ? readGeoJson(text) : readKml(text);
}

const PROJECTED_HINTS: Record<BoundaryFormat, string> = {
  geojson:
    'Add a "crs" member naming its EPSG code (e.g. {"type":"name","properties":{"name":"EPSG:32611"}}) or reproject the file to EPSG:4326',
  shapefile: "The zip's .prj is missing or not understood: include the .prj written by your GIS, or reproject to EPSG:4326",
  kml: 'KML coordinates must be longitude,latitude in degrees (OGC KML 2.2); reproject the source to EPSG:4326',
};

function checkCrossings(candidate: LonLatCandidate): void {
  const crossings = findSelfIntersections(candidate.parts, 6);
  if (crossings.length === 0) return;
  const [first, second] = [crossings[0].first, crossings[0].second];
  const whereFirst = ringWhere(candidate.label, first.polygon, first.ring, candidate.parts.length);
  const sameRing = first.polygon === second.polygon && first.ring === second.ring;
  const other = sameRing ? 'itself' : ringName(second.polygon, second.ring, candidate.parts.length);
  const edges = `edges ${first.segment + 1} and ${second.segment + 1}`;
  const places = crossings.map((c) => `[${c.at.map((v) => Number(v.toFixed(7))).join(', ')}]`);
  const more = crossings.length > 5 ? ' and more' : '';
  throw new BoundaryInputError(
    'self-intersection',
    `${whereFirst} crosses or touches ${other} (${edges}) at ${places.slice(0, 5).join(', ')}${more}; ` +
      'a boundary must not intersect itself: repair it in a GIS (a "fix geometries" or "make valid" tool) and upload it again',
  );
}

/** A polygon feature of a cover map, in lon/lat, with its attributes. */
export type PolygonFeature = { label: string; properties: Record<string, unknown>; parts: LonLatCandidate['parts'] };

/**
 * Reads every polygon feature of a file (a cover map) with its properties, checked and in lon/lat
 * like a boundary, but neither merged nor tested for self-intersection (a map is not an outline).
 */
export async function readPolygonFeatures(input: Uint8Array, fileName?: string): Promise<{ features: PolygonFeature[]; warnings: string[] }> {
  if (input.length === 0) throw new BoundaryInputError('empty', 'the file is empty');
  const source = await readSource(input, detectFormat(input, fileName));
  if (source.candidates.length === 0) throw new BoundaryInputError('no-polygon', 'the file has no Polygon or MultiPolygon features');
  checkVertexCount(countPositions(source.candidates));
  source.candidates.forEach(checkStructure);
  const features = source.candidates.map((c) => toLonLatCandidate(c, source.reprojectFrom));
  checkLonLatRange(features, PROJECTED_HINTS[source.format]);
  const warnings = source.ignored.length > 0 ? [`ignored ${source.ignored.length} non-polygon feature(s): ${source.ignored.join(', ')}`] : [];
  return { features, warnings: [...source.notes, ...warnings] };
}

/** Reads a boundary file (bytes, or text for GeoJSON/KML) into a validated lon/lat boundary. */
export async function readBoundary(input: Uint8Array | string, options: ReadBoundaryOptions = {}): Promise<Boundary> {
  const bytes = typeof input === 'string' ? new TextEncoder().encode(input) : input;
  if (bytes.length === 0) throw new BoundaryInputError('empty', 'the file is empty');
  const source = await readSource(bytes, detectFormat(bytes, options.fileName));
  const warnings = source.ignored.length > 0 ? [`ignored ${source.ignored.length} non-polygon feature(s): ${source.ignored.join(', ')}`] : [];
  if (source.candidates.length === 0) {
    throw new BoundaryInputError(
      source.ignored.length > 0 ? 'no-polygon' : 'empty',
      source.ignored.length > 0
        ? `the file has no Polygon or MultiPolygon, only ${source.ignored.join(', ')}; a boundary must be an area`
        : 'the file contains no features',
    );
  }
  checkVertexCount(countPositions(source.candidates));
  source.candidates.forEach(checkStructure);
  const lonLat = source.candidates.map((c) => toLonLatCandidate(c, source.reprojectFrom));
  checkLonLatRange(lonLat, PROJECTED_HINTS[source.format]);
  const notes = [...source.notes];
  let repeats = 0;
  const cleaned = lonLat.map((c) => {
    const { parts, removed } = dropRepeatedPositions(c.parts);
    repeats += removed;
    return { ...c, parts };
  });
  if (repeats > 0) notes.push(`removed ${repeats} repeated consecutive position(s)`);
  cleaned.forEach(checkRingAreas);
  cleaned.forEach(checkCrossings);
  const selected = selectBoundary(cleaned, options.pick);
  notes.push(...selected.notes);
  const { parts, reversed } = orientRings(selected.parts);
  if (reversed > 0) {
    notes.push(`reversed ${reversed} ring(s) to the RFC 7946 winding (exterior counter-clockwise, holes clockwise)`);
  }
  let vertexCount = 0;
  for (const polygon of parts) for (const ring of polygon) vertexCount += ring.length;
  return { parts, format: source.format, sourceCrs: source.sourceCrs, vertexCount, notes, warnings };
}

// GeoJSON reader (RFC 7946), honouring the legacy `crs` member (GeoJSON 2008 §3) when present.
import { collectPolygons } from './collect';
import { BoundaryInputError } from './errors';
import { crsMemberCode, epsgDefinition } from './reproject';
import type { SourceFeatures } from './types';

export function readGeoJson(text: string): SourceFeatures {
  let root: unknown;
  try {
    root = JSON.parse(text);
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    throw new BoundaryInputError('unreadable', `the file is not valid JSON (${reason}); a GeoJSON file must be JSON text (RFC 7946 §1)`);
  }
  const { candidates, ignored } = collectPolygons(root);
  const crs = typeof root === 'object' && root !== null ? (root as { crs?: unknown }).crs : undefined;
  const code = crs === undefined || crs === null ? 4326 : crsMemberCode(crs);
  return {
    format: 'geojson',
    sourceCrs: `EPSG:${code}`,
    reprojectFrom: code === 4326 ? null : epsgDefinition(code),
    candidates,
    ignored,
    notes: code === 4326 ? [] : [`reprojected from EPSG:${code} (the file's "crs" member) to EPSG:4326`],
  };
}

// EPSG codes Patchcast reprojects from, as proj4 definitions, and the GeoJSON `crs` member parser.
import proj4 from 'proj4';
import { BoundaryInputError } from './errors';

const WGS84_LONLAT = '+proj=longlat +datum=WGS84 +no_defs';

/** Supported codes, for messages. */
export const SUPPORTED_CRS_TEXT =
  'EPSG:4326, EPSG:4269, EPSG:3857, WGS84 UTM (EPSG:32601–32660, 32701–32760) and NAD83 UTM (EPSG:26901–26923)';

/** proj4 definition of an EPSG code (parameters as in the EPSG registry), or null if unsupported. */
export function epsgDefinition(code: number): string | null {
  if (code === 4326) return WGS84_LONLAT;
  if (code === 4269) return '+proj=longlat +datum=NAD83 +no_defs';
  // Web Mercator on a sphere of radius a (EPSG:3857, "Popular Visualisation Pseudo-Mercator").
  if (code === 3857) {
    return '+proj=merc +a=6378137 +b=6378137 +lat_ts=0 +lon_0=0 +x_0=0 +y_0=0 +k=1 +units=m +nadgrids=@null +no_defs';
  }
  if (code >= 32601 && code <= 32660) return `+proj=utm +zone=${code - 32600} +datum=WGS84 +units=m +no_defs`;
  if (code >= 32701 && code <= 32760) {
    return `+proj=utm +zone=${code - 32700} +south +datum=WGS84 +units=m +no_defs`;
  }
  if (code >= 26901 && code <= 26923) return `+proj=utm +zone=${code - 26900} +datum=NAD83 +units=m +no_defs`;
  return null;
}

/** Reads an EPSG code from a CRS name: "EPSG:32611", "urn:ogc:def:crs:EPSG::32611", "…OGC:1.3:CRS84". */
export function epsgCodeFromName(name: string): number | null {
  if (/^urn:ogc:def:crs:OGC:(1\.3:|:)?CRS84$/i.test(name.trim())) return 4326;
  const match = /^(?:urn:ogc:def:crs:)?EPSG:(?:[\d.]*:)?(\d+)$/i.exec(name.trim());
  return match ? Number(match[1]) : null;
}

/**
 * The EPSG code named by a GeoJSON `crs` member (GeoJSON 2008 §3.1; removed by RFC 7946 but still
 * written by many tools): `{type:"name",properties:{name}}` or the older `{type:"EPSG",properties:{code}}`.
 */
export function crsMemberCode(crs: unknown): number {
  const member = crs as { type?: unknown; properties?: { name?: unknown; code?: unknown } } | null;
  const name = member?.properties?.name;
  const code = member?.properties?.code;
  const parsed =
    typeof name === 'string'
      ? epsgCodeFromName(name)
      : typeof code === 'number' || typeof code === 'string'
        ? Number(code)
        : null;
  const text = typeof name === 'string' ? name : JSON.stringify(crs);
  if (parsed === null || !Number.isInteger(parsed) || epsgDefinition(parsed) === null) {
    throw new BoundaryInputError(
      'unsupported-crs',
      `the file's "crs" member names ${text}, which Patchcast cannot reproject; supported: ${SUPPORTED_CRS_TEXT}. ` +
        'Reproject the file to EPSG:4326 (longitude/latitude) and try again',
    );
  }
  return parsed;
}

/** A function taking a position in `definition` to [lon, lat] WGS84. */
export function toLonLat(definition: string): (position: number[]) => [number, number] {
  const converter = proj4(definition, WGS84_LONLAT);
  return (position) => {
    const [lon, lat] = converter.forward([position[0], position[1]]);
    return [lon, lat];
  };
}

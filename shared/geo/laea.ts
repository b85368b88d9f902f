// The local equal-area frame of a boundary: Lambert azimuthal equal-area on the WGS84 ellipsoid,
// centred on the boundary (Snyder 1987, Map Projections — A Working Manual, USGS PP 1395, §24).
import proj4 from 'proj4';
import type { Boundary, LonLat } from './types';

export type LocalProjection = {
  definition: string;
  forward: (lonLat: readonly number[]) => [number, number];
  inverse: (xy: readonly number[]) => LonLat;
};

/** proj4 definition; proj4js needs x_0/y_0 spelled out for laea or it returns NaN. */
export function laeaDefinition(lat0: number, lon0: number): string {
  return `+proj=laea +lat_0=${lat0} +lon_0=${lon0} +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs`;
}

/** Centre of the boundary's lon/lat bounding box, rounded to 1e-6° (about 0.1 m). */
export function boundaryCentre(boundary: Pick<Boundary, 'parts'>): LonLat {
  let minLon = Infinity;
  let maxLon = -Infinity;
  let minLat = Infinity;
  let maxLat = -Infinity;
  for (const polygon of boundary.parts) {
    for (const [lon, lat] of polygon[0]) {
      minLon = Math.min(minLon, lon);
      maxLon = Math.max(maxLon, lon);
      minLat = Math.min(minLat, lat);
      maxLat = Math.max(maxLat, lat);
    }
  }
  const round = (v: number): number => Math.round(v * 1e6) / 1e6;
  return [round((minLon + maxLon) / 2), round((minLat + maxLat) / 2)];
}

const cache = new Map<string, LocalProjection>();

/** Forward (lon/lat → metres) and inverse functions for a proj4 definition, cached by text. */
export function localProjection(definition: string): LocalProjection {
  const known = cache.get(definition);
  if (known) return known;
  const converter = proj4(definition);
  const made: LocalProjection = {
    definition,
    forward: (lonLat) => {
      const [x, y] = converter.forward([lonLat[0], lonLat[1]]);
      return [x, y];
    },
    inverse: (xy) => {
      const [lon, lat] = converter.inverse([xy[0], xy[1]]);
      return [lon, lat];
    },
  };
  cache.set(definition, made);
  return made;
}

/** The equal-area projection centred on a boundary. */
export function projectionFor(boundary: Pick<Boundary, 'parts'>): LocalProjection {
  const [lon0, lat0] = boundaryCentre(boundary);
  return localProjection(laeaDefinition(lat0, lon0));
}

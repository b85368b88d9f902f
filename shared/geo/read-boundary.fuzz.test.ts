// Fuzzing the boundary and cover-map readers: any bytes, GeoJSON-shaped JSON or KML give a valid
// lon/lat result or a BoundaryInputError (the server's 400), never another exception and never a
// hang; random simple polygons are accepted with the area they enclose.
import fc from 'fast-check';
import { starRing, starSpec } from '../../tests/fixtures/geo/arbitraries';
import { fuzz, readOrRefuseAsync } from '../../tests/fixtures/fuzz';
import { BoundaryInputError } from './errors';
import { geodesicArea } from './geodesic-area';
import { readBoundary, readPolygonFeatures } from './read-boundary';
import type { PolygonRings } from './types';

/** A run that takes longer than this counts as a hang (fast-check's per-run timeout). */
const RUN_TIMEOUT_MS = 2_000;
const settings = (numRuns: number) => ({ ...fuzz(numRuns), timeout: RUN_TIMEOUT_MS });

const lonLat = fc.tuple(fc.double({ min: -180, max: 180, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }));
const position = fc.oneof(lonLat, fc.tuple(fc.double(), fc.double()), fc.array(fc.oneof(fc.double(), fc.string({ maxLength: 3 }), fc.constant(null)), { maxLength: 4 }), fc.jsonValue({ maxDepth: 1 }));
const ring = fc.oneof(fc.array(position, { maxLength: 8 }), lonLat.chain((p) => fc.array(lonLat, { minLength: 2, maxLength: 6 }).map((middle) => [p, ...middle, p])));
const geometry = fc.record(
  {
    type: fc.constantFrom<unknown>('Polygon', 'MultiPolygon', 'Point', 'LineString', 'GeometryCollection', 'Topology', 'Circle', 7, null),
    coordinates: fc.oneof(fc.array(ring, { maxLength: 3 }), fc.array(fc.array(ring, { maxLength: 2 }), { maxLength: 2 }), fc.jsonValue({ maxDepth: 2 })),
    geometries: fc.array(fc.record({ type: fc.constantFrom('Polygon', 'Point'), coordinates: fc.array(ring, { maxLength: 2 }) }), { maxLength: 2 }),
  },
  { requiredKeys: [] },
);
const properties = fc.oneof(fc.constant(null), fc.dictionary(fc.constantFrom('name', 'NAME', 'veg', '__proto__', 'constructor'), fc.jsonValue({ maxDepth: 1 })));
const feature = fc.record({ type: fc.constantFrom<unknown>('Feature', 'feature', 3), properties, geometry: fc.oneof(geometry, fc.constant(null)), id: fc.jsonValue({ maxDepth: 0 }) }, { requiredKeys: ['type'] });
const crs = fc.record({ type: fc.constant('name'), properties: fc.record({ name: fc.constantFrom<unknown>('EPSG:4326', 'EPSG:32611', 'EPSG:3857', 'urn:ogc:def:crs:EPSG::26911', 'EPSG:2154', 'nonsense', 4326) }) });
const geoJsonLike = fc.oneof(
  geometry,
  feature,
  fc.record({ type: fc.constant('FeatureCollection'), features: fc.oneof(fc.array(fc.oneof(feature, fc.jsonValue({ maxDepth: 1 })), { maxLength: 4 }), fc.jsonValue({ maxDepth: 1 })), crs: fc.oneof(crs, fc.jsonValue({ maxDepth: 1 })) }, { requiredKeys: ['type', 'features'] }),
  fc.jsonValue(),
);
const geoJsonText = geoJsonLike.map((value) => JSON.stringify(value) ?? 'undefined');

const kmlText = fc
  .record({
    name: fc.string({ maxLength: 8 }),
    coordinates: fc.array(fc.oneof(lonLat.map(([x, y]) => `${x},${y}`), fc.constantFrom('a,b', '1,2,3', ',', '', 'NaN,NaN', '1e400,0')), { maxLength: 8 }),
    close: fc.boolean(),
  })
  .map(({ name, coordinates, close }) => {
    const body = `<kml xmlns="http://www.opengis.net/kml/2.2"><Placemark><name>${name}</name><Polygon><outerBoundaryIs><LinearRing><coordinates>${coordinates.join(' ')}</coordinates></LinearRing></outerBoundaryIs></Polygon></Placemark></kml>`;
    return close ? body : body.slice(0, body.length / 2);
  });

/** Bytes that start like a zip, JSON or XML file, so each format's reader sees garbage. */
const signedBytes = fc
  .tuple(fc.constantFrom([0x50, 0x4b, 0x03, 0x04], [0x7b], [0x3c], [0xef, 0xbb, 0xbf, 0x7b], [...Buffer.from('<?xml version="1.0"?><kml>')]), fc.uint8Array({ maxLength: 512 }))
  .map(([head, tail]) => Uint8Array.from([...head, ...tail]));

const inputs: [string, fc.Arbitrary<Uint8Array>][] = [
  ['any bytes', fc.uint8Array({ maxLength: 512 })],
  ['bytes behind a zip, JSON or XML signature', signedBytes],
  ['GeoJSON-shaped JSON', geoJsonText.map((t) => new TextEncoder().encode(t))],
  ['KML with any coordinates', kmlText.map((t) => new TextEncoder().encode(t))],
];

/** Every position a finite lon/lat, every ring closed with at least 4 positions. */
function expectLonLatPolygons(parts: PolygonRings[]): void {
  expect(parts.length).toBeGreaterThan(0);
  for (const polygon of parts) {
    for (const r of polygon) {
      expect(r.length).toBeGreaterThanOrEqual(4);
      expect(r[0]).toEqual(r[r.length - 1]);
      for (const [lon, lat] of r) expect(Number.isFinite(lon) && Number.isFinite(lat) && Math.abs(lon) <= 180 && Math.abs(lat) <= 90).toBe(true);
    }
  }
}

describe('readBoundary fuzzing', () => {
  test.each(inputs)('%s give a valid boundary or a BoundaryInputError', async (_what, bytes) => {
    await fc.assert(
      fc.asyncProperty(bytes, async (b) => {
        const outcome = await readOrRefuseAsync(BoundaryInputError, () => readBoundary(b, { fileName: 'upload.bin' }));
        if ('refused' in outcome) {
          expect(outcome.refused.message).not.toBe('');
          return;
        }
        expectLonLatPolygons(outcome.value.parts);
        expect(outcome.value.vertexCount).toBe(outcome.value.parts.flat(2).length);
        // Not > 0: corners a few 1e-314 degrees off one line pass the collinearity check with an
        // area that rounds to 0; the patch grid then refuses them (no patches).
        expect(geodesicArea(outcome.value)).toBeGreaterThanOrEqual(0);
      }),
      settings(150),
    );
  });

  test('a random simple polygon anywhere on the globe is accepted with the area it encloses', async () => {
    const centre = fc.tuple(fc.double({ min: -170, max: 170, noNaN: true }), fc.double({ min: -80, max: 80, noNaN: true }));
    await fc.assert(
      fc.asyncProperty(starSpec, centre, async (spec, [lon, lat]) => {
        const ring = starRing(spec, lon, lat, 0.05);
        const b = await readBoundary(JSON.stringify({ type: 'Feature', properties: { name: 'Star' }, geometry: { type: 'Polygon', coordinates: [ring] } }));
        expect(b.parts).toHaveLength(1);
        expect(b.vertexCount).toBe(ring.length);
        expect(geodesicArea(b)).toBeGreaterThan(0);
      }),
      settings(100),
    );
  });
});

describe('readPolygonFeatures (cover maps) fuzzing', () => {
  test.each(inputs)('%s give checked lon/lat features or a BoundaryInputError', async (_what, bytes) => {
    await fc.assert(
      fc.asyncProperty(bytes, async (b) => {
        const outcome = await readOrRefuseAsync(BoundaryInputError, () => readPolygonFeatures(b, 'map.bin'));
        if ('refused' in outcome) return;
        for (const f of outcome.value.features) {
          expectLonLatPolygons(f.parts);
          expect(typeof f.properties).toBe('object');
        }
      }),
      settings(150),
    );
  });

  test('every polygon of a random map is read with its attributes', async () => {
    const polygons = fc.array(fc.tuple(starSpec, fc.string({ unit: 'grapheme', maxLength: 6 })), { minLength: 1, maxLength: 5 });
    await fc.assert(
      fc.asyncProperty(polygons, async (list) => {
        const features = list.map(([spec, veg], i) => ({ type: 'Feature', properties: { veg }, geometry: { type: 'Polygon', coordinates: [starRing(spec, -117 + i * 0.2, 43, 0.05)] } }));
        const read = await readPolygonFeatures(new TextEncoder().encode(JSON.stringify({ type: 'FeatureCollection', features })));
        expect(read.features.map((f) => f.properties)).toEqual(list.map(([, veg]) => ({ veg })));
      }),
      settings(100),
    );
  });
});

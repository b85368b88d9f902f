import { readFileSync } from 'fs';
import { join } from 'path';
import fc from 'fast-check';
import { starRing, starSpec } from '../../tests/fixtures/geo/arbitraries';
import { BoundaryInputError, type BoundaryErrorCode } from './errors';
import { geodesicArea } from './geodesic-area';
import { MAX_VERTICES } from './validate';
import { detectFormat, readBoundary } from './read-boundary';
import { ringSignedArea } from './winding';

const fixtures = join(__dirname, '../../tests/fixtures/geo');
const seed = join(__dirname, '../../server/seed/boundaries');
const bytes = (path: string): Uint8Array => new Uint8Array(readFileSync(path));

async function refusal(input: Uint8Array | string, fileName?: string): Promise<BoundaryInputError> {
  try {
    await readBoundary(input, { fileName });
  } catch (err) {
    if (err instanceof BoundaryInputError) return err;
    throw err;
  }
  throw new Error(`${fileName ?? 'input'} was accepted`);
}

describe('readBoundary: formats', () => {
  it('reads the demo GeoJSON boundaries with their parts and hole', async () => {
    const cinder = await readBoundary(bytes(join(seed, 'cinder-flat.geojson')));
    expect(cinder.parts.map((p) => p.length)).toEqual([2]);
    const heron = await readBoundary(bytes(join(seed, 'heron-bay.geojson')));
    expect(heron.parts).toHaveLength(2);
    expect(geodesicArea(cinder) / 1e4).toBeCloseTo(3500, -1);
    expect(geodesicArea(heron) / 1e4).toBeCloseTo(900, -1);
  });

  // The UTM files were written by GDAL's ogr2ogr from cinder-flat.geojson (EPSG:32611 and the
  // NAD83 zone, EPSG:26911) at millimetre precision: they must land on the lon/lat twin.
  it.each(['cinder-flat-utm11.geojson', 'cinder-flat-nad83-utm11.geojson', 'cinder-flat-utm11.shp.zip'])(
    'reads %s back onto its lon/lat twin',
    async (name) => {
      const twin = await readBoundary(bytes(join(seed, 'cinder-flat.geojson')));
      const got = await readBoundary(bytes(join(fixtures, name)), { fileName: name });
      expect(got.parts[0].map((r) => r.length)).toEqual(twin.parts[0].map((r) => r.length));
      got.parts[0].forEach((ring, r) =>
        ring.forEach(([lon, lat], i) => {
          const [lon0, lat0] = twin.parts[0][r][i];
          expect(Math.hypot((lon - lon0) * 82_000, (lat - lat0) * 111_000)).toBeLessThan(0.01); // metres
        }),
      );
      expect(Math.abs(geodesicArea(got) / geodesicArea(twin) - 1)).toBeLessThan(1e-6);
    },
  );

  it('reads KML with its hole, ignoring and listing the point placemark', async () => {
    const b = await readBoundary(bytes(join(fixtures, 'boundary.kml')), { fileName: 'boundary.kml' });
    expect(b.format).toBe('kml');
    expect(b.parts[0]).toHaveLength(2);
    expect(b.warnings.join(' ')).toMatch(/Gate.*Point/);
  });

  it('detects formats by content first, then by extension', () => {
    const enc = (s: string): Uint8Array => new TextEncoder().encode(s);
    expect(detectFormat(enc('\uFEFF  {"type":"Polygon"}'))).toBe('geojson');
    expect(detectFormat(enc('<?xml version="1.0"?><kml/>'))).toBe('kml');
    expect(detectFormat(Uint8Array.from([0x50, 0x4b, 0x03, 0x04, 0]))).toBe('shapefile');
    expect(() => detectFormat(enc('hello'), 'x.txt')).toThrow(BoundaryInputError);
  });
});

describe('readBoundary: choosing and repairing', () => {
  const square = (x: number, name: string): object => ({
    type: 'Feature',
    properties: { name },
    geometry: { type: 'Polygon', coordinates: [[[x, 43], [x + 0.01, 43], [x + 0.01, 43.01], [x, 43.01], [x, 43]]] },
  });
  const collection = JSON.stringify({
    type: 'FeatureCollection',
    features: [square(-117, 'west'), square(-116.99, 'east'), { type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [-117, 43] } }],
  });

  it('merges several polygon features into one (union) and lists the ignored point', async () => {
    const b = await readBoundary(collection);
    expect(b.parts).toHaveLength(1); // the two squares share an edge
    const single = await readBoundary(JSON.stringify(square(-117, 'west')));
    expect(geodesicArea(b) / geodesicArea(single)).toBeCloseTo(2, 4);
    expect(b.notes.join(' ')).toMatch(/merged 2/);
    expect(b.warnings.join(' ')).toMatch(/feature 3 \(Point\)/);
  });

  it('picks one feature by a property value, or says which values exist', async () => {
    const east = await readBoundary(collection, { pick: { property: 'name', value: 'east' } });
    expect(east.parts[0][0][0][0]).toBeCloseTo(-116.99, 9);
    await expect(readBoundary(collection, { pick: { property: 'name', value: 'north' } })).rejects.toThrow(/"west", "east"/);
  });

  // RFC 7946 §3.1.6: exterior rings counter-clockwise, holes clockwise; other windings are repaired.
  it('turns rings of any winding to the RFC 7946 orientation and notes it', async () => {
    await fc.assert(
      fc.asyncProperty(starSpec, fc.boolean(), async (spec, clockwise) => {
        const ring = starRing(spec, -117, 43, 0.05);
        const given = clockwise ? [...ring].reverse() : ring;
        const b = await readBoundary(JSON.stringify({ type: 'Polygon', coordinates: [given] }));
        expect(ringSignedArea(b.parts[0][0])).toBeGreaterThan(0);
        expect(b.notes.some((n) => n.includes('reversed'))).toBe(clockwise);
      }),
      { numRuns: 30, seed: 20261201 },
    );
  });

  it('refuses every non-boundary input with a BoundaryInputError, never another error', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(fc.json(), fc.string()), async (text) => {
        await readBoundary(text).then(
          () => undefined,
          (err: unknown) => expect(err).toBeInstanceOf(BoundaryInputError),
        );
      }),
      { numRuns: 200, seed: 20261201 },
    );
  });
});

describe('readBoundary: broken files, each refused with its own message', () => {
  const cases: [string, BoundaryErrorCode, RegExp][] = [
    ['truncated.geojson', 'unreadable', /not valid JSON/],
    ['unclosed-ring.geojson', 'unclosed-ring', /ring 1 \(exterior\) is not closed.*\[-117, 43\.1\]/],
    ['bowtie.geojson', 'self-intersection', /crosses or touches itself.*\[-116\.95, 43\.05\]/],
    ['swapped.geojson', 'swapped-coordinates', /\[latitude, longitude\]/],
    ['utm-without-crs.geojson', 'projected-coordinates', /\[500000, 4760000\].*metres/],
    ['unknown-crs.geojson', 'unsupported-crs', /EPSG::2154/],
    ['empty-collection.geojson', 'empty', /no features/],
    ['points-only.geojson', 'no-polygon', /"gate" \(Point\).*"fence" \(LineString\)/],
    ['zero-area.geojson', 'zero-area', /encloses no area/],
    ['short-ring.geojson', 'short-ring', /has 3 positions/],
    ['bad-coordinates.geojson', 'bad-coordinates', /position 2 is \["-116\.9",43\]/],
    ['topojson.json', 'invalid-geojson', /"Topology"/],
    ['not-a-boundary.txt', 'unknown-format', /neither GeoJSON, KML nor a zipped shapefile/],
    ['truncated.kml', 'unreadable', /not well-formed XML/],
    ['no-shapefile.zip', 'unreadable', /could not be read as a shapefile/],
    ['shapefile-without-prj.zip', 'projected-coordinates', /\.prj is missing/],
  ];

  it.each(cases)('%s → %s', async (name, code, message) => {
    const err = await refusal(bytes(join(fixtures, 'broken', name)), name);
    expect(err.code).toBe(code);
    expect(err.message).toMatch(message);
  });

  it('gives every broken file a different message', async () => {
    const messages = await Promise.all(cases.map(([name]) => refusal(bytes(join(fixtures, 'broken', name)), name)));
    expect(new Set(messages.map((e) => e.message)).size).toBe(cases.length);
  });

  it('refuses an empty file and one with too many vertices', async () => {
    expect((await refusal(new Uint8Array(0))).code).toBe('empty');
    const n = MAX_VERTICES + 1;
    const ring = Array.from({ length: n }, (_, i) => [-117 + 0.01 * Math.cos((2 * Math.PI * i) / n), 43 + 0.01 * Math.sin((2 * Math.PI * i) / n)]);
    ring.push(ring[0]);
    const err = await refusal(JSON.stringify({ type: 'Polygon', coordinates: [ring] }));
    expect(err.code).toBe('too-many-vertices');
    expect(err.message).toMatch(/200,002 positions/);
  });
});

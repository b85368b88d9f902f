// Cross-check against GDAL (Debian package gdal-bin): ogr2ogr writes a zipped shapefile and a
// GeoJSON with a `crs` member in UTM from our demo boundary; reading them back must give the same
// boundary. Needs `ogr2ogr` on the PATH (CI installs gdal-bin).
import { execFileSync } from 'child_process';
import { mkdtempSync, readFileSync, rmSync } from 'fs';
import { tmpdir } from 'os';
import { join } from 'path';
import { geodesicArea } from './geodesic-area';
import { buildPatchGrid } from './grid';
import { readBoundary } from './read-boundary';

const source = join(__dirname, '../../server/seed/boundaries/heron-bay.geojson');

describe('boundaries written by GDAL ogr2ogr', () => {
  const dir = mkdtempSync(join(tmpdir(), 'patchcast-gdal-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it.each([
    ['ESRI Shapefile', 'EPSG:32610', 'heron.shp.zip'],
    ['GeoJSON', 'EPSG:26910', 'heron-nad83.geojson'],
    ['GeoJSON', 'EPSG:3857', 'heron-mercator.geojson'],
    ['KML', 'EPSG:4326', 'heron.kml'],
  ])('%s in %s reads back onto the original', async (driver, srs, file) => {
    const out = join(dir, file);
    execFileSync('ogr2ogr', ['-f', driver, '-t_srs', srs, out, source]);
    const original = await readBoundary(new Uint8Array(readFileSync(source)));
    const copy = await readBoundary(new Uint8Array(readFileSync(out)), { fileName: file });
    expect(copy.parts).toHaveLength(original.parts.length);
    expect(Math.abs(geodesicArea(copy) / geodesicArea(original) - 1)).toBeLessThan(1e-6);
    const a = buildPatchGrid(original, { cellSize: 100 });
    const b = buildPatchGrid(copy, { cellSize: 100 });
    expect(b.cells.length).toBe(a.cells.length);
    expect(Math.abs(b.totalAreaM2 / a.totalAreaM2 - 1)).toBeLessThan(1e-6);
  });
});

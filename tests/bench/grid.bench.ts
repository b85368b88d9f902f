// Patch grid speed: an invented 20,000-vertex boundary with a hole rasterised by buildPatchGrid into
// ≥ 200,000 patches, beside the naive Turf approach on the same polygon in the same run (a square
// grid over the bounding box, then intersect every cell with the polygon and take its area).
import { readFileSync } from 'node:fs';
import { area, featureCollection, intersect, polygon, squareGrid } from '@turf/turf';
import type { Feature, Polygon } from 'geojson';
import { buildPatchGrid } from '../../shared/geo/grid';
import type { LonLat, PolygonRings } from '../../shared/geo/types';
import { createStream } from '../../shared/markov/streams';

const EXTERIOR_VERTICES = 19_000;
const HOLE_VERTICES = 1_000;
/** Invented centre (lon, lat) and mean radius of the boundary. */
const CENTRE: LonLat = [-116.8, 43.4];
const RADIUS_M = 10_000;
const CELL_SIZE_M = 37;
/** Cells of the naive approach actually intersected (at most this many, within the time budget); the rest is extrapolated linearly. */
const SAMPLE_CELLS = 2_000;
/** Each Turf intersect with a 20,000-vertex polygon takes most of a second here, so sampling stops after this long. */
const SAMPLE_BUDGET_MS = 20_000;

const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};
const seconds = (ms: number): string => `${(ms / 1000).toFixed(2)} s`;

/** Metres east/north of CENTRE to lon/lat: equirectangular approximation on the IUGG mean-radius sphere (R = 6,371,008.8 m). */
function toLonLat(x: number, y: number): LonLat {
  const metresPerDegree = (Math.PI / 180) * 6_371_008.8;
  return [CENTRE[0] + x / (metresPerDegree * Math.cos((CENTRE[1] * Math.PI) / 180)), CENTRE[1] + y / metresPerDegree];
}

/** A closed ring of `count` vertices around (cx, cy) with radius r(θ) = radius · wobble(θ), counter-clockwise unless `clockwise`. */
function ring(count: number, cx: number, cy: number, radius: number, wobble: (theta: number) => number, clockwise: boolean): LonLat[] {
  const out: LonLat[] = [];
  for (let i = 0; i < count; i++) {
    const theta = ((clockwise ? -i : i) / count) * 2 * Math.PI;
    const r = radius * wobble(theta);
    out.push(toLonLat(cx + r * Math.cos(theta), cy + r * Math.sin(theta)));
  }
  out.push(out[0]);
  return out;
}

/** A star-shaped, noisy outline (seeded, so every run rasterises the same shape) with one hole. */
function inventedBoundary(): PolygonRings {
  const noise = createStream('grid-bench', 'outline');
  const jitter = Float64Array.from({ length: EXTERIOR_VERTICES }, () => noise.nextFloat() - 0.5);
  const star = (theta: number): number => {
    const i = Math.round((theta / (2 * Math.PI)) * EXTERIOR_VERTICES) % EXTERIOR_VERTICES;
    return 1 + 0.18 * Math.sin(7 * theta) + 0.04 * Math.sin(61 * theta) + 0.004 * jitter[i];
  };
  const hole = (theta: number): number => 1 + 0.1 * Math.sin(5 * theta);
  return [ring(EXTERIOR_VERTICES, 0, 0, RADIUS_M, star, false), ring(HOLE_VERTICES, 2_500, -1_500, 1_800, hole, true)];
}

/** Turf's squareGrid over the polygon's bounding box with the same cell side, and its time. */
function naiveGrid(outline: Feature<Polygon>): { cells: Feature<Polygon>[]; ms: number } {
  const ring0 = outline.geometry.coordinates[0];
  const lons = ring0.map((p) => p[0]);
  const lats = ring0.map((p) => p[1]);
  const started = performance.now();
  const grid = squareGrid([Math.min(...lons), Math.min(...lats), Math.max(...lons), Math.max(...lats)], CELL_SIZE_M / 1000, { units: 'kilometers' });
  return { cells: grid.features, ms: performance.now() - started };
}

/** Time to intersect a seeded random sample of cells with the polygon and take the areas (stops at the budget). */
function naiveSample(outline: Feature<Polygon>, cells: Feature<Polygon>[]): { ms: number; sampled: number } {
  const pick = createStream('grid-bench', 'sample');
  const started = performance.now();
  let sampled = 0;
  while (sampled < SAMPLE_CELLS && performance.now() - started < SAMPLE_BUDGET_MS) {
    const clipped = intersect(featureCollection([cells[Math.floor(pick.nextFloat() * cells.length)], outline]));
    if (clipped) area(clipped);
    sampled++;
  }
  return { ms: performance.now() - started, sampled };
}

export async function bench(): Promise<void> {
  const rings = inventedBoundary();
  const vertices = rings.reduce((sum, r) => sum + r.length - 1, 0);
  const started = performance.now();
  const grid = buildPatchGrid({ parts: [rings] }, { cellSize: CELL_SIZE_M });
  const oursMs = performance.now() - started;

  const outline = polygon(rings);
  const { cells, ms: gridMs } = naiveGrid(outline);
  const { ms: sampleMs, sampled } = naiveSample(outline, cells);
  const naiveMs = gridMs + (sampleMs / sampled) * cells.length;

  line(`boundary: invented star-shaped outline with one hole, ${vertices.toLocaleString('en-US')} vertices; cells of ${CELL_SIZE_M} m`);
  line(`  buildPatchGrid (scanline interior, exact clipping on the boundary): ${seconds(oursMs)}, ${grid.cells.length.toLocaleString('en-US')} patches (target ≤ 3 s, ≥ 200,000 patches)`);
  line(
    `  naive Turf (squareGrid ${seconds(gridMs)} for ${cells.length.toLocaleString('en-US')} cells, then intersect + area per cell): ` +
      `${seconds(naiveMs)}, EXTRAPOLATED linearly from ${sampled.toLocaleString('en-US')} randomly sampled cells ` +
      `(${seconds(sampleMs)}; sampling stops at ${SAMPLE_CELLS.toLocaleString('en-US')} cells or ${seconds(SAMPLE_BUDGET_MS)})`,
  );
  line(`  ratio naive/buildPatchGrid ${(naiveMs / oursMs).toExponential(2)}× (target ≥ 20×)  (load ${readFileSync('/proc/loadavg', 'utf8').split(' ')[0]})`);
}

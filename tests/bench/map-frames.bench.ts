// Map playback speed in headless Chromium: the map's two drawing techniques — one SVG path per
// state built from merged row runs (features/playback/mapPaths.ts) and a one-pixel-per-cell image
// layer inside the SVG (features/playback/frameRaster.ts) — on synthetic square grids of 40,000
// and 250,000 patches. Each step changes ~10 % of the patches (states are spatially uncorrelated,
// as the chain treats patches independently, so runs of equal cells are short). Printed: median
// time from the step change to the frame being painted (the task after the requestAnimationFrame
// that follows the DOM update). Targets from issue 7: ≤ 33 ms at 40,000, ≤ 150 ms at 250,000.
import { build } from 'esbuild';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { openBrowser } from '../support/browser';

/** The two sizes of the targets, and small grids to place the switch from paths to the image. */
const SIZES = [2_500, 5_000, 10_000, 40_000, 250_000];
const STEPS = 30;
const ROOT = path.resolve(__dirname, '..', '..');

const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};

/** The page's script: builds a grid, then times step changes for one technique. */
const PAGE_SCRIPT = `
import { fitFrame } from '@/features/studyAreas/drawing';
import { statePaths } from '@/features/playback/mapPaths';
import { rasterizeFrame, rgbaWord } from '@/features/playback/frameRaster';

const COLOURS = ['#E69F00', '#56B4E9', '#009E73', '#F0E442'];
const SVG = 'http://www.w3.org/2000/svg';
const afterPaint = () => new Promise((resolve) => requestAnimationFrame(() => { const c = new MessageChannel(); c.port1.onmessage = resolve; c.port2.postMessage(0); }));

function setup(count) {
  const side = Math.round(Math.sqrt(count));
  const spec = { projection: '', originX: 0, originY: 0, cellSize: 10, rows: side, cols: side };
  const cells = Int32Array.from({ length: side * side }, (_, i) => i);
  const frame = fitFrame([0, 0, side * 10, side * 10]);
  let seed = 12345;
  const random = () => ((seed = (seed * 1664525 + 1013904223) >>> 0) / 4294967296);
  const states = Uint8Array.from(cells, () => Math.floor(random() * 4));
  const next = () => { for (let i = 0; i < states.length; i++) if (random() < 0.1) states[i] = Math.floor(random() * 4); };
  document.body.innerHTML = '';
  const svg = document.createElementNS(SVG, 'svg');
  svg.setAttribute('viewBox', '0 0 ' + frame.width + ' ' + frame.height);
  svg.setAttribute('width', '900'); svg.setAttribute('height', String(Math.round(900 * frame.height / frame.width)));
  document.body.appendChild(svg);
  return { spec, cells, frame, states, next, svg };
}

// Median over the steps; each step may return a promise to wait for before the paint (the image decoding).
async function median(run, step) {
  const times = [];
  for (let s = 0; s < ${STEPS}; s++) {
    run.next();
    const t0 = performance.now();
    await step();
    await afterPaint();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

window.benchPaths = async (count) => {
  const run = setup(count);
  const paths = COLOURS.map((colour) => { const p = document.createElementNS(SVG, 'path'); p.setAttribute('fill', colour); run.svg.appendChild(p); return p; });
  const step = () => statePaths(run.cells, run.states, 4, run.spec, run.frame).forEach((d, j) => paths[j].setAttribute('d', d));
  step(); await afterPaint();
  const subpaths = statePaths(run.cells, run.states, 4, run.spec, run.frame).reduce((sum, d) => sum + d.split('M').length - 1, 0);
  return { ms: await median(run, step), subpaths };
};

window.benchImage = async (count) => {
  const run = setup(count);
  const { rows, cols } = run.spec;
  const canvas = document.createElement('canvas');
  canvas.width = cols; canvas.height = rows;
  const context = canvas.getContext('2d');
  const image = context.createImageData(cols, rows);
  const pixels = new Uint32Array(image.data.buffer);
  const words = COLOURS.map(rgbaWord);
  const element = document.createElementNS(SVG, 'image');
  element.setAttribute('x', String(run.frame.x(0))); element.setAttribute('y', String(run.frame.y(rows * 10)));
  element.setAttribute('width', String(cols * 10 * run.frame.scale)); element.setAttribute('height', String(rows * 10 * run.frame.scale));
  element.setAttribute('preserveAspectRatio', 'none'); element.setAttribute('style', 'image-rendering: pixelated');
  run.svg.appendChild(element);
  const step = () => {
    const loaded = new Promise((resolve) => element.addEventListener('load', resolve, { once: true }));
    rasterizeFrame(pixels, run.cells, run.states, words, run.spec);
    context.putImageData(image, 0, 0);
    element.setAttribute('href', canvas.toDataURL());
    return loaded;
  };
  await step(); await afterPaint();
  return { ms: await median(run, step) };
};
`;

type PathResult = { ms: number; subpaths: number };
type ImageResult = { ms: number };

export async function bench(): Promise<void> {
  const dir = mkdtempSync(path.join(tmpdir(), 'patchcast-map-bench-'));
  const { page, close } = await openBrowser('wide');
  try {
    const bundled = await build({
      stdin: { contents: PAGE_SCRIPT, resolveDir: ROOT, loader: 'ts' },
      bundle: true,
      write: false,
      format: 'iife',
      alias: { '@': ROOT },
      tsconfig: path.join(ROOT, 'tsconfig.json'),
    });
    const file = path.join(dir, 'map-bench.html');
    writeFileSync(file, `<!doctype html><html><body></body><script>${bundled.outputFiles[0].text}</script></html>`);
    await page.goto(`file://${file}`);
    line(`median step change → painted frame, ${STEPS} steps each, headless Chromium (software rendering)`);
    for (const count of SIZES) {
      const paths = await page.evaluate((n) => (window as unknown as { benchPaths: (n: number) => Promise<PathResult> }).benchPaths(n), count);
      const image = await page.evaluate((n) => (window as unknown as { benchImage: (n: number) => Promise<ImageResult> }).benchImage(n), count);
      line(`${count.toLocaleString('en-US')} patches: one path per state ${paths.ms.toFixed(1)} ms (${paths.subpaths.toLocaleString('en-US')} merged runs) · image layer ${image.ms.toFixed(1)} ms`);
    }
  } finally {
    await close();
    rmSync(dir, { recursive: true, force: true });
  }
}

import type { CoverState } from '@/shared/schemas';

import type { MapDrawing } from './mapDrawing';

export type PatchLayerProps = { drawing: MapDrawing; coverStates: readonly CoverState[]; states: Uint8Array };

/**
 * Up to this many patches the map draws vector paths (one per state); past it, on web, an image
 * with one pixel per cell. Measured (tests/bench/map-frames.bench.ts, headless Chromium): paths
 * 24 ms at 5,000 patches and 140 ms at 40,000; the image 16–30 ms from 2,500 to 250,000.
 */
export const PATH_PATCH_LIMIT = 5_000;

import { useMemo, type ReactElement } from 'react';

import { rasterizeFrame, rgbaWord } from './frameRaster';
import { PATH_PATCH_LIMIT, type PatchLayerProps } from './patchLayerTypes';
import { StatePathsLayer } from './StatePathsLayer';

type Raster = { canvas: HTMLCanvasElement; context: CanvasRenderingContext2D; image: ImageData; pixels: Uint32Array };

function makeRaster(cols: number, rows: number): Raster | null {
  const canvas = document.createElement('canvas');
  canvas.width = cols;
  canvas.height = rows;
  const context = canvas.getContext('2d');
  if (!context) return null;
  const image = context.createImageData(cols, rows);
  return { canvas, context, image, pixels: new Uint32Array(image.data.buffer) };
}

/** Big grids: the frame painted on an offscreen canvas, one pixel per cell, shown as an SVG image kept sharp when zoomed. */
function ImageLayer({ drawing, coverStates, states }: PatchLayerProps): ReactElement | null {
  const { cells, spec, frame } = drawing;
  const raster = useMemo(() => makeRaster(spec.cols, spec.rows), [spec.cols, spec.rows]);
  const words = useMemo(() => coverStates.map((state) => rgbaWord(state.colour)), [coverStates]);
  const href = useMemo(() => {
    if (!raster) return null;
    rasterizeFrame(raster.pixels, cells, states, words, spec);
    raster.context.putImageData(raster.image, 0, 0);
    return raster.canvas.toDataURL();
  }, [raster, cells, states, words, spec]);
  if (!href) return null;
  const x = frame.x(spec.originX);
  const y = frame.y(spec.originY + spec.rows * spec.cellSize);
  return (
    <image
      href={href}
      x={x}
      y={y}
      width={spec.cols * spec.cellSize * frame.scale}
      height={spec.rows * spec.cellSize * frame.scale}
      preserveAspectRatio="none"
      style={{ imageRendering: 'pixelated' }}
    />
  );
}

/** Web: vector paths for small grids, the image layer past PATH_PATCH_LIMIT patches. */
export function PatchLayer(props: PatchLayerProps): ReactElement | null {
  return props.drawing.cells.length <= PATH_PATCH_LIMIT ? <StatePathsLayer {...props} /> : <ImageLayer {...props} />;
}

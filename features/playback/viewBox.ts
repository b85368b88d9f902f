// Pan and zoom of the map as a viewBox over the fixed drawing box.

export type ViewBox = { x: number; y: number; width: number; height: number };

export const ZOOM_LIMITS = { min: 1, max: 16 } as const;

export const fullView = (width: number, height: number): ViewBox => ({ x: 0, y: 0, width, height });

/** Zoom by `factor` (>1 zooms in) about the view's centre, staying inside the drawing. */
export function zoomView(view: ViewBox, factor: number, full: ViewBox): ViewBox {
  const width = Math.min(full.width, Math.max(full.width / ZOOM_LIMITS.max, view.width / factor));
  const height = (width / full.width) * full.height;
  const cx = view.x + view.width / 2;
  const cy = view.y + view.height / 2;
  return clampView({ x: cx - width / 2, y: cy - height / 2, width, height }, full);
}

/** Move the view by (dx, dy) drawing units, staying inside the drawing. */
export function panView(view: ViewBox, dx: number, dy: number, full: ViewBox): ViewBox {
  return clampView({ ...view, x: view.x + dx, y: view.y + dy }, full);
}

function clampView(view: ViewBox, full: ViewBox): ViewBox {
  return {
    ...view,
    x: Math.min(full.width - view.width, Math.max(0, view.x)),
    y: Math.min(full.height - view.height, Math.max(0, view.y)),
  };
}

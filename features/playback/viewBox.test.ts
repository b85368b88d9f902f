import { fullView, panView, zoomView } from './viewBox';

const full = fullView(1000, 500);

describe('map view box', () => {
  test('zooming in halves the view about its centre; zooming out never shows past the drawing', () => {
    const zoomed = zoomView(full, 2, full);
    expect(zoomed).toEqual({ x: 250, y: 125, width: 500, height: 250 });
    expect(zoomView(zoomed, 0.1, full)).toEqual(full);
  });

  test('panning stops at the drawing’s edges', () => {
    const zoomed = zoomView(full, 2, full);
    expect(panView(zoomed, 10_000, -10_000, full)).toEqual({ x: 500, y: 0, width: 500, height: 250 });
  });
});

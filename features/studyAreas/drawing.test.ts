import { cellsPath, decodeCells, fitFrame, gridIsDrawable, gridLinesPath, outlinePath } from './drawing';

const spec = { projection: 'laea', originX: 0, originY: 0, cellSize: 100, rows: 2, cols: 3 };

describe('fitFrame', () => {
  it('when a 2 km × 1 km box is fitted, then north is up and the box is centred with padding', () => {
    const frame = fitFrame([0, 0, 2000, 1000]);
    expect(frame.width).toBe(1000);
    expect(frame.height).toBe(500);
    // The southern edge is at the bottom of the drawing, the northern at the top.
    expect(frame.y(0)).toBeGreaterThan(frame.y(1000));
    expect(frame.x(0)).toBeCloseTo(1000 - frame.x(2000));
  });
});

describe('paths', () => {
  const frame = fitFrame([0, 0, 300, 200]);

  it('when a square with a hole is drawn, then one sub-path per ring', () => {
    const ring = [[0, 0], [300, 0], [300, 200], [0, 0]];
    const path = outlinePath([[ring, ring]], frame);
    expect(path.match(/M/g)).toHaveLength(2);
    expect(path.match(/Z/g)).toHaveLength(2);
  });

  it('when grid lines are drawn, then cols + 1 vertical and rows + 1 horizontal lines', () => {
    const path = gridLinesPath(spec, frame);
    expect(path.match(/V/g)).toHaveLength(4);
    expect(path.match(/H/g)).toHaveLength(3);
    expect(gridIsDrawable({ rows: 150, cols: 150 })).toBe(true);
    expect(gridIsDrawable({ rows: 151, cols: 3 })).toBe(false);
  });

  it('when cells are merged, then neighbours in a row join but a run never wraps to the next row', () => {
    // Cells 1, 2 (row 0) and 3, 4 (row 1): contiguous indices, two rows.
    const cells = Int32Array.from([1, 2, 3, 4]);
    expect(cellsPath(cells, spec, frame, true).match(/M/g)).toHaveLength(2);
    expect(cellsPath(cells, spec, frame, false).match(/M/g)).toHaveLength(4);
  });
});

describe('decodeCells', () => {
  it('when base64 of little-endian Int32 is given, then the indices', () => {
    const bytes = new Uint8Array(new Int32Array([5, 70_000]).buffer);
    expect(Array.from(decodeCells(Buffer.from(bytes).toString('base64')))).toEqual([5, 70_000]);
  });
});

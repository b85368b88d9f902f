import { geodesicArea } from './geodesic-area';

describe('geodesicArea', () => {
  // The WGS84 ellipsoid's surface is 510 065 621.724 km² (value from memory, e.g. NIMA TR8350.2);
  // the triangle equator–0°, equator–90°E, North Pole is one eighth of it.
  it('gives one eighth of the ellipsoid for an octant', () => {
    const octant = geodesicArea({ parts: [[[[0, 0], [90, 0], [0, 90], [0, 0]]]] });
    expect(octant / (510_065_621.724e6 / 8)).toBeCloseTo(1, 8);
  });

  it('subtracts holes and ignores ring orientation', () => {
    const outer: [number, number][] = [[0, 0], [0.1, 0], [0.1, 0.1], [0, 0.1], [0, 0]];
    const hole: [number, number][] = [[0.02, 0.02], [0.04, 0.02], [0.04, 0.04], [0.02, 0.04], [0.02, 0.02]];
    const whole = geodesicArea({ parts: [[outer]] });
    const holeArea = geodesicArea({ parts: [[hole]] });
    expect(geodesicArea({ parts: [[outer, [...hole].reverse()]] })).toBeCloseTo(whole - holeArea, 3);
    expect(geodesicArea({ parts: [[[...outer].reverse()]] })).toBeCloseTo(whole, 3);
  });
});

import fc from 'fast-check';
import { geodesicArea } from './geodesic-area';
import { boundaryCentre, laeaDefinition, localProjection } from './laea';
import type { Ring } from './types';

describe('localProjection (LAEA)', () => {
  // Snyder 1987, USGS PP 1395, p. 334 numerical example for the ellipsoidal oblique LAEA (values
  // from memory): Clarke 1866, φ1 = 40° N, λ0 = 100° W; φ = 30° N, λ = 110° W →
  // x = −965 932.1 m, y = −1 056 814.9 m.
  it('reproduces Snyder’s worked example', () => {
    const def = '+proj=laea +lat_0=40 +lon_0=-100 +x_0=0 +y_0=0 +ellps=clrk66 +units=m +no_defs';
    const [x, y] = localProjection(def).forward([-110, 30]);
    expect(x).toBeCloseTo(-965932.1, 0);
    expect(y).toBeCloseTo(-1056814.9, 0);
  });

  it('puts the centre at the origin and round-trips nearby points within a few millimetres', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -70, max: 70, noNaN: true }),
        fc.double({ min: -179, max: 179, noNaN: true }),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        (lat0, lon0, dLat, dLon) => {
          const p = localProjection(laeaDefinition(lat0, lon0));
          const [x0, y0] = p.forward([lon0, lat0]);
          expect(Math.hypot(x0, y0)).toBeLessThan(1e-3); // metres
          const [lon, lat] = p.inverse(p.forward([lon0 + dLon, lat0 + dLat]));
          expect(Math.abs(lon - lon0 - dLon)).toBeLessThan(5e-8); // about 5 mm: proj4js inverts to ~1e-8°
          expect(Math.abs(lat - lat0 - dLat)).toBeLessThan(5e-8); // about 5 mm: proj4js inverts to ~1e-8°
        },
      ),
      { numRuns: 50, seed: 20261201 },
    );
  });

  // Equal-area check against an independent ellipsoidal area (GeographicLib, Karney 2013).
  it('keeps the area of a small lon/lat quadrilateral', () => {
    const ring: Ring = [[-118.5, 42.7], [-118.4, 42.7], [-118.4, 42.8], [-118.5, 42.8], [-118.5, 42.7]];
    const p = localProjection(laeaDefinition(42.75, -118.45));
    // Densify the edges so that straight lines in the plane follow the geodesics closely.
    const dense: number[][] = [];
    for (let i = 0; i + 1 < ring.length; i++) {
      for (let k = 0; k < 50; k++) {
        const t = k / 50;
        dense.push(p.forward([ring[i][0] + t * (ring[i + 1][0] - ring[i][0]), ring[i][1] + t * (ring[i + 1][1] - ring[i][1])]));
      }
    }
    let twice = 0;
    for (let i = 0; i < dense.length; i++) {
      const [a, b] = [dense[i], dense[(i + 1) % dense.length]];
      twice += a[0] * b[1] - b[0] * a[1];
    }
    expect(twice / 2 / geodesicArea({ parts: [[ring]] })).toBeCloseTo(1, 5);
  });

  it('centres on the middle of the bounding box', () => {
    expect(boundaryCentre({ parts: [[[[-120, 40], [-118, 40], [-118, 44], [-120, 40]]]] })).toEqual([-119, 42]);
  });
});

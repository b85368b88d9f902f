import proj4 from 'proj4';
import { crsMemberCode, epsgCodeFromName, epsgDefinition, toLonLat } from './reproject';
import { BoundaryInputError } from './errors';

describe('epsgCodeFromName', () => {
  it.each([
    ['EPSG:32611', 32611],
    ['urn:ogc:def:crs:EPSG::26911', 26911],
    ['urn:ogc:def:crs:EPSG:6.6:4269', 4269],
    ['urn:ogc:def:crs:OGC:1.3:CRS84', 4326],
    ['EPSG:3857', 3857],
  ])('reads %s as %i', (name, code) => expect(epsgCodeFromName(name)).toBe(code));

  it('returns null for names that are not EPSG codes', () => expect(epsgCodeFromName('WGS 84 / UTM 11N')).toBeNull());
});

describe('crsMemberCode', () => {
  it('reads the named form and the older EPSG form', () => {
    expect(crsMemberCode({ type: 'name', properties: { name: 'EPSG:32733' } })).toBe(32733);
    expect(crsMemberCode({ type: 'EPSG', properties: { code: 26910 } })).toBe(26910);
  });

  it('refuses an unsupported code with a message naming it', () => {
    const call = (): number => crsMemberCode({ type: 'name', properties: { name: 'EPSG:2154' } });
    expect(call).toThrow(BoundaryInputError);
    expect(call).toThrow(/EPSG:2154/);
  });

  it('refuses UTM-like codes outside the real zone ranges', () => {
    for (const code of [32600, 32661, 32700, 32761, 26900, 26924]) expect(epsgDefinition(code)).toBeNull();
  });
});

describe('toLonLat', () => {
  // Definitional values: a point on a UTM zone's central meridian has easting 500 000 m
  // (false easting), and on the equator northing 0 (north zones) or 10 000 000 m (south zones).
  it('puts central-meridian points at the UTM false easting and northing', () => {
    expect(toLonLat(epsgDefinition(32611)!)([500000, 0])).toEqual([expect.closeTo(-117, 9), expect.closeTo(0, 9)]);
    expect(toLonLat(epsgDefinition(32733)!)([500000, 10000000])).toEqual([expect.closeTo(15, 9), expect.closeTo(0, 9)]);
  });

  // Web Mercator half-width: π·6 378 137 m = 20 037 508.342789 m at 180° (EPSG:3857; value from memory).
  it('maps the Web Mercator edge to 180° longitude', () => {
    expect(toLonLat(epsgDefinition(3857)!)([20037508.342789, 0])[0]).toBeCloseTo(180, 6);
  });

  it('round-trips UTM and lon/lat within a millimetre', () => {
    const def = epsgDefinition(32611)!;
    const [x, y] = proj4('EPSG:4326', def, [-118.45, 42.72]);
    const [lon, lat] = toLonLat(def)([x, y]);
    expect(Math.abs(lon + 118.45) * 82_000).toBeLessThan(0.001);
    expect(Math.abs(lat - 42.72) * 111_000).toBeLessThan(0.001);
  });
});

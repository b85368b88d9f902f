// Types for the part of shpjs (no bundled types) that Patchcast uses: parsing a zip in memory.
declare module 'shpjs' {
  import type { FeatureCollection } from 'geojson';
  type Parsed = FeatureCollection & { fileName?: string };
  function shp(zip: ArrayBuffer | Uint8Array): Promise<Parsed | Parsed[]>;
  export default shp;
}

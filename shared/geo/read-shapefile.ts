// Zipped ESRI shapefile reader (.shp/.shx/.dbf/.prj): shpjs unzips it and reprojects with the
// .prj through proj4; a missing or unreadable .prj leaves projected numbers, which validation
// then refuses as "projected coordinates".
import './self-global';
import shp from 'shpjs';
import { collectPolygons } from './collect';
import { BoundaryInputError } from './errors';
import type { SourceFeatures } from './types';

export async function readShapefileZip(bytes: Uint8Array): Promise<SourceFeatures> {
  let parsed: Awaited<ReturnType<typeof shp>>;
  try {
    parsed = await shp(bytes);
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    throw new BoundaryInputError(
      'unreadable',
      `the zip could not be read as a shapefile (${reason}); it must hold a .shp with its .shx, .dbf and .prj`,
    );
  }
  const layers = Array.isArray(parsed) ? parsed : [parsed];
  const candidates = [];
  const ignored = [];
  for (const layer of layers) {
    const collected = collectPolygons({ type: 'FeatureCollection', features: layer.features });
    const prefix = layers.length > 1 ? `${layer.fileName ?? 'layer'}.shp ` : '';
    candidates.push(...collected.candidates.map((c) => ({ ...c, label: prefix + c.label })));
    ignored.push(...collected.ignored.map((text) => prefix + text));
  }
  const notes = layers.length > 1 ? [`read ${layers.length} shapefiles from the zip`] : [];
  return { format: 'shapefile', sourceCrs: 'the .prj', reprojectFrom: null, candidates, ignored, notes };
}

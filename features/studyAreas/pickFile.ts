import { getDocumentAsync } from 'expo-document-picker';

/** A file the person chose, ready to go into a multipart form. */
export type PickedFile = { name: string; size: number; blob: Blob };

/** Boundary and cover-map files Patchcast reads (GeoJSON, zipped shapefile, KML). */
const ACCEPTED = ['.geojson', '.json', '.zip', '.kml', 'application/geo+json', 'application/json', 'application/zip', 'application/vnd.google-earth.kml+xml'];

/** Opens the system file chooser; null when the person cancels. On web the asset carries the File itself. */
export async function pickFile(): Promise<PickedFile | null> {
  const result = await getDocumentAsync({ type: ACCEPTED, multiple: false, copyToCacheDirectory: false, base64: false });
  if (result.canceled) return null;
  const [asset] = result.assets;
  const blob = asset.file ?? (await (await fetch(asset.uri)).blob());
  return { name: asset.name, size: asset.size ?? blob.size, blob };
}

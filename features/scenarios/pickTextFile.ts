import { getDocumentAsync } from 'expo-document-picker';

/** A text file the person chose, read whole. */
export type PickedTextFile = { name: string; text: string };

/** CSV files as browsers and spreadsheets label them. */
export const CSV_TYPES = ['.csv', 'text/csv', 'text/plain', 'application/vnd.ms-excel'];

/** Opens the system file chooser for a CSV and reads it as text; null when the person cancels. */
export async function pickTextFile(types: readonly string[] = CSV_TYPES): Promise<PickedTextFile | null> {
  const result = await getDocumentAsync({ type: [...types], multiple: false, copyToCacheDirectory: false, base64: false });
  if (result.canceled) return null;
  const [asset] = result.assets;
  const text = asset.file ? await asset.file.text() : await (await fetch(asset.uri)).text();
  return { name: asset.name, text };
}

// Broken files for the bad-input corpus: the checked-in broken boundaries, and files made on the
// fly (a shapefile zip with parts left out, seeded random bytes, a 10-million-row survey table,
// raw multipart bodies).
import { readFileSync } from 'node:fs';
import path from 'node:path';

const geoFixtures = path.resolve(__dirname, '../fixtures/geo');

/** A file of tests/fixtures/geo/broken, as [bytes, file name] for an upload. */
export const broken = (name: string): [Buffer, string] => [readFileSync(path.join(geoFixtures, 'broken', name)), name];

export const json = (value: unknown, name = 'boundary.geojson'): [Buffer, string] => [Buffer.from(JSON.stringify(value)), name];

export const text = (content: string, name: string): [Buffer, string] => [Buffer.from(content), name];

/** A square polygon near Cinder Flat with the given positions replacing its second corner. */
export function squareWith(corner: unknown): object {
  return { type: 'Polygon', coordinates: [[[-117, 43], corner, [-116.9, 43.1], [-117, 43.1], [-117, 43]]] };
}

/** Deterministic pseudo-random bytes (a linear congruential generator), never starting with a zip, JSON or XML signature. */
export function seededBytes(length: number, seed = 20261201): Buffer {
  const bytes = Buffer.alloc(length);
  let state = seed >>> 0;
  for (let i = 0; i < length; i++) {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    bytes[i] = state >>> 24;
  }
  bytes[0] = 0x00;
  return bytes;
}

/**
 * A copy of a zip archive holding only the entries whose names pass `keep`. Entries are copied as
 * they are (compressed data and CRC included), so only the offsets need rewriting (PKWARE
 * APPNOTE.TXT §4.3: local headers, central directory, end of central directory record).
 */
export function zipWithOnly(zip: Buffer, keep: (name: string) => boolean): Buffer {
  const eocd = zip.lastIndexOf(Buffer.from([0x50, 0x4b, 0x05, 0x06]));
  const entryCount = zip.readUInt16LE(eocd + 10);
  const centralStart = zip.readUInt32LE(eocd + 16);
  const entries: { central: Buffer; localOffset: number; name: string }[] = [];
  for (let at = centralStart, n = 0; n < entryCount; n++) {
    const length = 46 + zip.readUInt16LE(at + 28) + zip.readUInt16LE(at + 30) + zip.readUInt16LE(at + 32);
    const central = Buffer.from(zip.subarray(at, at + length));
    entries.push({ central, localOffset: central.readUInt32LE(42), name: central.toString('utf8', 46, 46 + central.readUInt16LE(28)) });
    at += length;
  }
  // A local record runs to the next one (or to the central directory), data descriptor included.
  const ends = [...entries.map((e) => e.localOffset), centralStart].sort((a, b) => a - b);
  const locals: Buffer[] = [];
  const centrals: Buffer[] = [];
  let offset = 0;
  for (const entry of entries.filter((e) => keep(e.name))) {
    const end = ends.find((o) => o > entry.localOffset)!;
    locals.push(zip.subarray(entry.localOffset, end));
    entry.central.writeUInt32LE(offset, 42);
    centrals.push(entry.central);
    offset += end - entry.localOffset;
  }
  const directory = Buffer.concat(centrals);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(centrals.length, 8);
  end.writeUInt16LE(centrals.length, 10);
  end.writeUInt32LE(directory.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...locals, directory, end]);
}

export const shapefileZip = (): Buffer => readFileSync(path.join(geoFixtures, 'cinder-flat-utm11.shp.zip'));

/** A survey table of 10,000,000 visit rows (60 MB), far past the 25 MB upload limit. */
export function tenMillionRowCsv(): Buffer {
  const row = 'A,1,s\n';
  return Buffer.concat([Buffer.from('plot_id,year,cover_class\n'), Buffer.alloc(10_000_000 * row.length, row)]);
}

/** A multipart/form-data body with one file part; `cut` leaves off the closing boundary and the file's end. */
export function multipartBody(boundary: string, content: string, cut: boolean): string {
  const head = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="boundary.geojson"\r\nContent-Type: application/geo+json\r\n\r\n`;
  return cut ? head + content.slice(0, content.length / 2) : `${head}${content}\r\n--${boundary}--\r\n`;
}

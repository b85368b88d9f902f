// KML reader (OGC KML 2.2): parsed with @xmldom/xmldom, converted with @tmcw/togeojson.
import { kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import { collectPolygons } from './collect';
import { BoundaryInputError } from './errors';
import type { SourceFeatures } from './types';

function parseXml(text: string): Document {
  let problem: string | null = null;
  // Warnings (e.g. a missing namespace) are harmless; errors mean a broken file.
  const onError = (level: string, message: string): void => {
    if (level !== 'warning') problem ??= message.trim().split('\n')[0];
  };
  let doc: unknown = null;
  try {
    doc = new DOMParser({ onError }).parseFromString(text, 'text/xml');
  } catch (err) {
    problem ??= err instanceof Error ? err.message.split('\n')[0] : String(err);
  }
  if (problem !== null || doc === null) {
    throw new BoundaryInputError('unreadable', `the KML file is not well-formed XML (${problem ?? 'nothing parsed'})`);
  }
  // xmldom's Document implements the DOM interfaces togeojson walks.
  return doc as Document;
}

export function readKml(text: string): SourceFeatures {
  const doc = parseXml(text);
  if (doc.getElementsByTagName('kml').length === 0) {
    throw new BoundaryInputError('unreadable', 'the file is XML but has no <kml> element, so it is not KML');
  }
  const { candidates, ignored } = collectPolygons(kml(doc));
  // KML coordinates are always WGS84 longitude,latitude[,altitude] (OGC KML 2.2 §10.2).
  return { format: 'kml', sourceCrs: 'EPSG:4326', reprojectFrom: null, candidates, ignored, notes: [] };
}

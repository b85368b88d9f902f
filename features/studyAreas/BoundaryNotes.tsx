import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Text } from '@/components/Text';
import type { BoundaryPreview } from '@/shared/schemas';

import { formatCount } from './formatArea';

export type BoundaryNotesProps = { boundary: Pick<BoundaryPreview, 'notes' | 'warnings' | 'sourceCrs' | 'format' | 'vertexCount'> };

const FORMAT_LABEL: Partial<Record<string, string>> = { geojson: 'GeoJSON', shapefile: 'Zipped shapefile', kml: 'KML' };

const sentence = (line: string): string => `${line.charAt(0).toUpperCase()}${line.slice(1)}.`;

/** What the server did to the file (repairs, reprojection, merges) and what it left out. */
export function BoundaryNotes({ boundary }: BoundaryNotesProps): ReactElement {
  return (
    <>
      <Banner tone="info" title="Read from the file">
        <Text variant="small">{`${FORMAT_LABEL[boundary.format] ?? boundary.format} in ${boundary.sourceCrs}, ${formatCount(boundary.vertexCount)} vertices.`}</Text>
        {boundary.notes.map((note) => (
          <Text key={note} variant="small">
            {sentence(note)}
          </Text>
        ))}
      </Banner>
      {boundary.warnings.length > 0 ? (
        <Banner tone="warning" title="Left out">
          {boundary.warnings.map((warning) => (
            <Text key={warning} variant="small">
              {sentence(warning)}
            </Text>
          ))}
        </Banner>
      ) : null}
    </>
  );
}

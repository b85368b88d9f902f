import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { TextField } from '@/components/TextField';
import { space } from '@/components/theme';
import { FilePickField } from '@/features/studyAreas/FilePickField';
import type { PickedFile } from '@/features/studyAreas/pickFile';

export type DatedMapFieldProps = {
  /** "earlier" or "later": names the file field and the date field. */
  which: string;
  file: PickedFile | null;
  onPicked: (file: PickedFile) => void;
  date: string;
  onDate: (date: string) => void;
  dateError?: string;
  busy: boolean;
};

/** One of the two cover maps of a map-pair survey, with the date it shows. */
export function DatedMapField({ which, file, onPicked, date, onDate, dateError, busy }: DatedMapFieldProps): ReactElement {
  return (
    <View style={styles.map}>
      <FilePickField
        label={`The ${which} map`}
        hint="Polygons with an attribute that names the cover (GeoJSON, zipped shapefile or KML)."
        file={file}
        onPicked={onPicked}
        busy={busy}
      />
      <TextField label={`Date of the ${which} map`} value={date} onChangeText={onDate} placeholder="2019-06-30" hint="As YYYY-MM-DD." error={dateError} />
    </View>
  );
}

const styles = StyleSheet.create({ map: { flexBasis: 280, flexGrow: 1, gap: space.sm } });

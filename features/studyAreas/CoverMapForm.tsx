import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { CoverMapInspection, StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { FilePickField } from './FilePickField';
import { guessMapping, unmappedValues } from './coverMapMapping';
import type { PickedFile } from './pickFile';
import { useInspectCoverMap, useSaveCoverMap } from './queries';

export type CoverMapFormProps = { studyArea: StudyAreaDetail };

type MappingStepProps = { studyArea: StudyAreaDetail; file: PickedFile; inspection: CoverMapInspection };

const NO_FALLBACK = '';

/** Choose the attribute that names the cover, map each of its values to a state, pick a fallback, save. */
function MappingStep({ studyArea, file, inspection }: MappingStepProps): ReactElement {
  const save = useSaveCoverMap(studyArea.id);
  const valuesOf = (name: string): string[] => (inspection.properties.find((p) => p.name === name)?.values ?? []).map((v) => v.value);
  const [property, setProperty] = useState(inspection.properties[0]?.name ?? '');
  const [mapping, setMapping] = useState<Record<string, string>>(() => guessMapping(valuesOf(property), studyArea.states));
  const [fallback, setFallback] = useState(NO_FALLBACK);
  const stateOptions = studyArea.states.map((s) => ({ value: s.code, label: s.name }));
  const counts = inspection.properties.find((p) => p.name === property)?.values ?? [];
  const unmapped = unmappedValues(valuesOf(property), mapping);
  const chooseProperty = (name: string): void => {
    setProperty(name);
    setMapping(guessMapping(valuesOf(name), studyArea.states));
  };
  return (
    <>
      <SegmentedControl label="Attribute that names the cover" options={inspection.properties.map((p) => ({ value: p.name, label: p.name }))} value={property} onChange={chooseProperty} />
      {counts.map(({ value, count }) => (
        <View key={value} style={styles.mapping}>
          <SegmentedControl
            label={`${value} (${count} polygon${count === 1 ? '' : 's'}) →`}
            options={stateOptions}
            value={mapping[value] ?? NO_FALLBACK}
            onChange={(code) => setMapping({ ...mapping, [value]: code })}
          />
        </View>
      ))}
      <SegmentedControl
        label="Fallback state (patches under no polygon, or with an unmapped value)"
        options={[{ value: NO_FALLBACK, label: 'None' }, ...stateOptions]}
        value={fallback}
        onChange={setFallback}
      />
      {unmapped.length > 0 ? (
        <Text variant="small" tone={fallback === NO_FALLBACK ? 'danger' : 'muted'}>
          {`Not mapped: ${unmapped.join(', ')}. Their patches take the fallback state.`}
        </Text>
      ) : null}
      <FormError message={describeError(save.error)} />
      <Button
        label="Save start cover from the map"
        busy={save.isPending}
        disabled={property === ''}
        onPress={() => save.mutate({ file, property, mapping, ...(fallback === NO_FALLBACK ? {} : { fallback }) })}
      />
    </>
  );
}

/** A start cover from an uploaded cover map: the state of the polygon under each patch centroid. */
export function CoverMapForm({ studyArea }: CoverMapFormProps): ReactElement {
  const inspect = useInspectCoverMap(studyArea.id);
  const [file, setFile] = useState<PickedFile | null>(null);
  const choose = (picked: PickedFile): void => {
    setFile(picked);
    inspect.mutate(picked);
  };
  return (
    <>
      <FilePickField
        label="Cover map"
        hint="Polygons with an attribute that names the cover (GeoJSON, zipped shapefile or KML)."
        file={file}
        onPicked={choose}
        busy={inspect.isPending}
      />
      <FormError title="This map cannot be used" message={describeError(inspect.error)} />
      {inspect.data && inspect.data.warnings.length > 0 ? (
        <Banner tone="warning" title="About this map">
          {inspect.data.warnings.join(' ')}
        </Banner>
      ) : null}
      {file && inspect.data ? <MappingStep key={`${file.name}-${inspect.submittedAt}`} studyArea={studyArea} file={file} inspection={inspect.data} /> : null}
    </>
  );
}

const styles = StyleSheet.create({
  mapping: { paddingLeft: space.sm },
});

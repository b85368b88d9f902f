import { useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import type { CoverState, MapPairInspection, StateMapping } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import type { FieldErrors } from '@/features/api/fieldErrors';

import { matchLabels } from './defaultMapping';
import { LabelMappingSection } from './LabelMappingSection';
import { mapPairLabels, sharedProperties } from './mapPairLabels';

export type MapPairChoice = { property: string; mapping: StateMapping; name: string };

export type MapPairMappingFormProps = {
  inspection: MapPairInspection;
  states: readonly CoverState[];
  defaultName: string;
  busy: boolean;
  error: Error | null;
  fieldErrors: FieldErrors;
  onCreate: (choice: MapPairChoice) => void;
};

/** The attribute that names the cover on both maps, each of its values to a state, then the name. */
export function MapPairMappingForm({ inspection, states, defaultName, busy, error, fieldErrors, onCreate }: MapPairMappingFormProps): ReactElement {
  const properties = sharedProperties(inspection);
  const startMapping = (name: string): StateMapping => matchLabels(mapPairLabels(inspection, name).map(({ value }) => value), states);
  const [property, setProperty] = useState(properties[0] ?? '');
  const [mapping, setMapping] = useState<StateMapping>(() => startMapping(property));
  const [name, setName] = useState(defaultName);
  const chooseProperty = (next: string): void => {
    setProperty(next);
    setMapping(startMapping(next));
  };
  return (
    <>
      <Section title="Attribute" description="The attribute that names the cover, on both maps.">
        {properties.length > 0 ? (
          <SegmentedControl label="Attribute that names the cover" options={properties.map((p) => ({ value: p, label: p }))} value={property} onChange={chooseProperty} />
        ) : (
          <Text variant="small" tone="danger">
            The two maps have no attribute in common. Both need the same attribute naming the cover.
          </Text>
        )}
        {fieldErrors.property ? (
          <Text variant="small" tone="danger">
            {fieldErrors.property}
          </Text>
        ) : null}
      </Section>
      {property ? (
        <LabelMappingSection
          description={`Which cover state each value of "${property}" means, on either map. Patches under polygons you leave out are not counted.`}
          labels={mapPairLabels(inspection, property)}
          unit={['polygon', 'polygons']}
          states={states}
          mapping={mapping}
          onChange={setMapping}
          error={fieldErrors.mapping}
        />
      ) : null}
      <Section title="Survey">
        <TextField label="Survey name" value={name} onChangeText={setName} error={fieldErrors.name} />
      </Section>
      <FormError message={describeError(error)} title="The survey was not read" />
      <Button label="Estimate the matrix" busy={busy} disabled={property === ''} onPress={() => onCreate({ property, mapping, name })} />
    </>
  );
}

import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { space } from '@/components/theme';
import type { CoverState, StateMapping, SurveyInspection } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { serverFieldErrors } from '@/features/api/fieldErrors';

import type { PickedTextFile } from '../scenarios/pickTextFile';
import { defaultMapping } from './defaultMapping';
import { LabelMappingSection } from './LabelMappingSection';
import type { CreateSurveyRequest } from './queries';

export type SurveyMappingFormProps = {
  file: PickedTextFile;
  inspection: SurveyInspection;
  states: readonly CoverState[];
  busy: boolean;
  error: Error | null;
  onCreate: (request: CreateSurveyRequest) => void;
};

type Role = 'plot' | 'time' | 'state';
const ROLES: ReadonlyArray<{ role: Role; label: string; hint: string }> = [
  { role: 'plot', label: 'Plot column', hint: 'Which plot was visited' },
  { role: 'time', label: 'Time column', hint: 'When (a year or a visit number)' },
  { role: 'state', label: 'State column', hint: 'The cover recorded' },
];

/** Column mapping, then value mapping from the file's labels to the cover states, then name and step. */
export function SurveyMappingForm({ file, inspection, states, busy, error, onCreate }: SurveyMappingFormProps): ReactElement {
  const first = inspection.columns[0]?.name ?? '';
  const [columns, setColumns] = useState<Record<Role, string>>({
    plot: inspection.guessedColumns.plot ?? first,
    time: inspection.guessedColumns.time ?? first,
    state: inspection.guessedColumns.state ?? first,
  });
  const [mapping, setMapping] = useState<StateMapping>(() => defaultMapping(inspection, columns.state, states));
  const [name, setName] = useState(file.name.replace(/\.[^.]+$/, ''));
  const [timeStep, setTimeStep] = useState('1');
  const columnOptions = inspection.columns.map((column) => ({ value: column.name, label: column.name }));
  const labels = inspection.columns.find((column) => column.name === columns.state)?.values ?? [];
  const fieldErrors = serverFieldErrors(error);
  const chooseColumn = (role: Role, value: string): void => {
    setColumns((current) => ({ ...current, [role]: value }));
    if (role === 'state') setMapping(defaultMapping(inspection, value, states));
  };
  return (
    <>
      <Section title="Columns" description={`${file.name}: ${inspection.rowCount.toLocaleString('en-US')} rows. Say which column holds what.`}>
        {ROLES.map(({ role, label, hint }) => (
          <View key={role} style={styles.field}>
            <SegmentedControl label={label} options={columnOptions} value={columns[role]} onChange={(value) => chooseColumn(role, value)} />
            <Text variant="tiny" tone="muted">
              {fieldErrors[`${role}Column`] ?? hint}
            </Text>
          </View>
        ))}
      </Section>
      <LabelMappingSection
        description={`Which cover state each label in "${columns.state}" means. Rows you leave out are not counted.`}
        labels={labels}
        unit={['row', 'rows']}
        states={states}
        mapping={mapping}
        onChange={setMapping}
        error={fieldErrors.mapping}
      />
      <Section title="Survey">
        <TextField label="Survey name" value={name} onChangeText={setName} error={fieldErrors.name} />
        <TextField
          label="Time units per step"
          value={timeStep}
          inputMode="decimal"
          onChangeText={setTimeStep}
          error={fieldErrors.timeStep}
          hint="Only visits of a plot exactly this far apart are counted as one transition."
        />
      </Section>
      <FormError message={describeError(error)} title="The survey was not read" />
      <Button label="Estimate the matrix" busy={busy} onPress={() => onCreate({ file, name, columns, mapping, timeStep })} />
    </>
  );
}

const styles = StyleSheet.create({ field: { gap: space.xxs } });

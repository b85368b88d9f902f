import type { Dispatch, ReactElement } from 'react';

import { Section } from '@/components/Section';
import { TextField } from '@/components/TextField';

import type { ScenarioForm, ScenarioFormAction } from './scenarioFormState';

export type ScenarioFieldsProps = {
  form: ScenarioForm;
  dispatch: Dispatch<ScenarioFormAction>;
  readOnly: boolean;
  errors: { name?: string; notes?: string; years?: string };
};

/** Name, notes and the length of one step in years. */
export function ScenarioFields({ form, dispatch, readOnly, errors }: ScenarioFieldsProps): ReactElement {
  return (
    <Section title="Scenario">
      <TextField label="Name" value={form.name} editable={!readOnly} error={errors.name} onChangeText={(text) => dispatch({ type: 'name', text })} />
      <TextField
        label="Notes"
        value={form.notes}
        multiline
        editable={!readOnly}
        error={errors.notes}
        hint="What this scenario assumes: management, data behind the matrices, open questions."
        onChangeText={(text) => dispatch({ type: 'notes', text })}
      />
      <TextField
        label="Years per step"
        value={form.yearsText}
        inputMode="decimal"
        editable={!readOnly}
        error={errors.years}
        hint="How much time one model step stands for; mixing and residence times are shown in years with it."
        onChangeText={(text) => dispatch({ type: 'years', text })}
      />
    </Section>
  );
}

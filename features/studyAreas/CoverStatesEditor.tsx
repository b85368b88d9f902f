import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import type { StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { CoverStateRows } from './CoverStateRows';
import { toRows, toStates, validateRows, type StateErrors, type StateRow } from './coverStates';
import { useSaveCoverStates } from './queries';

export type CoverStatesEditorProps = { studyArea: StudyAreaDetail; hasStartCover: boolean };

/** Editors and owners: rename, recolour, reorder, add or remove cover states. */
export function CoverStatesEditor({ studyArea, hasStartCover }: CoverStatesEditorProps): ReactElement {
  const save = useSaveCoverStates(studyArea.id);
  const [rows, setRows] = useState<StateRow[]>(() => toRows(studyArea.states));
  const [errors, setErrors] = useState<StateErrors | null>(null);
  const countChanged = rows.length !== studyArea.states.length;
  const change = (next: StateRow[]): void => {
    setRows(next);
    save.reset();
    if (errors) setErrors(validateRows(next));
  };
  const send = (): void => {
    const found = validateRows(rows);
    setErrors(found);
    if (!found) save.mutate(toStates(rows));
  };
  return (
    <>
      <CoverStateRows rows={rows} onChange={change} errors={errors} />
      {countChanged && hasStartCover ? (
        <Banner tone="warning" title="The start cover will be cleared">
          {`You are changing the number of cover states from ${studyArea.states.length} to ${rows.length}. Saving clears the start cover; set it again below.`}
        </Banner>
      ) : null}
      <FormError message={describeError(save.error)} />
      {save.isSuccess && !save.isPending ? <Banner tone="success" live>Cover states saved.</Banner> : null}
      <Button label="Save cover states" variant="secondary" size="sm" busy={save.isPending} onPress={send} />
    </>
  );
}

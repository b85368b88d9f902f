import { useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { TextField } from '@/components/TextField';
import { renameStudyAreaBodySchema, type StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { useRenameStudyArea } from './queries';

export type RenameStudyAreaFormProps = { studyArea: StudyAreaDetail };

/** Editors and owners: change the name and description. */
export function RenameStudyAreaForm({ studyArea }: RenameStudyAreaFormProps): ReactElement {
  const rename = useRenameStudyArea(studyArea.id);
  const [name, setName] = useState(studyArea.name);
  const [description, setDescription] = useState(studyArea.description);
  const { errors, submit } = useValidatedSubmit(renameStudyAreaBodySchema, (body) => rename.mutate(body), rename.error);
  const unchanged = name.trim() === studyArea.name && description.trim() === studyArea.description;
  return (
    <>
      <TextField label="Study area name" value={name} onChangeText={setName} error={errors.name} />
      <TextField label="Study area description" value={description} onChangeText={setDescription} error={errors.description} />
      <FormError message={describeError(rename.error)} />
      <Button label="Save name and description" variant="secondary" size="sm" busy={rename.isPending} disabled={unchanged} onPress={() => submit({ name, description })} />
    </>
  );
}

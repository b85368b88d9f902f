import { useRouter } from 'expo-router';
import type { ReactElement } from 'react';

import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import type { StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useDeleteStudyArea } from './queries';

export type DeleteStudyAreaProps = { studyArea: StudyAreaDetail };

/** Owners only: delete the study area with everything in it, after one confirmation. */
export function DeleteStudyArea({ studyArea }: DeleteStudyAreaProps): ReactElement {
  const router = useRouter();
  const remove = useDeleteStudyArea(studyArea.id);
  return (
    <>
      <ConfirmButton
        label="Delete study area"
        question={`Delete ${studyArea.name} with its patches, cover states and start cover? This cannot be undone.`}
        confirmLabel="Delete for good"
        busy={remove.isPending}
        onConfirm={() => remove.mutate(undefined, { onSuccess: () => router.replace('/') })}
      />
      <FormError message={describeError(remove.error)} />
    </>
  );
}

import { useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import type { StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { pickTextFile, type PickedTextFile } from '../scenarios/pickTextFile';
import { useCreateSurvey, useInspectSurvey } from './queries';
import { SurveyMappingForm } from './SurveyMappingForm';
import { openSurvey } from './surveyPath';

export type PlotSurveyUploadProps = { studyArea: StudyAreaDetail };

/** A CSV of plot resurveys: choose the file, map its columns and labels, estimate. */
export function PlotSurveyUpload({ studyArea }: PlotSurveyUploadProps): ReactElement {
  const [file, setFile] = useState<PickedTextFile | null>(null);
  const inspect = useInspectSurvey(studyArea.id);
  const create = useCreateSurvey(studyArea.id);
  const choose = async (): Promise<void> => {
    const picked = await pickTextFile();
    if (!picked) return;
    setFile(picked);
    create.reset();
    inspect.mutate(picked);
  };
  return (
    <>
      <Section title="Plot resurveys" description="A CSV with one row per plot visit: which plot, when, and the cover seen. Transitions are counted within each plot, between visits one step apart.">
        <Button label={file ? 'Choose another file' : 'Choose a CSV file'} variant={file ? 'secondary' : 'primary'} busy={inspect.isPending} onPress={() => void choose()} />
        {file ? <Text variant="small" tone="muted">{`Chosen: ${file.name}`}</Text> : null}
        <FormError message={describeError(inspect.error)} title="The file could not be read" />
      </Section>
      {file && inspect.data ? (
        <SurveyMappingForm
          key={file.name + inspect.data.rowCount}
          file={file}
          inspection={inspect.data}
          states={studyArea.states}
          busy={create.isPending}
          error={create.error}
          onCreate={(request) => create.mutate(request, { onSuccess: openSurvey })}
        />
      ) : null}
    </>
  );
}

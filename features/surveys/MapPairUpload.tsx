import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { FormError } from '@/components/FormError';
import { Section } from '@/components/Section';
import { space } from '@/components/theme';
import type { StudyAreaDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { serverFieldErrors } from '@/features/api/fieldErrors';
import type { PickedFile } from '@/features/studyAreas/pickFile';

import { DatedMapField } from './DatedMapField';
import { MapPairMappingForm } from './MapPairMappingForm';
import { useCreateMapPairSurvey, useInspectMapPair, type MapPairFiles } from './queries';
import { openSurvey } from './surveyPath';

export type MapPairUploadProps = { studyArea: StudyAreaDetail };

type Which = keyof MapPairFiles;
type Picked = Record<Which, PickedFile | null>;

const baseName = (file: PickedFile): string => file.name.replace(/\.[^.]+$/, '');

/** Two dated cover maps: each patch's state on each map, paired patch by patch. */
export function MapPairUpload({ studyArea }: MapPairUploadProps): ReactElement {
  const [files, setFiles] = useState<Picked>({ earlier: null, later: null });
  const [dates, setDates] = useState<Record<Which, string>>({ earlier: '', later: '' });
  const inspect = useInspectMapPair(studyArea.id);
  const create = useCreateMapPairSurvey(studyArea.id);
  const fieldErrors = serverFieldErrors(create.error);
  const pick = (which: Which, file: PickedFile): void => {
    const next = { ...files, [which]: file };
    setFiles(next);
    create.reset();
    if (next.earlier && next.later) inspect.mutate({ earlier: next.earlier, later: next.later });
  };
  const { earlier, later } = files;
  const warnings = inspect.data ? [...inspect.data.earlier.warnings, ...inspect.data.later.warnings] : [];
  return (
    <>
      <Section title="Two dated cover maps" description="Two maps of the cover over the study area, from two dates. Each patch takes the state of the polygon under its centre on each map, and the pairs are counted patch by patch.">
        <View style={styles.maps}>
          {(['earlier', 'later'] as const).map((which) => (
            <DatedMapField
              key={which}
              which={which}
              file={files[which]}
              onPicked={(file) => pick(which, file)}
              date={dates[which]}
              onDate={(date) => setDates((current) => ({ ...current, [which]: date }))}
              dateError={fieldErrors[`${which}Date`]}
              busy={inspect.isPending}
            />
          ))}
        </View>
        <FormError message={describeError(inspect.error)} title="The maps could not be read" />
        {warnings.length > 0 ? (
          <Banner tone="warning" title="About these maps">
            {warnings.join(' ')}
          </Banner>
        ) : null}
      </Section>
      {earlier && later && inspect.data ? (
        <MapPairMappingForm
          key={`${earlier.name}-${later.name}-${inspect.submittedAt}`}
          inspection={inspect.data}
          states={studyArea.states}
          defaultName={`${baseName(earlier)} → ${baseName(later)}`}
          busy={create.isPending}
          error={create.error}
          fieldErrors={fieldErrors}
          onCreate={(choice) => create.mutate({ ...choice, files: { earlier, later }, earlierDate: dates.earlier, laterDate: dates.later }, { onSuccess: openSurvey })}
        />
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({ maps: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg } });

import { useRouter } from 'expo-router';
import { useMemo, useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { LoadingState } from '@/components/LoadingState';
import { Section } from '@/components/Section';
import { TextField } from '@/components/TextField';
import { createStudyAreaFieldsSchema, type TeamSummary } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { BoundaryNotes } from './BoundaryNotes';
import { CellSizeField } from './CellSizeField';
import { CoverStateRows } from './CoverStateRows';
import { FilePickField } from './FilePickField';
import { GridPreview } from './GridPreview';
import { PickFeatureFields } from './PickFeatureFields';
import { starterRows, toStates, validateRows, type StateErrors, type StateRow } from './coverStates';
import { estimateGrid } from './gridEstimate';
import { useCreateStudyArea } from './queries';
import { useAreaUnit } from './useAreaUnit';
import { useBoundaryUpload } from './useBoundaryUpload';

export type CreateStudyAreaFormProps = { team: TeamSummary };

/** The minimum-fraction field is a percentage of a full cell (0 to below 100); the API takes a fraction. */
function fractionOf(percentText: string): { fraction: number; message?: string } {
  const percent = Number(percentText.trim().replace(',', '.'));
  if (percentText.trim() === '' || !Number.isFinite(percent) || percent < 0 || percent >= 100) {
    return { fraction: 0, message: 'Type a percentage from 0 to below 100.' };
  }
  return { fraction: percent / 100 };
}

/** A new study area: boundary file with a live grid preview, cell size, cover states. */
export function CreateStudyAreaForm({ team }: CreateStudyAreaFormProps): ReactElement {
  const router = useRouter();
  const unit = useAreaUnit();
  const upload = useBoundaryUpload(team.id);
  const create = useCreateStudyArea(team.id);
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [cellSize, setCellSize] = useState('100');
  const [minPercent, setMinPercent] = useState('0');
  const [rows, setRows] = useState<StateRow[]>(starterRows);
  const [stateErrors, setStateErrors] = useState<StateErrors | null>(null);
  const { fraction: minFraction, message: minFractionMessage } = fractionOf(minPercent);
  const estimate = useMemo(
    () => (upload.projected ? estimateGrid(upload.projected, cellSize, minFraction) : null),
    [upload.projected, cellSize, minFraction],
  );

  const { errors, submit } = useValidatedSubmit(
    createStudyAreaFieldsSchema,
    (body) => {
      if (!upload.file) return;
      create.mutate(
        { ...body, file: upload.file, states: toStates(rows) },
        { onSuccess: (studyArea) => router.replace(`/study-areas/${studyArea.id}`) },
      );
    },
    create.error,
  );
  const changeRows = (next: StateRow[]): void => {
    setRows(next);
    if (stateErrors) setStateErrors(validateRows(next));
  };
  const send = (): void => {
    const rowErrors = validateRows(rows);
    setStateErrors(rowErrors);
    if (rowErrors) return;
    submit({ name, description, cellSize, minFraction, states: JSON.stringify(toStates(rows)), ...upload.pickFields });
  };
  const ready = upload.preview !== null && estimate?.kind === 'ok' && minFractionMessage === undefined;

  return (
    <>
      <Section title="Name and description">
        <TextField label="Name" value={name} onChangeText={setName} error={errors.name} placeholder="North pasture allotment" />
        <TextField label="Description" value={description} onChangeText={setDescription} error={errors.description} hint="Optional: what the area is and where the boundary comes from." />
      </Section>

      <Section title="Boundary" description="GeoJSON, zipped shapefile (with its .prj) or KML, up to 25 MB. It is checked and shown here; nothing is saved until you create the study area.">
        <FilePickField label="Boundary file" hint="Lon/lat or a projected coordinate system; polygons and multipolygons, holes kept." file={upload.file} onPicked={upload.choose} busy={upload.reading} />
        <FormError title="This file cannot be used" message={describeError(upload.error)} />
        {upload.reading ? <LoadingState label="Reading the boundary…" /> : null}
        {upload.preview ? <BoundaryNotes boundary={upload.preview} /> : null}
        {upload.file ? <PickFeatureFields pick={upload.pick} onChange={upload.setPick} onApply={upload.reread} busy={upload.reading} /> : null}
      </Section>

      <Section title="Patch grid" description="Square cells in an equal-area projection centred on the boundary; each patch is a cell clipped to the boundary, with its true area.">
        <CellSizeField value={cellSize} onChange={setCellSize} error={estimate?.kind === 'invalid' ? estimate.message : errors.cellSize} />
        <TextField
          label="Drop edge patches smaller than (% of a cell)"
          value={minPercent}
          onChangeText={setMinPercent}
          keyboardType="numeric"
          error={minFractionMessage ?? errors.minFraction}
          hint="0 keeps every cell the boundary touches; e.g. 25 drops slivers under a quarter cell."
        />
        {upload.projected && upload.preview && estimate ? (
          <GridPreview boundary={upload.projected} areaM2={upload.preview.areaM2} estimate={estimate} minFraction={minFraction} unit={unit} onUseCellSize={(metres) => setCellSize(String(metres))} />
        ) : null}
      </Section>

      <Section title="Cover states" description="2 to 12 vegetation conditions, in the order they appear in tables and legends. Codes are short (letters, digits, - and _).">
        <CoverStateRows rows={rows} onChange={changeRows} errors={stateErrors} />
      </Section>

      <FormError message={describeError(create.error)} />
      <Button label="Create study area" onPress={send} busy={create.isPending} disabled={!ready} />
    </>
  );
}

import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { DownloadLink } from '@/components/DownloadLink';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import type { Run } from '@/shared/schemas';
import { useAreaUnit } from '@/features/studyAreas/useAreaUnit';

import { parseStep } from './stepInput';

export type RunDownloadsProps = { run: Run };

const API = '/api/v1';

/** The run's report and files for GIS and spreadsheets; shown once the run has succeeded. */
export function RunDownloads({ run }: RunDownloadsProps): ReactElement | null {
  const unit = useAreaUnit();
  const [stepText, setStepText] = useState(String(run.steps));
  if (run.status !== 'succeeded') return null;
  const step = parseStep(stepText, run.steps);
  return (
    <Section title="Downloads" description="Files open in GIS (GeoJSON, WGS 84) and spreadsheets (CSV); the report prints or saves as PDF.">
      <TextLink href={`/study-areas/${run.studyAreaId}/report/${run.id}`}>Printable run report</TextLink>
      <View style={styles.step}>
        <TextField label="Step to map" value={stepText} onChangeText={setStepText} inputMode="numeric" error={step === null ? `Type a whole step from 0 to ${run.steps}.` : undefined} />
        {step === null ? null : <DownloadLink url={`${API}/runs/${run.id}/steps/${step}/patches.geojson`}>{`Patch states at step ${step} (GeoJSON)`}</DownloadLink>}
      </View>
      <View style={styles.list}>
        <DownloadLink url={`${API}/runs/${run.id}/history.csv`}>Patch history, every step (CSV)</DownloadLink>
        <DownloadLink url={`${API}/study-areas/${run.studyAreaId}/patches.geojson`}>Patch outlines to join the history to (GeoJSON)</DownloadLink>
        <DownloadLink url={`${API}/runs/${run.id}/area-shares.csv?unit=${unit}`}>{`Area shares per step, in ${unit} (CSV)`}</DownloadLink>
        {run.scenarioId === null
          ? null
          : run.inputs.phases.map((_, n) => (
              <DownloadLink key={n} url={`${API}/scenarios/${run.scenarioId}/phases/${n}/matrix.csv`}>{`Matrix of phase ${n + 1}, as the scenario is now (CSV)`}</DownloadLink>
            ))}
      </View>
      <Text variant="small" tone="muted">
        The run's own frozen matrices are listed under Inputs and in the report.
      </Text>
    </Section>
  );
}

const styles = StyleSheet.create({
  step: { gap: space.xs, maxWidth: 360 },
  list: { gap: space.sm },
});

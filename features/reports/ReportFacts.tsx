import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { AreaUnit, Run } from '@/shared/schemas';
import { formatArea, formatCount } from '@/features/studyAreas/formatArea';
import { formatDateTime } from '@/features/ui/formatDate';

import { MatrixTable } from './MatrixTable';

export type ReportFactsProps = { run: Run; unit: AreaUnit };

const stepsText = (fromStep: number, toStep: number | null): string => (toStep === null ? `steps ${fromStep} on` : `steps ${fromStep}–${toStep}`);

/** What the run was made from and who ran it: everything needed to repeat it. */
export function ReportFacts({ run, unit }: ReportFactsProps): ReactElement {
  const { inputs } = run;
  const codes = inputs.states.map((s) => s.code);
  const facts: [string, string][] = [
    ['Study area', `${inputs.studyAreaName}: ${formatCount(inputs.patchCount)} patches of ${inputs.cellSizeM} m, ${formatArea(inputs.totalAreaM2, unit)}`],
    ['Scenario', inputs.scenarioName],
    ['Start cover', inputs.startCover],
    ['Steps', `${run.steps} of ${run.yearsPerStep} year${run.yearsPerStep === 1 ? '' : 's'} (${run.steps * run.yearsPerStep} years)`],
    ['Replicates', `${run.replicates} (maps show replicate ${run.shownReplicate + 1})`],
    ['Seed', run.seed],
    // In blocks of 8 so that it wraps on a phone; the run page shows it unbroken for copying.
    ['Fingerprint', run.fingerprint.replace(/(.{8})(?=.)/g, '$1 ')],
    ['Run by', `${run.createdBy}, started ${formatDateTime(run.createdAt)}${run.finishedAt ? `, finished ${formatDateTime(run.finishedAt)}` : ''}`],
  ];
  return (
    <View style={styles.box}>
      {facts.map(([name, value]) => (
        <View key={name} style={styles.fact}>
          <Text variant="label" style={styles.name}>
            {name}
          </Text>
          <Text variant={name === 'Fingerprint' || name === 'Seed' ? 'mono' : 'small'} selectable style={styles.value}>
            {value}
          </Text>
        </View>
      ))}
      <View style={styles.matrices}>
        {inputs.phases.map((phase, n) => (
          <MatrixTable key={n} caption={`Phase ${n + 1} (${stepsText(phase.fromStep, phase.toStep)}): transition matrix, rows from, columns to`} codes={codes} matrix={phase.matrix} />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  fact: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  name: { width: 110 },
  value: { flexShrink: 1, flexGrow: 1, flexBasis: 200 },
  matrices: { gap: space.xl, marginTop: space.md },
});

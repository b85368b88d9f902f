import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Card } from '@/components/Card';
import { ConfirmButton } from '@/components/ConfirmButton';
import { FormError } from '@/components/FormError';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { ButtonLink } from '@/components/ButtonLink';
import { space } from '@/components/theme';
import type { Role, Run } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useNumericParam } from '@/features/scenarios/routeParams';
import { useStudyAreaContext } from '@/features/scenarios/useStudyAreaContext';
import { RunDownloads } from '@/features/reports/RunDownloads';
import { canEdit } from '@/features/studyAreas/roles';
import { formatDateTime } from '@/features/ui/formatDate';

import { ProgressBar } from './ProgressBar';
import { isActive, useCancelRun, useRetryRun, useRun } from './queries';
import { RunCaution } from './RunCaution';
import { RunInputs } from './RunInputs';
import { RunStatusBadge } from './RunStatusBadge';

type RunActionsProps = { run: Run; role: Role | undefined };

/** Cancel while active, retry (the same frozen inputs) once failed or cancelled; editors and owners only. */
function RunActions({ run, role }: RunActionsProps): ReactElement | null {
  const cancel = useCancelRun(run.id);
  const retry = useRetryRun(run.id);
  if (!canEdit(role)) return null;
  return (
    <View style={styles.actions}>
      {isActive(run) ? (
        <ConfirmButton label="Cancel run" variant="danger" question="Cancel this run? Work done so far is thrown away." confirmLabel="Yes, cancel" onConfirm={() => cancel.mutate()} busy={cancel.isPending} />
      ) : null}
      {run.status === 'failed' || run.status === 'cancelled' ? <Button label="Retry with the same inputs" variant="secondary" onPress={() => retry.mutate()} busy={retry.isPending} /> : null}
      <FormError message={describeError(cancel.error ?? retry.error)} />
    </View>
  );
}

type RunDetailsProps = { run: Run; role: Role | undefined };

function RunDetails({ run, role }: RunDetailsProps): ReactElement {
  return (
    <>
      <TextLink href={`/study-areas/${run.studyAreaId}/runs`}>← Runs</TextLink>
      <View style={styles.title}>
        <Heading level={1}>{`Run ${run.id}: ${run.inputs.scenarioName}`}</Heading>
        <RunStatusBadge status={run.status} />
      </View>
      <Text variant="small" tone="muted">
        {`Started by ${run.createdBy} on ${formatDateTime(run.createdAt)}${run.finishedAt ? ` · ended ${formatDateTime(run.finishedAt)}` : ''}${run.attempt > 1 ? ` · attempt ${run.attempt}` : ''}`}
      </Text>
      <ProgressBar run={run} />
      {run.status === 'failed' ? (
        <Banner tone="danger" title="The run failed">
          {run.error ?? 'No reason was recorded.'}
        </Banner>
      ) : null}
      <RunActions run={run} role={role} />
      {run.status === 'succeeded' ? (
        <View style={styles.title}>
          <ButtonLink href={`/study-areas/${run.studyAreaId}/watch/${run.id}`} label="Watch the map and chart" />
          <TextLink href={`/study-areas/${run.studyAreaId}/compare?runs=${run.id}`}>Compare with other runs</TextLink>
        </View>
      ) : null}
      <RunCaution />
      <Section title="Inputs" description="Frozen when the run started: later edits of the scenario or study area do not change this run.">
        <Card>
          <RunInputs run={run} />
        </Card>
      </Section>
      <RunDownloads run={run} />
    </>
  );
}

/** One run: inputs, fingerprint and seed, progress or why it failed, cancel and retry, and the standing caution. */
export function RunScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const runId = useNumericParam('runId');
  const run = useRun(runId);
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title={run.data ? `Run ${run.data.id}` : 'Run'}>
      {run.error ? <QueryErrorState what="the run" error={run.error} onRetry={() => void run.refetch()} /> : null}
      {run.isPending ? <LoadingState label="Loading the run…" /> : null}
      {run.data ? <RunDetails run={run.data} role={context.role} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  title: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  actions: { gap: space.sm },
});

import { useMemo, useReducer, useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { space } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import { MAX_PHASES, type AreaUnit, type CoverState, type ScenarioBody, type ScenarioUncertainty } from '@/shared/schemas';
import { isApiError } from '@/features/api/ApiError';
import { describeError } from '@/features/api/describeError';

import { AnalysisPanel } from '../analysis/AnalysisPanel';
import { useAnalysisView } from '../analysis/useAnalysisView';
import { readMatrix } from '../matrix-editor/matrixEditorState';
import { PhaseCard } from './PhaseCard';
import { ScenarioFields } from './ScenarioFields';
import { phaseStarts, scenarioBody, scenarioFormReducer, type FormProblems, type ScenarioForm } from './scenarioFormState';
import { groupScenarioIssues } from './serverIssues';
import { StartCoverFields } from './StartCoverFields';

export type ScenarioWorkspaceProps = {
  studyAreaId: number;
  states: readonly CoverState[];
  initial: ScenarioForm;
  studyAreaShares: number[] | null;
  totalAreaM2: number;
  unit: AreaUnit;
  readOnly: boolean;
  /** The saved scenario's id, null for a new one. */
  savedId: number | null;
  uncertainty: ScenarioUncertainty | undefined;
  save: { run: (body: ScenarioBody) => void; busy: boolean; error: Error | null; label: string };
};

const slug = (name: string): string => name.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'scenario';

/** The scenario editor beside its analysis: side by side on wide screens, one above the other on phones. */
export function ScenarioWorkspace(props: ScenarioWorkspaceProps): ReactElement {
  const { studyAreaId, states, initial, studyAreaShares, totalAreaM2, unit, readOnly, savedId, uncertainty, save } = props;
  const { isWide } = useBreakpoint();
  const [form, dispatch] = useReducer(scenarioFormReducer, initial);
  const [problems, setProblems] = useState<FormProblems>({ phases: {} });
  const readings = useMemo(() => form.phases.map((phase) => readMatrix(phase.matrix)), [form.phases]);
  const dirty = useMemo(() => JSON.stringify(scenarioBody(form)) !== JSON.stringify(scenarioBody(initial)), [form, initial]);
  const analysis = useAnalysisView({ states, form, readings, studyAreaShares, totalAreaM2, savedId, dirty });
  const server = groupScenarioIssues(isApiError(save.error) ? save.error.issues : []);
  const starts = phaseStarts(form);

  const onSave = (): void => {
    const result = scenarioBody(form);
    if (!result.ok) {
      setProblems(result.problems);
      return;
    }
    setProblems({ phases: {} });
    save.run(result.body);
  };

  const editor = (
    <View style={styles.column}>
      <ScenarioFields
        form={form}
        dispatch={dispatch}
        readOnly={readOnly}
        errors={{ name: server.name[0], notes: server.notes[0], years: problems.years ?? server.yearsPerStep[0] }}
      />
      <StartCoverFields
        states={states}
        form={form}
        dispatch={dispatch}
        readOnly={readOnly}
        studyAreaShares={studyAreaShares}
        errors={[...(problems.startCover ? [problems.startCover] : []), ...server.startCover]}
      />
      {form.phases.map((phase, index) => (
        <PhaseCard
          key={phase.key}
          index={index}
          phase={phase}
          start={starts[index]}
          isLast={index === form.phases.length - 1}
          canRemove={form.phases.length > 1}
          states={states}
          reading={readings[index]}
          dispatch={dispatch}
          readOnly={readOnly}
          issues={[...(problems.phases[index] ?? []), ...(server.phases[index] ?? [])]}
          studyAreaId={studyAreaId}
          fileName={`${slug(form.name)}-phase-${index + 1}.csv`}
        />
      ))}
      {readOnly ? null : (
        <View style={styles.actions}>
          <Button
            label="Add phase"
            variant="secondary"
            disabled={form.phases.length >= MAX_PHASES}
            onPress={() => dispatch({ type: 'addPhase' })}
          />
          <Button label={save.label} busy={save.busy} onPress={onSave} />
          {dirty && savedId !== null ? <Banner tone="warning">Unsaved changes</Banner> : null}
        </View>
      )}
      {server.other.map((issue) => (
        <FormError key={issue} message={issue} />
      ))}
      <FormError message={isApiError(save.error) && save.error.issues.length > 0 ? save.error.message : describeError(save.error)} title="Not saved" />
    </View>
  );
  const panel = <AnalysisPanel states={states} view={analysis.view} blockedBy={analysis.blockedBy} unit={unit} uncertainty={dirty ? undefined : uncertainty} />;
  return isWide ? (
    <View style={styles.wide}>
      <View style={styles.main}>{editor}</View>
      <View style={styles.side}>{panel}</View>
    </View>
  ) : (
    <View style={styles.column}>
      {editor}
      {panel}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.lg },
  wide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  main: { flex: 3, minWidth: 0, gap: space.lg },
  side: { flex: 2, minWidth: 0 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
});

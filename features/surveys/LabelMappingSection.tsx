import type { ReactElement } from 'react';

import { SegmentedControl } from '@/components/SegmentedControl';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import type { CoverState, StateMapping } from '@/shared/schemas';

export type LabelCount = { value: string; count: number };

export type LabelMappingSectionProps = {
  description: string;
  labels: readonly LabelCount[];
  /** What a label's count counts, singular and plural: ['row', 'rows'], ['polygon', 'polygons']. */
  unit: readonly [string, string];
  states: readonly CoverState[];
  mapping: StateMapping;
  onChange: (mapping: StateMapping) => void;
  error?: string;
};

const LEAVE_OUT = '';

/** The value-mapping step: each label in the upload to a cover state, or left out. */
export function LabelMappingSection({ description, labels, unit, states, mapping, onChange, error }: LabelMappingSectionProps): ReactElement {
  const stateOptions = [...states.map((state) => ({ value: state.code, label: `${state.code} · ${state.name}` })), { value: LEAVE_OUT, label: 'Leave out' }];
  return (
    <Section title="States" description={description}>
      {labels.map(({ value, count }) => (
        <SegmentedControl
          key={value}
          label={`"${value}" (${count.toLocaleString('en-US')} ${count === 1 ? unit[0] : unit[1]})`}
          options={stateOptions}
          value={mapping[value] ?? LEAVE_OUT}
          onChange={(code) => onChange({ ...mapping, [value]: code === LEAVE_OUT ? null : code })}
        />
      ))}
      {error ? (
        <Text variant="small" tone="danger">
          {error}
        </Text>
      ) : null}
    </Section>
  );
}

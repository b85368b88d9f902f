import type { ReactElement } from 'react';

import { SegmentedControl } from '@/components/SegmentedControl';
import { TextField } from '@/components/TextField';

import { formatMetres } from './formatArea';

export type CellSizeFieldProps = { value: string; onChange: (value: string) => void; error?: string };

const QUICK_CHOICES = ['50', '100', '250', '500', '1000'].map((metres) => ({ value: metres, label: formatMetres(Number(metres)) }));

/** The patch cell size in metres: typed, or one of the common sizes. */
export function CellSizeField({ value, onChange, error }: CellSizeFieldProps): ReactElement {
  return (
    <>
      <TextField label="Cell size (m)" value={value} onChangeText={onChange} keyboardType="numeric" error={error} hint="Square cells, 10 m to 10,000 m a side." />
      <SegmentedControl label="Common cell sizes" hideLabel options={QUICK_CHOICES} value={value.trim()} onChange={onChange} />
    </>
  );
}

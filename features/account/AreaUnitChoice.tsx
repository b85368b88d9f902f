import type { ReactElement } from 'react';

import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import type { AreaUnit, User } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useUpdateAccount } from './queries';

export type AreaUnitChoiceProps = { user: User };

const options = [
  { value: 'ha', label: 'Hectares (ha)' },
  { value: 'acres', label: 'Acres' },
] as const satisfies ReadonlyArray<{ value: AreaUnit; label: string }>;

/** The unit areas are shown in across Patchcast; saved on change. */
export function AreaUnitChoice({ user }: AreaUnitChoiceProps): ReactElement {
  const update = useUpdateAccount();
  const value = update.isPending && update.variables.areaUnit ? update.variables.areaUnit : user.areaUnit;
  return (
    <>
      <SegmentedControl
        label="Area unit"
        options={options}
        value={value}
        disabled={update.isPending}
        onChange={(areaUnit) => update.mutate({ areaUnit })}
      />
      <FormError message={describeError(update.error)} />
    </>
  );
}

import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { RUN_CAUTION } from '@/shared/schemas';

/** The standing caution of every run and compare screen (brief §8). */
export function RunCaution(): ReactElement {
  return (
    <Banner tone="warning" title="Model output, not a prediction">
      {RUN_CAUTION}
    </Banner>
  );
}

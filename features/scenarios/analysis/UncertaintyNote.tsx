import type { ReactElement } from 'react';

import { Text } from '@/components/Text';
import type { ScenarioUncertainty } from '@/shared/schemas';

export type UncertaintyNoteProps = { uncertainty: ScenarioUncertainty };

const PRIOR_NAMES: Record<string, string> = { '0.5': 'Jeffreys', '1': 'uniform' };

/** States how the 5–95 % ranges were made: draws, prior, seed, and the server's method line. */
export function UncertaintyNote({ uncertainty }: UncertaintyNoteProps): ReactElement {
  const { prior, draws, seed, quantiles, method } = uncertainty;
  const priorName = PRIOR_NAMES[String(prior)];
  const [low, high] = quantiles.map((q) => `${Math.round(q * 100)} %`);
  return (
    <Text variant="small" tone="muted">
      {`Estimation uncertainty (${low}–${high} range): ${draws.toLocaleString('en-US')} draws, prior Dirichlet(${prior}) per cell` +
        `${priorName ? ` (${priorName})` : ''}, seed "${seed}". ${method}`}
    </Text>
  );
}

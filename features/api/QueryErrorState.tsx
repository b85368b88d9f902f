import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Text } from '@/components/Text';

import { describeError } from './describeError';

export type QueryErrorStateProps = { error: unknown; onRetry: () => void; what: string };

/** A failed load: what could not be loaded, why, and a way to try again. */
export function QueryErrorState({ error, onRetry, what }: QueryErrorStateProps): ReactElement {
  return (
    <Banner tone="danger" title={`Could not load ${what}`} live>
      <Text variant="small">{describeError(error)}</Text>
      <Button label="Try again" variant="secondary" size="sm" onPress={onRetry} />
    </Banner>
  );
}

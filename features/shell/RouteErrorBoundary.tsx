import type { ErrorBoundaryProps } from 'expo-router';
import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';

/** Shown in place of a screen that crashed while rendering; the rest of the app keeps working. */
export function RouteErrorBoundary({ error, retry }: ErrorBoundaryProps): ReactElement {
  return (
    <Screen title="Something went wrong">
      <Banner tone="danger" title="This page stopped working" live>
        <Text variant="small">{error.message}</Text>
        <Button label="Try again" variant="secondary" size="sm" onPress={() => void retry()} />
      </Banner>
    </Screen>
  );
}

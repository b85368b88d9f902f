import type { ReactElement } from 'react';

import { EmptyState } from '@/components/EmptyState';
import { Screen } from '@/components/Screen';
import { TextLink } from '@/components/TextLink';

export function NotFoundScreen(): ReactElement {
  return (
    <Screen title="Page not found">
      <EmptyState title="This page does not exist" action={<TextLink href="/">Go to your study areas</TextLink>}>
        The link may be mistyped, or the page may have moved.
      </EmptyState>
    </Screen>
  );
}

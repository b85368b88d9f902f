import type { ReactElement, ReactNode } from 'react';

import { Card } from './Card';
import { Heading } from './Heading';
import { Text } from './Text';

export type SectionProps = { title: string; description?: string; children: ReactNode };

/** A titled card: one topic of a settings page. */
export function Section({ title, description, children }: SectionProps): ReactElement {
  return (
    <Card>
      <Heading level={2}>{title}</Heading>
      {description ? (
        <Text variant="small" tone="muted">
          {description}
        </Text>
      ) : null}
      {children}
    </Card>
  );
}

import type { ReactElement } from 'react';

import { Banner } from './Banner';

export type FormErrorProps = { message: string | null | undefined; title?: string };

/** The form-level error above the submit button; renders nothing without a message. */
export function FormError({ message, title }: FormErrorProps): ReactElement | null {
  if (!message) return null;
  return (
    <Banner tone="danger" title={title} live>
      {message}
    </Banner>
  );
}

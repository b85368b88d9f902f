import { useState } from 'react';
import type { z } from 'zod';

import { serverFieldErrors, validateForm, type FieldErrors } from './fieldErrors';

export type ValidatedSubmit = {
  /** The client-side messages of the last submit, else the server's messages for the last request. */
  errors: FieldErrors;
  submit: (values: unknown) => void;
};

/**
 * Checks a form with the shared schema before sending it, so a person sees the same per-field
 * messages the server would give without a round trip, and shows the server's when it disagrees.
 */
export function useValidatedSubmit<T>(schema: z.ZodType<T>, send: (body: T) => void, serverError: unknown): ValidatedSubmit {
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const submit = (values: unknown): void => {
    const result = validateForm(schema, values);
    if (!result.ok) {
      setClientErrors(result.errors);
      return;
    }
    setClientErrors({});
    send(result.body);
  };
  const hasClientErrors = Object.keys(clientErrors).length > 0;
  return { errors: hasClientErrors ? clientErrors : serverFieldErrors(serverError), submit };
}

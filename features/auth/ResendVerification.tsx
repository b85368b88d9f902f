import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { describeError } from '@/features/api/describeError';

import { useResendVerification } from './queries';

export type ResendVerificationProps = { email: string };

/** "Resend verification e-mail" with the server's answer beneath. */
export function ResendVerification({ email }: ResendVerificationProps): ReactElement {
  const resend = useResendVerification();
  return (
    <>
      <Button
        label="Resend verification e-mail"
        variant="secondary"
        size="sm"
        busy={resend.isPending}
        onPress={() => resend.mutate({ email })}
      />
      {resend.data ? (
        <Banner tone="success" live>
          {resend.data.message}
        </Banner>
      ) : null}
      <FormError message={describeError(resend.error)} />
    </>
  );
}

import { useLocalSearchParams } from 'expo-router';
import { useEffect, useRef, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { FormError } from '@/components/FormError';
import { LoadingState } from '@/components/LoadingState';
import { TextLink } from '@/components/TextLink';
import { describeError } from '@/features/api/describeError';

import { AuthCard } from './AuthCard';
import { useVerifyEmail } from './queries';

/** Confirms the e-mail address from the link's token as soon as the page opens. */
export function VerifyScreen(): ReactElement {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const verify = useVerifyEmail();
  const { mutate } = verify;
  const sent = useRef<string | null>(null);

  useEffect(() => {
    if (!token || sent.current === token) return;
    sent.current = token;
    mutate({ token });
  }, [token, mutate]);

  return (
    <AuthCard
      pageTitle="Confirm e-mail"
      heading={verify.isSuccess ? 'E-mail address confirmed' : 'Confirm your e-mail address'}
      footer={<TextLink href="/sign-in">Go to the sign-in page</TextLink>}
    >
      {!token ? <Banner tone="warning">Open the link from your verification e-mail; this page needs its token.</Banner> : null}
      {verify.isPending ? <LoadingState label="Confirming your address…" /> : null}
      {verify.data ? (
        <Banner tone="success" live>
          {verify.data.message}
        </Banner>
      ) : null}
      <FormError message={describeError(verify.error)} />
    </AuthCard>
  );
}

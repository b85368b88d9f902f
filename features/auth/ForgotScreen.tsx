import { useLocalSearchParams } from 'expo-router';
import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { TextLink } from '@/components/TextLink';
import { forgotBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { AuthCard } from './AuthCard';
import { useForgotPassword } from './queries';

export function ForgotScreen(): ReactElement {
  const params = useLocalSearchParams<{ email?: string }>();
  const forgot = useForgotPassword();
  const [email, setEmail] = useState(params.email ?? '');
  const { errors, submit } = useValidatedSubmit(forgotBodySchema, (body) => forgot.mutate(body), forgot.error);
  const send = (): void => submit({ email });

  return (
    <AuthCard
      pageTitle="Forgot password"
      heading="Reset your password"
      footer={<TextLink href="/sign-in">Back to the sign-in page</TextLink>}
    >
      {forgot.data ? (
        <Banner tone="success" live>
          {forgot.data.message}
        </Banner>
      ) : (
        <>
          <Text tone="muted">We will e-mail you a link to choose a new password. The link works once and expires.</Text>
          <TextField
            label="E-mail"
            value={email}
            onChangeText={setEmail}
            autoComplete="email"
            keyboardType="email-address"
            onSubmitEditing={send}
            error={errors.email}
          />
          <FormError message={describeError(forgot.error)} />
          <Button label="Send reset link" onPress={send} busy={forgot.isPending} />
        </>
      )}
    </AuthCard>
  );
}

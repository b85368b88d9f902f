import { useLocalSearchParams } from 'expo-router';
import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { NewPasswordField } from '@/components/NewPasswordField';
import { TextLink } from '@/components/TextLink';
import { resetBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { AuthCard } from './AuthCard';
import { useResetPassword } from './queries';

export function ResetScreen(): ReactElement {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const reset = useResetPassword();
  const [password, setPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(resetBodySchema, (body) => reset.mutate(body), reset.error);
  const send = (): void => submit({ token: token ?? '', password });

  if (!token) {
    return (
      <AuthCard pageTitle="Choose a new password" heading="This link is incomplete">
        <Banner tone="warning">Open the link from your reset e-mail, or ask for a new one.</Banner>
        <TextLink href="/forgot">Ask for a new reset link</TextLink>
      </AuthCard>
    );
  }
  if (reset.data) {
    return (
      <AuthCard pageTitle="Password changed" heading="Password changed">
        <Banner tone="success" live>
          {reset.data.message}
        </Banner>
        <TextLink href="/sign-in">Go to the sign-in page</TextLink>
      </AuthCard>
    );
  }
  return (
    <AuthCard
      pageTitle="Choose a new password"
      heading="Choose a new password"
      footer={<TextLink href="/forgot">Link expired? Ask for a new one</TextLink>}
    >
      <NewPasswordField
        label="New password"
        value={password}
        onChangeText={setPassword}
        onSubmitEditing={send}
        error={errors.password}
      />
      <FormError message={errors.token ?? describeError(reset.error)} />
      <Button label="Save new password" onPress={send} busy={reset.isPending} />
    </AuthCard>
  );
}

import { Redirect, useLocalSearchParams } from 'expo-router';
import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { TextLink } from '@/components/TextLink';
import { signInBodySchema } from '@/shared/schemas';
import { isApiError } from '@/features/api/ApiError';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { AuthCard } from './AuthCard';
import { safeNextPath } from './nextPath';
import { useMe, useSignIn } from './queries';
import { ResendVerification } from './ResendVerification';

type SignInParams = { next?: string; email?: string };

type SignInProblemProps = { error: Error | null; email: string };

/** Why signing in failed, with the way forward for the two cases people hit most. */
function SignInProblem({ error, email }: SignInProblemProps): ReactElement | null {
  if (isApiError(error, 429)) {
    return (
      <Banner tone="warning" title="Too many attempts" live>
        {error.message}
      </Banner>
    );
  }
  if (isApiError(error, 403, 'email_unverified')) {
    return (
      <Banner tone="warning" title="Confirm your e-mail address first" live>
        <Text variant="small">{error.message}</Text>
        <ResendVerification email={email} />
      </Banner>
    );
  }
  return <FormError message={describeError(error)} />;
}

export function SignInScreen(): ReactElement {
  const params = useLocalSearchParams<SignInParams>();
  const next = safeNextPath(params.next);
  const me = useMe();
  const signIn = useSignIn();
  const [email, setEmail] = useState(params.email ?? '');
  const [password, setPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(signInBodySchema, (body) => signIn.mutate(body), signIn.error);

  if (me.data) return <Redirect href={next} />;

  const send = (): void => submit({ email, password });
  return (
    <AuthCard
      pageTitle="Sign in"
      heading="Welcome back"
      footer={
        <>
          <TextLink href={{ pathname: '/forgot', params: email ? { email } : {} }}>Forgot your password?</TextLink>
          <TextLink href={{ pathname: '/sign-up', params: { next, ...(email ? { email } : {}) } }}>
            New to Patchcast? Create an account
          </TextLink>
        </>
      }
    >
      <TextField label="E-mail" value={email} onChangeText={setEmail} autoComplete="email" keyboardType="email-address" error={errors.email} />
      <TextField
        label="Password"
        value={password}
        onChangeText={setPassword}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={send}
        error={errors.password}
      />
      <SignInProblem error={signIn.error} email={email.trim()} />
      <Button label="Sign in" onPress={send} busy={signIn.isPending} />
    </AuthCard>
  );
}

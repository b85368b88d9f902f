import { Redirect, useLocalSearchParams } from 'expo-router';
import { useState, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { TextField } from '@/components/TextField';
import { NewPasswordField } from '@/components/NewPasswordField';
import { TextLink } from '@/components/TextLink';
import { signUpBodySchema } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';
import { useValidatedSubmit } from '@/features/api/useValidatedSubmit';

import { AuthCard } from './AuthCard';
import { safeNextPath } from './nextPath';
import { useMe, useSignUp } from './queries';

type SignUpParams = { next?: string; email?: string; invitation?: string };

export function SignUpScreen(): ReactElement {
  const params = useLocalSearchParams<SignUpParams>();
  const next = safeNextPath(params.next);
  const me = useMe();
  const signUp = useSignUp();
  const [name, setName] = useState('');
  const [email, setEmail] = useState(params.email ?? '');
  const [password, setPassword] = useState('');
  const { errors, submit } = useValidatedSubmit(signUpBodySchema, (body) => signUp.mutate(body), signUp.error);

  if (me.data) return <Redirect href={next} />;

  const signInHref = { pathname: '/sign-in', params: { next, ...(email ? { email: email.trim() } : {}) } } as const;
  if (signUp.data) {
    return (
      <AuthCard pageTitle="Account created" heading="Check your inbox">
        <Banner tone="success" live>
          {signUp.data.message}
        </Banner>
        <TextLink href={signInHref}>{params.invitation ? 'Continue to the invitation' : 'Go to the sign-in page'}</TextLink>
      </AuthCard>
    );
  }

  const send = (): void => submit({ name, email, password, ...(params.invitation ? { invitation: params.invitation } : {}) });
  return (
    <AuthCard
      pageTitle="Create an account"
      heading="Create your account"
      footer={<TextLink href={signInHref}>Already have an account? Go to the sign-in page</TextLink>}
    >
      {params.invitation ? (
        <Banner tone="info">Sign up with the invited address; it counts as confirmed, so you can accept straight away.</Banner>
      ) : null}
      <TextField label="Name" value={name} onChangeText={setName} autoComplete="name" error={errors.name} />
      <TextField label="E-mail" value={email} onChangeText={setEmail} autoComplete="email" keyboardType="email-address" error={errors.email} />
      <NewPasswordField
        label="Password"
        value={password}
        onChangeText={setPassword}
        onSubmitEditing={send}
        error={errors.password}
      />
      <FormError message={errors.invitation ?? describeError(signUp.error)} />
      <Button label="Create account" onPress={send} busy={signUp.isPending} />
    </AuthCard>
  );
}

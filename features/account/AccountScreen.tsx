import type { ReactElement } from 'react';

import { Heading } from '@/components/Heading';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { useMe } from '@/features/auth/queries';

import { AreaUnitChoice } from './AreaUnitChoice';
import { PasswordForm } from './PasswordForm';
import { ProfileForm } from './ProfileForm';
import { SignOutButton } from './SignOutButton';

export function AccountScreen(): ReactElement {
  const { data: user } = useMe();
  return (
    <Screen title="Account">
      <Heading level={1}>Account</Heading>
      {user ? (
        <>
          <Section title="Profile">
            <ProfileForm user={user} />
          </Section>
          <Section title="Units" description="Areas in tables, legends and downloads use this unit.">
            <AreaUnitChoice user={user} />
          </Section>
          <Section title="Password">
            <PasswordForm />
          </Section>
        </>
      ) : null}
      <Section title="Session">
        <SignOutButton />
      </Section>
    </Screen>
  );
}

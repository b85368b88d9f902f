import { useRouter } from 'expo-router';
import type { ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { describeError } from '@/features/api/describeError';
import { useSignOut } from '@/features/auth/queries';

/** Ends the session on this device and returns to the sign-in page. */
export function SignOutButton(): ReactElement {
  const signOut = useSignOut();
  const router = useRouter();
  return (
    <>
      <Button
        label="Sign out"
        variant="danger"
        busy={signOut.isPending}
        onPress={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
      />
      <FormError message={describeError(signOut.error)} />
    </>
  );
}

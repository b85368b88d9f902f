import { Slot } from 'expo-router';
import type { ReactElement } from 'react';

import { AppShell } from '@/features/shell/AppShell';
import { RequireSignIn } from '@/features/shell/RequireSignIn';

export default function SignedInLayout(): ReactElement {
  return (
    <RequireSignIn>
      {(user) => (
        <AppShell user={user}>
          <Slot />
        </AppShell>
      )}
    </RequireSignIn>
  );
}

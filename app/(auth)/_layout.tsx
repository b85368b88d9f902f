import { Slot } from 'expo-router';
import type { ReactElement } from 'react';

import { AuthFrame } from '@/features/auth/AuthFrame';

export default function AuthLayout(): ReactElement {
  return (
    <AuthFrame>
      <Slot />
    </AuthFrame>
  );
}

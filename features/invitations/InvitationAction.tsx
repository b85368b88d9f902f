import { useEffect, useRef, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { ButtonLink } from '@/components/ButtonLink';
import { FormError } from '@/components/FormError';
import { LoadingState } from '@/components/LoadingState';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import { describeError } from '@/features/api/describeError';
import { useMe, useSignOut } from '@/features/auth/queries';
import type { InvitationPreview } from '@/shared/schemas';

import { useAcceptInvitation } from './queries';

export type InvitationActionProps = {
  token: string;
  invitation: InvitationPreview;
  /** Accept at once: the person came back here from signing in or up for this invitation. */
  autoAccept: boolean;
};

const sameAddress = (a: string, b: string): boolean => a.trim().toLowerCase() === b.trim().toLowerCase();

/** Accept when signed in with the invited address; otherwise the way to sign in or up with it. */
export function InvitationAction({ token, invitation, autoAccept }: InvitationActionProps): ReactElement {
  const me = useMe();
  const signOut = useSignOut();
  const accept = useAcceptInvitation(token);
  const { mutate } = accept;
  const matches = me.data ? sameAddress(me.data.email, invitation.email) : false;
  const tried = useRef(false);

  useEffect(() => {
    if (!autoAccept || !matches || tried.current) return;
    tried.current = true;
    mutate();
  }, [autoAccept, matches, mutate]);

  if (me.isPending) return <LoadingState />;

  if (accept.data) {
    return (
      <View style={styles.stack}>
        <Banner tone="success" live>
          {`You joined ${accept.data.name}.`}
        </Banner>
        <ButtonLink href="/team" label="Open the team" />
      </View>
    );
  }

  if (me.data && matches) {
    return (
      <View style={styles.stack}>
        <FormError message={describeError(accept.error)} />
        <Button label="Accept invitation" onPress={() => mutate()} busy={accept.isPending} />
      </View>
    );
  }

  if (me.data) {
    return (
      <View style={styles.stack}>
        <Banner tone="warning" title="Signed in with another address">
          {`You are signed in as ${me.data.email}, but this invitation is for ${invitation.email}.`}
        </Banner>
        <Button label="Switch account" variant="secondary" onPress={() => signOut.mutate()} busy={signOut.isPending} />
        <FormError message={describeError(signOut.error)} />
      </View>
    );
  }

  const next = `/invitation?token=${encodeURIComponent(token)}&accept=1`;
  return (
    <View style={styles.stack}>
      {invitation.accountExists ? (
        <>
          <Text variant="small">{`Sign in as ${invitation.email} to accept.`}</Text>
          <ButtonLink href={{ pathname: '/sign-in', params: { email: invitation.email, next } }} label="Continue to the sign-in page" />
        </>
      ) : (
        <>
          <Text variant="small">{`Create an account for ${invitation.email} to accept.`}</Text>
          <ButtonLink
            href={{ pathname: '/sign-up', params: { email: invitation.email, invitation: token, next } }}
            label="Create an account"
          />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ stack: { gap: space.md } });

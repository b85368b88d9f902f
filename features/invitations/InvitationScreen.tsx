import { useLocalSearchParams } from 'expo-router';
import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { LoadingState } from '@/components/LoadingState';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { describeError } from '@/features/api/describeError';
import { AuthCard } from '@/features/auth/AuthCard';
import { RoleBadge } from '@/features/teams/RoleBadge';
import { roleDescription } from '@/features/teams/roles';

import { InvitationAction } from './InvitationAction';
import { useInvitationPreview } from './queries';

type InvitationParams = { token?: string; accept?: string };

/** An invitation link: who invites whom to which team, and the one step to accept it. */
export function InvitationScreen(): ReactElement {
  const { token, accept } = useLocalSearchParams<InvitationParams>();
  const preview = useInvitationPreview(token);

  if (!token) {
    return (
      <AuthCard pageTitle="Invitation" heading="This link is incomplete">
        <Banner tone="warning">Open the link from your invitation e-mail; this page needs its token.</Banner>
      </AuthCard>
    );
  }
  if (preview.isPending) return <LoadingState label="Opening the invitation…" />;
  if (preview.error) {
    return (
      <AuthCard pageTitle="Invitation" heading="This invitation cannot be used" footer={<TextLink href="/">Go to Patchcast</TextLink>}>
        <Banner tone="danger" live>
          {describeError(preview.error) ?? ''}
        </Banner>
        <Text tone="muted">Invitations expire and work once. Ask the team owner to send a new one.</Text>
      </AuthCard>
    );
  }

  const invitation = preview.data;
  return (
    <AuthCard pageTitle="Invitation" heading={`Join ${invitation.teamName}`}>
      <Text>
        {`${invitation.invitedBy} invited ${invitation.email} to work with them in Patchcast.`}
      </Text>
      <RoleBadge role={invitation.role} />
      <Text variant="small" tone="muted">
        {roleDescription[invitation.role]}
      </Text>
      <InvitationAction token={token} invitation={invitation} autoAccept={accept === '1'} />
    </AuthCard>
  );
}

import type { ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { TextLink } from '@/components/TextLink';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useCurrentTeam } from '@/features/teams/useCurrentTeam';

import { CreateStudyAreaForm } from './CreateStudyAreaForm';
import { canEdit } from './roles';

function CreateStudyAreaBody(): ReactElement {
  const current = useCurrentTeam();
  if (current.isPending) return <LoadingState label="Loading your teams…" />;
  if (current.error) return <QueryErrorState what="your teams" error={current.error} onRetry={current.refetch} />;
  if (!current.team || !canEdit(current.team.role)) {
    return (
      <Banner tone="info" title="Editors and owners create study areas">
        {current.team ? `You are a viewer in ${current.team.name}. Ask an owner to make you an editor.` : 'Join or create a team first.'}
      </Banner>
    );
  }
  return <CreateStudyAreaForm key={current.team.id} team={current.team} />;
}

export function CreateStudyAreaScreen(): ReactElement {
  return (
    <Screen title="New study area">
      <TextLink href="/">← Study areas</TextLink>
      <Heading level={1}>New study area</Heading>
      <CreateStudyAreaBody />
    </Screen>
  );
}

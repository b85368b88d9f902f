import type { ReactElement } from 'react';

import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { QueryErrorState } from '@/features/api/QueryErrorState';

import { MailCard } from './MailCard';
import { useOutbox } from './queries';

function OutboxBody(): ReactElement {
  const outbox = useOutbox({ poll: true });
  if (outbox.isPending) return <LoadingState label="Loading caught mail…" />;
  if (outbox.error) return <QueryErrorState what="the outbox" error={outbox.error} onRetry={() => void outbox.refetch()} />;
  if (outbox.data === null) {
    return <EmptyState title="The outbox is off">This server sends real e-mail, so there is nothing caught to show.</EmptyState>;
  }
  if (outbox.data.length === 0) {
    return (
      <EmptyState title="No mail caught yet">
        Sign up, ask for a password reset or invite someone: the e-mail appears here within seconds.
      </EmptyState>
    );
  }
  const origin = typeof window === 'undefined' ? 'http://localhost' : window.location.origin;
  return (
    <>
      {outbox.data.map((mail) => (
        <MailCard key={mail.id} mail={mail} origin={origin} />
      ))}
    </>
  );
}

/** Development only: the mail the local SMTP catcher received, newest first. */
export function OutboxScreen(): ReactElement {
  return (
    <Screen title="Outbox">
      <Heading level={1}>Outbox</Heading>
      <Text tone="muted">
        Mail this development server would have sent. Links to verification, reset and invitation pages open here.
      </Text>
      <OutboxBody />
    </Screen>
  );
}

import type { ReactElement } from 'react';
import { View } from 'react-native';

import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import type { User } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useMe } from '@/features/auth/queries';

import { useAdminUsers } from './queries';
import { UserRow } from './UserRow';

type UserListProps = { admin: User };

function UserList({ admin }: UserListProps): ReactElement {
  const users = useAdminUsers(true);
  if (users.isPending) return <LoadingState label="Loading users…" />;
  if (users.error) return <QueryErrorState what="the users" error={users.error} onRetry={() => void users.refetch()} />;
  return (
    <Section title={`Users (${users.data.length})`} description="A disabled account cannot sign in; its teams and data stay.">
      <View>
        {users.data.map((user) => (
          <UserRow key={user.id} user={user} isSelf={user.id === admin.id} />
        ))}
      </View>
    </Section>
  );
}

/** Site admins only: every account, with a switch to disable it. */
export function AdminScreen(): ReactElement {
  const { data: me } = useMe();
  return (
    <Screen title="Admin">
      <Heading level={1}>Admin</Heading>
      {me?.isAdmin ? (
        <UserList admin={me} />
      ) : (
        <EmptyState title="Site admins only">This page lists and manages every account on this Patchcast site.</EmptyState>
      )}
    </Screen>
  );
}

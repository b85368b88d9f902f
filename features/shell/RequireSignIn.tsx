import { Redirect, usePathname } from 'expo-router';
import { useRef, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { LoadingState } from '@/components/LoadingState';
import { space } from '@/components/theme';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useMe } from '@/features/auth/queries';
import type { User } from '@/shared/schemas';

export type RequireSignInProps = { children: (user: User) => ReactElement };

/**
 * Shows its children to a signed-in person; sends anyone else to the sign-in page with the
 * path they asked for, to come back to. A convenience only: the server checks every request.
 */
export function RequireSignIn({ children }: RequireSignInProps): ReactElement {
  const me = useMe();
  const pathname = usePathname();
  // While the children (the nested navigator) are not rendered, the router reports the group's
  // index ("/"), so remember the path seen on the first render and whenever the children show.
  const requested = useRef(pathname);
  if (me.data) {
    requested.current = pathname;
    return children(me.data);
  }
  if (me.isPending) return <LoadingState label="Checking your session…" />;
  if (me.error) {
    return (
      <View style={styles.error}>
        <QueryErrorState what="your session" error={me.error} onRetry={() => void me.refetch()} />
      </View>
    );
  }
  const next = requested.current;
  return <Redirect href={next === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(next)}`} />;
}

const styles = StyleSheet.create({ error: { padding: space.lg } });

import type { Href } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Button } from '@/components/Button';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import { formatDateTime } from '@/features/ui/formatDate';

import { useMarkNoticeRead, useNotices } from './queries';

/** In-app notices of finished or failed runs, until marked read. */
export function UnreadNotices(): ReactElement | null {
  const notices = useNotices();
  const markRead = useMarkNoticeRead();
  const unread = (notices.data?.notices ?? []).filter((n) => n.readAt === null);
  if (unread.length === 0) return null;
  return (
    <Banner tone="info" title={unread.length === 1 ? 'New notice' : `${unread.length} new notices`} live>
      {unread.slice(0, 5).map((notice) => (
        <View key={notice.id} style={styles.row}>
          <Text variant="small" style={styles.message}>{`${formatDateTime(notice.createdAt)} · ${notice.message}`}</Text>
          {notice.link ? <TextLink href={notice.link as Href}>Open</TextLink> : null}
          <Button label="Mark read" variant="ghost" size="sm" busy={markRead.isPending && markRead.variables === notice.id} onPress={() => markRead.mutate(notice.id)} />
        </View>
      ))}
    </Banner>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  message: { flexShrink: 1 },
});

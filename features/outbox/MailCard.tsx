import { Link } from 'expo-router';
import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import { colors, fonts, radius, space, typeScale } from '@/components/theme';
import type { CaughtMail } from '@/shared/schemas';
import { formatDateTime } from '@/features/ui/formatDate';

import { appHref } from './appHref';

export type MailCardProps = { mail: CaughtMail; origin: string };

const PREVIEW_LINES = 6;

/** One caught message: who, when, the text and its links, which open inside the app. */
export function MailCard({ mail, origin }: MailCardProps): ReactElement {
  const [expanded, setExpanded] = useState(false);
  const lines = mail.text.trim().split('\n');
  const long = lines.length > PREVIEW_LINES;
  return (
    <Card>
      <View style={styles.head}>
        <Heading level={3}>{mail.subject || '(no subject)'}</Heading>
        <Text variant="small" tone="muted">
          {`To ${mail.to.join(', ')} · from ${mail.from} · ${formatDateTime(mail.receivedAt)}`}
        </Text>
      </View>
      {mail.links.length > 0 ? (
        <View style={styles.links}>
          {mail.links.map((link) => {
            const inApp = appHref(link, origin);
            return (
              <Link key={link} href={inApp ?? link} target={inApp ? undefined : '_blank'} style={styles.link}>
                {inApp ?? link}
              </Link>
            );
          })}
        </View>
      ) : null}
      <Text variant="mono" style={styles.body}>
        {expanded || !long ? mail.text.trim() : `${lines.slice(0, PREVIEW_LINES).join('\n')}\n…`}
      </Text>
      {long ? (
        <Button label={expanded ? 'Show less' : 'Show the whole message'} variant="ghost" size="sm" onPress={() => setExpanded(!expanded)} />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xxs },
  links: { gap: space.xs },
  link: { color: colors.sageDark, fontFamily: fonts.medium, textDecorationLine: 'underline', ...typeScale.small },
  body: { backgroundColor: colors.sand, borderRadius: radius.md, padding: space.md },
});

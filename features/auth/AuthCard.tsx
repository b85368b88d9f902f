import Head from 'expo-router/head';
import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { space } from '@/components/theme';

export type AuthCardProps = {
  /** Document title, e.g. "Sign in". */
  pageTitle: string;
  heading: string;
  children: ReactNode;
  /** Links under the card (to sign up, back to sign in …). */
  footer?: ReactNode;
};

/** One auth page: a titled card holding a short form, with links beneath. */
export function AuthCard({ pageTitle, heading, children, footer }: AuthCardProps): ReactElement {
  return (
    <View style={styles.stack}>
      <Head>
        <title>{`${pageTitle} · Patchcast`}</title>
      </Head>
      <Card>
        <Heading level={1}>{heading}</Heading>
        {children}
      </Card>
      {footer ? <View style={styles.footer}>{footer}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.lg },
  footer: { gap: space.sm, paddingHorizontal: space.xs },
});

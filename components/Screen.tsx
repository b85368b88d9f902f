import Head from 'expo-router/head';
import type { ReactElement, ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { useBreakpoint } from './useBreakpoint';
import { contentMaxWidth, space } from './theme';

export type ScreenProps = {
  /** Document title, shown as "<title> · Patchcast". */
  title: string;
  children: ReactNode;
  /** 'wide' lets a work surface (an editor beside its inspector) use up to 1,400 px. */
  width?: 'readable' | 'wide';
};

/** A scrolling page with a centred, readable column. */
export function Screen({ title, children, width = 'readable' }: ScreenProps): ReactElement {
  const { isWide } = useBreakpoint();
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={[styles.content, isWide && styles.contentWide]}>
      <Head>
        <title>{`${title} · Patchcast`}</title>
      </Head>
      <View style={[styles.column, width === 'wide' && styles.columnWide]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1 },
  content: { padding: space.lg, paddingBottom: space.xxxl, alignItems: 'center' },
  contentWide: { padding: space.xxl },
  column: { width: '100%', maxWidth: contentMaxWidth, gap: space.lg },
  columnWide: { maxWidth: 1400 },
});

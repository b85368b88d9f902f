import type { ReactElement, ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { Wordmark } from '@/components/Wordmark';
import { colors, space } from '@/components/theme';

export type AuthFrameProps = { children: ReactNode };

/** The calm single column around the sign-in, sign-up, reset and invitation pages. */
export function AuthFrame({ children }: AuthFrameProps): ReactElement {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.column}>
        <View style={styles.brand}>
          <Wordmark size="lg" />
          <Text tone="muted" variant="small">
            Forecasts of vegetation cover, patch by patch.
          </Text>
        </View>
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.sand },
  content: { flexGrow: 1, alignItems: 'center', padding: space.lg, paddingTop: space.xxxl },
  column: { width: '100%', maxWidth: 440, gap: space.xl },
  brand: { gap: space.xs, alignItems: 'flex-start' },
});

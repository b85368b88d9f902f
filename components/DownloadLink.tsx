import { Link } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet } from 'react-native';

import { colors, fonts } from './theme';

export type DownloadLinkProps = { /** A server path that answers with an attachment, e.g. /api/v1/…/source. */ url: string; children: string };

/** A plain link to a file the server sends as a download; the browser handles it, not the router. */
export function DownloadLink({ url, children }: DownloadLinkProps): ReactElement {
  return (
    <Link href={url} target="_blank" style={styles.link}>
      {children}
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { color: colors.sageDark, fontFamily: fonts.medium, textDecorationLine: 'underline' },
});

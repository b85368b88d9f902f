import * as Linking from 'expo-linking';
import { Share } from 'react-native';

/** Opens the system share sheet with the app address of `path`. */
export async function shareLink(path: string): Promise<boolean> {
  const result = await Share.share({ message: Linking.createURL(path) });
  return result.action === Share.sharedAction;
}

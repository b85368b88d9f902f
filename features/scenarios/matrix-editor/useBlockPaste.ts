import type { RefObject } from 'react';
import type { TextInput } from 'react-native';

/**
 * Native text inputs keep pasted text as typed into one entry; blocks are caught on the web only
 * (useBlockPaste.web.ts), the platform Patchcast ships on.
 */
export function useBlockPaste(_input: RefObject<TextInput | null>, _onBlock: (text: string) => void): void {}

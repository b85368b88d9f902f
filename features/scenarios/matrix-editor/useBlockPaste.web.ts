import { useEffect, type RefObject } from 'react';
import type { TextInput } from 'react-native';

import { isBlock } from './pasteBlock';

/**
 * On the web, a single-line input drops the line breaks of pasted text, so a block copied from a
 * spreadsheet is caught at the paste event, before the browser flattens it. Single values paste
 * normally.
 */
export function useBlockPaste(input: RefObject<TextInput | null>, onBlock: (text: string) => void): void {
  useEffect(() => {
    // react-native-web renders TextInput as an <input> and hands it out as the ref.
    const node = input.current as unknown as HTMLInputElement | null;
    if (!node) return undefined;
    const listener = (event: ClipboardEvent): void => {
      const text = event.clipboardData?.getData('text/plain') ?? '';
      if (!isBlock(text)) return;
      event.preventDefault();
      onBlock(text);
    };
    node.addEventListener('paste', listener);
    return () => node.removeEventListener('paste', listener);
  }, [input, onBlock]);
}

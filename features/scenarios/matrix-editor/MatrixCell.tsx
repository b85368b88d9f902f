import { useCallback, useRef, useState, type ReactElement } from 'react';
import { StyleSheet, TextInput } from 'react-native';

import { colors, numberInput, typeScale } from '@/components/theme';

import { useBlockPaste } from './useBlockPaste';
import { shortForm } from './cellDisplay';

export type MatrixCellProps = {
  /** Accessible name, e.g. "From Shrub steppe to Bare soil". */
  label: string;
  text: string;
  issue: string | null;
  readOnly: boolean;
  onChange: (text: string) => void;
  /** A block of entries was pasted here: fill the grid from this entry. */
  onPasteBlock: (text: string) => void;
};

export const CELL_WIDTH = 80;

export const CELL_HEIGHT = 44;

/** One transition probability: a 44 px numeric input in IBM Plex Mono, marked when it is wrong. */
export function MatrixCell({ label, text, issue, readOnly, onChange, onPasteBlock }: MatrixCellProps): ReactElement {
  const input = useRef<TextInput>(null);
  const paste = useCallback((block: string) => onPasteBlock(block), [onPasteBlock]);
  useBlockPaste(input, paste);
  const [focused, setFocused] = useState(false);
  return (
    <TextInput
      ref={input}
      value={focused ? text : shortForm(text)}
      onFocus={() => setFocused(true)}
      onBlur={() => setFocused(false)}
      onChangeText={onChange}
      editable={!readOnly}
      accessibilityLabel={label}
      aria-invalid={issue !== null}
      inputMode="decimal"
      autoCapitalize="none"
      autoCorrect={false}
      selectTextOnFocus={!readOnly}
      style={[styles.cell, issue !== null && styles.bad, readOnly && styles.readOnly]}
    />
  );
}

const styles = StyleSheet.create({
  cell: { ...numberInput, width: CELL_WIDTH, height: CELL_HEIGHT, paddingHorizontal: 6, ...typeScale.small },
  bad: { borderColor: colors.rust, borderWidth: 2, borderStyle: 'dashed', backgroundColor: colors.rustTint },
  readOnly: { backgroundColor: colors.surface },
});

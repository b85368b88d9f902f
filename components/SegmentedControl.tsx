import type { ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './Text';
import { colors, radius, space } from './theme';

export type SegmentedOption<V extends string | number> = { value: V; label: string };

export type SegmentedControlProps<V extends string | number> = {
  /** Group label, visible above the options and used as the radio group's name. */
  label: string;
  /** Hide the visible label (the group keeps its accessible name). */
  hideLabel?: boolean;
  options: ReadonlyArray<SegmentedOption<V>>;
  value: V;
  onChange: (value: V) => void;
  disabled?: boolean;
  /** 'md' gives 44 px touch targets, for controls used often on phones. */
  size?: 'sm' | 'md';
};

/** A single choice among a few options, as a radio group of chips that wrap on narrow screens. */
export function SegmentedControl<V extends string | number>({
  label,
  hideLabel = false,
  options,
  value,
  onChange,
  disabled = false,
  size = 'sm',
}: SegmentedControlProps<V>): ReactElement {
  return (
    <View style={styles.field}>
      {hideLabel ? null : <Text variant="label">{label}</Text>}
      <View role="radiogroup" aria-label={label} style={styles.row}>
        {options.map((option) => {
          const selected = option.value === value;
          return (
            <Pressable
              key={String(option.value)}
              role="radio"
              aria-checked={selected}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => {
                if (!selected) onChange(option.value);
              }}
              style={[styles.chip, size === 'md' && styles.chipMd, selected && styles.chipSelected, disabled && styles.disabled]}
            >
              <Text variant="small" weight="medium" tone={selected ? 'inverse' : 'default'}>
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: {
    minHeight: 32,
    justifyContent: 'center',
    paddingHorizontal: space.md,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  chipMd: { minHeight: 44, paddingHorizontal: space.lg },
  chipSelected: { backgroundColor: colors.sage, borderColor: colors.sage },
  disabled: { opacity: 0.55 },
});

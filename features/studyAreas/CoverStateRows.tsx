import type { ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { Text } from '@/components/Text';
import { TextField } from '@/components/TextField';
import { colors, radius, space } from '@/components/theme';
import { coverStateSchema, DEFAULT_STATE_COLOURS, MIN_STATES } from '@/shared/schemas';

import { canAddRow, moveRow, newRow, type StateErrors, type StateField, type StateRow } from './coverStates';

export type CoverStateRowsProps = {
  rows: StateRow[];
  onChange: (rows: StateRow[]) => void;
  /** Shown inline once the person has tried to save. */
  errors: StateErrors | null;
};

type ColourChoiceProps = { label: string; value: string; onChange: (colour: string) => void };

/** The default colours as swatches; the hex field beside it takes any other. */
function ColourChoice({ label, value, onChange }: ColourChoiceProps): ReactElement {
  return (
    <View role="radiogroup" aria-label={label} style={styles.swatches}>
      {DEFAULT_STATE_COLOURS.map((colour) => {
        const selected = colour.toUpperCase() === value.toUpperCase();
        return (
          <Pressable
            key={colour}
            role="radio"
            aria-checked={selected}
            aria-label={colour}
            onPress={() => onChange(colour)}
            style={[styles.swatch, { backgroundColor: colour }, selected && styles.swatchSelected]}
          />
        );
      })}
    </View>
  );
}

/** The ordered cover states: code, name and colour per row; move, add and remove (2 to 12). */
export function CoverStateRows({ rows, onChange, errors }: CoverStateRowsProps): ReactElement {
  const update = (index: number, field: StateField, value: string): void =>
    onChange(rows.map((row, i) => (i === index ? { ...row, [field]: value } : row)));
  return (
    <View style={styles.list}>
      {rows.map((row, index) => {
        const rowErrors = errors?.rows[index] ?? {};
        const title = `State ${index + 1}`;
        return (
          <View key={row.key} style={styles.row} aria-label={title} role="group">
            <View style={styles.head}>
              <View style={[styles.dot, { backgroundColor: coverStateSchema.shape.colour.safeParse(row.colour).success ? row.colour : colors.line }]} />
              <Text weight="semibold" style={styles.title}>
                {row.name.trim() || title}
              </Text>
              <Button label="Up" variant="ghost" size="sm" disabled={index === 0} onPress={() => onChange(moveRow(rows, index, -1))} />
              <Button label="Down" variant="ghost" size="sm" disabled={index === rows.length - 1} onPress={() => onChange(moveRow(rows, index, 1))} />
              <Button
                label="Remove"
                variant="ghost"
                size="sm"
                disabled={rows.length <= MIN_STATES}
                onPress={() => onChange(rows.filter((_, i) => i !== index))}
              />
            </View>
            <View style={styles.fields}>
              <View style={styles.code}>
                <TextField label={`Code of state ${index + 1}`} value={row.code} onChangeText={(v) => update(index, 'code', v)} error={rowErrors.code} placeholder={index === 0 ? 'e.g. PG' : undefined} />
              </View>
              <View style={styles.name}>
                <TextField
                  label={`Name of state ${index + 1}`}
                  value={row.name}
                  onChangeText={(v) => update(index, 'name', v)}
                  error={rowErrors.name}
                  placeholder={index === 0 ? 'e.g. Perennial grassland' : undefined}
                />
              </View>
              <View style={styles.colour}>
                <TextField label={`Colour of state ${index + 1}`} value={row.colour} onChangeText={(v) => update(index, 'colour', v)} error={rowErrors.colour} />
              </View>
            </View>
            <ColourChoice label={`Default colours for state ${index + 1}`} value={row.colour} onChange={(v) => update(index, 'colour', v)} />
          </View>
        );
      })}
      {errors?.list ? (
        <Text variant="small" tone="danger" role="alert">
          {errors.list}
        </Text>
      ) : null}
      <Button label="Add a state" variant="secondary" size="sm" disabled={!canAddRow(rows)} onPress={() => onChange([...rows, newRow(rows)])} />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  row: { gap: space.sm, paddingTop: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  dot: { width: 16, height: 16, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.line },
  title: { flex: 1 },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  code: { flexBasis: 96, flexGrow: 1 },
  name: { flexBasis: 200, flexGrow: 3 },
  colour: { flexBasis: 110, flexGrow: 1 },
  swatches: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  swatch: { width: 24, height: 24, borderRadius: radius.sm, borderWidth: 2, borderColor: colors.surface },
  swatchSelected: { borderColor: colors.basalt },
});

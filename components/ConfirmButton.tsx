import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, type ButtonVariant } from './Button';
import { Text } from './Text';
import { space } from './theme';

export type ConfirmButtonProps = {
  label: string;
  /** The question shown after the first press, e.g. "Remove Ana from the team?". */
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
  variant?: ButtonVariant;
  size?: 'md' | 'sm';
};

/** A button that asks once, inline, before doing something hard to undo. */
export function ConfirmButton({
  label,
  question,
  confirmLabel,
  onConfirm,
  busy = false,
  variant = 'danger',
  size = 'sm',
}: ConfirmButtonProps): ReactElement {
  const [asking, setAsking] = useState(false);
  if (!asking) return <Button label={label} variant={variant} size={size} busy={busy} onPress={() => setAsking(true)} />;
  return (
    <View style={styles.box}>
      <Text variant="small">{question}</Text>
      <View style={styles.row}>
        <Button
          label={confirmLabel}
          variant="danger"
          size={size}
          busy={busy}
          onPress={() => {
            setAsking(false);
            onConfirm();
          }}
        />
        <Button label="Keep" variant="ghost" size={size} onPress={() => setAsking(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});

import { useId, type ReactElement } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';

import { Text } from './Text';
import { colors, fonts, radius, space, typeScale } from './theme';

export type TextFieldProps = Pick<
  TextInputProps,
  'value' | 'onChangeText' | 'autoComplete' | 'keyboardType' | 'secureTextEntry' | 'autoFocus' | 'onSubmitEditing' | 'placeholder' | 'multiline' | 'editable' | 'inputMode'
> & {
  /** Visible label; also the input's accessible name. */
  label: string;
  /** Inline error under the input. */
  error?: string;
  /** Extra guidance under the input, shown when there is no error. */
  hint?: string;
};

/** A labelled text input with an inline error or hint. */
export function TextField({ label, error, hint, ...input }: TextFieldProps): ReactElement {
  const messageId = useId();
  const message = error ?? hint;
  return (
    <View style={styles.field}>
      <Text variant="label">{label}</Text>
      <TextInput
        {...input}
        accessibilityLabel={label}
        aria-invalid={error !== undefined}
        aria-describedby={message ? messageId : undefined}
        autoCapitalize="none"
        autoCorrect={false}
        placeholderTextColor={colors.basaltMuted}
        style={[styles.input, input.multiline && styles.multiline, error !== undefined && styles.inputError]}
      />
      {message ? (
        <Text nativeID={messageId} variant="small" tone={error ? 'danger' : 'muted'}>
          {message}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  input: {
    minHeight: 44,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.white,
    paddingHorizontal: space.md,
    color: colors.basalt,
    fontFamily: fonts.regular,
    ...typeScale.body,
  },
  multiline: { minHeight: 88, paddingVertical: space.sm, textAlignVertical: 'top' },
  inputError: { borderColor: colors.rust },
});

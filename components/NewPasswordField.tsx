import type { ReactElement } from 'react';

import { PASSWORD_MIN_LENGTH } from '@/shared/schemas';

import { TextField, type TextFieldProps } from './TextField';

export type NewPasswordFieldProps = Pick<TextFieldProps, 'label' | 'value' | 'onChangeText' | 'onSubmitEditing' | 'error'>;

/** A field for choosing a password: hidden, the browser's new-password hint, and the length rule shown. */
export function NewPasswordField(props: NewPasswordFieldProps): ReactElement {
  return <TextField {...props} secureTextEntry autoComplete="new-password" hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} />;
}

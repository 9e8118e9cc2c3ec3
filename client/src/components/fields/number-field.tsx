import { TextInput, type TextInputProps } from '@mantine/core';

export interface NumberFieldProps extends Omit<TextInputProps, 'type'> {
  /** Whole numbers only: a numeric keypad on phones. */
  whole?: boolean;
}

/**
 * A number typed as text and kept exactly as typed: no clamping, rounding or dropped characters.
 * The form's rule (`numberRule`) refuses what is out of range with a message.
 */
export function NumberField({ whole, ...props }: NumberFieldProps) {
  return <TextInput {...props} inputMode={whole ? 'numeric' : 'decimal'} autoComplete="off" />;
}

import { TextInput, type TextInputProps } from '@mantine/core';
import { useState, type ChangeEvent } from 'react';
import { browserDateFormat, dateInWords, howToType, readTypedDate } from './typed-date';

export type DateFieldProps = Omit<TextInputProps, 'type' | 'placeholder'>;

/**
 * A date typed as text and kept exactly as typed. Beside it the field says in words which day it
 * understood ("14 March 2025"); whether that day is allowed is the form's rule (`dateRule`).
 */
export function DateField({ description, onChange, value, defaultValue, ...props }: DateFieldProps) {
  const [text, setText] = useState(String(value ?? defaultValue ?? ''));
  const shown = value === undefined ? text : String(value ?? '');
  const format = browserDateFormat();
  const read = readTypedDate(shown, format);
  const hint = read.kind === 'date' ? dateInWords(read.iso) : read.kind === 'empty' ? howToType(format) : null;
  return (
    <TextInput
      {...props}
      value={value === undefined ? undefined : shown}
      defaultValue={value === undefined ? defaultValue : undefined}
      onChange={(e: ChangeEvent<HTMLInputElement>) => {
        setText(e.currentTarget.value);
        onChange?.(e);
      }}
      placeholder={format.pattern === 'YYYY-MM-DD' ? 'YYYY-MM-DD' : `e.g. 2025-03-14`}
      autoComplete="off"
      description={
        description || hint ? (
          <>
            {description}
            {description && hint ? ' · ' : null}
            {hint && <span data-testid="date-in-words">{hint}</span>}
          </>
        ) : undefined
      }
    />
  );
}

import { TextInput, type TextInputProps } from '@mantine/core';
import { useState, type ChangeEvent } from 'react';
import { useWords } from '@/lib/i18n';
import { browserDateFormat, dateExample, dateInWords, howToType, readTypedDate } from './typed-date';

export type DateFieldProps = Omit<TextInputProps, 'type' | 'placeholder'>;

/**
 * A date typed as text and kept exactly as typed. Beside it the field says in words which day it
 * understood ("14 March 2025"); whether that day is allowed is the form's rule (`dateRule`).
 */
export function DateField({ description, onChange, value, defaultValue, ...props }: DateFieldProps) {
  const t = useWords();
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
      placeholder={format.pattern === 'YYYY-MM-DD' ? 'YYYY-MM-DD' : t('page.shell.fields.dateExample', { example: dateExample(format) })}
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

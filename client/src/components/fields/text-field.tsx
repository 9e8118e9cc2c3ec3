import { Text, TextInput, Textarea, type TextInputProps, type TextareaProps } from '@mantine/core';
import { useState, type ChangeEvent, type ReactNode } from 'react';
import { counterText } from './text-rule';

interface LimitProps {
  /** The server's limit (from TEXT_LIMITS); shown as a counter near it and refused above it by `textRule`. */
  maxLength: number;
}

/** Deliberately no DOM maxlength: a browser cuts a long paste silently, we say it is too long. */
function useCounter(maxLength: number, start: unknown, onChange?: (e: ChangeEvent<HTMLInputElement & HTMLTextAreaElement>) => void) {
  const [length, setLength] = useState(String(start ?? '').length);
  const counter = counterText(length, maxLength);
  const over = length > maxLength;
  return {
    handle: (e: ChangeEvent<HTMLInputElement & HTMLTextAreaElement>) => {
      setLength(e.currentTarget.value.length);
      onChange?.(e);
    },
    note: (description: ReactNode) =>
      description || counter ? (
        <>
          {description}
          {description && counter ? ' · ' : null}
          {counter && (
            <Text span size="xs" c={over ? 'clay' : undefined} fw={over ? 600 : undefined} data-testid="text-counter">
              {counter}
            </Text>
          )}
        </>
      ) : undefined,
  };
}

/** A one-line text field that shows its limit. */
export function TextField({ maxLength, description, onChange, ...props }: Omit<TextInputProps, 'maxLength'> & LimitProps) {
  const { handle, note } = useCounter(maxLength, props.value ?? props.defaultValue, onChange);
  return <TextInput {...props} onChange={handle} description={note(description)} />;
}

/** A multi-line text field that shows its limit. */
export function TextAreaField({ maxLength, description, onChange, ...props }: Omit<TextareaProps, 'maxLength'> & LimitProps) {
  const { handle, note } = useCounter(maxLength, props.value ?? props.defaultValue, onChange);
  return <Textarea rows={3} {...props} onChange={handle} description={note(description)} />;
}

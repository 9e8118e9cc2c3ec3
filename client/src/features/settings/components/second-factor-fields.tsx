import { PasswordInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { TEXT_LIMITS } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';

export interface CodeAndPassword {
  password: string;
  code: string;
}

export const codeAndPasswordRules = (codeRequired: string) => ({
  password: textRule({ required: 'Enter your password.', maxLength: TEXT_LIMITS.password }),
  code: textRule({ required: codeRequired, maxLength: TEXT_LIMITS.secondFactorCode }),
});

/** The current password and a code: what every change to the second factor asks for. */
export function CodeAndPasswordFields({
  form,
  codeLabel,
  codeDescription,
}: {
  form: UseFormReturnType<CodeAndPassword>;
  codeLabel: string;
  codeDescription?: string;
}) {
  return (
    <>
      <TextField
        label={codeLabel}
        description={codeDescription}
        autoComplete="one-time-code"
        withAsterisk
        maxLength={TEXT_LIMITS.secondFactorCode}
        key={form.key('code')}
        {...form.getInputProps('code')}
      />
      <PasswordInput label="Your password" autoComplete="current-password" withAsterisk key={form.key('password')} {...form.getInputProps('password')} />
    </>
  );
}

import { PasswordInput } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import { TEXT_LIMITS, type Words } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { textRule } from '@/components/fields/text-rule';
import { useWords } from '@/lib/i18n';

export interface CodeAndPassword {
  password: string;
  code: string;
}

export const codeAndPasswordRules = (t: Words, codeRequired: string) => ({
  password: textRule({ required: t('page.settings.secondFactor.enterPassword'), maxLength: TEXT_LIMITS.password }),
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
  const t = useWords();
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
      <PasswordInput
        label={t('page.settings.secondFactor.yourPassword')}
        autoComplete="current-password"
        withAsterisk
        key={form.key('password')}
        {...form.getInputProps('password')}
      />
    </>
  );
}

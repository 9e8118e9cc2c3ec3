import { PasswordInput, Stack } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useConfirmPasswordReset } from '../api/password-reset';
import { useWords } from '@/lib/i18n';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const t = useWords();
  const confirm = useConfirmPasswordReset();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { password: '' },
    validate: { password: (v) => (v.length >= MIN_PASSWORD_LENGTH ? null : t('page.settings.password.tooShort', { count: MIN_PASSWORD_LENGTH })) },
  });
  return (
    <form
      onSubmit={form.onSubmit((v) =>
        confirm.mutate({ token, password: v.password }, { onSuccess: onDone, onError: (e) => setProblem(applyServerErrors(form, e)) }),
      )}
    >
      <Stack>
        <PasswordInput
          label={t('page.settings.password.new')}
          autoComplete="new-password"
          withAsterisk
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <FormActions message={problem} loading={confirm.isPending} submitLabel={t('page.auth.setPassword')} />
      </Stack>
    </form>
  );
}

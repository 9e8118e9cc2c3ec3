import { Alert, Stack, TextInput } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { applyServerErrors } from '@/lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset';
import { useWords } from '@/lib/i18n';
import { RESET_LINK_MINUTES } from '@broodsilk/shared';

export function ForgotPasswordForm() {
  const t = useWords();
  const request = useRequestPasswordReset();
  const [answer, setAnswer] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm({ mode: 'uncontrolled', initialValues: { email: '' } });
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        request.mutate(values, {
          onSuccess: () => setAnswer({ ok: true, text: t('page.auth.resetSent', { minutes: RESET_LINK_MINUTES }) }),
          onError: (e) => setAnswer({ ok: false, text: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack>
        {answer?.ok && (
          <Alert color="moss" variant="light" role="status">
            {answer.text}
          </Alert>
        )}
        <TextInput label={t('page.auth.email')} type="email" withAsterisk key={form.key('email')} {...form.getInputProps('email')} />
        <FormActions message={answer && !answer.ok ? answer.text : null} loading={request.isPending} submitLabel={t('page.auth.sendLink')} />
      </Stack>
    </form>
  );
}

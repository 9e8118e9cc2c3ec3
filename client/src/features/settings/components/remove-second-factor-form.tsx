import { Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useRemoveSecondFactor } from '../api/second-factor';
import { CodeAndPasswordFields, codeAndPasswordRules, type CodeAndPassword } from './second-factor-fields';
import { useWords } from '@/lib/i18n';

export function RemoveSecondFactorForm() {
  const t = useWords();
  const remove = useRemoveSecondFactor();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CodeAndPassword>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '', password: '' },
    validate: codeAndPasswordRules(t, t('page.settings.secondFactor.enterCodeOrRecovery')),
  });
  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        remove.mutate(values, {
          onSuccess: () => notifications.show({ color: 'moss', message: t('page.settings.secondFactor.removed') }),
          onError: (e) => setProblem(applyServerErrors(form, e)),
        });
      })}
    >
      <Stack maw={480}>
        <CodeAndPasswordFields form={form} codeLabel={t('page.settings.secondFactor.codeOrRecovery')} />
        <FormActions message={problem} loading={remove.isPending} submitLabel={t('page.settings.secondFactor.remove')} />
      </Stack>
    </form>
  );
}

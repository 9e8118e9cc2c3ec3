import { Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { useState } from 'react';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useRemoveSecondFactor } from '../api/second-factor';
import { CodeAndPasswordFields, codeAndPasswordRules, type CodeAndPassword } from './second-factor-fields';

export function RemoveSecondFactorForm() {
  const remove = useRemoveSecondFactor();
  const [problem, setProblem] = useState<string | null>(null);
  const form = useForm<CodeAndPassword>({
    mode: 'uncontrolled',
    validateInputOnBlur: true,
    initialValues: { code: '', password: '' },
    validate: codeAndPasswordRules('Enter a code from your app or a recovery code.'),
  });
  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        remove.mutate(values, {
          onSuccess: () => notifications.show({ color: 'moss', message: 'Second factor removed. Signing in asks only for your password again.' }),
          onError: (e) => setProblem(applyServerErrors(form, e)),
        });
      })}
    >
      <Stack maw={480}>
        <CodeAndPasswordFields form={form} codeLabel="Code from the app or a recovery code" />
        <FormActions message={problem} loading={remove.isPending} submitLabel="Remove second factor" />
      </Stack>
    </form>
  );
}

import { PasswordInput, Stack } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useChangePassword } from '../api/profile';

export function PasswordForm() {
  const change = useChangePassword();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { currentPassword: '', newPassword: '' },
    validate: { newPassword: (v) => (v.length >= MIN_PASSWORD_LENGTH ? null : `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.`) },
  });
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        change.mutate(values, {
          onSuccess: () => {
            form.reset();
            notifications.show({ color: 'moss', message: 'Password changed. Your other sessions were signed out.' });
          },
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={480}>
        <PasswordInput
          label="Current password"
          autoComplete="current-password"
          withAsterisk
          key={form.key('currentPassword')}
          {...form.getInputProps('currentPassword')}
        />
        <PasswordInput label="New password" autoComplete="new-password" withAsterisk key={form.key('newPassword')} {...form.getInputProps('newPassword')} />
        <FormActions message={null} loading={change.isPending} submitLabel="Change password" />
      </Stack>
    </form>
  );
}

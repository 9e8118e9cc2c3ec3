import { PasswordInput, Stack } from '@mantine/core';
import { FormActions } from '@/components/ui/form-actions';
import { useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { MIN_PASSWORD_LENGTH } from '@broodsilk/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { useChangePassword } from '../api/profile';
import { useWords } from '@/lib/i18n';

export function PasswordForm() {
  const t = useWords();
  const change = useChangePassword();
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { currentPassword: '', newPassword: '' },
    validate: { newPassword: (v) => (v.length >= MIN_PASSWORD_LENGTH ? null : t('page.settings.password.tooShort', { count: MIN_PASSWORD_LENGTH })) },
  });
  return (
    <form
      onSubmit={form.onSubmit((values) =>
        change.mutate(values, {
          onSuccess: () => {
            form.reset();
            notifications.show({ color: 'moss', message: t('page.settings.password.changed') });
          },
          onError: (e) => notifications.show({ color: 'clay', message: applyServerErrors(form, e) }),
        }),
      )}
    >
      <Stack maw={480}>
        <PasswordInput
          label={t('page.settings.password.current')}
          autoComplete="current-password"
          withAsterisk
          key={form.key('currentPassword')}
          {...form.getInputProps('currentPassword')}
        />
        <PasswordInput
          label={t('page.settings.password.new')}
          autoComplete="new-password"
          withAsterisk
          key={form.key('newPassword')}
          {...form.getInputProps('newPassword')}
        />
        <FormActions message={null} loading={change.isPending} submitLabel={t('page.settings.password.change')} />
      </Stack>
    </form>
  );
}

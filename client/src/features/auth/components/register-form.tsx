import { Anchor, PasswordInput, Stack, Text } from '@mantine/core';
import { Link } from 'react-router';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { MIN_PASSWORD_LENGTH, TEXT_LIMITS } from '@broodsilk/shared';
import { TextField } from '@/components/fields/text-field';
import { browserTimeZone, TimeZoneField } from '@/components/fields/time-zone-field';
import { textRule } from '@/components/fields/text-rule';
import { FormActions } from '@/components/ui/form-actions';
import { applyServerErrors } from '@/lib/form-errors';
import { useRegister } from '../api/session';
import { useWords } from '@/lib/i18n';
import { CheckEmail } from './check-email';

/** `invitationToken`: the invitation link that led here; the confirmation e-mail carries it and confirming accepts it. */
export function RegisterForm({ signInHref, invitationToken }: { signInHref: string; invitationToken?: string }) {
  const t = useWords();
  const register = useRegister();
  const [problem, setProblem] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { displayName: '', email: '', password: '', timeZone: browserTimeZone() },
    validate: {
      displayName: textRule({ required: t('page.auth.nameRequired'), maxLength: TEXT_LIMITS.displayName }),
      email: (v) => (/^\S+@\S+\.\S+$/.test(v.trim()) ? null : t('page.auth.validEmail')),
      password: (v) =>
        v.length < MIN_PASSWORD_LENGTH
          ? t('page.settings.password.tooShort', { count: MIN_PASSWORD_LENGTH })
          : textRule({ maxLength: TEXT_LIMITS.password })(v),
    },
  });

  if (sentTo) return <CheckEmail email={sentTo} withInvitation={!!invitationToken} />;

  return (
    <form
      onSubmit={form.onSubmit((values) => {
        setProblem(null);
        register.mutate(
          { ...values, ...(invitationToken ? { invitationToken } : {}) },
          { onSuccess: () => setSentTo(values.email.trim()), onError: (e) => setProblem(applyServerErrors(form, e)) },
        );
      })}
    >
      <Stack>
        <TextField
          label={t('page.auth.yourName')}
          description={t('page.auth.yourNameHint')}
          maxLength={TEXT_LIMITS.displayName}
          withAsterisk
          key={form.key('displayName')}
          {...form.getInputProps('displayName')}
        />
        <TextField
          label={t('page.auth.email')}
          type="email"
          autoComplete="email"
          maxLength={TEXT_LIMITS.email}
          withAsterisk
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label={t('page.auth.password')}
          description={t('page.auth.atLeast', { count: MIN_PASSWORD_LENGTH })}
          autoComplete="new-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <TimeZoneField
          current={form.getValues().timeZone}
          description={t('page.auth.zoneHint')}
          key={form.key('timeZone')}
          {...form.getInputProps('timeZone')}
        />
        <FormActions message={problem} loading={register.isPending} submitLabel={t('page.auth.createAccountButton')} />
        <Text size="sm">
          {t('page.auth.haveAccount')}{' '}
          <Anchor component={Link} to={signInHref}>
            {t('page.auth.signIn')}
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}

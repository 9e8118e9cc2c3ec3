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
import { CheckEmail } from './check-email';

/** `invitationToken`: the invitation link that led here; the confirmation e-mail carries it and confirming accepts it. */
export function RegisterForm({ signInHref, invitationToken }: { signInHref: string; invitationToken?: string }) {
  const register = useRegister();
  const [problem, setProblem] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm({
    mode: 'uncontrolled',
    initialValues: { displayName: '', email: '', password: '', timeZone: browserTimeZone() },
    validate: {
      displayName: textRule({ required: 'Tell us the name to show to your partners.', maxLength: TEXT_LIMITS.displayName }),
      email: (v) => (/^\S+@\S+\.\S+$/.test(v.trim()) ? null : 'Enter a valid e-mail address.'),
      password: (v) =>
        v.length < MIN_PASSWORD_LENGTH ? `Use a password of at least ${MIN_PASSWORD_LENGTH} characters.` : textRule({ maxLength: TEXT_LIMITS.password })(v),
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
          label="Your name"
          description="Shown to your partners"
          maxLength={TEXT_LIMITS.displayName}
          withAsterisk
          key={form.key('displayName')}
          {...form.getInputProps('displayName')}
        />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          maxLength={TEXT_LIMITS.email}
          withAsterisk
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          description={`At least ${MIN_PASSWORD_LENGTH} characters`}
          autoComplete="new-password"
          required
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <TimeZoneField
          current={form.getValues().timeZone}
          description="Taken from this browser. Dates and what is due today follow it; change it here or later in Settings."
          key={form.key('timeZone')}
          {...form.getInputProps('timeZone')}
        />
        <FormActions message={problem} loading={register.isPending} submitLabel="Create account" />
        <Text size="sm">
          Already have an account?{' '}
          <Anchor component={Link} to={signInHref}>
            Sign in
          </Anchor>
        </Text>
      </Stack>
    </form>
  );
}
